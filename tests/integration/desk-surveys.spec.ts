/**
 * The Desk's surveys against the real MariaDB: creating, assigning, unassigning, moving the
 * stage and marking the checking finished each write one audit row and (where a device shows
 * it) a new change_seq; an unassignment reaches that auditor's pull as a tombstone and no one
 * else's; bad input and other firms' ids write nothing; sync_devices notes pushes and pulls.
 */
import { isActionFailure, isHttpError, isRedirect } from '@sveltejs/kit';
import { and, eq, inArray, like } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as schema from '../../src/lib/server/db/schema';
import { surveyScope } from '../../src/lib/server/policy';
import { demoSites } from '../../src/lib/server/seed/demo';
import { pullChanges } from '../../src/lib/server/sync/pull';
import { currentCursor } from '../../src/lib/server/walk/snapshot';
import { actions as surveyActions } from '../../src/routes/(desk)/desk/surveys/[surveyId]/+page.server';
import { actions as newActions } from '../../src/routes/(desk)/desk/surveys/new/+page.server';
import { testDatabase } from './db';
import { auditorA, auditorB, consultantA, consultantB } from './demo-people';
import { batch, getPull, postPush, trapCapture, upsert } from './sync-api';
import { routeEvent } from './walk-api';

const { pool, db } = testDatabase();
const TAG = 'DESK-SURVEYS-SPEC';
const siteA = demoSites[0].id;
const siteB = demoSites[1].id;
const devices: string[] = [];

type Answer =
	| { kind: 'done'; data: Record<string, unknown> }
	| { kind: 'refused'; status: number; data: Record<string, unknown> }
	| { kind: 'redirect'; location: string }
	| { kind: 'error'; status: number };

async function post(
	handler: (event: never) => unknown,
	routeId: string,
	path: string,
	user: SessionUser,
	fields: [string, string][],
	params: Record<string, string> = {}
): Promise<Answer> {
	const request = new Request(`http://127.0.0.1${path}`, {
		method: 'POST',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams(fields).toString()
	});
	try {
		const r = await handler(routeEvent(user, routeId, request, params) as never);
		if (isActionFailure(r)) {
			return {
				kind: 'refused',
				status: r.status,
				data: r.data as unknown as Record<string, unknown>
			};
		}
		return { kind: 'done', data: r as Record<string, unknown> };
	} catch (e) {
		if (isRedirect(e)) return { kind: 'redirect', location: e.location };
		if (isHttpError(e)) return { kind: 'error', status: e.status };
		throw e;
	}
}

const create = (user: SessionUser, fields: [string, string][]) =>
	post(newActions.default as never, '/(desk)/desk/surveys/new', '/desk/surveys/new', user, fields);

const act = (
	name: keyof typeof surveyActions,
	user: SessionUser,
	surveyId: string,
	fields: [string, string][]
) =>
	post(
		surveyActions[name] as never,
		'/(desk)/desk/surveys/[surveyId]',
		`/desk/surveys/${surveyId}?/${name}`,
		user,
		fields,
		{ surveyId }
	);

const form = (overrides: Partial<Record<string, string>> = {}, auditors: string[] = []) => {
	const base: Record<string, string> = {
		siteId: siteA,
		name: `${TAG} creamery revisit`,
		startsOn: '2026-12-07',
		endsOn: '2026-12-09',
		...overrides
	};
	return [
		...Object.entries(base),
		...auditors.map((id) => ['auditorIds', id] as [string, string])
	] as [string, string][];
};

const surveyRow = async (id: string) =>
	(await db.select().from(schema.surveys).where(eq(schema.surveys.id, id)))[0];
const auditRows = (id: string, action?: string) =>
	db
		.select()
		.from(schema.auditLog)
		.where(
			and(eq(schema.auditLog.entityId, id), action ? eq(schema.auditLog.action, action) : undefined)
		);
const ourSurveys = () =>
	db
		.select()
		.from(schema.surveys)
		.where(like(schema.surveys.name, `${TAG}%`));
const assigned = async (id: string) =>
	(
		await db
			.select({ userId: schema.surveyAuditors.userId })
			.from(schema.surveyAuditors)
			.where(eq(schema.surveyAuditors.surveyId, id))
	)
		.map((r) => r.userId)
		.sort();

let surveyId = '';

