/**
 * The Desk's review table against the real MariaDB (docs/desk.md, "Review table"): every sort
 * key both ways with ties by id, every filter and a combination, text search, paging and totals
 * against a seeded set of this file's own invented site (expected values computed here from
 * the rows inserted), out-of-date figures flagged, bad parameters refused with a message,
 * another firm's survey hidden, and bulk review writing only this survey's findings.
 */
import { and, eq, inArray, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
	FINDING_CONDITIONS,
	FINDING_SORT_KEYS,
	type FindingSortKey
} from '../../src/lib/schemas/desk-findings';
import {
	FINDING_STATUSES,
	LEAK_SIZE_CLASSES,
	TRAP_CONDITIONS
} from '../../src/lib/schemas/finding-vocabulary';
import type { CostBasis } from '../../src/lib/schemas/site';
import * as schema from '../../src/lib/server/db/schema';
import { markReviewed } from '../../src/lib/server/desk/review';
import { touchFirm } from '../../src/lib/server/sync/counter';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { ENGINE_VERSION } from '../../src/lib/steam/version';
import { GET } from '../../src/routes/api/surveys/[id]/findings/+server';
import { actions } from '../../src/routes/(desk)/desk/surveys/[surveyId]/findings/+page.server';
import { testDatabase } from './db';
import { auditorA, clientA, consultantA, consultantB } from './demo-people';
import { call, routeEvent, type Handler } from './walk-api';

