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
