import 'fake-indexeddb/auto';
import Dexie from 'dexie';
import { afterEach, describe, expect, it } from 'vitest';
import { closeDeviceDb, DeviceDatabase, deviceDbName, openDeviceDb, type OutboxEntry } from './db';
import { saveDraft, surveyDrafts } from './drafts';
import { saveFinding } from './findings';
import { leakCapture, SURVEY_ID, testDb, trapCapture } from './spec-fixtures';

/** The version-1 database exactly as it shipped: the upgrade must read what it wrote. */
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

const names: string[] = [];
afterEach(async () => {
	for (const name of names.splice(0)) await Dexie.delete(name);
});
function named(): string {
	const name = `t-${crypto.randomUUID()}`;
	names.push(name);
	return name;
}

describe('device database, version 1 → 2', () => {
	it('carries findings, photos and the outbox over and sets aside what it cannot read', async () => {
		const name = named();
		const trap = trapCapture();
		const leak = leakCapture();
		const photo = new Blob([new Uint8Array([0xff, 0xd8, 0xff, 0xd9])], { type: 'image/jpeg' });
		const v1 = new V1Database(name);
		await v1.table('surveys').add({
			id: SURVEY_ID,
			name: 'Spring walk',
			siteName: 'Riverside',
			cursor: 3,
			updatedAt: '2025-03-01T00:00:00.000Z'
		});
		await v1.table('findings').bulkAdd([
			// A capture as it is now.
			{ id: trap.id, surveyId: SURVEY_ID, kind: 'trap', record: trap, version: 0, updatedAt: 'x' },
			// A whole stored finding (the old record shape): review part left to the Desk.
			{
				id: leak.id,
				surveyId: SURVEY_ID,
				kind: 'leak',
				record: { ...leak, photoIds: undefined, status: 'reviewed', version: 2, deleted: false },
				version: 2,
				updatedAt: 'y'
			},
			// Unreadable: kept aside, not dropped.
			{ id: 'broken', surveyId: SURVEY_ID, kind: 'leak', record: { kind: 'leak' }, version: 0 }
		]);
		await v1.table('photos').add({
			id: 'p1',
			findingId: trap.id,
			blob: photo,
			contentType: 'image/jpeg',
			uploaded: 0,
			createdAt: '2025-03-04T09:01:00.000Z'
		});
		await v1.table('outbox').bulkAdd([
			{
				mutationId: 'm1',
				entity: 'finding',
				entityId: trap.id,
				payload: trap,
				attempts: 2,
				lastError: 'offline',
				createdAt: 'z'
			},
			{
				mutationId: 'm2',
				entity: 'photo',
				entityId: 'p1',
				payload: {},
				attempts: 0,
				createdAt: 'z'
			}
		]);
		v1.close();

		const db = new DeviceDatabase(name);
		const findings = await db.findings.orderBy('id').toArray();
		expect(findings.map((f) => f.id).sort()).toEqual([leak.id, trap.id].sort());
		const carriedTrap = findings.find((f) => f.id === trap.id)!;
		expect(carriedTrap).toMatchObject({ capture: trap, version: 0, pending: 1, status: 'draft' });
		const carriedLeak = findings.find((f) => f.id === leak.id)!;
		expect(carriedLeak.capture).toEqual({ ...leak, photoIds: [] });
		expect(carriedLeak).toMatchObject({ status: 'reviewed', version: 0, pending: 1, deleted: 0 });

		const [upgradedPhoto] = await db.photos.toArray();
		expect(upgradedPhoto).toMatchObject({ id: 'p1', surveyId: SURVEY_ID, bytes: 4, uploaded: 0 });
		expect(upgradedPhoto.thumbnail.size).toBe(4);
		expect(await db.photos.where('surveyId').equals(SURVEY_ID).count()).toBe(1);

		const outbox = await db.outbox.toArray();
		const trapEntry = outbox.find((e) => e.recordId === trap.id);
		expect(trapEntry).toMatchObject({
			mutationId: 'm1',
			op: 'upsert',
			baseVersion: 0,
			payload: trap,
			attempts: 2,
			lastError: 'offline'
		} satisfies Partial<OutboxEntry>);
		expect(trapEntry).not.toHaveProperty('entityId');
		// The leak had nothing queued: it is queued now, so it reaches the server.
		expect(outbox.find((e) => e.recordId === leak.id)).toMatchObject({
			op: 'upsert',
			payload: { id: leak.id }
		});
		expect(outbox).toHaveLength(2);

		const aside = await db.setAside.toArray();
		expect(aside.map((a) => `${a.store}:${a.key}`).sort()).toEqual(
			['findings:broken', 'outbox:2', `surveys:${SURVEY_ID}`].sort()
		);
		expect(aside.find((a) => a.key === 'broken')?.row).toMatchObject({ record: { kind: 'leak' } });
		expect(aside.find((a) => a.key === 'broken')?.reason).toMatch(
			/^Not a finding this version can read/
		);
		db.close();
	});
});

describe('device database', () => {
	it('keeps drafts and the outbox when closed and opened again', async () => {
		const name = named();
		let db = new DeviceDatabase(name);
		await saveFinding(db, trapCapture());
		await saveDraft(db, {
			surveyId: SURVEY_ID,
			kind: 'leak',
			findingId: 'f-1',
			values: { location: 'Dryer 2', hole: '3,5' }
		});
		db.close();
		db = new DeviceDatabase(name);
		expect(await db.outbox.count()).toBe(1);
		expect((await surveyDrafts(db, SURVEY_ID))[0].values).toEqual({
			location: 'Dryer 2',
			hole: '3,5'
		});
		db.close();
	});

	it('refuses a second outbox entry with the same mutation id', async () => {
		const db = testDb();
		names.push(db.name);
		const entry: OutboxEntry = {
			mutationId: 'm-1',
			entity: 'finding',
			op: 'delete',
			recordId: 'f',
			baseVersion: 1,
			payload: null,
			attempts: 0,
			createdAt: 'x'
		};
		await db.outbox.add({ ...entry });
		await expect(db.outbox.add({ ...entry })).rejects.toThrow();
		expect(await db.outbox.count()).toBe(1);
		db.close();
	});
});

describe('one database per person', () => {
	it('names each person’s database and refuses to open one for nobody', () => {
		expect(deviceDbName('u-1')).toBe('steamwisp-user-u-1');
		expect(() => deviceDbName('')).toThrow('signed-in person');
	});

	it('keeps two people’s records apart and opens each once', async () => {
		const a = `a-${crypto.randomUUID()}`;
		const b = `b-${crypto.randomUUID()}`;
		names.push(deviceDbName(a), deviceDbName(b));
		const dbA = openDeviceDb(a);
		expect(openDeviceDb(a)).toBe(dbA);
		await saveFinding(dbA, trapCapture());
		const dbB = openDeviceDb(b);
		expect(dbB).not.toBe(dbA);
		expect(await dbB.findings.count()).toBe(0);
		expect(await dbB.outbox.count()).toBe(0);
		expect(await dbA.findings.count()).toBe(1);
		closeDeviceDb(a);
		closeDeviceDb(b);
		expect(openDeviceDb(a)).not.toBe(dbA);
		expect(await openDeviceDb(a).findings.count()).toBe(1);
		closeDeviceDb(a);
	});
});