const { pool, db } = testDatabase();
const firmId = demoFirms[0].id;
const id = (kind: number, n: number) =>
	`d0f10000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;
const client = id(1, 1);
const site = id(2, 1);
const [basisOld, basisNow, basisNext] = [id(3, 1), id(3, 2), id(3, 3)];
const [high, low] = [id(4, 1), id(4, 2)];
const areaRows = [
	{ id: id(5, 1), name: 'Boiler house' },
	{ id: id(5, 2), name: 'Dryer hall' },
	{ id: id(5, 3), name: 'Evaporator hall' }
];
const [survey, otherSurvey] = [id(6, 1), id(6, 2)];
const N = 36;
const KINDS = ['trap', 'leak', 'insulation', 'header'] as const;
const STATUS_CYCLE = ['draft', 'draft', 'draft', 'reviewed', 'published', 'reviewed'] as const;
const t0 = Date.parse('2026-11-18T07:00:00Z');

const basis: CostBasis = {
	fuel: { kind: 'natural-gas', price: '10.00', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.8,
	feedwaterTemperature: 373.15,
	condensateReturnFraction: 0.5,
	makeupWaterPrice: '2.00',
	waterTreatmentPrice: '1.00',
	operatingHours: 8000
};

/** One planned finding with everything the table shows, as the test expects to read it. */
function planned(i: number) {
	const kind = KINDS[i % 4];
	const area = Math.floor(i / 3) % 4 === 3 ? null : areaRows[Math.floor(i / 3) % 4];
	const header =
		i % 5 === 0
			? null
			: i % 2
				? { id: high, name: 'High pressure' }
				: { id: low, name: 'Low pressure' };
	const condition =
		kind === 'trap'
			? TRAP_CONDITIONS[i % TRAP_CONDITIONS.length]
			: kind === 'leak'
				? LEAK_SIZE_CLASSES[i % LEAK_SIZE_CLASSES.length]
				: null;
	const status = STATUS_CYCLE[i % 6];
	const reviewed = status !== 'draft' || i % 7 === 0;
	const priced = i % 8 !== 7;
	// Values repeat (mod 11), so sorting by them has ties for the id to break.
	const steam = priced ? ((i * 13) % 11) + 0.25 : null;
	const repair = i % 3 === 0 ? null : 10_000 + (i % 4) * 5_000;
	const cost = steam === null ? null : Math.round(steam * 1000);
	return {
		id: id(9, i + 1),
		i,
		kind,
		area,
		header,
		condition,
		status,
		reviewed,
		tag: kind === 'trap' ? `DF-${String(i).padStart(3, '0')}` : null,
		location: `Gallery ${String(i % 9).padStart(2, '0')}`,
		notes: i % 5 === 1 ? 'beside the 50% bypass' : '',
		recordedAt: new Date(t0 + ((i * 17) % N) * 60_000),
		steam,
		heat: steam === null ? null : steam * 0.7,
		energy: steam === null ? null : steam * 3,
		cost,
		co2: steam === null ? null : steam * 50,
		water: steam === null ? null : steam * 2,
		repair,
		payback: repair !== null && cost ? repair / cost : null,
		// Every eleventh was priced on the earlier basis: out of date.
		stale: priced && i % 11 === 10,
		photos: i % 3,
		conflict: i === 2
	};
}
type Planned = ReturnType<typeof planned>;
const plan = Array.from({ length: N }, (_, i) => planned(i));
const deletedId = id(9, 999);
const otherFinding = id(9, 1000);

async function cleanUp() {
	const ids = [...plan.map((p) => p.id), deletedId, otherFinding];
	await db.delete(schema.auditLog).where(inArray(schema.auditLog.entityId, ids));
	await db.delete(schema.findingConflicts).where(inArray(schema.findingConflicts.findingId, ids));
	await db.delete(schema.findings).where(inArray(schema.findings.surveyId, [survey, otherSurvey]));
	await db.delete(schema.surveys).where(inArray(schema.surveys.id, [survey, otherSurvey]));
	await db.update(schema.sites).set({ costBasisId: null }).where(eq(schema.sites.id, site));
	await db.delete(schema.costBases).where(eq(schema.costBases.siteId, site));
	await db.delete(schema.assets).where(eq(schema.assets.siteId, site));
	await db.delete(schema.areas).where(eq(schema.areas.siteId, site));
	await db.delete(schema.headers).where(eq(schema.headers.siteId, site));
	await db.delete(schema.sites).where(eq(schema.sites.id, site));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, client));
}

const row = (p: Planned, surveyId = survey, assetId: string | null = null) => ({
	id: p.id,
	surveyId,
	kind: p.kind,
	assetId,
	headerId: p.header?.id ?? null,
	areaId: p.area?.id ?? null,
	location: p.location,
	notes: p.notes,
	photoIds: Array.from({ length: p.photos }, (_, k) => id(8, p.i * 10 + k)),
	inputs: {},
	condition: p.condition,
	flows: p.steam === null ? null : ({ steamFlow: p.steam / 3600 } as never),
	physicsEngine: ENGINE_VERSION,
	resultsEngine: p.steam === null ? null : ENGINE_VERSION,
	pricedBasisId: p.steam === null ? null : p.stale ? basisOld : basisNow,
	steamLoss: p.steam,
	heatLoss: p.heat,
	fuelEnergy: p.energy,
	cost: p.cost,
	co2: p.co2,
	water: p.water,
	paybackYears: p.payback,
	repairCost: p.repair,
	status: p.status,
	recordedAt: p.recordedAt,
	reviewedAt: p.reviewed ? new Date(t0) : null
});

beforeAll(async () => {
	await cleanUp();
	await db
		.insert(schema.clientCompanies)
		.values({ id: client, firmId, name: 'Table Test Tannery' });
	await db
		.insert(schema.sites)
		.values({ id: site, firmId, clientCompanyId: client, name: 'Tannery' });
	await db.insert(schema.costBases).values([
		{ id: basisOld, siteId: site, number: 1, basis },
		{ id: basisNow, siteId: site, number: 2, basis },
		{ id: basisNext, siteId: site, number: 3, basis }
	]);
	await db.update(schema.sites).set({ costBasisId: basisNow }).where(eq(schema.sites.id, site));
	await db.insert(schema.headers).values([
		{ id: high, siteId: site, name: 'High pressure', pressure: 1.1 },
		{ id: low, siteId: site, name: 'Low pressure', pressure: 0.4 }
	]);
	await db.insert(schema.areas).values(areaRows.map((a) => ({ ...a, siteId: site })));
	await db.insert(schema.surveys).values([
		{ id: survey, firmId, siteId: site, name: 'Tannery winter', status: 'in-review' },
		{ id: otherSurvey, firmId, siteId: site, name: 'Tannery spring', status: 'in-review' }
	]);
	for (const p of plan) {
		const assetId = p.tag ? id(7, p.i + 1) : null;
		if (assetId) {
			await db.insert(schema.assets).values({ id: assetId, siteId: site, tag: p.tag! });
		}
		await db.insert(schema.findings).values(row(p, survey, assetId));
	}
	await db.insert(schema.findings).values({
		...row(planned(0)),
		id: deletedId,
		location: 'Gallery deleted',
		deletedAt: new Date()
	});
	await db.insert(schema.findings).values({
		...row(planned(1)),
		id: otherFinding,
		surveyId: otherSurvey,
		status: 'draft',
		reviewedAt: null
	});
	const conflict = (findingId: string, n: number, resolved: boolean) => ({
		id: id(10, n),
		firmId,
		surveyId: survey,
		findingId,
		userId: auditorA.id,
		deviceId: id(11, 1),
		mutationId: id(12, n),
		baseVersion: 1,
		serverVersion: 2,
		data: null,
		resolvedAt: resolved ? new Date() : null
	});
	await db
		.insert(schema.findingConflicts)
		.values([conflict(plan[2].id, 1, false), conflict(plan[3].id, 2, true)]);
});

afterAll(async () => {
	await cleanUp();
	await pool.end();
});

const ROUTE = '/api/surveys/[id]/findings';
const get = (query: string, user: SessionUser | null = consultantA, surveyId = survey) =>
	call(GET as Handler, ROUTE, user, `/api/surveys/${surveyId}/findings?${query}`, { id: surveyId });

interface Page {
	items: { id: string; figureState: string; [k: string]: unknown }[];
	total: number;
	page: number;
	size: number;
	totals: Record<string, number | string>;
}
const page = async (query: string) => {
	const res = await get(query);
	expect(res.status, JSON.stringify(res.body)).toBe(200);
	return res.body as Page;
};

/** Sort value the table sorts by, as the test planned it. */
function keyOf(p: Planned, key: FindingSortKey): string | number | null {
	switch (key) {
		case 'recorded':
			return p.recordedAt.getTime();
		case 'kind':
			return p.kind;
		case 'area':
			return p.area?.name ?? null;
		case 'header':
			return p.header?.name ?? null;
		case 'location':
			return p.location;
		case 'tag':
			return p.tag;
		case 'condition':
			return p.condition === null ? null : FINDING_CONDITIONS.indexOf(p.condition);
		case 'status':
			return FINDING_STATUSES.indexOf(p.status);
		case 'repair':
			return p.repair;
		case 'payback':
			return p.payback;
		case 'energy':
			return p.energy;
		default:
			return p[key];
	}
}

function expectedOrder(rows: Planned[], key: FindingSortKey, dir: 'asc' | 'desc'): string[] {
	return [...rows]
		.sort((a, b) => {
			const [x, y] = [keyOf(a, key), keyOf(b, key)];
			if (x === null || y === null) {
				if (x !== y) return x === null ? 1 : -1;
			} else if (x !== y) {
				return (x < y ? -1 : 1) * (dir === 'asc' ? 1 : -1);
			}
			return a.id < b.id ? -1 : 1;
		})
		.map((p) => p.id);
}

const ids = (p: Page) => p.items.map((i) => i.id);

describe('sorting', () => {
	for (const key of FINDING_SORT_KEYS) {
		for (const dir of ['asc', 'desc'] as const) {
			it(`by ${key} ${dir}, missing values last, ties by id`, async () => {
				const got = await page(`sort=${key}&dir=${dir}&size=200`);
				expect(ids(got)).toEqual(expectedOrder(plan, key, dir));
			});
		}
	}

	it('defaults to the order of recording, and figures to biggest first', async () => {
		expect(ids(await page(''))).toEqual(expectedOrder(plan, 'recorded', 'asc'));
		expect(ids(await page('sort=cost&size=200'))).toEqual(expectedOrder(plan, 'cost', 'desc'));
	});
});

describe('filters and search', () => {
	const cases: [string, (p: Planned) => boolean][] = [
		['kind=trap', (p) => p.kind === 'trap'],
		['kind=trap&kind=leak', (p) => p.kind === 'trap' || p.kind === 'leak'],
		[`area=${areaRows[1].id}`, (p) => p.area?.id === areaRows[1].id],
		[`area=${areaRows[0].id}&area=none`, (p) => p.area === null || p.area.id === areaRows[0].id],
		[`header=${high}`, (p) => p.header?.id === high],
		['header=none', (p) => p.header === null],
		[
			'condition=failed-open&condition=small',
			(p) => ['failed-open', 'small'].includes(p.condition ?? '')
		],
		['stage=draft', (p) => p.status === 'draft'],
		['stage=published&stage=draft', (p) => ['published', 'draft'].includes(p.status)],
		['stage=unreviewed', (p) => !p.reviewed],
		['stage=desk-checked', (p) => p.reviewed],
		['q=gallery%2003', (p) => p.location === 'Gallery 03'],
		['q=DF-01', (p) => (p.tag ?? '').includes('DF-01')],
		// A literal %, not a wildcard: only the notes that say "50%".
		['q=50%25', (p) => p.notes.includes('50%')],
		['q=BYPASS', (p) => p.notes.includes('bypass')],
		[
			`kind=trap&kind=leak&header=${low}&stage=draft&q=gallery`,
			(p) => ['trap', 'leak'].includes(p.kind) && p.header?.id === low && p.status === 'draft'
		]
	];
	for (const [query, keep] of cases) {
		it(query, async () => {
			const expected = plan.filter(keep);
			expect(expected.length, 'the plan has rows for this filter').toBeGreaterThan(0);
			expect(expected.length).toBeLessThan(N);
			const got = await page(`${query}&size=200`);
			expect(got.total).toBe(expected.length);
			expect(ids(got)).toEqual(expectedOrder(expected, 'recorded', 'asc'));
		});
	}

	it('never lists a deleted finding or another survey’s', async () => {
		const got = await page('size=200&q=gallery');
		expect(ids(got)).not.toContain(deletedId);
		expect(ids(got)).not.toContain(otherFinding);
		expect(got.total).toBe(N);
	});
});

describe('paging and totals', () => {
	it('pages through the whole sorted set without repeats or gaps', async () => {
		const seen: string[] = [];
		for (let n = 1; n <= 8; n++) {
			const got = await page(`sort=steam&dir=desc&size=5&page=${n}`);
			expect(got.page).toBe(n);
			expect(got.size).toBe(5);
			expect(got.total).toBe(N);
			seen.push(...ids(got));
		}
		expect(seen).toEqual(expectedOrder(plan, 'steam', 'desc'));
		expect((await page('size=5&page=9')).items).toEqual([]);
	});

	it('totals the filtered set’s current figures and counts the out-of-date ones', async () => {
		const filtered = plan.filter((p) => p.kind === 'trap' || p.kind === 'insulation');
		const current = filtered.filter((p) => p.steam !== null && !p.stale);
		const sum = (f: (p: Planned) => number | null, rows = current) =>
			rows.reduce((s, p) => s + (f(p) ?? 0), 0);
		const got = await page('kind=trap&kind=insulation&size=3');
		expect(got.total).toBe(filtered.length);
		expect(got.totals.steamKgH).toBeCloseTo(
			sum((p) => p.steam),
			9
		);
		expect(got.totals.heatKw).toBeCloseTo(
			sum((p) => p.heat),
			9
		);
		expect(got.totals.fuelGjYear).toBeCloseTo(
			sum((p) => p.energy),
			9
		);
		expect(got.totals.costMinor).toBe(sum((p) => p.cost));
		expect(got.totals.co2KgYear).toBeCloseTo(
			sum((p) => p.co2),
			6
		);
		expect(got.totals.waterM3Year).toBeCloseTo(
			sum((p) => p.water),
			9
		);
		expect(got.totals.repairCostMinor).toBe(sum((p) => p.repair, filtered));
		expect(got.totals.outOfDate).toBe(filtered.filter((p) => p.stale).length);
		expect(got.totals.outOfDate).toBeGreaterThan(0);
		expect(got.totals.currency).toBe('EUR');
	});

	it('gives each row its words, figures, photo count and waiting conflict', async () => {
		const got = await page('size=200');
		const byId = new Map(got.items.map((i) => [i.id, i]));
		for (const p of plan) {
			const item = byId.get(p.id)!;
			expect(item).toMatchObject({
				kind: p.kind,
				tag: p.tag,
				location: p.location,
				area: p.area?.name ?? null,
				header: p.header?.name ?? null,
				condition: p.condition,
				status: p.status,
				reviewed: p.reviewed,
				steamKgH: p.steam,
				costMinor: p.cost,
				repairCostMinor: p.repair,
				currency: 'EUR',
				photoCount: p.photos,
				conflictWaiting: p.conflict,
				figureState: p.steam === null ? 'none' : p.stale ? 'basis' : 'current'
			});
			expect(typeof item.kindWords).toBe('string');
			expect(item.statusWords).not.toBe(p.status);
		}
		expect(byId.get(plan[0].id)!.conditionWords).toBe('Working');
	});

	it('marks every figure out of date when the site’s basis moves without a re-price', async () => {
		await db.update(schema.sites).set({ costBasisId: basisNext }).where(eq(schema.sites.id, site));
		try {
			const got = await page('size=200');
			const priced = got.items.filter((i) => i.steamKgH !== null);
			expect(priced.length).toBeGreaterThan(0);
			expect(priced.every((i) => i.figureState === 'basis')).toBe(true);
			expect(got.totals.costMinor).toBe(0);
			expect(got.totals.outOfDate).toBe(priced.length);
		} finally {
			await db.update(schema.sites).set({ costBasisId: basisNow }).where(eq(schema.sites.id, site));
		}
		expect((await page('size=1')).totals.costMinor).toBeGreaterThan(0);
	});
});

describe('refusals', () => {
	const bad: [string, RegExp][] = [
		['sort=colour', /sort must be one of/],
		['dir=up', /dir must be one of/],
		['kind=steam', /kind must be one of/],
		['condition=rusty', /condition must be one of/],
		['stage=lost', /stage must be one of/],
		['area=boiler', /area must be an id/],
		['header=1', /header must be an id/],
		['page=0', /page must be a whole number from 1/],
		['size=201', /size must be a whole number from 1 to 200/],
		['size=ten', /size must be a whole number/],
		['sort=cost&sort=steam', /Give sort only once/],
		['colour=red', /Unknown parameter colour/],
		[`q=${'x'.repeat(101)}`, /at most 100 characters/]
	];
	for (const [query, message] of bad) {
		it(`${query.slice(0, 30)} → 400 with a message`, async () => {
			const res = await get(query);
			expect(res.status).toBe(400);
			expect((res.body as { message: string }).message).toMatch(message);
		});
	}

	it('hides the survey from another firm, refuses client users and auditors', async () => {
		expect((await get('', consultantB)).status).toBe(404);
		expect((await get('', clientA)).status).toBe(403);
		expect((await get('', auditorA)).status).toBe(403);
		expect((await get('', null)).status).toBe(401);
		expect((await get('', consultantA, 'not-a-survey-id')).status).toBe(404);
	});
});

describe('bulk review', () => {
	const audits = (ids: string[]) =>
		db
			.select()
			.from(schema.auditLog)
			.where(and(inArray(schema.auditLog.entityId, ids), eq(schema.auditLog.entity, 'finding')));
	const state = (ids: string[]) =>
		db
			.select({
				id: schema.findings.id,
				status: schema.findings.status,
				reviewedAt: schema.findings.reviewedAt
			})
			.from(schema.findings)
			.where(inArray(schema.findings.id, ids));
	const drafts = plan
		.filter((p) => p.status === 'draft' && !p.reviewed)
		.slice(0, 3)
		.map((p) => p.id);

	/** The page's ?/review action with a form of findingIds (a multi-select list). */
	async function postReview(findingIds: string[], reviewed: 'yes' | 'no', user = consultantA) {
		const body = new URLSearchParams([
			...findingIds.map((f) => ['findingIds', f]),
			['reviewed', reviewed]
		]);
		const request = new Request(`http://127.0.0.1/desk/surveys/${survey}/findings?/review`, {
			method: 'POST',
			headers: { 'content-type': 'application/x-www-form-urlencoded' },
			body
		});
		const event = routeEvent(user, '/(desk)/desk/surveys/[surveyId]/findings', request, {
			surveyId: survey
		});
		return (await actions.review(event as never)) as {
			status?: number;
			data?: { error: string };
		} & Record<string, unknown>;
	}

	it('refuses a finding of another survey and writes nothing', async () => {
		const before = await state([...drafts, otherFinding]);
		const out = await postReview([...drafts, otherFinding], 'yes');
		expect(out.status).toBe(400);
		expect(out.data?.error).toMatch(/not in this survey.*Nothing was changed/);
		expect(await state([...drafts, otherFinding])).toEqual(before);
		expect(await audits([...drafts, otherFinding])).toEqual([]);
	});

	it('refuses a tampered id with a message', async () => {
		const out = await postReview([drafts[0], 'not-an-id'], 'yes');
		expect(out.status).toBe(400);
		expect(out.data?.error).toMatch(/not a finding of this survey/);
	});

	it('marks drafts checked (draft → reviewed) with one audit row each, and back', async () => {
		const published = plan.find((p) => p.status === 'published')!;
		// Mark the published one unchecked first (direct), so marking it checked changes it.
		await markReviewed(db, {
			firmId,
			actorId: consultantA.id,
			surveyId: survey,
			findingIds: [published.id],
			reviewed: false
		});
		const out = await postReview([...drafts, published.id], 'yes');
		expect(out).toMatchObject({ reviewed: true, changed: 4, unchanged: 0 });
		const after = await state([...drafts, published.id]);
		for (const r of after) {
			expect(r.reviewedAt).not.toBeNull();
			expect(r.status).toBe(r.id === published.id ? 'published' : 'reviewed');
		}
		const rows = await audits(drafts);
		expect(rows.map((a) => a.action).sort()).toEqual(['review', 'review', 'review']);
		expect(rows.every((a) => a.actorId === consultantA.id && a.firmId === firmId)).toBe(true);
		// The other survey's draft was not touched.
		expect((await state([otherFinding]))[0].reviewedAt).toBeNull();

		const again = await postReview(drafts, 'yes');
		expect(again).toMatchObject({ changed: 0, unchanged: 3 });
		const back = await postReview(drafts, 'no');
		expect(back).toMatchObject({ reviewed: false, changed: 3 });
		for (const r of await state(drafts))
			expect(r).toMatchObject({ status: 'draft', reviewedAt: null });
		expect((await audits(drafts)).filter((a) => a.action === 'unreview')).toHaveLength(3);
	});

	it('another firm’s consultant cannot review this survey', async () => {
		await expect(postReview(drafts, 'yes', consultantB)).rejects.toMatchObject({ status: 404 });
		expect(await state(drafts)).toEqual(
			expect.arrayContaining([expect.objectContaining({ reviewedAt: null })])
		);
	});
});

