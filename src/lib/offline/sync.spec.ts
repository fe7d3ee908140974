import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import { deleteFinding, saveFinding } from './findings';
import { leakCapture, SURVEY_ID, trapCapture } from './spec-fixtures';
import { syncOnce } from './sync';
import { deviceId } from './sync-meta';
import { device, dropDevices, photoOf, server } from './sync-spec-fixtures';

afterEach(dropDevices);

const later = (iso: string, minutes: number) =>
	new Date(new Date(iso).getTime() + minutes * 60_000).toISOString();

describe('syncOnce, pushing', () => {
	it('carries findings, photos and a deletion to the server, and a repeat changes nothing', async () => {
		const srv = server();
		const db = await device(srv);
		const trap = trapCapture();
		const leak = leakCapture();
		const gone = leakCapture({ location: 'Recorded by mistake' });
		await saveFinding(db, trap);
		await saveFinding(db, leak);
		await saveFinding(db, gone);
		const photo = await photoOf(db, trap);
		// Sent once, then deleted: the deletion must reach the server too.
		await syncOnce(db, { fetch: srv.fetch });
		expect(srv.findings.get(gone.id)?.version).toBe(1);
		expect(await deleteFinding(db, gone.id)).toBe('marked');

		const summary = await syncOnce(db, { fetch: srv.fetch });
		expect(summary.problem).toBeUndefined();
		expect(summary.pushed).toBe(1);
		expect(srv.findings.get(trap.id)).toMatchObject({ version: 1, deleted: false });
		expect(srv.findings.get(leak.id)?.capture).toEqual(leak);
		expect(srv.findings.get(gone.id)).toMatchObject({ version: 2, deleted: true });
		expect(srv.photos.get(photo.id)?.findingId).toBe(trap.id);
		expect(await db.outbox.count()).toBe(0);
		const onDevice = await db.findings.toArray();
		expect(onDevice.map((f) => [f.id, f.version, f.pending]).sort()).toEqual(
			[
				[trap.id, 1, 0],
				[leak.id, 1, 0]
			].sort()
		);
		expect(await db.photos.get(photo.id)).toMatchObject({ uploaded: 1 });

		const counter = srv.counter;
		const requests = srv.requests.length;
		const again = await syncOnce(db, { fetch: srv.fetch });
		expect(again).toMatchObject({ pushed: 0, photosSent: 0, pulled: 0 });
		expect(srv.counter).toBe(counter);
		// Nothing to push or upload: one pull only.
		expect(srv.requests.slice(requests)).toEqual([
			`GET /api/sync/pull?since=${counter}&device=${await deviceId(db)}`
		]);
		expect(await db.findings.get(trap.id)).toMatchObject({ version: 1, pending: 0 });
	});

	it('after server trouble and a lost answer, the retry lands each change exactly once', async () => {
		const srv = server();
		const db = await device(srv);
		const captures = [trapCapture(), leakCapture(), leakCapture({ location: 'Tank room' })];
		for (const c of captures) await saveFinding(db, c);
		const photo = await photoOf(db, captures[0]);
		const ids = (await db.outbox.orderBy('seq').toArray()).map((e) => e.mutationId);

		srv.fail('/api/sync/push', { kind: 'status', status: 503 });
		const first = await syncOnce(db, { fetch: srv.fetch, batchSize: 1 });
		expect(first.problem).toMatchObject({ kind: 'retry', retryable: true });
		// Everything as it was: same entries, same mutation ids, nothing on the server.
		expect((await db.outbox.orderBy('seq').toArray()).map((e) => e.mutationId)).toEqual(ids);
		expect(srv.findings.size).toBe(0);
		expect(await db.photos.get(photo.id)).toMatchObject({ uploaded: 0 });

		// The second batch is applied on the server, but its answer never arrives.
		srv.fail('/api/sync/push', { kind: 'drop-answer' }, 1);
		const cut = await syncOnce(db, { fetch: srv.fetch, batchSize: 1 });
		expect(cut.problem?.kind).toBe('offline');
		expect(srv.findings.size).toBe(2);
		expect((await db.outbox.orderBy('seq').toArray()).map((e) => e.mutationId)).toEqual(
			ids.slice(1)
		);

		const resumed = await syncOnce(db, { fetch: srv.fetch, batchSize: 1 });
		expect(resumed.problem).toBeUndefined();
		expect(resumed).toMatchObject({ pushed: 1, duplicates: 1, photosSent: 1 });
		expect(await db.outbox.count()).toBe(0);
		// Each change applied once, in the order recorded.
		expect(srv.appliedLog).toEqual(ids);
		for (const c of captures) {
			expect(srv.findings.get(c.id)).toMatchObject({ version: 1, capture: c });
			expect(await db.findings.get(c.id)).toMatchObject({ version: 1, pending: 0 });
		}
		expect(srv.requests.filter((r) => r === `PUT /api/photos/${photo.id}`)).toHaveLength(1);
	});

	it('an edit made while a push is in flight follows the answer’s version and is sent next', async () => {
		const srv = server();
		const db = await device(srv);
		const trap = trapCapture();
		await saveFinding(db, trap);
		const first = srv.hold('/api/sync/push');
		const second = srv.hold('/api/sync/push');
		const run = syncOnce(db, { fetch: srv.fetch });
		await first.reached;
		const edit = {
			...trap,
			notes: 'Retested: blowing through',
			updatedAt: later(trap.updatedAt, 5)
		};
		await saveFinding(db, edit);
		// Made on the version the device had: 0.
		expect((await db.outbox.orderBy('seq').last())?.baseVersion).toBe(0);
		first.release();
		await second.reached;
		// The first answer (version 1) is written, and the edit's base with it.
		expect((await db.outbox.toArray()).map((e) => e.baseVersion)).toEqual([1]);
		expect(await db.findings.get(trap.id)).toMatchObject({ version: 1, pending: 1 });
		second.release();
		const summary = await run;
		expect(summary).toMatchObject({ pushed: 2, conflicts: 0 });
		expect(srv.conflicts).toEqual([]);
		expect(srv.findings.get(trap.id)).toMatchObject({ version: 2, capture: edit });
		expect(await db.findings.get(trap.id)).toMatchObject({ version: 2, pending: 0, capture: edit });
	});

	it('two devices edit one finding: the second keeps its edit, marked, with a conflict stored', async () => {
		const srv = server();
		const trap = trapCapture();
		srv.edit(trap);
		const phoneA = await device(srv);
		const phoneB = await device(srv);
		const editA = { ...trap, notes: 'A: cold, blocked' };
		const editB = { ...trap, notes: 'B: passing steam' };
		await saveFinding(phoneA, editA);
		await saveFinding(phoneB, editB);
		expect((await syncOnce(phoneA, { fetch: srv.fetch })).conflicts).toBe(0);
		const b = await syncOnce(phoneB, { fetch: srv.fetch });
		expect(b.conflicts).toBe(1);
		expect(b.problem).toBeUndefined();
		expect(srv.findings.get(trap.id)).toMatchObject({ version: 2, capture: editA });
		expect(srv.conflicts).toMatchObject([{ findingId: trap.id, baseVersion: 1, serverVersion: 2 }]);

		const [conflict] = await phoneB.conflicts.toArray();
		expect(conflict).toMatchObject({
			recordId: trap.id,
			surveyId: SURVEY_ID,
			capture: editB,
			serverVersion: 2
		});
		expect(conflict.reason).not.toBe('');
		// The auditor's capture stays, even after the pull brought the server's version 2.
		const kept = await phoneB.findings.get(trap.id);
		expect(kept).toMatchObject({ capture: editB, conflict: 1, pending: 1 });
		expect(await phoneB.outbox.count()).toBe(0);
		// Sending again does not make a second conflict.
		await syncOnce(phoneB, { fetch: srv.fetch });
		expect(srv.conflicts).toHaveLength(1);
		expect(await phoneB.conflicts.count()).toBe(1);
	});

	it('a conflict is settled when the server moves past it: the desk’s answer replaces the edit', async () => {
		const srv = server();
		const trap = trapCapture();
		srv.edit(trap);
		const phoneA = await device(srv);
		const phoneB = await device(srv);
		await saveFinding(phoneA, { ...trap, notes: 'A' });
		await saveFinding(phoneB, { ...trap, notes: 'B' });
		await syncOnce(phoneA, { fetch: srv.fetch });
		await syncOnce(phoneB, { fetch: srv.fetch });
		expect(await phoneB.findings.get(trap.id)).toMatchObject({ conflict: 1, pending: 1 });
		// The consultant settles it at the desk: a new server version.
		const settled = srv.edit({ ...trap, notes: 'Settled: B was right' });
		await syncOnce(phoneB, { fetch: srv.fetch });
		const after = await phoneB.findings.get(trap.id);
		expect(after).toMatchObject({ capture: settled.capture, version: 3, pending: 0 });
		expect(after?.conflict).toBeUndefined();
		expect(await phoneB.conflicts.count()).toBe(0);
	});
});
