/**
 * A client's decisions and comments against the real MariaDB (docs/decisions.md), on a site and
 * surveys of this file's own (the demo client owns the site): findings arrive through the sync
 * push, are checked, two are grouped into a measure, and revision 1 is published. Then: the
 * database holds a decision to exactly one finding or measure and one current decision per
 * item; a new decision supersedes the current one and the history stays; schedule and repair
 * dates, unpublished findings, findings a correction adds, oversized comments and another
 * company's or firm's items are refused in words with nothing written; consultants answer; the
 * digest sends one message per consultant per batch; nothing here moves a figure.
 */
import { and, count, eq, inArray, isNull } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COMMENT_MAX, type DecisionInput } from '../../src/lib/schemas/decisions';
import type { FindingCapture } from '../../src/lib/schemas/capture';
import type { CostBasis } from '../../src/lib/schemas/site';
import * as schema from '../../src/lib/server/db/schema';
import { deskDecisionsPage } from '../../src/lib/server/decisions/desk';
import { sendDecisionDigests } from '../../src/lib/server/decisions/digest';
import { itemFacts } from '../../src/lib/server/decisions/facts';
import { ladderItemPage } from '../../src/lib/server/decisions/item';
import { recordRepairOutcome } from '../../src/lib/server/decisions/outcome';
import {
	commentThread,
	currentDecisions,
	decisionHistory
} from '../../src/lib/server/decisions/read';
import { addComment, recordDecision } from '../../src/lib/server/decisions/write';
import { markReviewed } from '../../src/lib/server/desk/review';
import { createMeasure } from '../../src/lib/server/measures/write';
import { saveCostBasis } from '../../src/lib/server/pricing/cost-basis';
import { openCorrection, publishSurvey } from '../../src/lib/server/publish/publish';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { actions as findingActions } from '../../src/routes/(ladder)/ladder/findings/[findingId]/+page.server';
import { testDatabase } from './db';
import { adminA, auditorA, clientA, clientB, consultantA, consultantB } from './demo-people';
import { captureMail, type MailCapture } from './mail-capture';
import { batch, postPush, trapCapture, upsert } from './sync-api';
import { postForm } from './walk-api';

