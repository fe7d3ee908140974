/**
 * Totals and breakdown of a survey's ranked savings list, in one aggregate over its findings
 * (grouped by kind and area, a handful of groups): sums of what every saving finding saves
 * per year and costs to repair, how many findings the list leaves out and why, and the same
 * sums per kind and per area for the breakdown beside the Pareto chart.
 */
import { and, eq, isNull, sql, type SQL } from 'drizzle-orm';
import { FINDING_KINDS, type FindingKind } from '../../schemas/finding-vocabulary';
import { measureEconomics } from '../../economics/measure';
import { simplePaybackYears } from '../../economics/payback';
import { basisLifeTerms } from '../measures/sums';
import { areas, findings as F, measures as M, surveyRevisionFindings as S } from '../db/schema';
import { savingSnapshotSql } from '../publish/snapshot';
import type { Executor } from '../db/types';
import { figuresOutOfDateSql } from '../pricing/state';
import { ENGINE_VERSION } from '../../steam/version';
import { savingFindingSql } from './ranked-list';
import { kindWords } from '../finding-words';

export interface SavingsTotals {
	/** Saving findings (every one, also past the list's cut). */
	count: number;
	/** Per year, over the saving findings. */
	steamKgH: number;
	heatKw: number;
	fuelGjYear: number;
	/** Fuel and water cost saved per year, minor units of `currency`. */
	costMinor: number;
	co2KgYear: number;
	waterM3Year: number;
	/** Known repair costs of the saving findings, minor units. */
	repairCostMinor: number;
	/** Saving findings whose repair is not priced yet (left out of repairCostMinor). */
	withoutRepairCost: number;
	/**
	 * The measures' own costs (access, scaffold, shutdown, other) of the survey's measures that
	 * hold a live finding, minor units: part of the investment, in no finding's repair cost.
	 */
	extraCostMinor: number;
	/** What the repairs cost in all: repairCostMinor + extraCostMinor, minor units. */
	investmentMinor: number;
	/** investmentMinor ÷ costMinor, years; null with no saving or nothing priced. */
	paybackYears: number | null;
	currency: string;
	/** Live findings left out because their figures are out of date (another basis or engine). */
	outOfDate: number;
	/** Live findings left out because they have no money figures (pricing_note says why). */
	withoutFigures: number;
}

/** One group of the breakdown: a kind, or an area (key null: findings with no area). */
export interface SavingsGroup {
	key: string | null;
	label: string;
	count: number;
	costMinor: number;
	repairCostMinor: number;
	co2KgYear: number;
}

export interface SavingsBreakdown {
	/** By kind, biggest saving first. */
	kind: SavingsGroup[];
	/** By area, biggest saving first. */
	area: SavingsGroup[];
}

const sumWhen = (when: SQL, value: SQL | typeof F.cost) =>
	sql<string | number | null>`SUM(CASE WHEN ${when} THEN ${value} END)`;
const countWhen = (when: SQL) =>
	sql<string | number | null>`SUM(CASE WHEN ${when} THEN 1 ELSE 0 END)`;
const num = (v: string | number | null | undefined) => Number(v ?? 0);

/** Biggest saving first; ties by label, then the key (null last). */
const bySaving = (a: SavingsGroup, b: SavingsGroup) =>
	b.costMinor - a.costMinor ||
	a.label.localeCompare(b.label) ||
	(a.key ?? '\uffff').localeCompare(b.key ?? '\uffff');

type GroupSums = Record<'count' | 'cost' | 'repair' | 'co2', string | number | null | undefined>;

/** One aggregate row's sums, as the totals' GROUP BY names them. */
export type GroupRow = Record<
	'count' | 'steam' | 'heat' | 'fuel' | 'cost' | 'co2' | 'water' | 'repair' | 'withoutRepair',
	string | number | null | undefined
>;

/** The sums every list's totals hold, whatever else it adds (measures' costs, left-out counts). */
export type ListSums = Pick<
	SavingsTotals,
	| 'count'
	| 'steamKgH'
	| 'heatKw'
	| 'fuelGjYear'
	| 'costMinor'
	| 'co2KgYear'
	| 'waterM3Year'
	| 'repairCostMinor'
	| 'withoutRepairCost'
>;

/** Adds one aggregate row's sums into the totals of a list (live findings or snapshot rows). */
export function addGroup(totals: ListSums, g: GroupRow): void {
	totals.count += num(g.count);
	totals.steamKgH += num(g.steam);
	totals.heatKw += num(g.heat);
	totals.fuelGjYear += num(g.fuel);
	totals.costMinor += num(g.cost);
	totals.co2KgYear += num(g.co2);
	totals.waterM3Year += num(g.water);
	totals.repairCostMinor += num(g.repair);
	totals.withoutRepairCost += num(g.withoutRepair);
}

/** Adds one aggregate row's sums into its group of a breakdown (made on first use). */
export function into(
	map: Map<string | null, SavingsGroup>,
	key: string | null,
	label: string,
	g: GroupSums
): void {
	const group = map.get(key) ?? {
		key,
		label,
		count: 0,
		costMinor: 0,
		repairCostMinor: 0,
		co2KgYear: 0
	};
	group.count += num(g.count);
	group.costMinor += num(g.cost);
	group.repairCostMinor += num(g.repair);
	group.co2KgYear += num(g.co2);
	map.set(key, group);
}

/** The own costs of the survey's measures that hold a live finding, minor units. */
async function measureExtras(db: Executor, surveyId: string): Promise<number> {
	const [row] = await db
		.select({
			extra: sql<
				string | number | null
			>`SUM(${M.accessCost} + ${M.scaffoldCost} + ${M.shutdownCost} + ${M.otherCost})`
		})
		.from(M)
		.where(
			and(
				eq(M.surveyId, surveyId),
				isNull(M.deletedAt),
				sql`EXISTS (SELECT 1 FROM ${F} WHERE ${F.measureId} = ${M.id} AND ${F.deletedAt} IS NULL)`
			)
		);
	return num(row?.extra);
}

