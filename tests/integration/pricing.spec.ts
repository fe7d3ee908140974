/**
 * Figures at scale against the real MariaDB (docs/desk.md, "Figures"): a new cost basis re-prices
 * every finding of its site and no other, from stored flows, onto the new version; a published
 * survey keeps the basis it was priced on; figures not on the basis in force read as out of
 * date; a header change recomputes that header's findings only. Fixtures are this file's own
 * invented site (fixed ids, removed afterwards), so the demo data others test against stays.
 */
import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CostBasis } from '../../src/lib/schemas/site';
import * as schema from '../../src/lib/server/db/schema';
import { findingsQuerySchema } from '../../src/lib/schemas/desk-findings';
import { findingsPage, surveyPricing } from '../../src/lib/server/desk/findings-query';
import { demoFirms } from '../../src/lib/server/seed/demo';
import {
	saveCostBasis,
	costBasisHistory,
	freezeSurveyBasis
} from '../../src/lib/server/pricing/cost-basis';
import { pricingContext } from '../../src/lib/server/pricing/context';
import { figureColumns } from '../../src/lib/server/pricing/figures';
import {
	recomputeSite,
	refreshStaleFigures,
	repriceSite
} from '../../src/lib/server/pricing/refresh';
import { figureState } from '../../src/lib/server/pricing/state';
import { evaluateFinding, type FindingInput } from '../../src/lib/steam/index';
import { testDatabase } from './db';
import { consultantA } from './demo-people';

