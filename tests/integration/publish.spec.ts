/**
 * Publishing against the real MariaDB (docs/publishing.md), on a site and survey of this file's
 * own (the demo client owns the site, so its plant manager is told): findings arrive through
 * the sync push (the server prices them), publishing is refused while any is unchecked or a
 * device's change waits, revision 1 freezes the figures and the cost basis and tells the
 * client's active users by e-mail with a link; while published nothing changes the findings —
 * not the Desk's edit, review or conflict settling, not a device's push — and a new cost basis
 * for the site leaves the published figures as they were; a correction is revision 2, needs a
 * note, and the client sees revision 1 until it is published.
 */
import { and, eq, inArray, isNull } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FindingCapture } from '../../src/lib/schemas/capture';
import { NOTE_REQUIRED } from '../../src/lib/schemas/publish';
import type { CostBasis } from '../../src/lib/schemas/site';
import * as schema from '../../src/lib/server/db/schema';
import { resolveConflict } from '../../src/lib/server/desk/conflicts';
import { editFinding } from '../../src/lib/server/desk/finding-edit';
import { surveyPricing } from '../../src/lib/server/desk/findings-query';
import { markReviewed } from '../../src/lib/server/desk/review';
import { saveCostBasis } from '../../src/lib/server/pricing/cost-basis';
import { DEVICE_LOCKED_REASON } from '../../src/lib/server/publish/lock';
import { clientRecipients } from '../../src/lib/server/publish/notify';
import { openCorrection, publishSurvey } from '../../src/lib/server/publish/publish';
import { ladderSurvey, publishPage } from '../../src/lib/server/publish/revisions';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { createMeasure } from '../../src/lib/server/measures/write';
import type { RankedSavings } from '../../src/lib/server/savings/ranked-savings';
import { GET as savingsRoute } from '../../src/routes/api/surveys/[id]/savings/+server';
import { testDatabase } from './db';
import { liveSavings } from './live-savings';
import { auditorA, clientA, consultantA, consultantB } from './demo-people';
import { captureMail, linkIn, type MailCapture } from './mail-capture';
import { batch, postPush, trapCapture, upsert as upsertOf } from './sync-api';
import { call, type Handler } from './walk-api';