async function cleanUp() {
	const ids = (await ourSurveys()).map((s) => s.id);
	if (ids.length > 0) {
		const found = await db
			.select({ id: schema.findings.id })
			.from(schema.findings)
			.where(inArray(schema.findings.surveyId, ids));
		const findingIds = found.map((f) => f.id);
		if (findingIds.length > 0) {
			await db.delete(schema.auditLog).where(inArray(schema.auditLog.entityId, findingIds));
			await db.delete(schema.findings).where(inArray(schema.findings.id, findingIds));
		}
		await db.delete(schema.auditLog).where(inArray(schema.auditLog.entityId, ids));
		await db.delete(schema.syncTombstones).where(inArray(schema.syncTombstones.entityId, ids));
		await db.delete(schema.surveyAuditors).where(inArray(schema.surveyAuditors.surveyId, ids));
		await db.delete(schema.surveys).where(inArray(schema.surveys.id, ids));
	}
	if (devices.length > 0) {
		await db.delete(schema.syncDevices).where(inArray(schema.syncDevices.deviceId, devices));
	}
	// The traps these pushes tagged: the Walk's tests expect the demo site's register alone.
	const tagged = await db
		.select({ id: schema.assets.id })
		.from(schema.assets)
		.where(like(schema.assets.tag, `${TAG}%`));
	if (tagged.length > 0) {
		const assetIds = tagged.map((a) => a.id);
		await db.delete(schema.findings).where(inArray(schema.findings.assetId, assetIds));
		await db.delete(schema.assets).where(inArray(schema.assets.id, assetIds));
	}
}

beforeAll(cleanUp);
afterAll(async () => {
	await cleanUp();
	await pool.end();
});

describe('creating a survey', () => {
	it('makes it planned, assigns the chosen people, audits it and gives it a change_seq', async () => {
		const before = await currentCursor(db, consultantA.firmId);
		const r = await create(consultantA, form({}, [auditorA.id]));
		expect(r.kind).toBe('redirect');
		if (r.kind !== 'redirect') return;
		surveyId = r.location.split('/').pop()!;
		expect(r.location).toBe(`/desk/surveys/${surveyId}`);
		const row = await surveyRow(surveyId);
		expect(row).toMatchObject({
			firmId: consultantA.firmId,
			siteId: siteA,
			status: 'planned',
			startsOn: '2026-12-07',
			endsOn: '2026-12-09',
			createdBy: consultantA.id
		});
		expect(row.changeSeq).toBeGreaterThan(before);
		expect(await assigned(surveyId)).toEqual([auditorA.id]);
		const audit = await auditRows(surveyId, 'create');
		expect(audit).toHaveLength(1);
		expect(audit[0]).toMatchObject({ actorId: consultantA.id, entity: 'survey' });
	});

	it('refuses bad input beside its field and writes nothing', async () => {
		const count = (await ourSurveys()).length;
		const cases: [[string, string][], string, string][] = [
			[form({ endsOn: '2026-12-06' }), 'endsOn', 'The end date cannot be before the start date'],
			[form({ siteId: '' }), 'siteId', 'Choose a site'],
			[form({ name: '   ' }), 'name', 'Give the survey a name'],
			[form({ startsOn: '2026-02-30' }), 'startsOn', 'The start date is not a day of the calendar'],
			[form({ siteId: siteB }), 'siteId', 'Choose one of your firm’s sites.'],
			[form({}, [auditorB.id]), 'auditorIds', 'Choose people of your firm who record'],
			[form({}, ['not-an-id']), 'auditorIds.0', 'Choose people from the list']
		];
		for (const [fields, field, message] of cases) {
			const r = await create(consultantA, fields);
			expect(r.kind, field).toBe('refused');
			if (r.kind !== 'refused') continue;
			expect(r.status).toBe(400);
			expect((r.data.errors as Record<string, string>)[field]).toContain(message);
			// What was typed comes back to the form.
			expect((r.data.values as Record<string, unknown>).name).toBe(
				fields.find(([k]) => k === 'name')![1]
			);
		}
		expect((await ourSurveys()).length).toBe(count);
	});

	it('is the Desk’s: an auditor is refused', async () => {
		const count = (await ourSurveys()).length;
		expect(await create(auditorA, form())).toEqual({ kind: 'error', status: 403 });
		expect((await ourSurveys()).length).toBe(count);
	});
});

