/**
 * The ranked savings list of one survey: its findings that save money on current figures,
 * ranked in SQL over the typed columns, with each one's rank and the running sums of saving
 * and repair cost in rank order (window functions: the Pareto chart's points), never loading
 * the survey's findings into Node. At most MAX_SAVINGS_ITEMS rows come back; the running sums
 * are over the whole ranking, so the last row listed still carries the true cumulative.
 */
import { and, asc, desc, eq, gt, isNull, sql, type AnyColumn, type SQL } from 'drizzle-orm';
import { MAX_SAVINGS_ITEMS, type SavingsRank } from '../../schemas/savings';
import type { FindingKind, FindingStatus } from '../../schemas/finding-vocabulary';
import { areas, assets, findings as F, headers, surveyRevisionFindings as S } from '../db/schema';
import { savingSnapshotSql } from '../publish/snapshot';
import { snapshotItemColumns } from '../item-columns';
import type { Executor } from '../db/types';
import { figuresCurrentSql } from '../pricing/state';
import { conditionWords, kindWords, statusWords } from '../finding-words';

export interface SavingsItem {
	/** 1-based place in the ranking. */
	rank: number;
	id: string;
	kind: FindingKind;
	kindWords: string;
	tag: string | null;
	location: string;
	area: string | null;
	header: string | null;
	condition: string | null;
	conditionWords: string | null;
	status: FindingStatus;
	statusWords: string;
	/** Steam no longer lost once repaired, kg/h. */
	steamKgH: number | null;
	/** Heat the boiler no longer replaces, kW. */
	heatKw: number | null;
	/** Fuel energy saved per year, GJ. */
	fuelGjYear: number | null;
	/** Fuel and water cost saved per year, minor units of `currency` (> 0 for every item). */
	costMinor: number;
	currency: string;
	/** CO2 avoided per year, kg. */
	co2KgYear: number | null;
	/** Makeup water saved per year, m³. */
	waterM3Year: number | null;
	/** Repair cost, minor units; null: not priced yet. */
	repairCostMinor: number | null;
	/** Simple payback, years; null without a repair cost. */
	paybackYears: number | null;
	/** The measure it is repaired in, or null. */
	measureId: string | null;
	/** Saving per year of this item and every item ranked above it, minor units. */
	cumulativeSavingMinor: number;
	/** Known repair costs of this item and every item ranked above it, minor units. */
	cumulativeRepairCostMinor: number;
}

/**
 * What the list holds: the survey's live findings priced on the basis the survey is on now, by
 * this engine, that save something. `basisId` is that basis (SurveyPricing.basisId).
 */
export const savingFindingSql = (surveyId: string, basisId: string | null): SQL =>
	and(
		eq(F.surveyId, surveyId),
		isNull(F.deletedAt),
		sql`${figuresCurrentSql(basisId)}`,
		gt(F.cost, 0)
	)!;

/** The columns a ranking orders by and sums: the findings' or a revision snapshot's. */
interface RankColumns {
	id: AnyColumn;
	cost: AnyColumn;
	paybackYears: AnyColumn;
	co2: AnyColumn;
	repairCost: AnyColumn;
}

/**
 * The orders, each total (ties by id): saving biggest first; payback shortest first with
 * findings that have none last; CO2 avoided most first (none last).
 */
export const rankOrder = (c: RankColumns, rank: SavingsRank): SQL[] =>
	({
		savings: [desc(c.cost), asc(c.id)],
		payback: [sql`${c.paybackYears} IS NULL`, asc(c.paybackYears), asc(c.id)],
		co2: [sql`${c.co2} IS NULL`, desc(c.co2), asc(c.id)]
	})[rank];

/** A row's place and the running sums of saving and repair cost in rank order. */
export function ranking(c: RankColumns, rank: SavingsRank) {
	const orderBy = sql`ORDER BY ${sql.join(rankOrder(c, rank), sql`, `)}`;
	// Running sums row by row (the order is total, so no two rows share a place).
	const over = sql`OVER (${orderBy} ROWS BETWEEN UNBOUNDED PRECEDING AND CURRENT ROW)`;
	return {
		place: sql<string | number>`ROW_NUMBER() OVER (${orderBy})`.as('place'),
		cumulativeSaving: sql<string | number>`SUM(${c.cost}) ${over}`.as('cumulative_saving'),
		cumulativeRepair: sql<string | number>`SUM(COALESCE(${c.repairCost}, 0)) ${over}`.as(
			'cumulative_repair'
		)
	};
}

/** A point of the Pareto curve: the running sums after the item at `rank`. */
export interface ParetoSample {
	rank: number;
	cumulativeSavingMinor: number;
	cumulativeRepairCostMinor: number;
}

/**
 * Every k-th point of a ranking's running sums, and its last (k so that at most `points` come
 * back): the Pareto curve of a list of any length in one statement, never every row.
 */
export async function sampledRunningSums(
	db: Executor,
	source: { table: typeof F | typeof S; cols: RankColumns; where: SQL },
	rank: SavingsRank,
	count: number,
	points: number
): Promise<ParetoSample[]> {
	if (count === 0) return [];
	const stride = Math.max(1, Math.ceil(count / points));
	const sums = ranking(source.cols, rank);
	const ranked = db
		.select({ place: sums.place, saving: sums.cumulativeSaving, repair: sums.cumulativeRepair })
		.from(source.table)
		.where(source.where)
		.as('ranked');
	const rows = await db
		.select({ place: ranked.place, saving: ranked.saving, repair: ranked.repair })
		.from(ranked)
		.where(sql`MOD(${ranked.place}, ${stride}) = 0 OR ${ranked.place} = ${count}`)
		.orderBy(asc(ranked.place));
	return rows.map((r) => ({
		rank: Number(r.place),
		cumulativeSavingMinor: Number(r.saving),
		cumulativeRepairCostMinor: Number(r.repair)
	}));
}

