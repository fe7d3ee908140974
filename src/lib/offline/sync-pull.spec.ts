import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import { saveDraft } from './drafts';
import { saveFinding } from './findings';
import { storeSnapshot } from './snapshot';
import { leakCapture, snapshot, SURVEY_ID, trapCapture } from './spec-fixtures';
import { syncOnce } from './sync';
import { deviceId, getMeta, pullCursor } from './sync-meta';
import { pullChanges } from './sync-pull';
import { device, dropDevices, OTHER_SURVEY_ID, photoOf, server } from './sync-spec-fixtures';

afterEach(dropDevices);

const pulls = (requests: string[]) =>
	requests.filter((r) => r.startsWith('GET /api/sync/pull')).map((r) => r.split('?')[1]);

describe('syncOnce, pulling', () => {
	it('pulls page by page from the snapshot’s cursor, and a cut pull resumes where it stopped', async () => {
		const srv = server();
		const db = await device(srv);
		const start = srv.counter;
		const made = Array.from({ length: 7 }, (_, i) => srv.edit(leakCapture({ location: `L${i}` })));
		// Pages of 2: the third page's request is lost.
		srv.fail('/api/sync/pull', { kind: 'drop-request' }, 2);
		const cut = await syncOnce(db, { fetch: srv.fetch, pullLimit: 2 });
		expect(cut.problem?.kind).toBe('offline');
		expect(cut.pulled).toBe(4);
		expect(await db.findings.count()).toBe(4);
		const kept = await getMeta<number>(db, 'cursor');
		expect(kept).toBe(made[3].seq);
		expect((await db.surveys.get(SURVEY_ID))?.cursor).toBe(made[3].seq);

		const resumed = await syncOnce(db, { fetch: srv.fetch, pullLimit: 2 });
		expect(resumed.problem).toBeUndefined();
		expect(resumed).toMatchObject({ pulled: 3, cursor: srv.counter });
		// Each page names the device, for the Desk's sync state.
		const me = await deviceId(db);
		expect(pulls(srv.requests)).toEqual([
			`since=${start}&limit=2&device=${me}`,
			`since=${made[1].seq}&limit=2&device=${me}`,
			`since=${made[3].seq}&limit=2&device=${me}`,
			`since=${made[3].seq}&limit=2&device=${me}`,
			`since=${made[5].seq}&limit=2&device=${me}`
		]);
		const onDevice = await db.findings.toArray();
		expect(onDevice.map((f) => f.capture.location).sort()).toEqual(
			made.map((m) => m.capture.location).sort()
		);
		expect(onDevice.every((f) => f.version === 1 && f.pending === 0)).toBe(true);
	});

	it('a pulled change never replaces a finding waiting to send; others take the server’s', async () => {
		const srv = server();
		const mine = trapCapture();
		const theirs = leakCapture();
		srv.edit(mine);
		srv.edit(theirs);
		const db = await device(srv);
		const typed = { ...mine, notes: 'Typed on the device, not sent yet' };
		await saveFinding(db, typed);
		srv.edit({ ...mine, notes: 'Changed at the desk' });
		const desk = srv.edit({ ...theirs, notes: 'Changed at the desk too' });

		const page = await pullChanges(db, srv.fetch, await pullCursor(db));
		expect(page.pulled).toBe(2);
		expect(await db.findings.get(mine.id)).toMatchObject({
			capture: typed,
			version: 1,
			pending: 1
		});
		expect(await db.findings.get(theirs.id)).toMatchObject({
			capture: desk.capture,
			version: 2,
			pending: 0
		});
		expect(await db.outbox.count()).toBe(1);
	});

	it('a finding deleted on the server goes from the device with its photos', async () => {
		const srv = server();
		const leak = leakCapture();
		srv.edit(leak);
		const db = await device(srv);
		const photo = await photoOf(db, leak);
		await syncOnce(db, { fetch: srv.fetch });
		expect(srv.photos.has(photo.id)).toBe(true);
		srv.remove(leak.id);
		await syncOnce(db, { fetch: srv.fetch });
		expect(await db.findings.get(leak.id)).toBeUndefined();
		expect(await db.photos.get(photo.id)).toBeUndefined();
	});

	it('starts from the smallest snapshot cursor and moves every survey on', async () => {
		const srv = server([SURVEY_ID, OTHER_SURVEY_ID]);
		const early = srv.counter;
		const before = leakCapture({ surveyId: OTHER_SURVEY_ID, location: 'After the older snapshot' });
		srv.edit(before);
		const db = await device(srv, [SURVEY_ID]);
		// The other survey's snapshot was taken before that change.
		await storeSnapshot(db, {
			...snapshot([], { cursor: early }),
			survey: srv.surveys.get(OTHER_SURVEY_ID)!.summary
		});
		await syncOnce(db, { fetch: srv.fetch });
		expect(pulls(srv.requests)).toEqual([`since=${early}&device=${await deviceId(db)}`]);
		expect(await db.findings.get(before.id)).toMatchObject({ version: 1, pending: 0 });
		const cursors = (await db.surveys.toArray()).map((s) => s.cursor);
		expect(cursors).toEqual([srv.counter, srv.counter]);
		expect(await getMeta<number>(db, 'cursor')).toBe(srv.counter);
	});

	it('a snapshot stored after the device pulled past its cursor is caught up', async () => {
		const srv = server([SURVEY_ID, OTHER_SURVEY_ID]);
		const db = await device(srv, [SURVEY_ID]);
		// The other survey's snapshot is taken now, but stored only after the next pull.
		const taken = {
			...snapshot([], { cursor: srv.counter }),
			survey: srv.surveys.get(OTHER_SURVEY_ID)!.summary
		};
		const late = leakCapture({ surveyId: OTHER_SURVEY_ID, location: 'Recorded on another phone' });
		srv.edit(late);
		await syncOnce(db, { fetch: srv.fetch });
		// Not kept: its survey was not on the device yet.
		expect(await db.findings.get(late.id)).toBeUndefined();
		await storeSnapshot(db, taken);
		await syncOnce(db, { fetch: srv.fetch });
		expect(pulls(srv.requests).at(-1)).toBe(`since=${taken.cursor}&device=${await deviceId(db)}`);
		expect(await db.findings.get(late.id)).toMatchObject({ version: 1, pending: 0 });
	});
});

