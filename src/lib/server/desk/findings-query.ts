/**
 * The Desk's review table: one survey's findings sorted, filtered, searched and paged in SQL
 * over the typed figure columns, with the filtered set's totals. Two steps, as the sync feed
 * does: the view's ids in order first (only the joins the sort or search needs), then the page's
 * rows, so a survey of 10,000 findings never reads its JSON columns to sort them. The ordered
 * ids and the totals of a view are kept between requests (findings-cache), keyed on the firm's
 * change counter: a page of a view already seen costs one query for its rows.
 */
import { and, asc, desc, eq, inArray, isNotNull, isNull, like, or, sql } from 'drizzle-orm';
import type { SQL } from 'drizzle-orm';
import type { FindingsQuery, FindingSortKey } from '../../schemas/desk-findings';
import { FINDING_CONDITIONS, NO_PLACE } from '../../schemas/desk-findings';
import { FINDING_STATUSES } from '../../schemas/finding-vocabulary';
import { areas, assets, changeCounters, costBases, findings as F } from '../db/schema';
import { headers, sites, surveys } from '../db/schema';
import type { Executor, PooledDb } from '../db/types';
import { figuresCurrentSql, figuresOutOfDateSql, surveyBasisSql } from '../pricing/state';
import {
	VIEW_CACHE_IDS,
	VIEW_CACHE_PAGE_ITEMS,
	VIEW_CACHE_TOTALS,
	viewCache
} from './findings-cache';
import { pageRows, type FindingItem } from './findings-rows';

export type { FindingItem };

export interface SurveyPricing {
	id: string;
	name: string;
	siteId: string;
	/** The basis the survey is priced on now (frozen, else the site's); null: none yet. */
	basisId: string | null;
	/** Its currency (the site's when there is no basis). */
	currency: string;
	/** The firm's change counter as it stood when read (0 before the firm's first change). */
	revision: number;
}

