import 'fake-indexeddb/auto';
import Dexie from 'dexie';
import { afterEach, describe, expect, it } from 'vitest';
import { DeviceDatabase } from './db';
import { SURVEY_ID, trapCapture } from './spec-fixtures';

/** The version-2 stores exactly as they shipped (the upgrade must read what they hold). */
class V2Database extends Dexie {
	constructor(name: string) {
		super(name);
		this.version(2).stores({
			surveys: 'id, updatedAt, siteId',
			sites: 'id',
			areas: 'id, siteId',
			assets: 'id, siteId, &[siteId+tag]',
			findings: 'id, surveyId, [surveyId+kind], [surveyId+updatedAt]',
			photos: 'id, findingId, surveyId, uploaded',
			drafts: 'key, surveyId',
			outbox: '++seq, &mutationId, recordId',
			setAside: '++seq, store'
		});
	}
}

/** The version-1 stores exactly as they shipped. */
class V1Database extends Dexie {
	constructor(name: string) {
		super(name);
		this.version(1).stores({
			surveys: 'id, updatedAt',
			findings: 'id, surveyId, [surveyId+updatedAt]',
			photos: 'id, findingId, uploaded',
			outbox: '++seq, &mutationId, entityId'
		});
	}
}

const name = `t-${crypto.randomUUID()}`;
afterEach(async () => {
	await Dexie.delete(name);
});

describe('device database, version 2 → 3', () => {
	it('keeps every row, adds meta and conflicts, and tells queued deletions their survey', async () => {
		const v2 = new V2Database(name);
		const trap = trapCapture();
		await v2.table('findings').put({
			id: trap.id,
			surveyId: SURVEY_ID,
			kind: 'trap',
			capture: trap,
			version: 2,
			status: 'draft',
			pending: 1,
			deleted: 1,
			updatedAt: trap.updatedAt
		});
		const at = '2026-11-20T10:00:00.000Z';
		await v2.table('outbox').bulkAdd([
			{
				mutationId: crypto.randomUUID(),
				recordId: trap.id,
				op: 'upsert',
				baseVersion: 1,
				payload: trap,
				attempts: 1,
				createdAt: at
			},
			{
				mutationId: crypto.randomUUID(),
				recordId: trap.id,
				op: 'delete',
				baseVersion: 2,
				payload: null,
				attempts: 0,
				createdAt: at
			}
		]);
		await v2.table('drafts').put({ key: 'd1', surveyId: SURVEY_ID, values: {} });
		await v2
			.table('photos')
			.put({ id: 'p1', findingId: trap.id, surveyId: SURVEY_ID, uploaded: 0 });
		await v2
			.table('setAside')
			.add({ store: 'findings', key: 'x', row: {}, reason: 'r', setAsideAt: at });
		v2.close();

		const db = new DeviceDatabase(name);
		await db.open();
		expect(db.verno).toBe(3);
		const outbox = await db.outbox.orderBy('seq').toArray();
		expect(outbox.map((e) => [e.op, e.surveyId, e.attempts])).toEqual([
			['upsert', SURVEY_ID, 1],
			['delete', SURVEY_ID, 0]
		]);
		// The new index gives a finding's queue in order.
		const queue = await db.outbox
			.where('[recordId+seq]')
			.between([trap.id, 0], [trap.id, Infinity])
			.toArray();
		expect(queue).toHaveLength(2);
		expect(await db.findings.get(trap.id)).toMatchObject({ version: 2, deleted: 1, pending: 1 });
		expect(await db.drafts.count()).toBe(1);
		expect(await db.photos.count()).toBe(1);
		expect(await db.setAside.count()).toBe(1);
		expect(await db.meta.count()).toBe(0);
		expect(await db.conflicts.count()).toBe(0);
		db.close();
	});
});

describe('device database, version 1 → 2 → 3', () => {
	it('a version-1 database still opens, through version 2, with the sync stores', async () => {
		const v1 = new V1Database(name);
		const trap = trapCapture();
		await v1.table('findings').add({
			id: trap.id,
			surveyId: SURVEY_ID,
			kind: 'trap',
			record: trap,
			version: 0,
			updatedAt: trap.updatedAt
		});
		await v1.table('outbox').add({
			mutationId: 'm1',
			entity: 'finding',
			entityId: trap.id,
			payload: trap,
			attempts: 1,
			createdAt: trap.updatedAt
		});
		v1.close();

		const db = new DeviceDatabase(name);
		await db.open();
		expect(db.verno).toBe(3);
		expect(await db.findings.get(trap.id)).toMatchObject({ capture: trap, pending: 1 });
		const [entry] = await db.outbox.toArray();
		expect(entry).toMatchObject({
			mutationId: 'm1',
			recordId: trap.id,
			op: 'upsert',
			surveyId: SURVEY_ID,
			attempts: 1
		});
		expect(
			await db.outbox.where('[recordId+seq]').between([trap.id, 0], [trap.id, Infinity]).count()
		).toBe(1);
		await db.meta.put({ key: 'cursor', value: 7 });
		await db.conflicts.put({
			mutationId: 'm1',
			recordId: trap.id,
			surveyId: SURVEY_ID,
			capture: trap,
			serverVersion: 2,
			reason: 'r',
			createdAt: trap.updatedAt
		});
		expect(await db.conflicts.where('recordId').equals(trap.id).count()).toBe(1);
		db.close();
	});
});