/** The live findings' saving rows, or a revision snapshot's, as a ranking's source. */
export const liveSource = (survey: { id: string; basisId: string | null }) => ({
	table: F,
	cols: F,
	where: savingFindingSql(survey.id, survey.basisId)
});
export const revisionSource = (revisionId: string) => ({
	table: S,
	cols: { ...S, id: S.findingId },
	where: savingSnapshotSql(revisionId)
});

const placed = (
	r: ItemColumns & Record<'place' | 'cumulativeSaving' | 'cumulativeRepair', string | number>,
	currency: string
) =>
	savingsItem(r, currency, {
		rank: Number(r.place),
		saving: Number(r.cumulativeSaving),
		repair: Number(r.cumulativeRepair)
	});

const n = (v: string | number | null) => (v === null ? null : Number(v));

/**
 * The first `limit` items of the survey's ranking (MAX_SAVINGS_ITEMS unless told), in rank
 * order. One statement: the ranking with its window sums over every saving finding in a
 * derived table, cut to the limit, then the names of the rows kept.
 */
export async function rankedItems(
	db: Executor,
	survey: { id: string; basisId: string | null; currency: string },
	rank: SavingsRank,
	limit = MAX_SAVINGS_ITEMS
): Promise<SavingsItem[]> {
	const ranked = db
		.select({
			id: F.id,
			kind: F.kind,
			assetId: F.assetId,
			areaId: F.areaId,
			headerId: F.headerId,
			location: F.location,
			condition: F.condition,
			status: F.status,
			steamKgH: F.steamLoss,
			heatKw: F.heatLoss,
			fuelGjYear: F.fuelEnergy,
			costMinor: F.cost,
			co2KgYear: F.co2,
			waterM3Year: F.water,
			repairCostMinor: F.repairCost,
			paybackYears: F.paybackYears,
			measureId: F.measureId,
			...ranking(F, rank)
		})
		.from(F)
		.where(savingFindingSql(survey.id, survey.basisId))
		.orderBy(...rankOrder(F, rank))
		.limit(limit)
		.as('ranked');
	const rows = await db
		.select({
			id: ranked.id,
			kind: ranked.kind,
			tag: assets.tag,
			location: ranked.location,
			area: areas.name,
			header: headers.name,
			condition: ranked.condition,
			status: ranked.status,
			steamKgH: ranked.steamKgH,
			heatKw: ranked.heatKw,
			fuelGjYear: ranked.fuelGjYear,
			costMinor: ranked.costMinor,
			co2KgYear: ranked.co2KgYear,
			waterM3Year: ranked.waterM3Year,
			repairCostMinor: ranked.repairCostMinor,
			paybackYears: ranked.paybackYears,
			measureId: ranked.measureId,
			place: ranked.place,
			cumulativeSaving: ranked.cumulativeSaving,
			cumulativeRepair: ranked.cumulativeRepair
		})
		.from(ranked)
		.leftJoin(assets, eq(assets.id, ranked.assetId))
		.leftJoin(areas, eq(areas.id, ranked.areaId))
		.leftJoin(headers, eq(headers.id, ranked.headerId))
		.orderBy(asc(ranked.place));
	return rows.map((r) => placed(r, survey.currency));
}

/**
 * The same ranking over a published revision's frozen snapshot (its names are frozen in it
 * too, so one statement): what the client is shown, never the live findings.
 */
export async function rankedRevisionItems(
	db: Executor,
	revision: { id: string; currency: string },
	rank: SavingsRank,
	limit = MAX_SAVINGS_ITEMS
): Promise<SavingsItem[]> {
	const cols = { ...S, id: S.findingId };
	const rows = await db
		.select({
			...snapshotItemColumns,
			...ranking(cols, rank)
		})
		.from(S)
		.where(savingSnapshotSql(revision.id))
		.orderBy(...rankOrder(cols, rank))
		.limit(limit);
	return rows.map((r) => placed(r, revision.currency));
}

/** The stored columns of one listed finding, as a query gives them. */
export interface ItemColumns {
	id: string;
	kind: string;
	tag: string | null;
	location: string | null;
	area: string | null;
	header: string | null;
	condition: string | null;
	status: string;
	steamKgH: number | null;
	heatKw: number | null;
	fuelGjYear: number | null;
	costMinor: string | number | null;
	co2KgYear: number | null;
	waterM3Year: number | null;
	repairCostMinor: string | number | null;
	paybackYears: number | null;
	measureId?: string | null;
}

/** A listed finding with its words, its money as numbers, its place and the running sums. */
export function savingsItem(
	r: ItemColumns,
	currency: string,
	at: { rank: number; saving: number; repair: number }
): SavingsItem {
	return {
		rank: at.rank,
		id: r.id,
		kind: r.kind as FindingKind,
		kindWords: kindWords(r.kind),
		tag: r.tag,
		location: r.location ?? '',
		area: r.area,
		header: r.header,
		condition: r.condition,
		conditionWords: conditionWords(r.condition),
		status: r.status as FindingStatus,
		statusWords: statusWords(r.status),
		steamKgH: r.steamKgH,
		heatKw: r.heatKw,
		fuelGjYear: r.fuelGjYear,
		costMinor: Number(r.costMinor),
		currency,
		co2KgYear: r.co2KgYear,
		waterM3Year: r.waterM3Year,
		repairCostMinor: n(r.repairCostMinor),
		paybackYears: r.paybackYears,
		measureId: r.measureId ?? null,
		cumulativeSavingMinor: at.saving,
		cumulativeRepairCostMinor: at.repair
	};
}
