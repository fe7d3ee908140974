/**
 * The rows of one page of the review table: the page's findings by id with their names, figures
 * (and whether those are current), photo count and whether a conflict waits on them.
 */
import { and, eq, exists, inArray, isNull, sql } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/mysql2';
import type { FindingKind, FindingStatus } from '../../schemas/finding-vocabulary';
import { areas, assets, costBases, findingConflicts, findings as F, headers } from '../db/schema';
import type { RowDataPacket } from 'mysql2';
import type { Executor, PooledDb } from '../db/types';
import { conditionWords, kindWords, statusWords } from '../finding-words';
import { figureState, type FigureState } from '../pricing/state';
import type { SurveyPricing } from './findings-query';

export interface FindingItem {
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
	reviewed: boolean;
	recordedAt: string | null;
	/** Figures as stored: per year at the site's hours; money in minor units of `currency`. */
	steamKgH: number | null;
	heatKw: number | null;
	fuelGjYear: number | null;
	costMinor: number | null;
	currency: string;
	co2KgYear: number | null;
	waterM3Year: number | null;
	repairCostMinor: number | null;
	paybackYears: number | null;
	/** current | engine | basis | none: anything but current is shown as out of date. */
	figureState: FigureState;
	pricingNote: string | null;
	photoCount: number;
	conflictWaiting: boolean;
}

/** The page's ids as one JSON array (JSON_TABLE), in the database's collation (scripts/db.sh). */
const pageIdList = sql`(SELECT page.id FROM JSON_TABLE(${sql.placeholder('ids')}, '$[*]' COLUMNS (id VARCHAR(36) COLLATE utf8mb4_unicode_ci PATH '$')) AS page)`;

/** A Drizzle handle with no connection, only to write the statement (never run through it). */
const statements = drizzle.mock({ mode: 'default' });

const conflictWaiting = exists(
	statements
		.select({ one: sql`1` })
		.from(findingConflicts)
		.where(
			and(
				eq(findingConflicts.surveyId, F.surveyId),
				eq(findingConflicts.findingId, F.id),
				isNull(findingConflicts.resolvedAt)
			)
		)
);

/** What a row of the page holds, in select order (the statement answers arrays). */
const FIELDS = {
	id: F.id,
	kind: sql<string>`${F.kind}`,
	tag: assets.tag,
	location: F.location,
	area: areas.name,
	header: headers.name,
	condition: F.condition,
	status: F.status,
	reviewedAt: F.reviewedAt,
	recordedAt: F.recordedAt,
	steamKgH: F.steamLoss,
	heatKw: F.heatLoss,
	fuelGjYear: F.fuelEnergy,
	costMinor: F.cost,
	co2KgYear: F.co2,
	waterM3Year: F.water,
	repairCostMinor: F.repairCost,
	paybackYears: F.paybackYears,
	physicsEngine: F.physicsEngine,
	resultsEngine: F.resultsEngine,
	pricedBasisId: F.pricedBasisId,
	pricingNote: F.pricingNote,
	photoCount: sql<number>`COALESCE(JSON_LENGTH(${F.photoIds}), 0)`,
	conflictWaiting: sql<number>`${conflictWaiting}`
};
const KEYS = Object.keys(FIELDS) as (keyof typeof FIELDS)[];

const pageRowsQuery = () =>
	statements
		.select(FIELDS)
		.from(F)
		.leftJoin(assets, eq(assets.id, F.assetId))
		.leftJoin(areas, eq(areas.id, F.areaId))
		.leftJoin(headers, eq(headers.id, F.headerId))
		.where(sql`${F.id} IN ${pageIdList}`);

type PageRow = Awaited<ReturnType<typeof pageRowsQuery>>[number];

/**
 * The statement is written once, in Drizzle, and run on the pool's own driver: the page is the
 * hottest query of the Desk, and building and mapping it through the query builder on every
 * request cost about three times the database's own work (measured, docs/desk.md). The driver
 * answers DATETIME as Date (the pool's `timezone: 'Z'`), BIGINT money and doubles as numbers —
 * what Drizzle's columns map them to.
 */
