/**
 * The ranked savings list against the real MariaDB (docs/savings.md): every rank order with
 * ties broken by id, the running sums of saving and repair cost, totals and the breakdown by
 * kind and area (expected values computed here from the rows this file inserts on its own
 * invented site), out-of-date and unpriced findings left out and counted, the economics of the
 * whole, the cut at 5,000 items, kept lists expiring with the firm's counter, bad parameters
 * refused with a message, and who may see the list: staff of the firm, and the client
 * company's users only once the survey is published.
 */
import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FINDING_KIND_LABELS } from '../../src/lib/schemas/finding-vocabulary';
import type { CostBasis } from '../../src/lib/schemas/site';
import { SAVINGS_RANKS, type SavingsRank } from '../../src/lib/schemas/savings';
import * as schema from '../../src/lib/server/db/schema';
import { rankedItems } from '../../src/lib/server/savings/ranked-list';
import type { RankedSavings } from '../../src/lib/server/savings/ranked-savings';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { touchFirm } from '../../src/lib/server/sync/counter';
import { ENGINE_VERSION } from '../../src/lib/steam/version';
import { GET } from '../../src/routes/api/surveys/[id]/savings/+server';
import { testDatabase } from './db';
import { adminA, auditorA, clientA, clientB, consultantA, consultantB } from './demo-people';
import { call, type Handler } from './walk-api';