describe('assigning and the stage', () => {
	it('assigning bumps version and change_seq and writes an audit row', async () => {
		const before = await surveyRow(surveyId);
		const r = await act('assign', consultantA, surveyId, [['auditorIds', consultantA.id]]);
		expect(r.kind).toBe('done');
		const after = await surveyRow(surveyId);
		expect(after.version).toBe(before.version + 1);
		expect(after.changeSeq).toBeGreaterThan(before.changeSeq);
		expect(await assigned(surveyId)).toEqual([auditorA.id, consultantA.id].sort());
		expect(await auditRows(surveyId, 'assign')).toHaveLength(1);
	});

	it('another firm’s person, nobody, or another firm’s survey is refused and writes nothing', async () => {
		const before = await surveyRow(surveyId);
		const other = await act('assign', consultantA, surveyId, [['auditorIds', auditorB.id]]);
		expect(other).toMatchObject({ kind: 'refused', status: 400 });
		const nobody = await act('assign', consultantA, surveyId, []);
		expect(nobody).toMatchObject({ kind: 'refused', status: 400 });
		// The survey is Cinderbrook's: for Northgale's consultant it does not exist.
		for (const name of ['assign', 'unassign', 'stage', 'details', 'markReviewed'] as const) {
			const fields: [string, string][] = [
				['auditorIds', auditorB.id],
				['userId', auditorA.id],
				['stage', 'in-field'],
				['mark', 'reviewed']
			];
			expect(await act(name, consultantB, surveyId, fields), name).toEqual({
				kind: 'error',
				status: 404
			});
		}
		expect(await act('assign', auditorA, surveyId, [['auditorIds', auditorA.id]])).toEqual({
			kind: 'error',
			status: 403
		});
		const after = await surveyRow(surveyId);
		expect(after.version).toBe(before.version);
		expect(after.status).toBe('planned');
		expect(await assigned(surveyId)).toEqual([auditorA.id, consultantA.id].sort());
		expect(await auditRows(surveyId, 'assign')).toHaveLength(1);
	});

	it('moves along the stages with an audit row and a change_seq; refuses moves that make no sense', async () => {
		const published = await act('stage', consultantA, surveyId, [['stage', 'published']]);
		expect(published).toMatchObject({ kind: 'refused', status: 400 });
		const before = await surveyRow(surveyId);
		expect(await act('stage', consultantA, surveyId, [['stage', 'in-field']])).toMatchObject({
			kind: 'done'
		});
		const after = await surveyRow(surveyId);
		expect(after.status).toBe('in-field');
		expect(after.changeSeq).toBeGreaterThan(before.changeSeq);
		expect(await auditRows(surveyId, 'stage')).toHaveLength(1);

		// A finding recorded on it: back to "Not started" no longer makes sense.
		const capture = { ...trapCapture(`${TAG}-1`), surveyId };
		const pushed = await postPush(auditorA, batch(upsert(capture, 0)));
		expect(pushed.status).toBe(200);
		const back = await act('stage', consultantA, surveyId, [['stage', 'planned']]);
		expect(back).toMatchObject({ kind: 'refused', status: 400 });
		if (back.kind === 'refused') {
			expect((back.data.errors as Record<string, string>).stage).toContain('1 finding was');
		}
		expect((await surveyRow(surveyId)).status).toBe('in-field');
		expect(await auditRows(surveyId, 'stage')).toHaveLength(1);
	});

	it('marks the checking finished only when every finding is checked; reopens', async () => {
		expect(await act('stage', consultantA, surveyId, [['stage', 'in-review']])).toMatchObject({
			kind: 'done'
		});
		const early = await act('markReviewed', consultantA, surveyId, [['mark', 'reviewed']]);
		expect(early).toMatchObject({ kind: 'refused', status: 400 });
		if (early.kind === 'refused') expect(early.data.error).toBe('1 finding is still to check.');
		expect((await surveyRow(surveyId)).reviewedAt).toBeNull();

		await db
			.update(schema.findings)
			.set({ reviewedAt: new Date(), reviewedBy: consultantA.id })
			.where(eq(schema.findings.surveyId, surveyId));
		expect(await act('markReviewed', consultantA, surveyId, [['mark', 'reviewed']])).toMatchObject({
			kind: 'done'
		});
		const marked = await surveyRow(surveyId);
		expect(marked.reviewedAt).not.toBeNull();
		expect(marked.reviewedBy).toBe(consultantA.id);
		expect(await auditRows(surveyId, 'review')).toHaveLength(1);

		expect(await act('markReviewed', consultantA, surveyId, [['mark', 'reopen']])).toMatchObject({
			kind: 'done'
		});
		expect((await surveyRow(surveyId)).reviewedAt).toBeNull();
		expect(await auditRows(surveyId, 'reopen-review')).toHaveLength(1);
	});

	it('details: end before start is refused, a good change is saved and audited', async () => {
		const bad = await act('details', consultantA, surveyId, [
			['name', 'Renamed'],
			['startsOn', '2026-12-07'],
			['endsOn', '2026-12-01']
		]);
		expect(bad).toMatchObject({ kind: 'refused', status: 400 });
		expect((await surveyRow(surveyId)).name).toBe(`${TAG} creamery revisit`);
		const before = await surveyRow(surveyId);
		const good = await act('details', consultantA, surveyId, [
			['name', `${TAG} creamery revisit, east wing`],
			['startsOn', '2026-12-07'],
			['endsOn', '2026-12-10']
		]);
		expect(good).toMatchObject({ kind: 'done' });
		const after = await surveyRow(surveyId);
		expect(after).toMatchObject({
			name: `${TAG} creamery revisit, east wing`,
			endsOn: '2026-12-10'
		});
		expect(after.changeSeq).toBeGreaterThan(before.changeSeq);
		expect(await auditRows(surveyId, 'update')).toHaveLength(1);
	});
});