const PAGE_ROWS_SQL = pageRowsQuery().toSQL().sql;

/** Each field's place in the statement's answer. */
const AT = Object.fromEntries(KEYS.map((k, i) => [k, i])) as Record<keyof PageRow, number>;

async function readPageRows(db: PooledDb, ids: string[]): Promise<PageRow[]> {
	const [arrays] = await db.$client.query<RowDataPacket[]>(
		{ sql: PAGE_ROWS_SQL, rowsAsArray: true },
		[JSON.stringify(ids)]
	);
	return (arrays as unknown as unknown[][]).map(rowOf);
}

/** A row as an object of one fixed shape, field by field (a page maps 50 of them per request). */
function rowOf(v: unknown[]): PageRow {
	const f = <K extends keyof PageRow>(k: K) => v[AT[k]] as PageRow[K];
	return {
		id: f('id'),
		kind: f('kind'),
		tag: f('tag'),
		location: f('location'),
		area: f('area'),
		header: f('header'),
		condition: f('condition'),
		status: f('status'),
		reviewedAt: f('reviewedAt'),
		recordedAt: f('recordedAt'),
		steamKgH: f('steamKgH'),
		heatKw: f('heatKw'),
		fuelGjYear: f('fuelGjYear'),
		costMinor: f('costMinor'),
		co2KgYear: f('co2KgYear'),
		waterM3Year: f('waterM3Year'),
		repairCostMinor: f('repairCostMinor'),
		paybackYears: f('paybackYears'),
		physicsEngine: f('physicsEngine'),
		resultsEngine: f('resultsEngine'),
		pricedBasisId: f('pricedBasisId'),
		pricingNote: f('pricingNote'),
		photoCount: f('photoCount'),
		conflictWaiting: f('conflictWaiting')
	};
}

/**
 * The currency each row's money is in: the survey's for rows priced on its basis (nearly all),
 * else that basis's own, read once per page for the few out-of-date ones.
 */
async function currencies(db: Executor, rows: PageRow[], survey: SurveyPricing) {
	const others = [
		...new Set(
			rows.flatMap((r) =>
				r.pricedBasisId && r.pricedBasisId !== survey.basisId ? [r.pricedBasisId] : []
			)
		)
	];
	const found = others.length
		? await db
				.select({
					id: costBases.id,
					currency: sql<string | null>`JSON_UNQUOTE(JSON_EXTRACT(${costBases.basis}, '$.currency'))`
				})
				.from(costBases)
				.where(inArray(costBases.id, others))
		: [];
	const byBasis = new Map(found.map((b) => [b.id, b.currency ?? survey.currency]));
	return (r: PageRow) => (r.pricedBasisId && byBasis.get(r.pricedBasisId)) || survey.currency;
}

export async function pageRows(db: PooledDb, ids: string[], survey: SurveyPricing) {
	if (ids.length === 0) return [];
	const rows = await readPageRows(db, ids);
	const currencyOf = await currencies(db, rows, survey);
	const byId = new Map(rows.map((r) => [r.id, r]));
	return ids.flatMap((id) => {
		const r = byId.get(id);
		return r ? [itemOf(r, survey, currencyOf(r))] : [];
	});
}

function itemOf(r: PageRow, survey: SurveyPricing, currency: string): FindingItem {
	return {
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
		reviewed: r.reviewedAt !== null,
		recordedAt: r.recordedAt?.toISOString() ?? null,
		steamKgH: r.steamKgH,
		heatKw: r.heatKw,
		fuelGjYear: r.fuelGjYear,
		costMinor: r.costMinor,
		currency,
		co2KgYear: r.co2KgYear,
		waterM3Year: r.waterM3Year,
		repairCostMinor: r.repairCostMinor,
		paybackYears: r.paybackYears,
		figureState: figureState(r, survey.basisId),
		pricingNote: r.pricingNote,
		photoCount: Number(r.photoCount),
		conflictWaiting: Number(r.conflictWaiting) === 1
	};
}