const { pool, db } = testDatabase();
const firmId = demoFirms[0].id;
const id = (kind: number, n: number) =>
	`5a710000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;
/** The demo client (clientA's company) owns this file's site, so its plant manager may see it. */
const client = clientA.clientCompanyId!;
const otherClient = id(1, 2);
const site = id(2, 1);
const [basisOld, basisNow] = [id(3, 1), id(3, 2)];
const [high, low] = [id(4, 1), id(4, 2)];
const areaRows = [
	{ id: id(5, 1), name: 'Boiler house' },
	{ id: id(5, 2), name: 'Dryer hall' },
	{ id: id(5, 3), name: 'Whey plant' }
];
const [survey, otherSurvey, bigSurvey] = [id(6, 1), id(6, 2), id(6, 3)];
/** A client user of another client company of the same firm. */
const otherClientUser: SessionUser = {
	id: id(7, 1),
	firmId,
	email: 'savings.spec@other-client.example',
	name: 'Other client user',
	role: 'client',
	clientCompanyId: otherClient
} as SessionUser;
const N = 48;
const KINDS = ['trap', 'leak', 'insulation', 'header'] as const;

const basis = (extra: Partial<CostBasis> = {}): CostBasis => ({
	fuel: { kind: 'natural-gas', price: '10.00', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.8,
	feedwaterTemperature: 373.15,
	condensateReturnFraction: 0.5,
	makeupWaterPrice: '2.00',
	waterTreatmentPrice: '1.00',
	operatingHours: 8000,
	...extra
});
const DISCOUNT = 0.08;
const LIFE = 6;

type Figures = 'current' | 'basis' | 'engine' | 'none';

/** One planned finding, as the test expects the list to read it. */
function planned(i: number) {
	const kind = KINDS[i % 4];
	const area = i % 5 === 4 ? null : areaRows[i % 3];
	const header =
		i % 6 === 0
			? null
			: i % 2
				? { id: high, name: 'High pressure' }
				: { id: low, name: 'Low pressure' };
	// Most are current; every ninth is on the earlier basis, every thirteenth made by an older
	// engine, every eleventh has no money figures at all.
	const figures: Figures =
		i % 9 === 8 ? 'basis' : i % 13 === 12 ? 'engine' : i % 11 === 10 ? 'none' : 'current';
	// Values repeat (mod 7), so every order has ties for the id to break; every seventh saves
	// nothing (a working trap), header readings never save.
	const cost = figures === 'none' ? null : kind === 'header' || i % 7 === 0 ? 0 : (i % 7) * 12_500;
	const repair = i % 4 === 1 && i % 3 === 0 ? null : 20_000 + (i % 3) * 10_000;
	const co2 = cost === null ? null : i === 5 ? null : (cost / 100) * 2 + (i % 2) * 50;
	const steam = cost === null ? null : cost / 5000;
	return {
		id: id(9, i + 1),
		i,
		kind,
		area,
		header,
		condition: kind === 'trap' ? 'failed-open' : kind === 'leak' ? 'medium' : null,
		tag: kind === 'trap' ? `SV-${String(i).padStart(3, '0')}` : null,
		location: `Bay ${String(i % 8).padStart(2, '0')}`,
		status: i % 3 === 0 ? 'reviewed' : 'draft',
		figures,
		cost,
		repair,
		co2,
		steam,
		heat: steam === null ? null : steam * 0.7,
		fuel: steam === null ? null : steam * 3,
		water: steam === null ? null : steam * 2,
		payback: repair !== null && cost ? repair / cost : null
	};
}
type Planned = ReturnType<typeof planned>;
const plan = Array.from({ length: N }, (_, i) => planned(i));
const deletedId = id(9, 900);
const otherSurveyFinding = id(9, 901);

const row = (p: Planned, surveyId = survey) => ({
	id: p.id,
	surveyId,
	kind: p.kind,
	assetId: p.tag ? id(8, p.i + 1) : null,
	headerId: p.header?.id ?? null,
	areaId: p.area?.id ?? null,
	location: p.location,
	notes: '',
	inputs: {},
	condition: p.condition,
	flows: p.figures === 'none' ? null : ({ steamFlow: 0 } as never),
	physicsEngine: p.figures === 'engine' ? 'older-engine' : ENGINE_VERSION,
	resultsEngine:
		p.figures === 'none' ? null : p.figures === 'engine' ? 'older-engine' : ENGINE_VERSION,
	pricedBasisId: p.figures === 'none' ? null : p.figures === 'basis' ? basisOld : basisNow,
	pricingNote: p.figures === 'none' ? 'The inputs could not be priced' : null,
	steamLoss: p.steam,
	heatLoss: p.heat,
	fuelEnergy: p.fuel,
	cost: p.cost,
	co2: p.co2,
	water: p.water,
	paybackYears: p.payback,
	repairCost: p.repair,
	status: p.status
});

async function cleanUp() {
	const surveys = [survey, otherSurvey, bigSurvey];
	await db.delete(schema.findings).where(inArray(schema.findings.surveyId, surveys));
	await db.delete(schema.measures).where(inArray(schema.measures.surveyId, surveys));
	await db.delete(schema.surveys).where(inArray(schema.surveys.id, surveys));
	await db.update(schema.sites).set({ costBasisId: null }).where(eq(schema.sites.id, site));
	await db.delete(schema.costBases).where(eq(schema.costBases.siteId, site));
	await db.delete(schema.assets).where(eq(schema.assets.siteId, site));
	await db.delete(schema.areas).where(eq(schema.areas.siteId, site));
	await db.delete(schema.headers).where(eq(schema.headers.siteId, site));
	await db.delete(schema.sites).where(eq(schema.sites.id, site));
	await db.delete(schema.users).where(eq(schema.users.id, otherClientUser.id));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, otherClient));
}

beforeAll(async () => {
	await cleanUp();
	await db
		.insert(schema.clientCompanies)
		.values({ id: otherClient, firmId, name: 'Savings Spec Other Client' });
	await db.insert(schema.users).values({
		id: otherClientUser.id,
		firmId,
		email: otherClientUser.email,
		name: otherClientUser.name,
		role: 'client',
		clientCompanyId: otherClient
	});
	await db
		.insert(schema.sites)
		.values({ id: site, firmId, clientCompanyId: client, name: 'Savings spec cheese plant' });
	await db.insert(schema.costBases).values([
		{ id: basisOld, siteId: site, number: 1, basis: basis() },
		{
			id: basisNow,
			siteId: site,
			number: 2,
			basis: basis({ discountRate: DISCOUNT, lifeYears: LIFE })
		}
	]);
	await db.update(schema.sites).set({ costBasisId: basisNow }).where(eq(schema.sites.id, site));
	await db.insert(schema.headers).values([
		{ id: high, siteId: site, name: 'High pressure', pressure: 1.1 },
		{ id: low, siteId: site, name: 'Low pressure', pressure: 0.4 }
	]);
	await db.insert(schema.areas).values(areaRows.map((a) => ({ ...a, siteId: site })));
	await db.insert(schema.surveys).values([
		{ id: survey, firmId, siteId: site, name: 'Cheese plant autumn', status: 'in-review' },
		{ id: otherSurvey, firmId, siteId: site, name: 'Cheese plant spring', status: 'in-review' },
		{ id: bigSurvey, firmId, siteId: site, name: 'Cheese plant, every trap', status: 'in-review' }
	]);
	const tagged = plan.filter((p) => p.tag);
	await db
		.insert(schema.assets)
		.values(tagged.map((p) => ({ id: id(8, p.i + 1), siteId: site, tag: p.tag! })));
	await db.insert(schema.findings).values(plan.map((p) => row(p)));
	// A deleted finding and one of another survey, both saving more than any planned one.
	const big = { ...planned(1), cost: 10_000_000, co2: 1e9, payback: 0.0001 };
	await db.insert(schema.findings).values([
		{ ...row(big), id: deletedId, assetId: null, deletedAt: new Date() },
		{ ...row(big, otherSurvey), id: otherSurveyFinding, assetId: null }
	]);
	await touchFirm(db, firmId);
});

afterAll(async () => {
	await cleanUp();
	await touchFirm(db, firmId);
	await pool.end();
});

const ROUTE = '/api/surveys/[id]/savings';
const get = (query: string, user: SessionUser | null = consultantA, surveyId = survey) =>
	call(GET as Handler, ROUTE, user, `/api/surveys/${surveyId}/savings?${query}`, { id: surveyId });
const list = async (query: string, user: SessionUser = consultantA, surveyId = survey) => {
	const res = await get(query, user, surveyId);
	expect(res.status, JSON.stringify(res.body)).toBe(200);
	return res.body as RankedSavings;
};

const saving = (p: Planned) => p.figures === 'current' && (p.cost ?? 0) > 0;
const savers = plan.filter(saving);

/** The order the list must have, written out from its rules (docs/savings.md). */
const nullsLast = (a: number | null, b: number | null, dir: 1 | -1) =>
	a === null ? (b === null ? 0 : 1) : b === null ? -1 : (a - b) * dir;
const compare: Record<SavingsRank, (a: Planned, b: Planned) => number> = {
	savings: (a, b) => b.cost! - a.cost! || a.id.localeCompare(b.id),
	payback: (a, b) => nullsLast(a.payback, b.payback, 1) || a.id.localeCompare(b.id),
	co2: (a, b) => nullsLast(a.co2, b.co2, -1) || a.id.localeCompare(b.id)
};
const keyOf: Record<SavingsRank, (p: Planned) => number | null> = {
	savings: (p) => p.cost,
	payback: (p) => p.payback,
	co2: (p) => p.co2
};
const expectedOrder = (rank: SavingsRank) => [...savers].sort(compare[rank]);

describe('the plan this file inserts', () => {
	it('has savers, ties in every order, and findings of each kind left out', () => {
		expect(savers.length).toBeGreaterThan(20);
		for (const rank of SAVINGS_RANKS) {
			const keys = savers.map(keyOf[rank]).filter((k) => k !== null);
			expect(new Set(keys).size, rank).toBeLessThan(keys.length);
		}
		expect(savers.some((p) => p.payback === null)).toBe(true);
		expect(savers.some((p) => p.co2 === null)).toBe(true);
		for (const f of ['basis', 'engine', 'none'] as const) {
			expect(
				plan.some((p) => p.figures === f && (p.cost ?? 1) > 0),
				f
			).toBe(true);
		}
	});
});

describe('GET /api/surveys/[id]/savings: the ranking', () => {
	for (const rank of SAVINGS_RANKS) {
		it(`ranks by ${rank}, ties by id, with running sums in rank order`, async () => {
			const body = await list(`rank=${rank}`);
			const order = expectedOrder(rank);
			expect(body.rank).toBe(rank);
			expect(body.items.map((i) => i.id)).toEqual(order.map((p) => p.id));
			let cumulativeSaving = 0;
			let cumulativeRepair = 0;
			order.forEach((p, k) => {
				const item = body.items[k];
				cumulativeSaving += p.cost!;
				cumulativeRepair += p.repair ?? 0;
				expect(item.rank).toBe(k + 1);
				expect(item.cumulativeSavingMinor, `${rank} #${k + 1}`).toBe(cumulativeSaving);
				expect(item.cumulativeRepairCostMinor, `${rank} #${k + 1}`).toBe(cumulativeRepair);
			});
		});
	}

	it('ranks by annual saving when no rank is given', async () => {
		const body = await list('');
		expect(body.rank).toBe('savings');
		expect(body.items.map((i) => i.id)).toEqual(expectedOrder('savings').map((p) => p.id));
	});

	it('gives each item its names, words and figures as stored', async () => {
		const body = await list('rank=savings');
		for (const item of body.items) {
			const p = plan.find((q) => q.id === item.id)!;
			expect(item).toMatchObject({
				kind: p.kind,
				kindWords: FINDING_KIND_LABELS[p.kind],
				tag: p.tag,
				location: p.location,
				area: p.area?.name ?? null,
				header: p.header?.name ?? null,
				condition: p.condition,
				status: p.status,
				costMinor: p.cost,
				currency: 'EUR',
				repairCostMinor: p.repair,
				co2KgYear: p.co2
			});
			expect(item.conditionWords).toBe(
				p.kind === 'trap' ? 'Failed open' : p.kind === 'leak' ? 'Medium' : null
			);
			expect(item.statusWords).toBe(
				p.status === 'draft' ? 'Recorded in the field' : 'Checked at the desk'
			);
			expect(item.steamKgH).toBeCloseTo(p.steam!, 9);
			expect(item.heatKw).toBeCloseTo(p.heat!, 9);
			expect(item.fuelGjYear).toBeCloseTo(p.fuel!, 9);
			expect(item.waterM3Year).toBeCloseTo(p.water!, 9);
			if (p.payback === null) expect(item.paybackYears).toBeNull();
			else expect(item.paybackYears).toBeCloseTo(p.payback, 12);
		}
	});

	it('leaves out findings on another basis or engine (counted), unpriced, deleted or of another survey', async () => {
		const body = await list('rank=co2');
		const ids = new Set(body.items.map((i) => i.id));
		for (const p of plan.filter((q) => !saving(q))) expect(ids.has(p.id), p.id).toBe(false);
		expect(ids.has(deletedId)).toBe(false);
		expect(ids.has(otherSurveyFinding)).toBe(false);
		const outOfDate = plan.filter((p) => p.figures === 'basis' || p.figures === 'engine').length;
		expect(outOfDate).toBeGreaterThan(0);
		expect(body.outOfDate).toBe(outOfDate);
		expect(body.totals.outOfDate).toBe(outOfDate);
		expect(body.totals.withoutFigures).toBe(plan.filter((p) => p.figures === 'none').length);
		expect(body.truncated).toBe(false);
	});
});