const { pool, db } = testDatabase();
const firmId = demoFirms[0].id;
const id = (kind: number, n: number) =>
	`b0b10000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;
const client = clientA.clientCompanyId!;
const otherClient = id(1, 1);
const site = id(2, 1);
const header = id(3, 1);
const survey = id(4, 1);
const disabledClient = id(5, 1);
const otherCompanyClient = id(5, 2);
const ORIGIN = 'http://127.0.0.1:4999';

/** An invented basis for this file's site (gas at `price` per GJ). */
const basis = (price: string): CostBasis => ({
	fuel: { kind: 'natural-gas', price, unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.82,
	feedwaterTemperature: 368.15,
	condensateReturnFraction: 0.6,
	makeupWaterPrice: '1.80',
	waterTreatmentPrice: '0.90',
	operatingHours: 7000
});

let mail: MailCapture;
/** The mutations this file pushes, so clean-up takes exactly their records. */
const mutationIds: string[] = [];
const upsert = (...args: Parameters<typeof upsertOf>) => {
	const m = upsertOf(...args);
	mutationIds.push(m.mutationId);
	return m;
};
const captures: FindingCapture[] = [];

async function cleanUp() {
	await db.delete(schema.surveyRevisions).where(eq(schema.surveyRevisions.surveyId, survey));
	await db.delete(schema.findingConflicts).where(eq(schema.findingConflicts.surveyId, survey));
	if (mutationIds.length > 0) {
		await db
			.delete(schema.appliedMutations)
			.where(inArray(schema.appliedMutations.id, mutationIds));
	}
	await db.delete(schema.findings).where(eq(schema.findings.surveyId, survey));
	await db.delete(schema.measures).where(eq(schema.measures.surveyId, survey));
	await db.delete(schema.surveyAuditors).where(eq(schema.surveyAuditors.surveyId, survey));
	await db.delete(schema.surveys).where(eq(schema.surveys.id, survey));
	await db.update(schema.sites).set({ costBasisId: null }).where(eq(schema.sites.id, site));
	await db.delete(schema.costBases).where(eq(schema.costBases.siteId, site));
	await db.delete(schema.assets).where(eq(schema.assets.siteId, site));
	await db.delete(schema.headers).where(eq(schema.headers.siteId, site));
	await db.delete(schema.sites).where(eq(schema.sites.id, site));
	await db
		.delete(schema.users)
		.where(inArray(schema.users.id, [disabledClient, otherCompanyClient]));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, otherClient));
}

const actor = { id: consultantA.id, firmId };
const findingsOf = () =>
	db
		.select()
		.from(schema.findings)
		.where(and(eq(schema.findings.surveyId, survey), isNull(schema.findings.deletedAt)));
const savingsCall = (user: SessionUser, query = '') =>
	call(
		savingsRoute as Handler,
		'/api/surveys/[id]/savings',
		user,
		`/api/surveys/${survey}/savings?${query}`,
		{ id: survey }
	);
const savingsOf = async (user: SessionUser, query = '') => {
	const res = await savingsCall(user, query);
	expect(res.status, JSON.stringify(res.body)).toBe(200);
	return res.body as RankedSavings;
};
const stage = async () =>
	(await db.select().from(schema.surveys).where(eq(schema.surveys.id, survey)))[0];

beforeAll(async () => {
	await cleanUp();
	mail = await captureMail();
	await db
		.insert(schema.clientCompanies)
		.values({ id: otherClient, firmId, name: 'Publish Spec Other Client' });
	await db.insert(schema.users).values([
		{
			id: disabledClient,
			firmId,
			email: 'publish.spec.left@larkspindle-dairy.example',
			name: 'Left the company',
			role: 'client',
			clientCompanyId: client,
			disabledAt: new Date()
		},
		{
			id: otherCompanyClient,
			firmId,
			email: 'publish.spec@other-client.example',
			name: 'Another company',
			role: 'client',
			clientCompanyId: otherClient
		}
	]);
	await db
		.insert(schema.sites)
		.values({ id: site, firmId, clientCompanyId: client, name: 'Publish spec whey plant' });
	await saveCostBasis(db, { firmId, siteId: site, actorId: consultantA.id, basis: basis('9.00') });
	await db
		.insert(schema.headers)
		.values({ id: header, siteId: site, name: 'Process header', pressure: 0.9 });
	await db
		.insert(schema.surveys)
		.values({ id: survey, firmId, siteId: site, name: 'Whey plant winter', status: 'in-field' });
	await db.insert(schema.surveyAuditors).values({ surveyId: survey, userId: auditorA.id });
	for (let i = 0; i < 6; i++) {
		const c = trapCapture(`PUB-${i}`);
		captures.push({ ...c, surveyId: survey, headerId: header, areaId: undefined });
	}
	const res = await postPush(auditorA, batch(...captures.map((c) => upsert(c, 0))));
	expect(res.status, JSON.stringify(res.body)).toBe(200);
});

afterAll(async () => {
	await mail?.close();
	await cleanUp();
	await pool.end();
});

describe('publishing a survey', () => {
	it('the pushed findings are priced on the site’s basis', async () => {
		const rows = await findingsOf();
		expect(rows).toHaveLength(6);
		for (const r of rows) expect(Number(r.cost)).toBeGreaterThan(0);
	});

	it('is refused from the field, while findings are unchecked, and while a conflict waits', async () => {
		let out = await publishSurvey(actor, survey, { note: '', origin: ORIGIN }, db);
		expect(out.ok).toBe(false);
		if (!out.ok) expect(out.message).toMatch(/from review/);

		await db
			.update(schema.surveys)
			.set({ status: 'in-review' })
			.where(eq(schema.surveys.id, survey));
		out = await publishSurvey(actor, survey, { note: '', origin: ORIGIN }, db);
		expect(!out.ok && out.message).toMatch(/6 findings are not checked/);

		const ids = (await findingsOf()).map((r) => r.id);
		const reviewed = await markReviewed(db, {
			firmId,
			actorId: consultantA.id,
			surveyId: survey,
			findingIds: ids,
			reviewed: true
		});
		expect(reviewed).toEqual({ ok: true, changed: 6, unchanged: 0 });

		// A device that had version 0 of an edited finding: its change waits for the Desk.
		const stale = { ...captures[0], location: 'Moved by a device' };
		const pushed = await postPush(auditorA, batch(upsert(stale, 0)));
		expect((pushed.body as { results: { status: string }[] }).results[0].status).toBe('conflict');
		out = await publishSurvey(actor, survey, { note: '', origin: ORIGIN }, db);
		expect(!out.ok && out.message).toMatch(/1 change from a device waits/);
		expect((await stage()).status).toBe('in-review');
		expect(
			await db
				.select()
				.from(schema.surveyRevisions)
				.where(eq(schema.surveyRevisions.surveyId, survey))
		).toHaveLength(0);

		const [conflict] = await db
			.select()
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.surveyId, survey));
		const [f] = await db
			.select()
			.from(schema.findings)
			.where(eq(schema.findings.id, conflict.findingId));
		const settled = await resolveConflict(db, {
			firmId,
			actorId: consultantA.id,
			surveyId: survey,
			conflictId: conflict.id,
			openedVersion: f.version,
			how: 'kept-server'
		});
		expect(settled.kind).toBe('resolved');
	});

	it('the page says who will be told: the company’s active client users only', async () => {
		const people = await clientRecipients(db, firmId, survey);
		const emails = people.map((p) => p.email);
		expect(emails).toContain(clientA.email);
		expect(emails).not.toContain('publish.spec.left@larkspindle-dairy.example');
		expect(emails).not.toContain('publish.spec@other-client.example');
		const expected = await db
			.select({ email: schema.users.email })
			.from(schema.users)
			.where(
				and(
					eq(schema.users.clientCompanyId, client),
					eq(schema.users.role, 'client'),
					isNull(schema.users.disabledAt)
				)
			);
		expect(new Set(emails)).toEqual(new Set(expected.map((e) => e.email)));
		const page = await publishPage(consultantA, survey, db);
		expect(page?.problem).toBeNull();
		expect(page?.nextRevision).toBe(1);
		expect(await publishPage(consultantB, survey, db)).toBeNull();
	});

	it('revision 1 freezes the figures and basis and tells the client by e-mail with a link', async () => {
		const before = await surveyPricing(db, survey);
		const list = await liveSavings(db, survey);
		const out = await publishSurvey(actor, survey, { note: '', origin: ORIGIN }, db);
		expect(out.ok, JSON.stringify(out)).toBe(true);
		if (!out.ok) return;
		expect(out.revision).toBe(1);
		expect(out.findings).toBe(6);
		expect(out.mail.sent).toBeGreaterThanOrEqual(1);
		expect(out.mail.failed).toBe(0);

		const s = await stage();
		expect(s.status).toBe('published');
		expect(s.publishedAt).not.toBeNull();
		expect(s.costBasisId).toBe(before!.basisId);

		const [rev] = await db
			.select()
			.from(schema.surveyRevisions)
			.where(eq(schema.surveyRevisions.surveyId, survey));
		expect(rev.number).toBe(1);
		expect(rev.costBasisId).toBe(before!.basisId);
		expect(rev.totals.costMinor).toBe(list.totals.costMinor);
		expect(rev.totals.count).toBe(list.totals.count);
		expect(rev.mailSent).toBe(out.mail.sent);

		const message = await mail.waitFor(clientA.email, /report is ready: Whey plant winter/);
		expect(linkIn(message.message.text, '/ladder/')).toBe(`${ORIGIN}/ladder/surveys/${survey}`);
		expect(message.meta.firmId).toBe(firmId);
		expect(await mail.to('publish.spec.left@larkspindle-dairy.example')).toHaveLength(0);
		expect(await mail.to('publish.spec@other-client.example')).toHaveLength(0);

		const seen = await ladderSurvey(survey, 50, db);
		expect(seen?.revision?.number).toBe(1);
		expect(seen?.findings.reduce((sum, f) => sum + f.costMinor, 0)).toBe(list.totals.costMinor);
	});

	it('while published nothing changes the findings: Desk edit, review, conflicts, devices', async () => {
		const rowsBefore = await findingsOf();
		const target = rowsBefore[1];
		const edited = await editFinding(
			db,
			{
				firmId,
				actorId: consultantA.id,
				surveyId: survey,
				findingId: target.id,
				openedVersion: target.version
			},
			{ ...captures.find((c) => c.id === target.id)!, location: 'Edited at the desk' },
			12_345
		);
		expect(edited.kind).toBe('frozen');

		const unreviewed = await markReviewed(db, {
			firmId,
			actorId: consultantA.id,
			surveyId: survey,
			findingIds: [target.id],
			reviewed: false
		});
		expect(unreviewed).toMatchObject({ ok: false, frozen: true });

		const conflictId = randomUUID();
		await db.insert(schema.findingConflicts).values({
			id: conflictId,
			firmId,
			surveyId: survey,
			findingId: target.id,
			userId: auditorA.id,
			deviceId: randomUUID(),
			mutationId: randomUUID(),
			baseVersion: 0,
			serverVersion: target.version,
			data: null
		});
		const settle = await resolveConflict(db, {
			firmId,
			actorId: consultantA.id,
			surveyId: survey,
			conflictId,
			openedVersion: target.version,
			how: 'kept-server'
		});
		expect(settle.kind).toBe('frozen');
		await db.delete(schema.findingConflicts).where(eq(schema.findingConflicts.id, conflictId));

		const capture = captures.find((c) => c.id === target.id)!;
		const pushed = await postPush(
			auditorA,
			batch(upsert({ ...capture, location: 'Changed on a device' }, target.version))
		);
		expect(pushed.status).toBe(200);
		const [result] = (pushed.body as { results: { status: string; reason?: string }[] }).results;
		expect(result.status).toBe('rejected');
		expect(result.reason).toBe(DEVICE_LOCKED_REASON);

		const rowsAfter = await findingsOf();
		expect(rowsAfter.map((r) => [r.id, r.version, r.location, r.reviewedAt?.getTime()])).toEqual(
			rowsBefore.map((r) => [r.id, r.version, r.location, r.reviewedAt?.getTime()])
		);
	});

	it('a new cost basis for the site leaves the published figures and the survey’s basis alone', async () => {
		const [rev] = await db
			.select()
			.from(schema.surveyRevisions)
			.where(eq(schema.surveyRevisions.surveyId, survey));
		const before = await ladderSurvey(survey, 50, db);
		const costsBefore = (await findingsOf()).map((r) => Number(r.cost));
		await saveCostBasis(db, {
			firmId,
			siteId: site,
			actorId: consultantA.id,
			basis: basis('18.00')
		});
		expect((await stage()).costBasisId).toBe(rev.costBasisId);
		expect((await findingsOf()).map((r) => Number(r.cost))).toEqual(costsBefore);
		expect(await ladderSurvey(survey, 50, db)).toEqual(before);
	});
});

describe('a correction', () => {
	it('is only for a published survey', async () => {
		const other = await openCorrection(
			{ id: consultantB.id, firmId: consultantB.firmId },
			survey,
			db
		);
		expect(other.ok).toBe(false);
	});

	it('opens revision 2: editable again, the client still sees revision 1', async () => {
		const out = await openCorrection(actor, survey, db);
		expect(out).toEqual({ ok: true, revision: 2 });
		expect((await stage()).status).toBe('in-review');
		const again = await openCorrection(actor, survey, db);
		expect(again.ok).toBe(false);

		const [target] = await findingsOf();
		const edited = await editFinding(
			db,
			{
				firmId,
				actorId: consultantA.id,
				surveyId: survey,
				findingId: target.id,
				openedVersion: target.version
			},
			{ ...captures.find((c) => c.id === target.id)!, location: 'Corrected at the desk' },
			54_321
		);
		expect(edited.kind).toBe('written');
		const seen = await ladderSurvey(survey, 50, db);
		expect(seen?.revision?.number).toBe(1);
		expect(seen?.findings.find((f) => f.findingId === target.id)?.location).not.toBe(
			'Corrected at the desk'
		);
	});

	it('while it is open the client’s savings list is revision 1, frozen; staff see the live correction', async () => {
		const made = await createMeasure(
			db,
			{ firmId, actorId: consultantA.id, surveyId: survey },
			{
				name: 'Replace the two worst traps',
				description: null,
				extras: { access: 6_000, scaffold: 4_000, shutdown: 0, other: 0 },
				otherLabel: null
			},
			(await findingsOf()).slice(0, 2).map((f) => f.id)
		);
		expect(made.kind).toBe('done');
		const seen = await savingsOf(clientA);
		expect(seen.figures.revision?.number).toBe(1);
		expect(seen.figures.choice).toEqual({ kind: 'revision', number: 1, latest: true });
		expect(seen.items.some((i) => i.location === 'Corrected at the desk')).toBe(false);
		// Revision 1 had no measure: neither the new one nor its own costs reach the client.
		expect(seen.measures).toEqual([]);
		expect(seen.totals.extraCostMinor).toBe(0);
		const [rev1] = await db
			.select()
			.from(schema.surveyRevisions)
			.where(eq(schema.surveyRevisions.surveyId, survey));
		expect(seen.totals.costMinor).toBe(rev1.totals.costMinor);

		const staff = await savingsOf(consultantA);
		expect(staff.figures.choice).toEqual({
			kind: 'live',
			marker: { state: 'correction', revision: 2 }
		});
		expect(staff.figures.words).toContain('correction in progress');
		expect(staff.items.some((i) => i.location === 'Corrected at the desk')).toBe(true);
		expect(staff.measures.map((m) => [m.name, m.findings, m.extraCost])).toEqual([
			['Replace the two worst traps', 2, 10_000]
		]);
		expect(staff.totals.extraCostMinor).toBe(10_000);
		expect(staff.totals.investmentMinor).toBe(staff.totals.repairCostMinor + 10_000);
		// Staff may ask for the published revision by its number; a revision never published is refused.
		const asked = await savingsOf(consultantA, 'revision=1');
		expect(asked.items.map((i) => i.id)).toEqual(seen.items.map((i) => i.id));
		const missing = await savingsCall(consultantA, 'revision=2');
		expect(missing.status).toBe(404);
		expect(JSON.stringify(missing.body)).toContain('no published revision 2');
	});

	it('needs a note of what changed, then publishes as revision 2 and says so in the e-mail', async () => {
		const bare = await publishSurvey(actor, survey, { note: '   ', origin: ORIGIN }, db);
		expect(bare).toMatchObject({ ok: false, field: 'note', message: NOTE_REQUIRED });
		expect((await stage()).status).toBe('in-review');

		const out = await publishSurvey(
			actor,
			survey,
			{ note: 'One trap’s location corrected and its repair quoted.', origin: ORIGIN },
			db
		);
		expect(out).toMatchObject({ ok: true, revision: 2 });
		const revisions = await db
			.select()
			.from(schema.surveyRevisions)
			.where(eq(schema.surveyRevisions.surveyId, survey));
		expect(revisions.map((r) => r.number).sort()).toEqual([1, 2]);
		const message = await mail.waitFor(clientA.email, /Revision 2 of your steam survey report/);
		expect(message.message.text).toContain('What changed: One trap’s location corrected');
		const seen = await ladderSurvey(survey, 50, db);
		expect(seen?.revision?.number).toBe(2);
		expect(seen?.findings.some((f) => f.location === 'Corrected at the desk')).toBe(true);
		const page = await publishPage(consultantA, survey, db);
		expect(page?.revisions.map((r) => r.number)).toEqual([2, 1]);
		expect(page?.revisions[0].note).toBe('One trap’s location corrected and its repair quoted.');
		// Revision 2 carries the measure as it stood, with its own costs in the investment.
		const client = await savingsOf(clientA);
		expect(client.figures.revision?.number).toBe(2);
		const [m] = client.measures;
		expect([m.name, m.findings, m.extraCost, m.rank]).toEqual([
			'Replace the two worst traps',
			2,
			10_000,
			1
		]);
		expect(m.cost).toBe(m.repairCost + 10_000);
		expect(client.totals.extraCostMinor).toBe(10_000);
		expect(client.totals.paybackYears).toBeCloseTo(
			(client.totals.repairCostMinor + 10_000) / client.totals.costMinor,
			12
		);
	});
});
