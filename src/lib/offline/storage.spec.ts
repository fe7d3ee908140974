import { afterEach, describe, expect, it, vi } from 'vitest';
import { describeBytes, describeStorage, requestPersistence, storageReport } from './storage';

afterEach(() => vi.unstubAllGlobals());

describe('describeStorage', () => {
	it('says what is used, what is free and that the data is kept', () => {
		expect(describeStorage({ usage: 4_200_000, quota: 1_804_200_000, persisted: true })).toBe(
			'4.2 MB used · about 1.8 GB free on this device · kept when space runs low'
		);
	});

	it('warns that the data may be cleared when persistence was not granted', () => {
		expect(describeStorage({ usage: 850_000, quota: 120_000_000, persisted: false })).toBe(
			'850 kB used · about 119 MB free on this device · may be cleared if the device runs low on space'
		);
	});

	it('says plainly when the browser gives no figures', () => {
		expect(describeStorage(null)).toBe('This browser does not say how much space is left');
	});

	it('never reports negative free space', () => {
		expect(describeStorage({ usage: 5000, quota: 1000, persisted: true })).toContain(
			'about 0 bytes free'
		);
	});
});

describe('describeBytes', () => {
	it('uses decimal units with one decimal below 10', () => {
		expect(describeBytes(1)).toBe('1 byte');
		expect(describeBytes(999)).toBe('999 bytes');
		expect(describeBytes(1000)).toBe('1.0 kB');
		expect(describeBytes(12_345_678)).toBe('12 MB');
	});
});

describe('requestPersistence and storageReport', () => {
	it('are false and null where the browser has no storage manager', async () => {
		vi.stubGlobal('navigator', {});
		expect(await requestPersistence()).toBe(false);
		expect(await storageReport()).toBeNull();
	});

	it('ask the storage manager when there is one', async () => {
		const persist = vi.fn(async () => true);
		vi.stubGlobal('navigator', {
			storage: {
				persist,
				persisted: async () => true,
				estimate: async () => ({ usage: 10, quota: 100 })
			}
		});
		expect(await requestPersistence()).toBe(true);
		expect(persist).toHaveBeenCalledOnce();
		expect(await storageReport()).toEqual({ usage: 10, quota: 100, persisted: true });
	});

	it('give no report when the estimate fails', async () => {
		vi.stubGlobal('navigator', {
			storage: { estimate: async () => Promise.reject(new Error('denied')) }
		});
		expect(await storageReport()).toBeNull();
	});
});
