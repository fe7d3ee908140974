/**
 * The Ladder's ranked list of a client company (src/lib/server/savings/company.ts, docs/ladder.md)
 * against MariaDB, on fixtures written straight into the snapshot tables: each site's most
 * recent published survey at its last revision is what is listed, never an older survey or
 * revision; the three orders and their ties; the filters by site, area and kind; totals,
 * breakdown and the sampled Pareto curve adding up to the rows; another company's rows never
 * counted; two currencies never added up.
 */
import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as schema from '../../src/lib/server/db/schema';
import {
	companySavings,
	LADDER_PAGE_ITEMS,
	shownSurveys
} from '../../src/lib/server/savings/company';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { testDatabase } from './db';

const { pool, db } = testDatabase();
const firmId = demoFirms[0].id;
const id = (kind: number, n: number) =>
	`5a1d0000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;
const company = { id: id(1, 1), name: 'Ladder spec bakery' };
const otherCompany = id(1, 2);
const [siteA, siteB, siteUsd, siteOther] = [id(2, 1), id(2, 2), id(2, 3), id(2, 4)];
const [areaOven, areaDock] = [id(3, 1), id(3, 2)];
/** Surveys: site A old and new, site B one, the USD site one, the other company's one. */
const S = {
	aOld: id(4, 1),
	aNew: id(4, 2),
	b: id(4, 3),
	usd: id(4, 4),
	other: id(4, 5)
};
/** Revisions: the new survey of site A has two; its first must never be listed. */
const R = {
	aOld: id(5, 1),
	aNew1: id(5, 2),
	aNew2: id(5, 3),
	b: id(5, 4),
	usd: id(5, 5),
	other: id(5, 6)
};

type Row = {
	revisionId: string;
	n: number;
	kind: string;
	cost: number;
	repair: number | null;
	co2: number | null;
	areaId: string | null;
	current?: 0 | 1;
};
const rowsOf = (revisionId: string, count: number, f: (n: number) => Partial<Row>): Row[] =>
	Array.from({ length: count }, (_, k) => ({
		revisionId,
		n: k + 1,
		kind: ['trap', 'leak', 'insulation'][k % 3],
		cost: 1_000 * ((k % 5) + 1),
		repair: k % 4 === 3 ? null : 300 * ((k % 3) + 1),
		co2: k % 6 === 5 ? null : 10 * ((k % 7) + 1),
		areaId: k % 2 ? areaOven : areaDock,
		...f(k)
	}));
const rows: Row[] = [
	...rowsOf(R.aOld, 6, () => ({ cost: 9_000_000 })),
	...rowsOf(R.aNew1, 6, () => ({ cost: 8_000_000 })),
	...rowsOf(R.aNew2, 37, () => ({})),
	// Not current on the revision's basis, or saving nothing: never listed.
	...rowsOf(R.aNew2, 3, () => ({ current: 0 })).map((r) => ({ ...r, n: 100 + r.n })),
	...rowsOf(R.aNew2, 2, () => ({ cost: 0 })).map((r) => ({ ...r, n: 200 + r.n })),
	...rowsOf(R.b, 23, (k) => ({ areaId: k % 3 ? null : areaDock })),
	...rowsOf(R.usd, 4, () => ({})),
	...rowsOf(R.other, 5, () => ({ cost: 7_000_000 }))
];
/** Unique over revisions: the revision's last two digits, then the row's number. */
const findingId = (r: Row) =>
	`${r.revisionId.slice(0, 24)}${r.revisionId.slice(-2)}${String(r.n).padStart(10, '0')}`;
const listed = (r: Row) =>
	[R.aNew2, R.b].includes(r.revisionId) && (r.current ?? 1) === 1 && r.cost > 0;

async function cleanUp() {
	const revs = Object.values(R);
	await db
		.delete(schema.surveyRevisionFindings)
		.where(inArray(schema.surveyRevisionFindings.revisionId, revs));
	await db.delete(schema.surveyRevisions).where(inArray(schema.surveyRevisions.id, revs));
	await db.delete(schema.surveys).where(inArray(schema.surveys.id, Object.values(S)));
	await db.delete(schema.areas).where(inArray(schema.areas.id, [areaOven, areaDock]));
	await db.delete(schema.sites).where(inArray(schema.sites.id, [siteA, siteB, siteUsd, siteOther]));
	await db
		.delete(schema.clientCompanies)
		.where(inArray(schema.clientCompanies.id, [company.id, otherCompany]));
}

const totals = (currency: string) =>
	({
		count: 0,
		steamKgH: 0,
		heatKw: 0,
		fuelGjYear: 0,
		costMinor: 0,
		co2KgYear: 0,
		waterM3Year: 0,
		repairCostMinor: 0,
		withoutRepairCost: 0,
		extraCostMinor: 0,
		investmentMinor: 0,
		paybackYears: null,
		currency,
		outOfDate: 0,
		withoutFigures: 0
	}) as const;

beforeAll(async () => {
	await cleanUp();
	await db.insert(schema.clientCompanies).values([
		{ id: company.id, firmId, name: company.name },
		{ id: otherCompany, firmId, name: 'Ladder spec other company' }
	]);
	await db.insert(schema.sites).values([
		{ id: siteA, firmId, clientCompanyId: company.id, name: 'A bakery' },
		{ id: siteB, firmId, clientCompanyId: company.id, name: 'B bakery' },
		{ id: siteUsd, firmId, clientCompanyId: company.id, name: 'C bakery', currency: 'USD' },
		{ id: siteOther, firmId, clientCompanyId: otherCompany, name: 'Other bakery' }
	]);
	await db.insert(schema.areas).values([
		{ id: areaOven, siteId: siteA, name: 'Ovens' },
		{ id: areaDock, siteId: siteA, name: 'Dock' }
	]);
	const day = (d: number) => new Date(Date.UTC(2026, 5, d));
	await db.insert(schema.surveys).values([
		{
			id: S.aOld,
			firmId,
			siteId: siteA,
			name: 'A, last year',
			status: 'published',
			publishedAt: day(1)
		},
		{
			id: S.aNew,
			firmId,
			siteId: siteA,
			name: 'A, this year',
			status: 'published',
			publishedAt: day(10)
		},
		{
			id: S.b,
			firmId,
			siteId: siteB,
			name: 'B, this year',
			status: 'published',
			publishedAt: day(5)
		},
		{
			id: S.usd,
			firmId,
			siteId: siteUsd,
			name: 'C, this year',
			status: 'published',
			publishedAt: day(6)
		},
		{
			id: S.other,
			firmId,
			siteId: siteOther,
			name: 'Other',
			status: 'published',
			publishedAt: day(7)
		}
	]);
	const rev = (revId: string, surveyId: string, number: number, currency = 'EUR') => ({
		id: revId,
		surveyId,
		number,
		publishedAt: day(number + 10),
		totals: totals(currency),
		findingCount: 0
	});
	await db
		.insert(schema.surveyRevisions)
		.values([
			rev(R.aOld, S.aOld, 1),
			rev(R.aNew1, S.aNew, 1),
			rev(R.aNew2, S.aNew, 2),
			rev(R.b, S.b, 1),
			rev(R.usd, S.usd, 1, 'USD'),
			rev(R.other, S.other, 1)
		]);
	await db.insert(schema.surveyRevisionFindings).values(
		rows.map((r) => ({
			revisionId: r.revisionId,
			findingId: findingId(r),
			kind: r.kind,
			status: 'published',
			location: `Spot ${r.n}`,
			areaId: r.areaId,
			areaName: r.areaId === areaOven ? 'Ovens' : r.areaId === areaDock ? 'Dock' : null,
			figuresCurrent: r.current ?? 1,
			cost: r.cost,
			co2: r.co2,
			repairCost: r.repair,
			paybackYears: r.repair === null || r.cost === 0 ? null : r.repair / r.cost,
			findingVersion: 1
		}))
	);
});

afterAll(async () => {
	await cleanUp();
	await pool.end();
});

const ask = (over: Partial<Parameters<typeof companySavings>[3]> = {}) =>
	companySavings(db, firmId, company, {
		rank: 'savings',
		site: null,
		area: null,
		kind: null,
		page: 1,
		...over
	});

describe('the Ladder’s ranked list of a company', () => {
	it('reads each site’s most recent published survey at its last revision', async () => {
		const shown = await shownSurveys(db, firmId, company.id);
		expect(shown.map((s) => [s.site, s.name, s.revision])).toEqual([
			['A bakery', 'A, this year', 2],
			['B bakery', 'B, this year', 1],
			['C bakery', 'C, this year', 1]
		]);
	});

	it('adds no two currencies up: with every site it asks for one, a site alone lists', async () => {
		const all = await ask();
		expect(all.mixedCurrencies).toBe(true);
		expect(all.items).toEqual([]);
		const usd = await ask({ site: siteUsd });
		expect(usd.mixedCurrencies).toBe(false);
		expect(usd.totals.currency).toBe('USD');
		expect(usd.totals.count).toBe(4);
	});

	it('ranks the two EUR sites in each order, ties by id, pages of 25, totals over all', async () => {
		await db
			.update(schema.sites)
			.set({ clientCompanyId: otherCompany })
			.where(eq(schema.sites.id, siteUsd));
		try {
			const expected = rows.filter(listed);
			const order = {
				savings: (a: Row, b: Row) => b.cost - a.cost || findingId(a).localeCompare(findingId(b)),
				payback: (a: Row, b: Row) => {
					const [x, y] = [a, b].map((r) => (r.repair === null ? null : r.repair / r.cost));
					if (x === null || y === null)
						return x === y ? findingId(a).localeCompare(findingId(b)) : x === null ? 1 : -1;
					return x - y || findingId(a).localeCompare(findingId(b));
				},
				co2: (a: Row, b: Row) => {
					if (a.co2 === null || b.co2 === null)
						return a.co2 === b.co2
							? findingId(a).localeCompare(findingId(b))
							: a.co2 === null
								? 1
								: -1;
					return b.co2 - a.co2 || findingId(a).localeCompare(findingId(b));
				}
			};
			for (const rank of ['savings', 'payback', 'co2'] as const) {
				const want = [...expected].sort(order[rank]).map(findingId);
				const pages = await Promise.all([1, 2, 3].map((page) => ask({ rank, page })));
				expect(pages[0].pages).toBe(Math.ceil(want.length / LADDER_PAGE_ITEMS));
				expect(
					pages.flatMap((p) => p.items.map((i) => i.id)),
					rank
				).toEqual(want);
				expect(pages[1].items[0].rank).toBe(LADDER_PAGE_ITEMS + 1);
			}
			const list = await ask();
			expect(list.mixedCurrencies).toBe(false);
			expect(list.totals.count).toBe(expected.length);
			expect(list.totals.costMinor).toBe(expected.reduce((s, r) => s + r.cost, 0));
			expect(list.totals.repairCostMinor).toBe(expected.reduce((s, r) => s + (r.repair ?? 0), 0));
			expect(list.totals.withoutRepairCost).toBe(expected.filter((r) => r.repair === null).length);
			expect(list.totals.paybackYears).toBeCloseTo(
				list.totals.repairCostMinor / list.totals.costMinor,
				12
			);
			// The old survey, the first revision, rows not current or saving nothing, and the other
			// company's rows are nowhere.
			expect(list.items.every((i) => i.costMinor < 1_000_000)).toBe(true);
			// Breakdown and Pareto add up to the totals.
			const sum = (g: { costMinor: number }[]) => g.reduce((s, x) => s + x.costMinor, 0);
			expect(sum(list.breakdown.kind)).toBe(list.totals.costMinor);
			expect(sum(list.breakdown.area)).toBe(list.totals.costMinor);
			expect(list.pareto.at(-1)).toEqual({
				rank: expected.length,
				cumulativeSavingMinor: list.totals.costMinor,
				cumulativeRepairCostMinor: list.totals.repairCostMinor
			});
			const p1 = list.items;
			for (const p of list.pareto.filter((x) => x.rank <= LADDER_PAGE_ITEMS)) {
				expect(p.cumulativeSavingMinor).toBe(p1[p.rank - 1].cumulativeSavingMinor);
			}
			// Each item says which survey and site it is from.
			const fromB = p1.find(
				(i) => expected.find((r) => findingId(r) === i.id)!.revisionId === R.b
			)!;
			expect([fromB.survey, fromB.site, fromB.surveyId]).toEqual(['B, this year', 'B bakery', S.b]);

			// Filters: a site, an area, a kind; together.
			const b = await ask({ site: siteB });
			expect(b.totals.count).toBe(expected.filter((r) => r.revisionId === R.b).length);
			const dock = await ask({ area: areaDock });
			expect(dock.totals.count).toBe(expected.filter((r) => r.areaId === areaDock).length);
			const leaksInDock = await ask({ area: areaDock, kind: 'leak' });
			expect(leaksInDock.totals.count).toBe(
				expected.filter((r) => r.areaId === areaDock && r.kind === 'leak').length
			);
			expect(leaksInDock.filters).toMatchObject({ area: areaDock, kind: 'leak' });
			// A site or area the company does not have is no filter at all, and is said to be unset.
			const foreign = await ask({ site: siteOther, area: id(3, 99) });
			expect(foreign.filters).toMatchObject({ site: null, area: null });
			expect(foreign.totals.count).toBe(expected.length);
		} finally {
			await db
				.update(schema.sites)
				.set({ clientCompanyId: company.id })
				.where(eq(schema.sites.id, siteUsd));
		}
	});
});
