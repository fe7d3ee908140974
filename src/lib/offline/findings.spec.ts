import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import type { DeviceDatabase } from './db';
import { saveDraft, surveyDrafts } from './drafts';
import { CaptureRefused, deleteFinding, saveFinding } from './findings';
import { addPhoto } from './photos';
import { storeSnapshot } from './snapshot';
import { leakCapture, SITE_ID, snapshot, SURVEY_ID, testDb, trapCapture } from './spec-fixtures';

let db: DeviceDatabase;
afterEach(async () => {
	await db.delete();
});

describe('saveFinding', () => {
	it('stores a new finding as pending with its outbox entry', async () => {
		db = testDb();
		const capture = trapCapture();
		const saved = await saveFinding(db, capture);
		expect(saved).toMatchObject({ version: 0, status: 'draft', pending: 1, deleted: 0 });
		expect(await db.findings.get(capture.id)).toEqual(saved);
		const [entry] = await db.outbox.toArray();
		expect(entry).toMatchObject({
			entity: 'finding',
			op: 'upsert',
			recordId: capture.id,
			baseVersion: 0,
			payload: capture,
			attempts: 0
		});
		expect(entry.mutationId).toMatch(/^[0-9a-f-]{36}$/);
	});

	it('refuses an invalid capture, naming the field, and writes nothing', async () => {
		db = testDb();
		await saveFinding(db, leakCapture());
		const before = { findings: await db.findings.count(), outbox: await db.outbox.count() };
		const bad = trapCapture();
		bad.inputs = { ...bad.inputs, orificeDiameter: -0.002 };
		const refusal = await saveFinding(db, bad).catch((e: unknown) => e);
		expect(refusal).toBeInstanceOf(CaptureRefused);
		expect((refusal as CaptureRefused).issues).toEqual([
			{ path: 'inputs.orificeDiameter', message: 'Orifice diameter must be greater than 0 m' }
		]);
		expect((refusal as CaptureRefused).message).toBe(
			'Not saved: Orifice diameter must be greater than 0 m'
		);
		expect({ findings: await db.findings.count(), outbox: await db.outbox.count() }).toEqual(
			before
		);
	});

	it('refuses a capture carrying what only the Desk may set', async () => {
		db = testDb();
		const sneaky = { ...leakCapture(), status: 'approved' };
		await expect(saveFinding(db, sneaky)).rejects.toBeInstanceOf(CaptureRefused);
		expect(await db.findings.count()).toBe(0);
		expect(await db.outbox.count()).toBe(0);
	});

	it('keeps the server version and status on an edit and bases the change on that version', async () => {
		db = testDb();
		const leak = leakCapture();
		await storeSnapshot(db, {
			...snapshot([{ capture: leak, version: 4 }]),
			findings: [{ capture: leak, version: 4, status: 'reviewed' }]
		});
		const saved = await saveFinding(db, { ...leak, notes: 'Plume bigger today' });
		expect(saved).toMatchObject({ version: 4, status: 'reviewed', pending: 1 });
		expect(await db.outbox.toArray()).toMatchObject([{ baseVersion: 4, recordId: leak.id }]);
	});

	it('refuses to move a finding to another survey', async () => {
		db = testDb();
		const leak = leakCapture();
		await saveFinding(db, leak);
		const moved = { ...leak, surveyId: '5e1f0000-0000-4000-8000-0000000000ff' };
		await expect(saveFinding(db, moved)).rejects.toThrow('belongs to another survey');
		expect(await db.outbox.count()).toBe(1);
	});

	it('makes a device asset for a trap tag the site does not know, so the next test pre-fills', async () => {
		db = testDb();
		await storeSnapshot(db, snapshot());
		await saveFinding(db, trapCapture({ assetTag: 'ST-101' }));
		expect(await db.assets.count()).toBe(1);
		const fresh = trapCapture({ assetTag: 'ST-300', location: 'Dryer 3 outlet' });
		fresh.inputs = { ...fresh.inputs, orificeDiameter: 0.004 };
		await saveFinding(db, fresh);
		const made = await db.assets.where('[siteId+tag]').equals([SITE_ID, 'ST-300']).first();
		expect(made).toMatchObject({
			local: 1,
			kind: 'trap',
			location: 'Dryer 3 outlet',
			details: { trapType: 'thermodynamic', dn: 15, orificeDiameter: 0.004 },
			lastResult: null
		});
		// A second test of the same new tag updates that asset, it does not add one.
		await saveFinding(db, { ...fresh, id: crypto.randomUUID(), location: 'Dryer 3, moved' });
		expect(await db.assets.where('siteId').equals(SITE_ID).count()).toBe(2);
	});
});

describe('deleteFinding', () => {
	it('removes a finding never sent, with its queued upserts, photos and drafts', async () => {
		db = testDb();
		const leak = leakCapture();
		const kept = leakCapture();
		await saveFinding(db, leak);
		await saveFinding(db, kept);
		const blob = new Blob([new Uint8Array(3)]);
		const prepared = { blob, thumbnail: blob, width: 1, height: 1, contentType: 'image/jpeg' };
		await addPhoto(db, { findingId: leak.id, surveyId: SURVEY_ID, prepared });
		await saveDraft(db, { surveyId: SURVEY_ID, kind: 'leak', findingId: leak.id, values: {} });
		expect(await deleteFinding(db, leak.id)).toBe('removed');
		expect(await db.findings.get(leak.id)).toBeUndefined();
		expect(await db.outbox.toArray()).toMatchObject([{ recordId: kept.id }]);
		expect(await db.photos.count()).toBe(0);
		expect(await surveyDrafts(db, SURVEY_ID)).toEqual([]);
	});

	it('marks a finding the server holds and queues a delete on its version', async () => {
		db = testDb();
		const leak = leakCapture();
		await storeSnapshot(db, snapshot([{ capture: leak, version: 2 }]));
		expect(await deleteFinding(db, leak.id)).toBe('marked');
		expect(await db.findings.get(leak.id)).toMatchObject({ deleted: 1, pending: 1, version: 2 });
		expect(await db.outbox.toArray()).toMatchObject([
			{ op: 'delete', recordId: leak.id, baseVersion: 2, payload: null }
		]);
	});

	it('treats a new finding whose upsert was already tried as sent', async () => {
		db = testDb();
		const leak = leakCapture();
		await saveFinding(db, leak);
		await db.outbox.toCollection().modify({ attempts: 1 });
		expect(await deleteFinding(db, leak.id)).toBe('marked');
		expect(await db.outbox.count()).toBe(2);
	});

	it('says when there is nothing to delete', async () => {
		db = testDb();
		expect(await deleteFinding(db, crypto.randomUUID())).toBe('missing');
	});
});