describe('GET /api/surveys/[id]/savings: totals and breakdown', () => {
	const sum = (ps: Planned[], f: (p: Planned) => number | null) =>
		ps.reduce((s, p) => s + (f(p) ?? 0), 0);

	it('totals every saving finding, with the payback of the whole', async () => {
		const { totals, items } = await list('rank=payback');
		const repair = sum(savers, (p) => p.repair);
		const cost = sum(savers, (p) => p.cost);
		expect(totals).toMatchObject({
			count: savers.length,
			costMinor: cost,
			repairCostMinor: repair,
			withoutRepairCost: savers.filter((p) => p.repair === null).length,
			currency: 'EUR'
		});
		expect(totals.withoutRepairCost).toBeGreaterThan(0);
		expect(totals.steamKgH).toBeCloseTo(
			sum(savers, (p) => p.steam),
			6
		);
		expect(totals.heatKw).toBeCloseTo(
			sum(savers, (p) => p.heat),
			6
		);
		expect(totals.fuelGjYear).toBeCloseTo(
			sum(savers, (p) => p.fuel),
			6
		);
		expect(totals.co2KgYear).toBeCloseTo(
			sum(savers, (p) => p.co2),
			6
		);
		expect(totals.waterM3Year).toBeCloseTo(
			sum(savers, (p) => p.water),
			6
		);
		expect(totals.paybackYears).toBeCloseTo(repair / cost, 12);
		// The last item's running sums are the totals (nothing was cut).
		expect(items.at(-1)!.cumulativeSavingMinor).toBe(totals.costMinor);
		expect(items.at(-1)!.cumulativeRepairCostMinor).toBe(totals.repairCostMinor);
	});

	it('prices the whole over the basis’s life and discount rate', async () => {
		const { totals } = await list('rank=savings');
		const repair = sum(savers, (p) => p.repair);
		const cost = sum(savers, (p) => p.cost);
		let npv = -repair;
		for (let t = 1; t <= LIFE; t++) npv += cost / (1 + DISCOUNT) ** t;
		expect(totals.economics).not.toBeNull();
		expect(totals.economics!.discountRate).toBe(DISCOUNT);
		expect(totals.economics!.lifeYears).toBe(LIFE);
		expect(totals.economics!.npvMinor).toBeCloseTo(npv, 3);
		// The IRR by its definition: the NPV at that rate is nothing.
		const irr = totals.economics!.irr!;
		let atIrr = -repair;
		for (let t = 1; t <= LIFE; t++) atIrr += cost / (1 + irr) ** t;
		expect(Math.abs(atIrr)).toBeLessThan(1e-3);
		expect(irr).toBeGreaterThan(0);
	});

	it('breaks the totals down by kind and by area, each adding up to the totals', async () => {
		const { totals, breakdown } = await list('rank=savings');
		for (const [name, groupOf, labelOf] of [
			['kind', (p: Planned) => p.kind, (p: Planned) => FINDING_KIND_LABELS[p.kind]],
			['area', (p: Planned) => p.area?.id ?? null, (p: Planned) => p.area?.name ?? 'No area']
		] as const) {
			const groups = breakdown[name];
			const keys = [...new Set(savers.map(groupOf))];
			expect(groups.map((g) => g.key).sort(), name).toEqual([...keys].sort());
			for (const g of groups) {
				const members = savers.filter((p) => groupOf(p) === g.key);
				expect(g.label).toBe(labelOf(members[0]));
				expect(g.count).toBe(members.length);
				expect(g.costMinor).toBe(sum(members, (p) => p.cost));
				expect(g.repairCostMinor).toBe(sum(members, (p) => p.repair));
				expect(g.co2KgYear).toBeCloseTo(
					sum(members, (p) => p.co2),
					6
				);
			}
			expect(sum2(groups, 'costMinor'), name).toBe(totals.costMinor);
			expect(sum2(groups, 'repairCostMinor'), name).toBe(totals.repairCostMinor);
			expect(sum2(groups, 'count'), name).toBe(totals.count);
			const savingsInOrder = groups.map((g) => g.costMinor);
			expect(savingsInOrder, `${name}: biggest first`).toEqual(
				[...savingsInOrder].sort((a, b) => b - a)
			);
		}
		expect(breakdown.area.some((g) => g.key === null && g.label === 'No area')).toBe(true);
	});
});
const sum2 = <K extends 'costMinor' | 'repairCostMinor' | 'count'>(
	groups: { [k in K]: number }[],
	key: K
) => groups.reduce((s, g) => s + g[key], 0);