describe('unassigning', () => {
	it('leaves a tombstone for that auditor’s pull only; the survey leaves their scope', async () => {
		const since = await currentCursor(db, auditorA.firmId);
		const r = await act('unassign', consultantA, surveyId, [['userId', auditorA.id]]);
		expect(r.kind).toBe('done');
		expect(await assigned(surveyId)).toEqual([consultantA.id]);
		expect(await auditRows(surveyId, 'unassign')).toHaveLength(1);

		const theirs = await pullChanges(db, auditorA, since, 1000);
		expect(theirs.changes).toContainEqual({
			entity: 'survey',
			id: surveyId,
			version: 0,
			deleted: true,
			data: null
		});
		const others = await pullChanges(db, consultantA, since, 1000);
		expect(others.changes.filter((c) => c.id === surveyId && c.deleted)).toEqual([]);
		const scoped = await db
			.select({ id: schema.surveys.id })
			.from(schema.surveys)
			.where(and(surveyScope(auditorA), eq(schema.surveys.id, surveyId)));
		expect(scoped).toEqual([]);
		// Their device can no longer record on it.
		const push = await postPush(
			auditorA,
			batch(upsert({ ...trapCapture(`${TAG}-2`), surveyId }, 0))
		);
		expect(push.status).toBe(404);
	});

	it('someone not on the survey is refused and nothing is written', async () => {
		const tombstones = () =>
			db.select().from(schema.syncTombstones).where(eq(schema.syncTombstones.entityId, surveyId));
		const count = (await tombstones()).length;
		const r = await act('unassign', consultantA, surveyId, [['userId', auditorB.id]]);
		expect(r).toMatchObject({ kind: 'refused', status: 400 });
		expect((await tombstones()).length).toBe(count);
		expect(await auditRows(surveyId, 'unassign')).toHaveLength(1);
	});
});

describe('sync_devices', () => {
	const row = async (deviceId: string) =>
		(
			await db.select().from(schema.syncDevices).where(eq(schema.syncDevices.deviceId, deviceId))
		)[0];

	it('an accepted push notes last_push_at for the person’s device', async () => {
		const body = batch(upsert(trapCapture(`${TAG}-3`), 0));
		devices.push(body.deviceId);
		// The demo survey in the field, where auditorA is assigned.
		await db
			.update(schema.surveys)
			.set({ status: 'in-field' })
			.where(eq(schema.surveys.id, body.mutations[0].data.surveyId));
		const r = await postPush(auditorA, body);
		expect(r.status).toBe(200);
		const noted = await row(body.deviceId);
		expect(noted).toMatchObject({ userId: auditorA.id, firmId: auditorA.firmId });
		expect(noted.lastPushAt).toBeInstanceOf(Date);
		expect(noted.lastPullAt).toBeNull();
		await db.delete(schema.auditLog).where(eq(schema.auditLog.entityId, body.mutations[0].id));
		await db.delete(schema.findings).where(eq(schema.findings.id, body.mutations[0].id));
	});

	it('a refused push notes nothing', async () => {
		const body = batch(upsert({ ...trapCapture(`${TAG}-4`), surveyId: randomUUID() }, 0));
		devices.push(body.deviceId);
		expect((await postPush(auditorA, body)).status).toBe(404);
		expect(await row(body.deviceId)).toBeUndefined();
	});

	it('a pull that names its device notes last_pull_at; without it, or with a bad one, nothing', async () => {
		const device = randomUUID();
		devices.push(device);
		expect((await getPull(auditorA, 'since=0&limit=1')).status).toBe(200);
		const bad = await getPull(auditorA, 'since=0&device=phone-7');
		expect(bad.status).toBe(400);
		expect(JSON.stringify(bad.body)).toContain('device must be');
		expect(await row(device)).toBeUndefined();
		expect((await getPull(auditorA, `since=0&limit=1&device=${device}`)).status).toBe(200);
		const noted = await row(device);
		expect(noted).toMatchObject({ userId: auditorA.id, firmId: auditorA.firmId });
		expect(noted.lastPullAt).toBeInstanceOf(Date);
		expect(noted.lastPushAt).toBeNull();
	});
});