const pricingQuery = (db: Executor) =>
	db
		.select({
			id: surveys.id,
			name: surveys.name,
			siteId: surveys.siteId,
			basisId: surveyBasisSql,
			basisCurrency: sql<
				string | null
			>`(SELECT JSON_UNQUOTE(JSON_EXTRACT(${costBases.basis}, '$.currency')) FROM ${costBases} WHERE ${costBases.id} = ${surveyBasisSql})`,
			siteCurrency: sites.currency,
			revision: sql<
				string | number | null
			>`(SELECT ${changeCounters.value} FROM ${changeCounters} WHERE ${changeCounters.firmId} = ${surveys.firmId})`
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(eq(surveys.id, sql.placeholder('surveyId')))
		.limit(1)
		.prepare();

/** The statement prepared once per database handle (the app's lives as long as the app). */
const prepared = new WeakMap<Executor, ReturnType<typeof pricingQuery>>();

/** The survey's name and the basis its figures count as current on. */
export async function surveyPricing(db: Executor, surveyId: string): Promise<SurveyPricing | null> {
	let query = prepared.get(db);
	if (!query) prepared.set(db, (query = pricingQuery(db)));
	const [row] = await query.execute({ surveyId });
	if (!row) return null;
	const { basisCurrency, siteCurrency, revision, ...rest } = row;
	return { ...rest, currency: basisCurrency ?? siteCurrency, revision: Number(revision ?? 0) };
}

export interface FindingTotals {
	/** Sums over the filtered findings whose figures are current (out-of-date ones are left out). */
	steamKgH: number;
	heatKw: number;
	fuelGjYear: number;
	costMinor: number;
	co2KgYear: number;
	waterM3Year: number;
	/** Repair costs are typed at the Desk, not priced: every filtered finding's. */
	repairCostMinor: number;
	currency: string;
	/** Filtered findings whose figures are out of date (made by another engine or basis). */
	outOfDate: number;
}

export interface FindingsPage {
	items: FindingItem[];
	total: number;
	page: number;
	size: number;
	totals: FindingTotals;
}

const placeFilter = (column: typeof F.areaId | typeof F.headerId, values: string[]) => {
	if (values.length === 0) return undefined;
	const ids = values.filter((v) => v !== NO_PLACE);
	return or(
		ids.length > 0 ? inArray(column, ids) : undefined,
		values.includes(NO_PLACE) ? isNull(column) : undefined
	);
};

const stageFilter = (stages: string[]) => {
	if (stages.length === 0) return undefined;
	const statuses = stages.filter((s) => (FINDING_STATUSES as readonly string[]).includes(s));
	return or(
		statuses.length > 0 ? inArray(F.status, statuses) : undefined,
		stages.includes('unreviewed') ? isNull(F.reviewedAt) : undefined,
		stages.includes('desk-checked') ? isNotNull(F.reviewedAt) : undefined
	);
};

/** LIKE's wildcards taken literally (MariaDB escapes with a backslash). */
const contains = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

function filterOf(surveyId: string, q: FindingsQuery): SQL {
	const pattern = contains(q.q);
	return and(
		eq(F.surveyId, surveyId),
		isNull(F.deletedAt),
		q.kind.length > 0 ? inArray(F.kind, q.kind) : undefined,
		placeFilter(F.areaId, q.area),
		placeFilter(F.headerId, q.header),
		q.condition.length > 0 ? inArray(F.condition, q.condition) : undefined,
		stageFilter(q.stage),
		q.q
			? or(like(F.location, pattern), like(F.notes, pattern), like(assets.tag, pattern))
			: undefined
	)!;
}

/** Lifecycle and severity orders rather than alphabetical ids. */
const listOrder = (column: typeof F.status | typeof F.condition, values: readonly string[]) =>
	sql`FIELD(${column}, ${sql.join(
		values.map((v) => sql`${v}`),
		sql`, `
	)})`;

const SORT: Record<FindingSortKey, SQL> = {
	recorded: sql`${F.recordedAt}`,
	kind: sql`${F.kind}`,
	area: sql`${areas.name}`,
	header: sql`${headers.name}`,
	location: sql`${F.location}`,
	tag: sql`${assets.tag}`,
	condition: sql`NULLIF(${listOrder(F.condition, FINDING_CONDITIONS)}, 0)`,
	steam: sql`${F.steamLoss}`,
	heat: sql`${F.heatLoss}`,
	energy: sql`${F.fuelEnergy}`,
	cost: sql`${F.cost}`,
	co2: sql`${F.co2}`,
	water: sql`${F.water}`,
	repair: sql`${F.repairCost}`,
	payback: sql`${F.paybackYears}`,
	status: listOrder(F.status, FINDING_STATUSES)
};

/** Missing values last in both directions; ties by id, so paging never repeats or skips a row. */
function orderOf(q: FindingsQuery): SQL[] {
	const key = SORT[q.sort];
	return [sql`${key} IS NULL`, q.dir === 'asc' ? asc(key) : desc(key), asc(F.id)];
}

/** Every id of the view, in its order (a page is a slice of it). */
async function viewIds(db: Executor, surveyId: string, q: FindingsQuery): Promise<string[]> {
	let query = db.select({ id: F.id }).from(F).$dynamic();
	if (q.q || q.sort === 'tag') query = query.leftJoin(assets, eq(assets.id, F.assetId));
	if (q.sort === 'area') query = query.leftJoin(areas, eq(areas.id, F.areaId));
	if (q.sort === 'header') query = query.leftJoin(headers, eq(headers.id, F.headerId));
	const rows = await query.where(filterOf(surveyId, q)).orderBy(...orderOf(q));
	return rows.map((r) => r.id);
}

const sumIf = (ok: SQL, column: SQL | typeof F.steamLoss) =>
	sql<string | null>`SUM(CASE WHEN ${ok} THEN ${column} END)`;

/** Sums from findings_desk_idx alone (the basis in force is the survey's, passed as a value). */
async function totalsOf(db: Executor, survey: SurveyPricing, q: FindingsQuery): Promise<Counted> {
	const current = figuresCurrentSql(survey.basisId);
	let query = db
		.select({
			total: sql<number>`COUNT(*)`,
			steam: sumIf(current, sql`${F.steamLoss}`),
			heat: sumIf(current, sql`${F.heatLoss}`),
			fuel: sumIf(current, sql`${F.fuelEnergy}`),
			cost: sumIf(current, sql`${F.cost}`),
			co2: sumIf(current, sql`${F.co2}`),
			water: sumIf(current, sql`${F.water}`),
			repair: sql<string | null>`SUM(${F.repairCost})`,
			outOfDate: sql<
				string | null
			>`SUM(CASE WHEN ${figuresOutOfDateSql(survey.basisId)} THEN 1 ELSE 0 END)`
		})
		.from(F)
		.$dynamic();
	if (q.q) query = query.leftJoin(assets, eq(assets.id, F.assetId));
	const [row] = await query.where(filterOf(survey.id, q));
	const currency = survey.currency;
	const n = (v: string | number | null | undefined) => Number(v ?? 0);
	return {
		total: n(row?.total),
		totals: {
			steamKgH: n(row?.steam),
			heatKw: n(row?.heat),
			fuelGjYear: n(row?.fuel),
			costMinor: n(row?.cost),
			co2KgYear: n(row?.co2),
			waterM3Year: n(row?.water),
			repairCostMinor: n(row?.repair),
			currency,
			outOfDate: n(row?.outOfDate)
		}
	};
}

interface Counted {
	total: number;
	totals: FindingTotals;
}

const idViews = viewCache<string[]>({ maxSize: VIEW_CACHE_IDS, size: (ids) => ids.length + 1 });
const totalViews = viewCache<Counted>({ max: VIEW_CACHE_TOTALS });
const pageViews = viewCache<FindingItem[]>({
	maxSize: VIEW_CACHE_PAGE_ITEMS,
	size: (items) => items.length + 1
});

/** What a filter's answer depends on: the survey, its basis, the counter, the filter itself. */
function filterKey(survey: SurveyPricing, q: FindingsQuery): string {
	const set = (values: string[]) => [...new Set(values)].sort();
	return JSON.stringify([
		survey.id,
		survey.basisId,
		survey.currency,
		survey.revision,
		set(q.kind),
		set(q.area),
		set(q.header),
		set(q.condition),
		set(q.stage),
		q.q
	]);
}

/** One page of a survey's findings, as `GET /api/surveys/[id]/findings` answers it. */
export async function findingsPage(
	db: PooledDb,
	survey: SurveyPricing,
	q: FindingsQuery
): Promise<FindingsPage> {
	const filter = filterKey(survey, q);
	const [ids, counted] = await Promise.all([
		idViews(`${filter}|${q.sort}|${q.dir}`, () => viewIds(db, survey.id, q)),
		totalViews(filter, () => totalsOf(db, survey, q))
	]);
	const start = (q.page - 1) * q.size;
	// The page's rows hang on the same counter as its ids (every write they show moves it).
	const items = await pageViews(`${filter}|${q.sort}|${q.dir}|${q.page}|${q.size}`, () =>
		pageRows(db, ids.slice(start, start + q.size), survey)
	);
	return { items, total: counted.total, page: q.page, size: q.size, totals: counted.totals };
}