describe('kept lists and the cut at 5,000', () => {
	it('serves a kept list until the firm’s counter moves, then the new figures', async () => {
		const top = expectedOrder('savings')[0];
		const before = await list('rank=savings');
		await db.update(schema.findings).set({ cost: 1 }).where(eq(schema.findings.id, top.id));
		// No counter moved: the kept list still answers (what SQL past the app would get).
		expect((await list('rank=savings')).items[0].id).toBe(top.id);
		await touchFirm(db, firmId);
		const after = await list('rank=savings');
		expect(after.items.at(-1)!.id).toBe(top.id);
		expect(after.totals.costMinor).toBe(before.totals.costMinor - top.cost! + 1);
		await db.update(schema.findings).set({ cost: top.cost }).where(eq(schema.findings.id, top.id));
		await touchFirm(db, firmId);
		expect((await list('rank=savings')).items[0].id).toBe(top.id);
	});

	it('cuts a ranking to its first rows with the running sums of the whole ranking', async () => {
		const order = expectedOrder('payback');
		const cut = await rankedItems(
			db,
			{ id: survey, basisId: basisNow, currency: 'EUR' },
			'payback',
			5
		);
		expect(cut.map((i) => i.id)).toEqual(order.slice(0, 5).map((p) => p.id));
		expect(cut[4].cumulativeSavingMinor).toBe(order.slice(0, 5).reduce((s, p) => s + p.cost!, 0));
	});

	it('lists the first 5,000 of a survey with more and says so, totals over all', async () => {
		const COUNT = 5_003;
		const rows = Array.from({ length: COUNT }, (_, k) => ({
			...row(planned(1), bigSurvey),
			id: id(10, k + 1),
			assetId: null,
			kind: 'trap',
			cost: 1_000 + k,
			co2: 1,
			repairCost: 500,
			paybackYears: 500 / (1_000 + k)
		}));
		for (let k = 0; k < COUNT; k += 1_000) {
			await db.insert(schema.findings).values(rows.slice(k, k + 1_000));
		}
		// 100 unless asked for more; at most 5,000.
		const first = await list('rank=savings', consultantA, bigSurvey);
		expect(first.items).toHaveLength(100);
		expect(first.truncated).toBe(true);
		expect(first.totals.count).toBe(COUNT);
		// The Pareto curve is sampled over the whole ranking and ends on the totals.
		expect(first.pareto.length).toBeLessThanOrEqual(201);
		expect(first.pareto.at(-1)).toEqual({
			rank: COUNT,
			cumulativeSavingMinor: first.totals.costMinor,
			cumulativeRepairCostMinor: first.totals.repairCostMinor
		});
		for (const [k, p] of first.pareto.entries()) {
			if (k > 0) expect(p.rank).toBeGreaterThan(first.pareto[k - 1].rank);
			if (p.rank <= 100) {
				expect(p.cumulativeSavingMinor).toBe(first.items[p.rank - 1].cumulativeSavingMinor);
			}
		}
		const body = await list('rank=savings&limit=5000', consultantA, bigSurvey);
		expect(body.truncated).toBe(true);
		expect(body.items).toHaveLength(5_000);
		expect(body.totals.count).toBe(COUNT);
		const all = rows.reduce((s, r) => s + r.cost, 0);
		expect(body.totals.costMinor).toBe(all);
		// The three smallest savings are the ones past the cut.
		expect(body.items.at(-1)!.costMinor).toBe(1_003);
		expect(body.items.at(-1)!.cumulativeSavingMinor).toBe(all - (1_000 + 1_001 + 1_002));
		expect(body.totals.repairCostMinor).toBe(500 * COUNT);
	});
});