const { pool, db } = testDatabase();
const firmId = demoFirms[0].id;
const id = (kind: number, n: number) =>
	`c0570000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;
const client = id(1, 1);
const [siteA, siteB] = [id(2, 1), id(2, 2)];
const [headerA1, headerA2, headerB] = [id(3, 1), id(3, 2), id(3, 3)];
const [fieldA, publishedA, fieldB] = [id(4, 1), id(4, 2), id(4, 3)];

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

type Planned = FindingInput & { surveyId: string; location: string };

const finding = (n: number, surveyId: string, headerId: string, kind: 'trap' | 'leak'): Planned =>
	({
		id: id(9, n),
		surveyId,
		headerId,
		kind,
		location: `Pricing test line ${n}`,
		notes: '',
		photoIds: [],
		createdAt: '2026-11-20T08:00:00.000Z',
		updatedAt: '2026-11-20T08:00:00.000Z',
		repairCost: 30000 + n * 100,
		inputs:
			kind === 'trap'
				? { trapType: 'thermodynamic', dn: 15, condition: 'failed-open', discharge: 'atmosphere' }
				: { sizeClass: n % 2 ? 'small' : 'medium' }
	}) as Planned;

const plan = [
	...Array.from({ length: 12 }, (_, i) =>
		finding(i + 1, fieldA, i % 2 ? headerA1 : headerA2, i % 3 ? 'trap' : 'leak')
	),
	...Array.from({ length: 5 }, (_, i) => finding(101 + i, publishedA, headerA1, 'leak')),
	...Array.from({ length: 4 }, (_, i) => finding(201 + i, fieldB, headerB, 'trap'))
];

async function rows(surveyId: string) {
	return db
		.select()
		.from(schema.findings)
		.where(eq(schema.findings.surveyId, surveyId))
		.orderBy(schema.findings.id);
}

async function cleanUp() {
	const surveyIds = [fieldA, publishedA, fieldB];
	await db.delete(schema.findings).where(inArray(schema.findings.surveyId, surveyIds));
	await db
		.update(schema.surveys)
		.set({ costBasisId: null })
		.where(inArray(schema.surveys.id, surveyIds));
	await db.delete(schema.surveys).where(inArray(schema.surveys.id, surveyIds));
	await db
		.update(schema.sites)
		.set({ costBasisId: null })
		.where(inArray(schema.sites.id, [siteA, siteB]));
	await db.delete(schema.costBases).where(inArray(schema.costBases.siteId, [siteA, siteB]));
	await db.delete(schema.headers).where(inArray(schema.headers.siteId, [siteA, siteB]));
	await db.delete(schema.sites).where(inArray(schema.sites.id, [siteA, siteB]));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, client));
}

beforeAll(async () => {
	await cleanUp();
	await db
		.insert(schema.clientCompanies)
		.values({ id: client, firmId, name: 'Pricing Test Cooperage' });
	for (const [site, name] of [
		[siteA, 'Cooperage A'],
		[siteB, 'Cooperage B']
	]) {
		await db
			.insert(schema.sites)
			.values({ id: site, firmId, clientCompanyId: client, name, elevation: 50 });
	}
	await db.insert(schema.headers).values([
		{ id: headerA1, siteId: siteA, name: 'Main', pressure: 1.1 },
		{ id: headerA2, siteId: siteA, name: 'Low', pressure: 0.4 },
		{ id: headerB, siteId: siteB, name: 'Main', pressure: 1.1 }
	]);
	for (const site of [siteA, siteB]) {
		await saveCostBasis(db, {
			firmId,
			siteId: site,
			actorId: consultantA.id,
			basis,
			note: 'first'
		});
	}
	await db.insert(schema.surveys).values([
		{ id: fieldA, firmId, siteId: siteA, name: 'Cooperage A winter', status: 'in-review' },
		{ id: publishedA, firmId, siteId: siteA, name: 'Cooperage A spring', status: 'published' },
		{ id: fieldB, firmId, siteId: siteB, name: 'Cooperage B winter', status: 'in-field' }
	]);
	for (const f of plan) {
		const site = f.surveyId === fieldB ? siteB : siteA;
		const ctx = await pricingContext(db, site);
		await db.insert(schema.findings).values({
			id: f.id,
			surveyId: f.surveyId,
			kind: f.kind,
			headerId: f.headerId,
			location: f.location,
			inputs: f.inputs as Record<string, unknown>,
			repairCost: f.repairCost,
			...figureColumns(ctx, f)
		});
	}
	await freezeSurveyBasis(db, publishedA);
});

afterAll(async () => {
	await cleanUp();
	await pool.end();
});

/** The review table's totals of a survey (its kept view, findings-cache, when one is kept). */
async function tableTotals(surveyId: string) {
	const survey = (await surveyPricing(db, surveyId))!;
	return (await findingsPage(db, survey, findingsQuerySchema.parse({}))).totals;
}
const sum = (values: (number | null)[]) => values.reduce<number>((a, v) => a + (v ?? 0), 0);

describe('a new cost basis', () => {
	it('re-prices every finding of its site onto the new version, and no other site', async () => {
		const before = { A: await rows(fieldA), P: await rows(publishedA), B: await rows(fieldB) };
		// The table has a view of the survey before the save (kept under the firm's counter).
		expect((await tableTotals(fieldA)).costMinor).toBe(sum(before.A.map((r) => r.cost)));
		expect(before.A.every((r) => r.cost! > 0 && r.pricedBasisId !== null)).toBe(true);
		const dearer = { ...basis, fuel: { ...basis.fuel, price: '20.00' }, operatingHours: 6000 };
		const saved = await saveCostBasis(db, {
			firmId,
			siteId: siteA,
			actorId: consultantA.id,
			basis: dearer,
			note: 'gas contract renewed'
		});
		expect(saved.number).toBe(2);
		expect(saved.recomputed).toBe(false);
		expect(saved.refreshed).toBe(12);

		const ctx = await pricingContext(db, siteA);
		expect(ctx.basisId).toBe(saved.id);
		const after = await rows(fieldA);
		for (const row of after) {
			const input = plan.find((p) => p.id === row.id)!;
			const fresh = evaluateFinding(input, ctx);
			expect(row.pricedBasisId).toBe(saved.id);
			expect(row.cost).toBe(fresh.cost.minor);
			expect(row.fuelEnergy).toBeCloseTo(fresh.fuelEnergy, 9);
			expect(row.co2).toBeCloseTo(fresh.co2, 9);
			expect(row.water).toBeCloseTo(fresh.water, 9);
			expect(row.paybackYears).toBeCloseTo(fresh.payback.years!, 9);
			// The physics did not move: same flows, same steam, not recomputed.
			const old = before.A.find((b) => b.id === row.id)!;
			expect(row.flows).toEqual(old.flows);
			expect(row.steamLoss).toBe(old.steamLoss);
			expect(row.version).toBe(old.version);
			expect(row.changeSeq).toBe(old.changeSeq);
			expect(figureState(row, saved.id)).toBe('current');
		}
		// The table shows the new money at once, not its kept view of the old.
		const table = await tableTotals(fieldA);
		expect(table.costMinor).toBe(sum(after.map((r) => r.cost)));
		expect(table.costMinor).not.toBe(sum(before.A.map((r) => r.cost)));
		// The other site and the published survey are untouched.
		expect(await rows(fieldB)).toEqual(before.B);
		expect(await rows(publishedA)).toEqual(before.P);
	});

	it('keeps the old basis for the published survey, in the history and in its figures', async () => {
		const history = await costBasisHistory(db, siteA);
		expect(history.map((h) => h.number)).toEqual([2, 1]);
		expect(history[0].current).toBe(true);
		expect(history[1].basis.fuel.price).toBe('10.00');
		expect(history[1].frozenFor.map((s) => s.id)).toEqual([publishedA]);
		const [published] = await db
			.select()
			.from(schema.surveys)
			.where(eq(schema.surveys.id, publishedA));
		expect(published.costBasisId).toBe(history[1].id);
		for (const row of await rows(publishedA)) {
			expect(row.pricedBasisId).toBe(history[1].id);
			expect(figureState(row, published.costBasisId)).toBe('current');
		}
		const audit = await db
			.select()
			.from(schema.auditLog)
			.where(eq(schema.auditLog.entityId, history[0].id));
		expect(audit.map((a) => a.action)).toEqual(['create']);
	});

	it('reads figures priced on another basis as out of date until re-priced', async () => {
		const [one] = await rows(fieldA);
		const history = await costBasisHistory(db, siteA);
		await db
			.update(schema.findings)
			.set({ pricedBasisId: history[1].id })
			.where(eq(schema.findings.id, one.id));
		const [stale] = (await rows(fieldA)).filter((r) => r.id === one.id);
		expect(figureState(stale, history[0].id)).toBe('basis');
		expect(figureState({ ...stale, physicsEngine: 'steamwisp-engine/0' }, history[0].id)).toBe(
			'engine'
		);
		expect(await repriceSite(db, siteA, { all: false })).toBe(1);
		// Many small batches worked two at a time count and write every finding once.
		expect(await repriceSite(db, siteA, { batchSize: 5 })).toBe(12);
		expect(await recomputeSite(db, siteA, { batchSize: 5 })).toBe(12);
		for (const row of await rows(fieldA)) expect(figureState(row, history[0].id)).toBe('current');
		const [fixed] = (await rows(fieldA)).filter((r) => r.id === one.id);
		expect(figureState(fixed, history[0].id)).toBe('current');
	});

	it('recomputes after an engine change, and only a moved header’s findings after a header change', async () => {
		const [one] = await rows(fieldB);
		await db
			.update(schema.findings)
			.set({ physicsEngine: 'steamwisp-engine/0', steamLoss: 1 })
			.where(eq(schema.findings.id, one.id));
		const refreshed = await refreshStaleFigures(db);
		expect(refreshed.recomputed).toBeGreaterThanOrEqual(1);
		const [back] = (await rows(fieldB)).filter((r) => r.id === one.id);
		expect(back.steamLoss).not.toBe(1);

		const before = await rows(fieldA);
		const published = await rows(publishedA);
		const steamBefore = (await tableTotals(fieldA)).steamKgH;
		expect(steamBefore).toBeCloseTo(sum(before.map((r) => r.steamLoss)), 9);
		await db.update(schema.headers).set({ pressure: 2.1 }).where(eq(schema.headers.id, headerA1));
		const n = await recomputeSite(db, siteA, { headerId: headerA1 });
		// The recompute moved the firm's counter: the table reads the new steam, not its kept view.
		const steamAfter = (await tableTotals(fieldA)).steamKgH;
		expect(steamAfter).toBeCloseTo(sum((await rows(fieldA)).map((r) => r.steamLoss)), 9);
		expect(steamAfter).toBeGreaterThan(steamBefore);
		expect(n).toBe(plan.filter((p) => p.headerId === headerA1 && p.surveyId === fieldA).length);
		for (const row of await rows(fieldA)) {
			const old = before.find((b) => b.id === row.id)!;
			if (row.headerId === headerA1) expect(row.steamLoss!).toBeGreaterThan(old.steamLoss!);
			else expect(row.steamLoss).toBe(old.steamLoss);
		}
		// The published survey (frozen) keeps the figures it was published with.
		expect(await rows(publishedA)).toEqual(published);
	});
});