const { pool, db } = testDatabase();
const firmId = demoFirms[0].id;
const id = (kind: number, n: number) =>
	`dec15000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;
const site = id(1, 1);
const header = id(2, 1);
const survey = id(3, 1);
const unpublished = id(3, 2);
const otherClient = id(4, 1);
const otherCompanyClient = id(5, 1);
const lateFinding = id(6, 1);
const ORIGIN = 'http://127.0.0.1:4998';

const basis: CostBasis = {
	fuel: { kind: 'natural-gas', price: '9.50', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.82,
	feedwaterTemperature: 368.15,
	condensateReturnFraction: 0.6,
	makeupWaterPrice: '1.80',
	waterTreatmentPrice: '0.90',
	operatingHours: 7000
};

const otherCompanyPerson: SessionUser = {
	id: otherCompanyClient,
	firmId,
	email: 'decisions.spec@other-client.example',
	name: 'Another company',
	role: 'client',
	clientCompanyId: otherClient
};

let mail: MailCapture;
const mutationIds: string[] = [];
const published: string[] = [];
let hidden: string;
let measureId: string;

const day = (offset: number, from = new Date()) =>
	new Date(from.getTime() + offset * 86_400_000).toISOString().slice(0, 10);
const finding = (n: number) => ({ kind: 'finding' as const, id: published[n] });
const approve = (comment: string | null = null): DecisionInput => ({
	decision: 'approved',
	comment,
	today: ''
});

async function cleanUp() {
	const surveysHere = [survey, unpublished];
	await db
		.delete(schema.decisionDigestOutbox)
		.where(inArray(schema.decisionDigestOutbox.surveyId, surveysHere));
	await db.delete(schema.comments).where(inArray(schema.comments.surveyId, surveysHere));
	await db.delete(schema.decisions).where(inArray(schema.decisions.surveyId, surveysHere));
	await db.delete(schema.surveyRevisions).where(eq(schema.surveyRevisions.surveyId, survey));
	if (mutationIds.length > 0) {
		await db
			.delete(schema.appliedMutations)
			.where(inArray(schema.appliedMutations.id, mutationIds));
	}
	await db
		.update(schema.findings)
		.set({ measureId: null })
		.where(inArray(schema.findings.surveyId, surveysHere));
	await db.delete(schema.measures).where(inArray(schema.measures.surveyId, surveysHere));
	await db.delete(schema.findings).where(inArray(schema.findings.surveyId, surveysHere));
	await db
		.delete(schema.surveyAuditors)
		.where(inArray(schema.surveyAuditors.surveyId, surveysHere));
	await db.delete(schema.surveys).where(inArray(schema.surveys.id, surveysHere));
	await db.update(schema.sites).set({ costBasisId: null }).where(eq(schema.sites.id, site));
	await db.delete(schema.costBases).where(eq(schema.costBases.siteId, site));
	await db.delete(schema.assets).where(eq(schema.assets.siteId, site));
	await db.delete(schema.headers).where(eq(schema.headers.siteId, site));
	await db.delete(schema.sites).where(eq(schema.sites.id, site));
	await db.delete(schema.users).where(eq(schema.users.id, otherCompanyClient));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, otherClient));
}

/** What the decision writers write: compared before and after a refusal. */
async function written() {
	const here = inArray(schema.decisions.surveyId, [survey, unpublished]);
	const [[d], [c], [o], [a]] = await Promise.all([
		db.select({ n: count() }).from(schema.decisions).where(here),
		db
			.select({ n: count() })
			.from(schema.comments)
			.where(inArray(schema.comments.surveyId, [survey, unpublished])),
		db
			.select({ n: count() })
			.from(schema.decisionDigestOutbox)
			.where(inArray(schema.decisionDigestOutbox.surveyId, [survey, unpublished])),
		db
			.select({ n: count() })
			.from(schema.auditLog)
			.where(
				and(
					inArray(schema.auditLog.action, ['decide', 'comment']),
					inArray(schema.auditLog.entityId, [...published, hidden, lateFinding, measureId])
				)
			)
	]);
	return { decisions: d.n, comments: c.n, outbox: o.n, audit: a.n };
}

async function push(surveyId: string, tags: string[]) {
	const captures: FindingCapture[] = tags.map((tag) => ({
		...trapCapture(tag),
		surveyId,
		headerId: header,
		areaId: undefined
	}));
	const mutations = captures.map((c) => upsert(c, 0));
	mutationIds.push(...mutations.map((m) => m.mutationId));
	const res = await postPush(auditorA, batch(...mutations));
	expect(res.status, JSON.stringify(res.body)).toBe(200);
	return captures.map((c) => c.id);
}

const figures = () =>
	db
		.select({
			id: schema.findings.id,
			version: schema.findings.version,
			status: schema.findings.status,
			cost: schema.findings.cost,
			repairCost: schema.findings.repairCost
		})
		.from(schema.findings)
		.where(eq(schema.findings.surveyId, survey))
		.orderBy(schema.findings.id);

beforeAll(async () => {
	await cleanUp();
	mail = await captureMail();
	await db
		.insert(schema.clientCompanies)
		.values({ id: otherClient, firmId, name: 'Decisions Spec Other Client' });
	await db.insert(schema.users).values({ ...otherCompanyPerson, clientCompanyId: otherClient });
	await db.insert(schema.sites).values({
		id: site,
		firmId,
		clientCompanyId: clientA.clientCompanyId!,
		name: 'Decisions spec cheese hall'
	});
	await saveCostBasis(db, { firmId, siteId: site, actorId: consultantA.id, basis });
	await db
		.insert(schema.headers)
		.values({ id: header, siteId: site, name: 'Cheese hall header', pressure: 0.8 });
	await db.insert(schema.surveys).values([
		{ id: survey, firmId, siteId: site, name: 'Cheese hall spring', status: 'in-field' },
		{ id: unpublished, firmId, siteId: site, name: 'Cheese hall autumn', status: 'in-field' }
	]);
	await db.insert(schema.surveyAuditors).values([
		{ surveyId: survey, userId: auditorA.id },
		{ surveyId: unpublished, userId: auditorA.id }
	]);
	published.push(...(await push(survey, ['DEC-1', 'DEC-2', 'DEC-3', 'DEC-4', 'DEC-5'])));
	[hidden] = await push(unpublished, ['DEC-9']);
	await db.update(schema.surveys).set({ status: 'in-review' }).where(eq(schema.surveys.id, survey));
	const reviewed = await markReviewed(db, {
		firmId,
		actorId: consultantA.id,
		surveyId: survey,
		findingIds: published,
		reviewed: true
	});
	expect(reviewed.ok).toBe(true);
	const made = await createMeasure(
		db,
		{ firmId, actorId: consultantA.id, surveyId: survey },
		{
			name: 'Replace the cheese hall traps',
			description: null,
			extras: { access: 5_000, scaffold: 0, shutdown: 0, other: 0 },
			otherLabel: null
		},
		[published[3], published[4]]
	);
	expect(made.kind).toBe('done');
	measureId = (made as { measureId: string }).measureId;
	const out = await publishSurvey(
		{ id: consultantA.id, firmId },
		survey,
		{ note: '', origin: ORIGIN },
		db
	);
	expect(out.ok, JSON.stringify(out)).toBe(true);
});

afterAll(async () => {
	await mail?.close();
	await cleanUp();
	await pool.end();
});

describe('one source of truth for a decision', () => {
	/** What MariaDB said when it refused a write (Drizzle wraps it as the error's cause). */
	const refusal = async (write: Promise<unknown>) => {
		try {
			await write;
		} catch (e) {
			return String((e as { cause?: { message?: string } }).cause?.message ?? e);
		}
		return 'written';
	};

	it('the database refuses a decision of no item, of two, or a second current one', async () => {
		const row = { surveyId: survey, decision: 'approved', decidedBy: clientA.id };
		const insert = (o: object) =>
			db.insert(schema.decisions).values({ ...row, id: randomUUID(), ...o });
		expect(await refusal(insert({}))).toMatch(/CONSTRAINT `decisions_one_item` failed/);
		expect(await refusal(insert({ findingId: published[0], measureId }))).toMatch(
			/CONSTRAINT `decisions_one_item` failed/
		);
		expect(await refusal(insert({ findingId: published[0] }))).toBe('written');
		expect(await refusal(insert({ findingId: published[0] }))).toMatch(
			/Duplicate entry .* for key 'decisions_current_uq'/
		);
		const comment = {
			id: randomUUID(),
			surveyId: survey,
			findingId: published[0],
			measureId,
			authorId: clientA.id,
			body: 'both'
		};
		expect(await refusal(db.insert(schema.comments).values(comment))).toMatch(
			/CONSTRAINT `comments_one_item` failed/
		);
		await db.delete(schema.decisions).where(eq(schema.decisions.findingId, published[0]));
	});

	it('a finding’s status stays its lifecycle: decisions live in the decisions table only', async () => {
		const before = await figures();
		expect(before.every((f) => ['draft', 'reviewed', 'published'].includes(f.status))).toBe(true);
		const out = await recordDecision(db, clientA, finding(0), approve());
		expect(out.ok).toBe(true);
		expect(await figures()).toEqual(before);
	});

	it('a new decision supersedes the current one; the history keeps both, newest first', async () => {
		const first = await decisionHistory(db, finding(0));
		expect(first.map((d) => [d.decision, d.current])).toEqual([['approved', true]]);
		const out = await recordDecision(db, clientA, finding(0), {
			decision: 'scheduled',
			date: day(7),
			who: 'Site fitters',
			comment: 'Booked with the fitters for next week.',
			today: ''
		});
		expect(out.ok).toBe(true);
		const history = await decisionHistory(db, finding(0));
		expect(history.map((d) => [d.decision, d.current])).toEqual([
			['scheduled', true],
			['approved', false]
		]);
		expect(history[0]).toMatchObject({
			scheduledFor: day(7),
			assignee: 'Site fitters',
			decidedBy: clientA.name
		});
		const current = await currentDecisions(db, [published[0], published[1]]);
		expect(current.get(published[0])?.decision).toBe('scheduled');
		expect(current.has(published[1])).toBe(false);
		// The comment came with the decision and sits in the thread.
		const thread = await commentThread(db, finding(0));
		expect(thread.map((c) => [c.body, c.withDecision, c.fromFirm])).toEqual([
			['Booked with the fitters for next week.', 'Repair booked', false]
		]);
		const [audit] = await db
			.select()
			.from(schema.auditLog)
			.where(and(eq(schema.auditLog.entityId, published[0]), eq(schema.auditLog.action, 'decide')))
			.orderBy(schema.auditLog.id);
		expect(audit.actorId).toBe(clientA.id);
	});

	it('a measure takes its own decision, apart from its findings', async () => {
		const ref = { kind: 'measure' as const, id: measureId };
		const out = await recordDecision(db, clientA, ref, approve());
		expect(out.ok).toBe(true);
		const [row] = await db
			.select()
			.from(schema.decisions)
			.where(eq(schema.decisions.currentItem, measureId));
		expect(row).toMatchObject({ measureId, findingId: null, decision: 'approved' });
		expect((await currentDecisions(db, [published[3]])).has(published[3])).toBe(false);
	});
});

describe('refusals: clear words, nothing written', () => {
	const refused = async (
		run: () => Promise<{ ok: boolean; message?: string; status?: number }>,
		status: number,
		message: RegExp
	) => {
		const before = await written();
		const out = await run();
		expect(out.ok).toBe(false);
		expect(out.status).toBe(status);
		expect(out.message).toMatch(message);
		expect(await written()).toEqual(before);
	};

	it('a booking for a day that has passed', async () => {
		await refused(
			() =>
				recordDecision(db, clientA, finding(1), {
					decision: 'scheduled',
					date: day(-1),
					who: null,
					comment: 'Should not be kept',
					today: ''
				}),
			400,
			/cannot be booked for a day that has passed/
		);
	});

	it('a repair marked on a day to come, or before the survey was published', async () => {
		await refused(
			() =>
				recordDecision(db, clientA, finding(1), {
					decision: 'repaired',
					date: day(1),
					comment: null,
					today: ''
				}),
			400,
			/day still to come/
		);
		await refused(
			() =>
				recordDecision(db, clientA, finding(1), {
					decision: 'repaired',
					date: day(-3),
					comment: null,
					today: ''
				}),
			400,
			/first published on/
		);
		const ok = await recordDecision(db, clientA, finding(1), {
			decision: 'repaired',
			date: day(0),
			comment: null,
			today: ''
		});
		expect(ok.ok).toBe(true);
	});

	it('a decision or comment on a finding of a survey not published to the client', async () => {
		const ref = { kind: 'finding' as const, id: hidden };
		await refused(() => recordDecision(db, clientA, ref, approve()), 404, /Not found/);
		await refused(() => addComment(db, clientA, ref, 'Hello?'), 404, /Not found/);
	});

	it('another company’s client, another firm’s people, and staff deciding for the client', async () => {
		await refused(
			() => recordDecision(db, otherCompanyPerson, finding(2), approve()),
			404,
			/Not found/
		);
		await refused(() => recordDecision(db, clientB, finding(2), approve()), 404, /Not found/);
		await refused(() => addComment(db, consultantB, finding(2), 'Not ours'), 404, /Not found/);
		await refused(() => recordDecision(db, consultantA, finding(2), approve()), 404, /Not found/);
	});

	it('an oversized comment, through the page’s action, says the limit and keeps the text', async () => {
		const before = await written();
		const body = 'x'.repeat(COMMENT_MAX + 1);
		const res = await postForm(
			findingActions.comment as never,
			'/(ladder)/ladder/findings/[findingId]',
			`/ladder/findings/${published[2]}?/comment`,
			{ findingId: published[2] },
			{ body },
			clientA
		);
		expect(res.status).toBe(400);
		expect(res.data.errors).toEqual({
			body: 'Keep a comment to 4,000 characters: this one has 4,001.'
		});
		expect((res.data.values as Record<string, string>).body).toBe(body);
		const withDecision = await postForm(
			findingActions.decide as never,
			'/(ladder)/ladder/findings/[findingId]',
			`/ladder/findings/${published[2]}?/decide`,
			{ findingId: published[2] },
			{ decision: 'approved', comment: body },
			clientA
		);
		expect(withDecision.status).toBe(400);
		expect(withDecision.data.errors).toHaveProperty('comment');
		expect(await written()).toEqual(before);
	});

	it('the decline form needs a reason, and the action says so beside it', async () => {
		const res = await postForm(
			findingActions.decide as never,
			'/(ladder)/ladder/findings/[findingId]',
			`/ladder/findings/${published[2]}?/decide`,
			{ findingId: published[2] },
			{ decision: 'declined', reason: '  ' },
			clientA
		);
		expect(res.status).toBe(400);
		expect(res.data.errors).toEqual({
			reason: 'Say why it is not going ahead: your consultant reads it.'
		});
	});

	it('staff may not decide through the page; another company’s client gets 404', async () => {
		const post = (user: SessionUser) =>
			postForm(
				findingActions.decide as never,
				'/(ladder)/ladder/findings/[findingId]',
				`/ladder/findings/${published[2]}?/decide`,
				{ findingId: published[2] },
				{ decision: 'approved' },
				user
			);
		await expect(post(consultantA)).rejects.toMatchObject({ status: 403 });
		await expect(post(otherCompanyPerson)).rejects.toMatchObject({ status: 404 });
	});
});

describe('comments and the Desk', () => {
	it('the client asks, the consultant answers, the thread keeps the order', async () => {
		expect((await addComment(db, clientA, finding(2), 'Is this one urgent?')).ok).toBe(true);
		const answer = await addComment(db, consultantA, finding(2), 'Yes: it blows live steam.', {
			surveyId: survey
		});
		expect(answer.ok).toBe(true);
		const thread = await commentThread(db, finding(2));
		expect(thread.map((c) => [c.author, c.fromFirm, c.body])).toEqual([
			[clientA.name, false, 'Is this one urgent?'],
			[consultantA.name, true, 'Yes: it blows live steam.']
		]);
		// An answer named for another survey writes nothing.
		const wrong = await addComment(db, consultantA, finding(2), 'Misplaced', {
			surveyId: unpublished
		});
		expect(wrong).toMatchObject({ ok: false, status: 404 });
	});

	it('the Desk page lists every decided or commented item with its history and thread', async () => {
		const page = await deskDecisionsPage(survey, db);
		expect(page).not.toBeNull();
		const ids = page!.items.map((i) => i.id);
		expect(new Set(ids)).toEqual(new Set([published[0], published[1], published[2], measureId]));
		const booked = page!.items.find((i) => i.id === published[0])!;
		expect(booked.current?.decision).toBe('scheduled');
		expect(booked.history).toHaveLength(2);
		expect(booked.title).toMatch(/Trap test DEC-1/);
		expect(page!.items.find((i) => i.id === measureId)?.title).toBe(
			'Replace the cheese hall traps'
		);
		expect(page!.counts).toEqual({ approved: 1, scheduled: 1, repaired: 1, declined: 0 });
		// The question on DEC-3 is answered; the comment with DEC-1's booking waits for one.
		expect(page!.items.find((i) => i.id === published[2])?.awaitingAnswer).toBe(false);
		expect(booked.awaitingAnswer).toBe(true);
		expect(page!.awaiting).toBe(1);
	});

	it('the client’s item page shows the frozen figures, decisions and thread', async () => {
		const facts = await itemFacts(db, firmId, finding(2));
		expect(facts).toMatchObject({ source: 'revision', shown: true, surveyId: survey });
		const page = await ladderItemPage(db, clientA, facts!);
		const [snap] = await db
			.select()
			.from(schema.surveyRevisionFindings)
			.where(eq(schema.surveyRevisionFindings.findingId, published[2]));
		expect(page?.finding?.costMinor).toBe(Number(snap.cost));
		expect(page?.finding?.tag).toBe('DEC-3');
		expect(page?.comments).toHaveLength(2);
		const measure = await ladderItemPage(
			db,
			clientA,
			(await itemFacts(db, firmId, { kind: 'measure', id: measureId }))!
		);
		expect(measure?.findings.map((f) => f.findingId).sort()).toEqual(
			[published[3], published[4]].sort()
		);
		expect(measure?.measure?.extraCost).toBe(5_000);
		expect(measure?.decisions[0]?.decision).toBe('approved');
	});
});

describe('the digest', () => {
	it('sends what waited so far, then nothing twice', async () => {
		const first = await sendDecisionDigests(db, new Date(), { origin: ORIGIN });
		expect(first.off).toBe(false);
		expect(first.failed).toBe(0);
		expect(await sendDecisionDigests(db, new Date(), { origin: ORIGIN })).toMatchObject({
			events: 0,
			sent: 0
		});
		const [{ n }] = await db
			.select({ n: count() })
			.from(schema.decisionDigestOutbox)
			.where(
				and(
					eq(schema.decisionDigestOutbox.surveyId, survey),
					isNull(schema.decisionDigestOutbox.sentAt)
				)
			);
		expect(n).toBe(0);
	});

	it('two clicks make one message per consultant of the survey, none to the others', async () => {
		const before = {
			consultant: (await mail.to(consultantA.email)).length,
			admin: (await mail.to(adminA.email)).length
		};
		expect((await recordDecision(db, clientA, finding(3), approve('Go ahead.'))).ok).toBe(true);
		expect((await addComment(db, clientA, finding(4), 'Can this wait a month?')).ok).toBe(true);
		const out = await sendDecisionDigests(db, new Date(), { origin: ORIGIN });
		expect(out).toMatchObject({ off: false, events: 2, sent: 1, failed: 0 });
		const got = await mail.waitFor(consultantA.email, /2 new decisions and comments: Cheese hall/);
		expect((await mail.to(consultantA.email)).length).toBe(before.consultant + 1);
		// The admin neither made, published, works on nor commented on this survey.
		expect((await mail.to(adminA.email)).length).toBe(before.admin);
		expect(got.message.text).toContain('Trap test DEC-4');
		expect(got.message.text).toContain('Approved for repair');
		expect(got.message.text).toContain('“Go ahead.”');
		expect(got.message.text).toContain('Can this wait a month?');
		expect(got.message.text).toContain(
			`${ORIGIN}/desk/surveys/${survey}/decisions#item-${published[3]}`
		);
		expect(await sendDecisionDigests(db, new Date(), { origin: ORIGIN })).toMatchObject({
			events: 0,
			sent: 0
		});
	});

	it('leaves a consultant’s own answer out of their digest', async () => {
		const before = (await mail.to(consultantA.email)).length;
		expect(
			(await addComment(db, consultantA, finding(4), 'It can wait.', { surveyId: survey })).ok
		).toBe(true);
		const out = await sendDecisionDigests(db, new Date(), { origin: ORIGIN });
		expect(out).toMatchObject({ events: 1, sent: 0 });
		expect((await mail.to(consultantA.email)).length).toBe(before);
	});
});