describe('measures in the list', () => {
	const measureIds = [id(7, 1), id(7, 2), id(7, 3)];
	/** Which planned findings each measure holds (current savers, a non-saver, a deleted one). */
	const members = [
		savers.slice(0, 3).map((p) => p.id),
		[savers[3].id, plan.find((p) => p.cost === 0)!.id],
		[deletedId]
	];
	const extras = [
		{ accessCost: 9_000, scaffoldCost: 30_000 },
		{ accessCost: 0, scaffoldCost: 0, otherCost: 1_500 },
		{ shutdownCost: 50_000 }
	];

	beforeAll(async () => {
		await db.insert(schema.measures).values(
			measureIds.map((mid, k) => ({
				id: mid,
				surveyId: survey,
				name: `Job ${k + 1}`,
				sortOrder: k,
				...extras[k]
			}))
		);
		for (const [k, ids] of members.entries()) {
			await db
				.update(schema.findings)
				.set({ measureId: measureIds[k] })
				.where(inArray(schema.findings.id, ids));
		}
		await touchFirm(db, firmId);
	});
	afterAll(async () => {
		await db
			.update(schema.findings)
			.set({ measureId: null })
			.where(inArray(schema.findings.measureId, measureIds));
		await db.delete(schema.measures).where(inArray(schema.measures.id, measureIds));
		await touchFirm(db, firmId);
	});

	/** A measure's sums written out from the plan: its live findings' figures, its own costs. */
	const expected = (k: number) => {
		const held = plan.filter((p) => members[k].includes(p.id));
		const saving = held.reduce((t, p) => t + (p.cost ?? 0), 0);
		const repairs = held.reduce((t, p) => t + (p.repair ?? 0), 0);
		const co2 = held.reduce((t, p) => t + (p.co2 ?? 0), 0);
		const own = Object.values(extras[k]).reduce((t, v) => t + v, 0);
		const cost = repairs + own;
		return { saving, cost, co2, payback: saving > 0 ? cost / saving : null, own };
	};

	it('lists each measure with its findings’ sums and its own costs, in each order', async () => {
		for (const rank of SAVINGS_RANKS) {
			const body = await list(`rank=${rank}`);
			// The third holds only a deleted finding: listed, nothing saved, its own shutdown cost.
			expect(body.measures).toHaveLength(3);
			for (const m of body.measures) {
				const k = measureIds.indexOf(m.id);
				const e = expected(k);
				expect(m.annualSaving, m.name).toBe(e.saving);
				expect(m.extraCost, m.name).toBe(e.own);
				expect(m.cost, m.name).toBe(e.cost);
				if (e.payback === null) expect(m.paybackYears).toBeNull();
				else expect(m.paybackYears, m.name).toBeCloseTo(e.payback, 12);
			}
			expect(body.measures.map((m) => m.rank)).toEqual([1, 2, 3]);
			const shown = body.measures.map((m) => measureIds.indexOf(m.id));
			const order = [...[0, 1, 2]].sort((a, b) => {
				const [x, y] = [expected(a), expected(b)];
				if (rank === 'payback') {
					if (x.payback === null) return 1;
					if (y.payback === null) return -1;
					return x.payback - y.payback;
				}
				return rank === 'savings' ? y.saving - x.saving : y.co2 - x.co2;
			});
			expect(shown, rank).toEqual(order);
			// Items say which measure they are repaired in.
			for (const item of body.items) {
				const k = members.findIndex((ids) => ids.includes(item.id));
				expect(item.measureId, item.id).toBe(k === -1 ? null : measureIds[k]);
			}
		}
	});

	it('counts the measures’ own costs in the investment and the payback of the whole', async () => {
		const body = await list('rank=savings');
		// Measures that hold a live finding count; the one holding only a deleted finding does not.
		const own = expected(0).own + expected(1).own;
		expect(body.totals.extraCostMinor).toBe(own);
		expect(body.totals.investmentMinor).toBe(body.totals.repairCostMinor + own);
		expect(body.totals.paybackYears).toBeCloseTo(
			(body.totals.repairCostMinor + own) / body.totals.costMinor,
			12
		);
		// The Pareto axis stays the findings’ own repairs.
		expect(body.items.at(-1)!.cumulativeRepairCostMinor).toBe(body.totals.repairCostMinor);
	});
});

