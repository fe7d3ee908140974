import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import { saveFinding } from './findings';
import { leakCapture, trapCapture } from './spec-fixtures';
import { syncOnce } from './sync';
import { syncCounts } from './sync-counts';
import {
	device,
	dropDevices,
	OTHER_SURVEY_ID,
	photoOf,
	pngBytes,
	server
} from './sync-spec-fixtures';
import { SURVEY_ID } from './spec-fixtures';

afterEach(dropDevices);

describe('syncOnce, refusals', () => {
	it('a rejected change stops the drain with its reason; what comes after waits untouched', async () => {
		const srv = server([SURVEY_ID, OTHER_SURVEY_ID]);
		const db = await device(srv, [SURVEY_ID, OTHER_SURVEY_ID]);
		srv.stopRecording(OTHER_SURVEY_ID);
		const first = trapCapture();
		const refused = leakCapture({ surveyId: OTHER_SURVEY_ID });
		const after = leakCapture();
		for (const c of [first, refused, after]) await saveFinding(db, c);

		const summary = await syncOnce(db, { fetch: srv.fetch, batchSize: 1 });
		expect(summary.problem).toMatchObject({
			kind: 'rejected',
			retryable: false,
			message: 'This survey is no longer open'
		});
		expect(summary).toMatchObject({ pushed: 1, rejected: 1 });
		expect(srv.findings.has(first.id)).toBe(true);
		expect(srv.findings.has(refused.id)).toBe(false);
		expect(srv.findings.has(after.id)).toBe(false);
		const outbox = await db.outbox.orderBy('seq').toArray();
		expect(outbox.map((e) => [e.recordId, e.lastError, e.attempts])).toEqual([
			[refused.id, 'This survey is no longer open', 1],
			[after.id, undefined, 0]
		]);
		expect(await db.findings.get(refused.id)).toMatchObject({ pending: 1, capture: refused });
		expect((await syncCounts(db)).refused).toBe(1);

		// Reopened on the server: the same change goes again (a rejection is not recorded there).
		srv.surveys.get(OTHER_SURVEY_ID)!.recording = true;
		const again = await syncOnce(db, { fetch: srv.fetch, batchSize: 1 });
		expect(again.problem).toBeUndefined();
		expect(await db.outbox.count()).toBe(0);
		expect(srv.findings.get(refused.id)?.version).toBe(1);
	});

	it('in one batch, a rejection keeps the server’s answers to the other changes', async () => {
		const srv = server([SURVEY_ID, OTHER_SURVEY_ID]);
		const db = await device(srv, [SURVEY_ID, OTHER_SURVEY_ID]);
		srv.stopRecording(OTHER_SURVEY_ID);
		const refused = leakCapture({ surveyId: OTHER_SURVEY_ID });
		const after = leakCapture();
		for (const c of [refused, after]) await saveFinding(db, c);
		const summary = await syncOnce(db, { fetch: srv.fetch });
		expect(summary).toMatchObject({ pushed: 1, rejected: 1, problem: { kind: 'rejected' } });
		// The server applied the other one: the device knows it, so it is not pending.
		expect(await db.findings.get(after.id)).toMatchObject({ version: 1, pending: 0 });
		expect((await db.outbox.toArray()).map((e) => e.recordId)).toEqual([refused.id]);
	});

	it('an entry that cannot be sent as stored is kept with the reason; those before it go', async () => {
		const srv = server();
		const db = await device(srv);
		const first = leakCapture();
		await saveFinding(db, first);
		const broken = leakCapture();
		await db.outbox.add({
			mutationId: crypto.randomUUID(),
			entity: 'finding',
			op: 'upsert',
			recordId: broken.id,
			baseVersion: 0,
			payload: { ...broken, inputs: {} } as never,
			surveyId: SURVEY_ID,
			attempts: 0,
			createdAt: broken.createdAt
		});
		const after = trapCapture();
		await saveFinding(db, after);
		const summary = await syncOnce(db, { fetch: srv.fetch });
		expect(summary.problem).toMatchObject({ kind: 'rejected', retryable: false });
		expect(summary.problem?.message).toMatch(/^This change cannot be sent as it is \(data\.inputs/);
		expect([...srv.findings.keys()]).toEqual([first.id]);
		const outbox = await db.outbox.orderBy('seq').toArray();
		expect(outbox.map((e) => [e.recordId, e.lastError !== undefined])).toEqual([
			[broken.id, true],
			[after.id, false]
		]);
	});

	it('a batch the server cannot read goes again one by one; only the unreadable one is kept', async () => {
		const srv = server();
		const db = await device(srv);
		const captures = [leakCapture(), leakCapture(), trapCapture()];
		for (const c of captures) await saveFinding(db, c);
		const message = 'mutations.1.data: not a capture';
		srv.fail('/api/sync/push', { kind: 'status', status: 400, message });
		srv.fail('/api/sync/push', { kind: 'status', status: 400, message }, 1);
		const summary = await syncOnce(db, { fetch: srv.fetch });
		expect(summary.problem).toMatchObject({ kind: 'bad-request', retryable: false, message });
		expect([...srv.findings.keys()]).toEqual([captures[0].id]);
		const outbox = await db.outbox.orderBy('seq').toArray();
		expect(outbox.map((e) => [e.recordId, e.lastError])).toEqual([
			[captures[1].id, message],
			[captures[2].id, undefined]
		]);
		// Read this time: everything goes.
		expect((await syncOnce(db, { fetch: srv.fetch })).problem).toBeUndefined();
		expect(srv.findings.size).toBe(3);
	});

	it('a photo refused as not an image is kept with the reason and skipped; the others go', async () => {
		const srv = server();
		const db = await device(srv);
		const trap = trapCapture();
		await saveFinding(db, trap);
		const svg = new TextEncoder().encode('<svg xmlns="http://www.w3.org/2000/svg"/>');
		const bad = await photoOf(db, trap, svg, 'image/png');
		const good = await photoOf(db, trap, pngBytes(2));
		const summary = await syncOnce(db, { fetch: srv.fetch });
		expect(summary.photosSent).toBe(1);
		expect(srv.photos.has(good.id)).toBe(true);
		expect(srv.photos.has(bad.id)).toBe(false);
		expect(await db.photos.get(bad.id)).toMatchObject({
			uploaded: 0,
			lastError: 'Only JPEG, PNG or WebP photos are taken'
		});
		expect(await syncCounts(db)).toMatchObject({ photosWaiting: 0, refused: 1 });

		const put = `PUT /api/photos/${bad.id}`;
		expect(srv.requests.filter((r) => r === put)).toHaveLength(1);
		await syncOnce(db, { fetch: srv.fetch });
		expect(srv.requests.filter((r) => r === put)).toHaveLength(1);
	});

	it('photos wait until their finding is on the server, and server trouble leaves them waiting', async () => {
		const srv = server();
		const db = await device(srv);
		const trap = trapCapture();
		await saveFinding(db, trap);
		const photo = await photoOf(db, trap);
		srv.fail('/api/sync/push', { kind: 'drop-request' });
		await syncOnce(db, { fetch: srv.fetch });
		expect(srv.requests.some((r) => r.startsWith('PUT'))).toBe(false);

		srv.fail(`/api/photos/${photo.id}`, { kind: 'status', status: 503 });
		const trouble = await syncOnce(db, { fetch: srv.fetch });
		expect(trouble.problem).toMatchObject({ retryable: true });
		expect(await db.photos.get(photo.id)).toMatchObject({ uploaded: 0 });
		expect((await db.photos.get(photo.id))?.lastError).toBeUndefined();

		expect((await syncOnce(db, { fetch: srv.fetch })).photosSent).toBe(1);
		expect(srv.photos.get(photo.id)?.bytes).toEqual(pngBytes());
	});

	it('other bytes under a photo’s id on the server: 409, kept here, a person must look', async () => {
		const srv = server();
		const trap = trapCapture();
		srv.edit(trap);
		const db = await device(srv);
		await saveFinding(db, { ...trap, notes: 'photo added' });
		const photo = await photoOf(db, trap);
		srv.photos.set(photo.id, { bytes: pngBytes(9), type: 'image/png', findingId: trap.id });
		const summary = await syncOnce(db, { fetch: srv.fetch });
		expect(summary.problem).toMatchObject({ kind: 'photo', retryable: false });
		expect(await db.photos.get(photo.id)).toMatchObject({ uploaded: 0 });
		expect((await db.photos.get(photo.id))?.lastError).toMatch(/different photo/);
		expect(srv.photos.get(photo.id)?.bytes).toEqual(pngBytes(9));
	});

	it('signed out: nothing changes and no one retries on a timer', async () => {
		const srv = server();
		const db = await device(srv);
		await saveFinding(db, trapCapture());
		srv.fail('/api/sync/push', { kind: 'status', status: 401 });
		const summary = await syncOnce(db, { fetch: srv.fetch });
		expect(summary.problem).toMatchObject({ kind: 'signed-out', retryable: false });
		expect(await db.outbox.count()).toBe(1);
		expect((await db.outbox.toArray())[0].lastError).toBeUndefined();
	});
});
