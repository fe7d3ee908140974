/**
 * The Walk's API against the seeded demo: who signed in (/api/me), which surveys a person may
 * record on (/api/surveys) and the snapshot of one survey, each answer checked with the shared
 * schema the device checks it with, and hidden surveys answering 404 (a wrong role 403).
 */
import { and, eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
	surveyListSchema,
	surveySnapshotSchema,
	walkPersonSchema
} from '../../src/lib/schemas/snapshot';
import { pool as appPool } from '../../src/lib/server/db';
import * as schema from '../../src/lib/server/db/schema';
import { demoSites, demoSurveys } from '../../src/lib/server/seed/demo';
import { captureOf, demoFindings, publishedSurveyId } from '../../src/lib/server/seed/findings';
import { testDatabase } from './db';
import {
	adminA,
	consultantA,
	auditorA,
	clientA,
	adminB,
	consultantB,
	auditorB,
	clientB
} from './demo-people';
import { getMe, getSnapshot, getSurveys } from './walk-api';

const { pool, db } = testDatabase();

const inField = demoSurveys[0].id;
const firmA = adminA.firmId;

// An auditor of Cinderbrook assigned to nothing (test data, removed afterwards).
const idleAuditor: SessionUser = {
	id: 'a11d0001-0000-4000-8000-000000000001',
	firmId: firmA,
	email: 'idle.auditor@walk-spec.example',
	name: 'Idle Auditor',
	role: 'auditor',
	clientCompanyId: null
};
let counterBefore: number | null = null;

beforeAll(async () => {
	await db.insert(schema.users).values({ ...idleAuditor, unitSystem: 'US' });
	const [row] = await db
		.select()
		.from(schema.changeCounters)
		.where(eq(schema.changeCounters.firmId, firmA));
	counterBefore = row ? row.value : null;
});

afterAll(async () => {
	await db.delete(schema.users).where(eq(schema.users.id, idleAuditor.id));
	await db.delete(schema.changeCounters).where(eq(schema.changeCounters.firmId, firmA));
	if (counterBefore !== null) {
		await db.insert(schema.changeCounters).values({ firmId: firmA, value: counterBefore });
	}
	await pool.end();
	await appPool.end();
});

describe('GET /api/surveys/[id]/snapshot', () => {
	it('gives the assigned auditor everything the survey needs offline', async () => {
		const res = await getSnapshot(auditorA, inField);
		expect(res.status).toBe(200);
		expect(res.headers.get('cache-control')).toBe('private, no-store');
		const snap = surveySnapshotSchema.parse(res.body);
		expect(snap.survey).toMatchObject({ id: inField, stage: 'in-field', siteId: demoSites[0].id });
		expect(snap.site.name).toBe(demoSites[0].name);
		expect(snap.costBasis?.currency).toBe('EUR');
		expect(snap.unitSystem).toBe('SI');
		expect(snap.headers.map((h) => h.sortOrder)).toEqual([1, 2, 3, 4]);
		expect(snap.areas.length).toBeGreaterThanOrEqual(6);
		expect(snap.assets.length).toBeGreaterThanOrEqual(60);
		const withHistory = snap.assets.filter((a) => a.lastResult !== null);
		expect(withHistory.length).toBeGreaterThan(snap.assets.length / 2);
		for (const a of withHistory) expect(a.lastResult!.surveyId).toBe(publishedSurveyId);
		expect(snap.assets.every((a) => a.details !== null)).toBe(true);
		expect(new Set(snap.assets.map((a) => a.lastResult?.condition)).size).toBeGreaterThan(3);
	});

	it("shows a trap's result from the earlier survey, never the one being walked", async () => {
		const snap = surveySnapshotSchema.parse((await getSnapshot(auditorA, inField)).body);
		// ST-E1-04 failed open in spring and was found working on this winter survey.
		const trap = snap.assets.find((a) => a.tag === 'ST-E1-04')!;
		expect(trap.lastResult?.condition).toBe('failed-open');
		const today = snap.findings.find((f) => f.capture.assetTag === 'ST-E1-04')!;
		expect(today.capture.kind === 'trap' && today.capture.inputs.condition).toBe('working');
	});

	it("holds this survey's findings and nothing of another survey", async () => {
		const snap = surveySnapshotSchema.parse((await getSnapshot(auditorA, inField)).body);
		const stored = await db
			.select({ id: schema.findings.id })
			.from(schema.findings)
			.where(eq(schema.findings.surveyId, inField));
		expect(snap.findings.map((f) => f.capture.id).sort()).toEqual(stored.map((f) => f.id).sort());
		expect(snap.findings.length).toBeGreaterThanOrEqual(10);
		expect(snap.findings.every((f) => f.capture.surveyId === inField)).toBe(true);
		expect(new Set(snap.findings.map((f) => f.capture.kind))).toEqual(
			new Set(['trap', 'leak', 'insulation', 'header'])
		);
		expect(snap.findings.every((f) => f.status === 'draft' && f.version >= 1)).toBe(true);
		expect(snap.survey.findingCount).toBe(snap.findings.length);
	});

	it('hands back each capture exactly as it was recorded', async () => {
		const snap = surveySnapshotSchema.parse((await getSnapshot(auditorA, inField)).body);
		const iso = (t: string) => new Date(t).toISOString();
		const seeded = demoFindings.filter((f) => f.surveyId === inField);
		expect(seeded.length).toBeGreaterThanOrEqual(10);
		for (const raw of seeded) {
			const want = captureOf(raw);
			const got = snap.findings.find((f) => f.capture.id === raw.id)?.capture;
			expect(got, raw.id).toEqual({
				...want,
				createdAt: iso(want.createdAt),
				updatedAt: iso(want.updatedAt)
			});
		}
	});

	it("carries the firm's change cursor as stored", async () => {
		await db
			.insert(schema.changeCounters)
			.values({ firmId: firmA, value: 4242 })
			.onDuplicateKeyUpdate({ set: { value: 4242 } });
		const snap = surveySnapshotSchema.parse((await getSnapshot(consultantA, inField)).body);
		expect(snap.cursor).toBe(4242);
		await db.delete(schema.changeCounters).where(eq(schema.changeCounters.firmId, firmA));
		const none = surveySnapshotSchema.parse((await getSnapshot(consultantA, inField)).body);
		expect(none.cursor).toBe(0);
	});

	it.each([
		['auditor not assigned to it', idleAuditor, inField, 404],
		["auditor, another firm's survey", auditorB, inField, 404],
		["admin, another firm's survey", adminB, inField, 404],
		["consultant, another firm's survey", consultantB, inField, 404],
		['client of the site (may not record)', clientA, inField, 403],
		["client, another firm's survey", clientB, inField, 403],
		['consultant, own firm', consultantA, inField, 200],
		['admin, own firm', adminA, inField, 200],
		['anyone, not an id', adminA, 'not-a-uuid', 404],
		['nobody signed in', null, inField, 401]
	] as const)('%s → %i', async (_, user, id, status) => {
		expect((await getSnapshot(user, id)).status).toBe(status);
	});
});