describe('GET /api/surveys/[id]/savings: parameters and who may see it', () => {
	it('refuses a rank it does not know, an unknown parameter and a repeated one, in words', async () => {
		expect(await get('rank=cheapest')).toMatchObject({
			status: 400,
			body: { message: 'rank must be one of: savings, payback, co2' }
		});
		expect(await get('rank=savings&page=2')).toMatchObject({
			status: 400,
			body: {
				message: 'Unknown parameter page: the savings list takes only rank, revision and limit'
			}
		});
		for (const limit of ['0', '5001', 'ten', '2.5']) {
			expect(await get(`limit=${limit}`)).toMatchObject({
				status: 400,
				body: { message: 'limit must be a whole number from 1 to 5,000' }
			});
		}
		expect(await get('rank=savings&rank=co2')).toMatchObject({
			status: 400,
			body: { message: 'Give rank only once.' }
		});
	});

	it('answers privately, never kept by a shared cache', async () => {
		const res = await get('rank=savings');
		expect(res.headers.get('cache-control')).toBe('private, no-store');
	});

	it('is for the firm’s staff: 404 for another firm, 403 for an auditor, 401 signed out', async () => {
		expect((await get('', adminA)).status).toBe(200);
		expect((await get('', consultantB)).status).toBe(404);
		expect((await get('', clientB)).status).toBe(404);
		expect((await get('', auditorA)).status).toBe(403);
		expect((await get('', null)).status).toBe(401);
		expect((await get('', consultantA, 'not-a-survey-id')).status).toBe(404);
	});

	it('shows the client company’s users the list only once the survey is published', async () => {
		expect((await get('', clientA)).status).toBe(404);
		await db
			.update(schema.surveys)
			.set({ status: 'published', publishedAt: new Date(), costBasisId: basisNow })
			.where(eq(schema.surveys.id, survey));
		try {
			const staff = await list('rank=co2');
			const seen = await list('rank=co2', clientA);
			expect(seen.items.map((i) => i.id)).toEqual(staff.items.map((i) => i.id));
			expect(seen.totals.costMinor).toBe(staff.totals.costMinor);
			// Another client company of the same firm, and the other firm's client, see nothing.
			expect((await get('', otherClientUser)).status).toBe(404);
			expect((await get('', clientB)).status).toBe(404);
			// The spring survey of the same site is not published: still hidden from the client.
			expect((await get('', clientA, otherSurvey)).status).toBe(404);
		} finally {
			await db
				.update(schema.surveys)
				.set({ status: 'in-review', publishedAt: null, costBasisId: null })
				.where(eq(schema.surveys.id, survey));
		}
	});
});