/**
 * The payback of a whole (list or revision): its investment ÷ its saving, with the investment
 * unknown — not free — while no repair is priced and no measure adds a cost.
 */
export function withInvestment<T extends SavingsTotals>(totals: T, extraCostMinor: number): T {
	const priced = totals.withoutRepairCost < totals.count || extraCostMinor > 0;
	const investmentMinor = totals.repairCostMinor + extraCostMinor;
	return {
		...totals,
		extraCostMinor,
		investmentMinor,
		paybackYears: simplePaybackYears(priced ? investmentMinor : null, totals.costMinor)
	};
}

export async function savingsTotals(
	db: Executor,
	survey: { id: string; basisId: string | null; currency: string }
): Promise<{ totals: SavingsTotals; breakdown: SavingsBreakdown }> {
	const saving = savingFindingSql(survey.id, survey.basisId);
	const extras = measureExtras(db, survey.id);
	const groups = await db
		.select({
			kind: F.kind,
			areaId: F.areaId,
			area: areas.name,
			count: countWhen(saving),
			steam: sumWhen(saving, sql`${F.steamLoss}`),
			heat: sumWhen(saving, sql`${F.heatLoss}`),
			fuel: sumWhen(saving, sql`${F.fuelEnergy}`),
			cost: sumWhen(saving, sql`${F.cost}`),
			co2: sumWhen(saving, sql`${F.co2}`),
			water: sumWhen(saving, sql`${F.water}`),
			repair: sumWhen(saving, sql`${F.repairCost}`),
			withoutRepair: countWhen(sql`${saving} AND ${F.repairCost} IS NULL`),
			outOfDate: countWhen(figuresOutOfDateSql(survey.basisId)),
			withoutFigures: countWhen(
				sql`${F.physicsEngine} <=> ${ENGINE_VERSION} AND ${F.resultsEngine} IS NULL`
			)
		})
		.from(F)
		.leftJoin(areas, eq(areas.id, F.areaId))
		.where(and(eq(F.surveyId, survey.id), isNull(F.deletedAt)))
		.groupBy(F.kind, F.areaId, areas.name);

	const totals: SavingsTotals = {
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
		currency: survey.currency,
		outOfDate: 0,
		withoutFigures: 0
	};
	const byKind = new Map<string, SavingsGroup>();
	const byArea = new Map<string | null, SavingsGroup>();
	for (const g of groups) {
		totals.outOfDate += num(g.outOfDate);
		totals.withoutFigures += num(g.withoutFigures);
		if (num(g.count) === 0) continue;
		addGroup(totals, g);
		into(byKind as Map<string | null, SavingsGroup>, g.kind, kindWords(g.kind), g);
		into(byArea, g.areaId, g.area ?? 'No area', g);
	}
	const kindOrder = (k: string | null) => FINDING_KINDS.indexOf(k as FindingKind);
	return {
		totals: withInvestment(totals, await extras),
		breakdown: {
			kind: [...byKind.values()].sort(
				(a, b) => bySaving(a, b) || kindOrder(a.key) - kindOrder(b.key)
			),
			area: [...byArea.values()].sort(bySaving)
		}
	};
}

/** The breakdown by kind and area of a revision's snapshot (as savingsTotals groups live ones). */
export async function revisionBreakdown(
	db: Executor,
	revisionId: string
): Promise<SavingsBreakdown> {
	const groups = await db
		.select({
			kind: S.kind,
			areaId: S.areaId,
			area: S.areaName,
			count: sql<string | number>`COUNT(*)`,
			cost: sql<string | number | null>`SUM(${S.cost})`,
			repair: sql<string | number | null>`SUM(${S.repairCost})`,
			co2: sql<string | number | null>`SUM(${S.co2})`
		})
		.from(S)
		.where(savingSnapshotSql(revisionId))
		.groupBy(S.kind, S.areaId, S.areaName);
	const fold = (
		key: (g: (typeof groups)[number]) => string | null,
		label: (g: (typeof groups)[number]) => string
	) => {
		const map = new Map<string | null, SavingsGroup>();
		for (const g of groups) into(map, key(g), label(g), g);
		return [...map.values()].sort(bySaving);
	};
	return {
		kind: fold(
			(g) => g.kind,
			(g) => kindWords(g.kind)
		),
		area: fold(
			(g) => g.areaId,
			(g) => g.area ?? 'No area'
		)
	};
}

/** NPV and IRR of the whole list over the cost basis's life and discount rate. */
export interface WholeEconomics {
	/** The basis's discount rate, a fraction per year. */
	discountRate: number;
	/** The basis's life, whole years. */
	lifeYears: number;
	/** NPV of the known repair costs against the total saving, minor units (not rounded). */
	npvMinor: number;
	/** IRR, a fraction per year; null when no single rate exists (nothing to repay, or free). */
	irr: number | null;
}

/** NPV and IRR of a list's totals on a basis's life and discount rate; null without them. */
export async function wholeEconomics(
	db: Executor,
	basisId: string | null,
	totals: Pick<SavingsTotals, 'count' | 'paybackYears' | 'investmentMinor' | 'costMinor'>
): Promise<WholeEconomics | null> {
	// A payback means something is priced and something is saved.
	if (totals.count === 0 || totals.paybackYears === null) return null;
	const terms = await basisLifeTerms(db, basisId);
	if (!terms) return null;
	return {
		...terms,
		...measureEconomics(
			{ costMinor: totals.investmentMinor, annualSavingMinor: totals.costMinor },
			terms
		)
	};
}