describe('GET /api/surveys', () => {
	it('lists only the surveys an auditor is assigned to', async () => {
		const res = await getSurveys(auditorA);
		expect(res.status).toBe(200);
		expect(res.headers.get('cache-control')).toBe('private, no-store');
		const list = surveyListSchema.parse(res.body);
		expect(list.surveys.map((s) => s.id)).toEqual([inField]);
		expect(list.surveys[0]).toMatchObject({ stage: 'in-field', siteName: demoSites[0].name });
		expect(surveyListSchema.parse((await getSurveys(idleAuditor)).body).surveys).toEqual([]);
	});

	it("gives a consultant the firm's surveys and none of another firm", async () => {
		const list = surveyListSchema.parse((await getSurveys(consultantA)).body);
		const ids = list.surveys.map((s) => s.id);
		expect(ids).toEqual(expect.arrayContaining([inField, publishedSurveyId]));
		expect(ids).not.toContain(demoSurveys[1].id);
		const firmSurveys = await db
			.select({ id: schema.surveys.id })
			.from(schema.surveys)
			.where(and(eq(schema.surveys.firmId, firmA), inArray(schema.surveys.id, ids)));
		expect(firmSurveys.length).toBe(ids.length);
	});

	it('refuses client users (403) and nobody (401)', async () => {
		expect((await getSurveys(clientA)).status).toBe(403);
		expect((await getSurveys(null)).status).toBe(401);
	});
});

describe('GET /api/me', () => {
	it("answers with the person's own unit system, else the firm's", async () => {
		const a = walkPersonSchema.parse((await getMe(auditorA)).body);
		expect(a).toEqual({
			id: auditorA.id,
			name: auditorA.name,
			email: auditorA.email,
			role: 'auditor',
			unitSystem: 'SI'
		});
		expect(walkPersonSchema.parse((await getMe(auditorB)).body).unitSystem).toBe('US');
		expect(walkPersonSchema.parse((await getMe(idleAuditor)).body).unitSystem).toBe('US');
		expect(walkPersonSchema.parse((await getMe(clientA)).body).role).toBe('client');
	});

	it('is 401 for nobody', async () => {
		expect((await getMe(null)).status).toBe(401);
	});
});