describe('syncOnce, a survey leaving this person', () => {
	it('with nothing waiting to send, the survey goes from the device with all of it', async () => {
		const srv = server();
		const db = await device(srv);
		const leak = leakCapture();
		await saveFinding(db, leak);
		await photoOf(db, leak);
		await syncOnce(db, { fetch: srv.fetch });
		await saveDraft(db, {
			surveyId: SURVEY_ID,
			kind: 'leak',
			findingId: crypto.randomUUID(),
			values: { location: 'half typed' }
		});
		srv.withdraw(SURVEY_ID);
		const summary = await syncOnce(db, { fetch: srv.fetch });
		expect(summary.problem).toBeUndefined();
		expect(await db.surveys.get(SURVEY_ID)).toBeUndefined();
		expect(await db.findings.count()).toBe(0);
		expect(await db.photos.count()).toBe(0);
		expect(await db.drafts.count()).toBe(0);
	});

	it('with something waiting, the survey is kept and marked withdrawn, and unmarked if given back', async () => {
		const srv = server();
		const db = await device(srv);
		const leak = leakCapture();
		srv.withdraw(SURVEY_ID);
		await saveFinding(db, leak);
		const summary = await syncOnce(db, { fetch: srv.fetch });
		// The push is refused for the survey (404), the pull still brings the tombstone.
		expect(summary.problem).toMatchObject({ kind: 'not-found', retryable: false });
		expect(await db.surveys.get(SURVEY_ID)).toMatchObject({ withdrawn: 1 });
		expect(await db.findings.get(leak.id)).toMatchObject({ pending: 1, capture: leak });
		expect(await db.outbox.count()).toBe(1);

		srv.addSurvey({ ...snapshot().survey, name: 'Given back' });
		const back = await syncOnce(db, { fetch: srv.fetch });
		expect(back.problem).toBeUndefined();
		const survey = await db.surveys.get(SURVEY_ID);
		expect(survey?.name).toBe('Given back');
		expect(survey?.withdrawn).toBeUndefined();
		expect(await db.outbox.count()).toBe(0);
	});
});
