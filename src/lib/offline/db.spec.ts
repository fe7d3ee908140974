import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import { DeviceDatabase } from './db';

describe('device database', () => {
	let db: DeviceDatabase;
	afterEach(async () => {
		await db.delete();
	});

	it('keeps a finding and its outbox entry written in one transaction', async () => {
		db = new DeviceDatabase(`t-${crypto.randomUUID()}`);
		const id = crypto.randomUUID();
		await db.transaction('rw', db.findings, db.outbox, async () => {
			await db.findings.add({
				id,
				surveyId: 's1',
				kind: 'leak',
				record: {},
				version: 1,
				updatedAt: 'x'
			});
			await db.outbox.add({
				mutationId: crypto.randomUUID(),
				entity: 'finding',
				entityId: id,
				payload: {},
				attempts: 0,
				createdAt: 'x'
			});
		});
		expect(await db.findings.get(id)).toMatchObject({ kind: 'leak' });
		expect(await db.outbox.where('entityId').equals(id).count()).toBe(1);
	});

	it('refuses a second outbox entry with the same mutation id', async () => {
		db = new DeviceDatabase(`t-${crypto.randomUUID()}`);
		const entry = {
			mutationId: 'm-1',
			entity: 'finding' as const,
			entityId: 'f',
			payload: {},
			attempts: 0,
			createdAt: 'x'
		};
		await db.outbox.add({ ...entry });
		await expect(db.outbox.add({ ...entry })).rejects.toThrow();
		expect(await db.outbox.count()).toBe(1);
	});
});
