import { describe, expect, it } from 'vitest';
import { captureFromRow, type CaptureColumns } from './capture-row';

const row = (over: Partial<CaptureColumns> = {}): CaptureColumns => ({
	id: '5e7a0007-0000-4000-8000-000000000099',
	surveyId: '5e7a0006-0000-4000-8000-000000000001',
	kind: 'leak',
	headerId: '5e7a0005-0000-4000-8000-000000000001',
	areaId: null,
	location: null,
	notes: null,
	inputs: { sizeClass: 'small' },
	photoIds: null,
	recordedAt: new Date('2026-11-17T09:00:00Z'),
	capturedAt: new Date('2026-11-17T09:05:00Z'),
	createdAt: new Date('2026-11-18T12:00:00Z'),
	updatedAt: new Date('2026-11-19T12:00:00Z'),
	assetTag: null,
	...over
});

describe('captureFromRow', () => {
	it("uses the device's times and leaves out what the row does not hold", () => {
		const capture = captureFromRow(row());
		expect(capture).toEqual({
			id: '5e7a0007-0000-4000-8000-000000000099',
			surveyId: '5e7a0006-0000-4000-8000-000000000001',
			kind: 'leak',
			headerId: '5e7a0005-0000-4000-8000-000000000001',
			location: '',
			notes: '',
			photoIds: [],
			inputs: { sizeClass: 'small' },
			createdAt: '2026-11-17T09:00:00.000Z',
			updatedAt: '2026-11-17T09:05:00.000Z'
		});
		expect('areaId' in capture || 'assetTag' in capture).toBe(false);
	});

	it("falls back to the row's own times, and never has a change before the recording", () => {
		const old = captureFromRow(row({ recordedAt: null, capturedAt: null }));
		expect([old.createdAt, old.updatedAt]).toEqual([
			'2026-11-18T12:00:00.000Z',
			'2026-11-19T12:00:00.000Z'
		]);
		const skewed = captureFromRow(row({ capturedAt: new Date('2026-11-17T08:00:00Z') }));
		expect(skewed.updatedAt).toBe(skewed.createdAt);
	});

	it('refuses a stored row the capture schema would refuse', () => {
		expect(() => captureFromRow(row({ inputs: {} }))).toThrow(/hole diameter|size class/i);
	});
});