describe('kept views (findings-cache)', () => {
	const costOf = async (findingId: string) =>
		(
			await db
				.select({ cost: schema.findings.cost })
				.from(schema.findings)
				.where(eq(schema.findings.id, findingId))
		)[0].cost;

	it('serves a view again until the firm’s counter moves, then reads it afresh', async () => {
		const target = plan.find((p) => p.cost !== null && !p.stale)!;
		const before = await page('size=200');
		const cost = await costOf(target.id);
		// A write made outside the app (no change_seq, no touch) is not seen: the view was kept.
		await db
			.update(schema.findings)
			.set({ cost: sql`${schema.findings.cost} + 1000` })
			.where(eq(schema.findings.id, target.id));
		try {
			const kept = await page('size=200');
			expect(kept.totals.costMinor).toBe(before.totals.costMinor);
			// The page's rows are kept too, under the same counter.
			expect(kept.items.find((i) => i.id === target.id)!.costMinor).toBe(cost);
			await touchFirm(db, firmId);
			const fresh = await page('size=200');
			expect(fresh.totals.costMinor).toBe(Number(before.totals.costMinor) + 1000);
			expect(fresh.items.find((i) => i.id === target.id)!.costMinor).toBe(Number(cost) + 1000);
		} finally {
			await db.update(schema.findings).set({ cost }).where(eq(schema.findings.id, target.id));
			await touchFirm(db, firmId);
		}
		expect((await page('size=200')).totals.costMinor).toBe(before.totals.costMinor);
	});

	it('shows a review at once in the stage filter, its count and its order', async () => {
		const unchecked = await page('stage=unreviewed&size=200');
		const picked = unchecked.items.slice(0, 2).map((i) => i.id);
		expect(picked).toHaveLength(2);
		const review = (reviewed: boolean) =>
			markReviewed(db, {
				firmId,
				actorId: consultantA.id,
				surveyId: survey,
				findingIds: picked,
				reviewed
			});
		await review(true);
		try {
			const after = await page('stage=unreviewed&size=200');
			expect(after.total).toBe(unchecked.total - 2);
			expect(after.items.map((i) => i.id)).toEqual(
				unchecked.items.map((i) => i.id).filter((i) => !picked.includes(i))
			);
		} finally {
			await review(false);
		}
		expect((await page('stage=unreviewed&size=200')).total).toBe(unchecked.total);
	});

	it('keeps views of different filters, orders and pages apart', async () => {
		const all = await page('size=200&sort=steam&dir=desc');
		const asc = await page('size=200&sort=steam&dir=asc');
		expect(asc.items.map((i) => i.id)).not.toEqual(all.items.map((i) => i.id));
		const traps = await page('kind=trap&size=200');
		expect(traps.total).toBe(plan.filter((p) => p.kind === 'trap').length);
		expect(traps.total).toBeLessThan(all.total);
		const second = await page('size=5&page=2&sort=steam&dir=desc');
		expect(second.items.map((i) => i.id)).toEqual(all.items.slice(5, 10).map((i) => i.id));
	});
});