describe('a correction', () => {
	it('keeps revision 1’s items decidable and refuses one the correction adds', async () => {
		const opened = await openCorrection({ id: consultantA.id, firmId }, survey, db);
		expect(opened.ok).toBe(true);
		// A finding the correction adds (written here past the app: a device cannot record on a
		// survey in review).
		await db.insert(schema.findings).values({
			id: lateFinding,
			surveyId: survey,
			kind: 'leak',
			location: 'Found in the correction',
			inputs: {},
			status: 'reviewed'
		});
		const before = await written();
		const out = await recordDecision(db, clientA, { kind: 'finding', id: lateFinding }, approve());
		expect(out).toMatchObject({ ok: false, status: 409 });
		expect(!out.ok && out.message).toMatch(/not in the report published to you/);
		expect(await written()).toEqual(before);
		const still = await recordDecision(db, clientA, finding(2), {
			decision: 'declined',
			reason: 'Line is being replaced next year.',
			comment: null,
			today: ''
		});
		expect(still.ok).toBe(true);
	});
});

describe('confirmed savings write their outcome beside the decision', () => {
	it('on a repaired item only', async () => {
		const at = new Date();
		expect(
			await recordRepairOutcome(db, finding(1), {
				outcome: 'verified',
				surveyId: unpublished,
				findingId: hidden,
				at
			})
		).toBe(true);
		const [current] = await decisionHistory(db, finding(1));
		expect(current).toMatchObject({ decision: 'repaired', outcome: 'verified', current: true });
		// Approved, not repaired: nothing is set.
		expect(
			await recordRepairOutcome(db, finding(3), {
				outcome: 'verified',
				surveyId: unpublished,
				findingId: null,
				at
			})
		).toBe(false);
		const rows = await db
			.select({ outcome: schema.decisions.outcome })
			.from(schema.decisions)
			.where(eq(schema.decisions.findingId, published[3]));
		expect(rows.every((r) => r.outcome === null)).toBe(true);
	});
});
