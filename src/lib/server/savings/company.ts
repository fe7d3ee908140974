/**
 * A client company's ranked savings across its published surveys — the Ladder's list
 * (docs/ladder.md). What is shown is each site's most recent published survey, at its last
 * published revision, read from the frozen snapshots (`survey_revision_findings`), never the live
 * findings: the same figures the company's reports and each survey's page give. Ranked, filtered
 * (site, area, kind), totalled, broken down and sampled for the Pareto chart in SQL; only one
 * page of items reaches Node. Snapshots never change, so a view is kept under the revisions it
 * reads (a new publication names another revision).
 */
import { and, asc, eq, inArray, isNotNull, sql, type SQL } from 'drizzle-orm';
import { simplePaybackYears } from '../../economics/payback';
import type { FindingKind } from '../../schemas/finding-vocabulary';
import type { SavingsRank } from '../../schemas/savings';
import {
	clientCompanies,
	sites,
	surveyRevisionFindings as S,
	surveyRevisions as R,
	surveys
} from '../db/schema';
import type { Executor } from '../db/types';
import { viewCache } from '../desk/findings-cache';
import { kindWords } from '../finding-words';
import {
	rankOrder,
	ranking,
	sampledRunningSums,
	savingsItem,
	type SavingsItem
} from './ranked-list';
import { snapshotItemColumns } from '../item-columns';
import {
	addGroup,
	into,
	type SavingsBreakdown,
	type ListSums,
	type SavingsGroup,
	type SavingsTotals
} from './totals';

/** Items on one page of the Ladder's list. */
export const LADDER_PAGE_ITEMS = 25;
/** Points of the Pareto curve at most (every k-th item on a long list, and the last). */
export const LADDER_PARETO_POINTS = 60;

/** A survey the list reads: its site's most recent publication, at its last revision. */
export interface ShownSurvey {
	surveyId: string;
	name: string;
	siteId: string;
	site: string;
	revisionId: string;
	revision: number;
	publishedAt: Date;
	currency: string;
}

export interface CompanyFilters {
	rank: SavingsRank;
	site: string | null;
	area: string | null;
	kind: FindingKind | null;
	page: number;
}

export interface LadderItem extends SavingsItem {
	surveyId: string;
	survey: string;
	site: string;
}

/** The savings list's totals, of the rows the filters keep. */
export type CompanyTotals = ListSums & Pick<SavingsTotals, 'paybackYears' | 'currency'>;

export interface CompanySavings {
	company: { id: string; name: string };
	/** Every site's most recent published survey (before any filter). */
	surveys: ShownSurvey[];
	/** The surveys the list is of (the site filter applied). */
	shown: ShownSurvey[];
	/** Two or more currencies among the shown surveys: pick a site (nothing is added up). */
	mixedCurrencies: boolean;
	filters: CompanyFilters;
	/** What the filters can be set to, from the shown surveys' snapshots. */
	choices: { sites: { id: string; name: string }[]; areas: SavingsGroup[]; kinds: FindingKind[] };
	items: LadderItem[];
	pages: number;
	totals: CompanyTotals;
	breakdown: SavingsBreakdown;
	/** Sampled points of the whole ranking, for the Pareto chart. */
	pareto: { rank: number; cumulativeSavingMinor: number; cumulativeRepairCostMinor: number }[];
}

const num = (v: unknown) => (v === null || v === undefined ? 0 : Number(v));

/** Each site's most recent published survey of the company, at its last published revision. */
export async function shownSurveys(
	db: Executor,
	firmId: string,
	companyId: string
): Promise<ShownSurvey[]> {
	const rows = await db
		.select({
			surveyId: surveys.id,
			name: surveys.name,
			siteId: sites.id,
			site: sites.name,
			firstPublished: surveys.publishedAt,
			revisionId: R.id,
			revision: R.number,
			publishedAt: R.publishedAt,
			currency: sql<string>`JSON_VALUE(${R.totals}, '$.currency')`
		})
		.from(R)
		.innerJoin(surveys, eq(surveys.id, R.surveyId))
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(
			and(
				eq(surveys.firmId, firmId),
				eq(sites.clientCompanyId, companyId),
				isNotNull(surveys.publishedAt),
				eq(
					R.number,
					sql`(SELECT MAX(r2.number) FROM survey_revisions r2 WHERE r2.survey_id = ${R.surveyId})`
				)
			)
		)
		.orderBy(asc(sites.name), asc(surveys.id));
	const bySite = new Map<string, (typeof rows)[number]>();
	for (const r of rows) {
		const kept = bySite.get(r.siteId);
		if (!kept || r.firstPublished! > kept.firstPublished!) bySite.set(r.siteId, r);
	}
	return [...bySite.values()].map(({ firstPublished: _, ...r }) => r);
}

const where = (revisionIds: string[], f: CompanyFilters): SQL =>
	and(
		inArray(S.revisionId, revisionIds),
		eq(S.figuresCurrent, 1),
		sql`${S.cost} > 0`,
		f.area === null ? undefined : eq(S.areaId, f.area),
		f.kind === null ? undefined : eq(S.kind, f.kind)
	)!;

const cols = { ...S, id: S.findingId };

async function page(db: Executor, revisionIds: string[], f: CompanyFilters) {
	return db
		.select({
			revisionId: S.revisionId,
			...snapshotItemColumns,
			...ranking(cols, f.rank)
		})
		.from(S)
		.where(where(revisionIds, f))
		.orderBy(...rankOrder(cols, f.rank))
		.limit(LADDER_PAGE_ITEMS)
		.offset((f.page - 1) * LADDER_PAGE_ITEMS);
}

const noTotals = (currency: string): CompanyTotals => ({
	count: 0,
	steamKgH: 0,
	heatKw: 0,
	fuelGjYear: 0,
	costMinor: 0,
	co2KgYear: 0,
	waterM3Year: 0,
	repairCostMinor: 0,
	withoutRepairCost: 0,
	paybackYears: null,
	currency
});

/** Totals and the breakdown by kind and area of the filtered snapshot rows (one aggregate). */
async function aggregate(db: Executor, revisionIds: string[], f: CompanyFilters, currency: string) {
	const groups = await db
		.select({
			kind: S.kind,
			areaId: S.areaId,
			area: S.areaName,
			count: sql<number>`COUNT(*)`,
			steam: sql<number>`SUM(${S.steamLoss})`,
			heat: sql<number>`SUM(${S.heatLoss})`,
			fuel: sql<number>`SUM(${S.fuelEnergy})`,
			cost: sql<number>`SUM(${S.cost})`,
			co2: sql<number>`SUM(${S.co2})`,
			water: sql<number>`SUM(${S.water})`,
			repair: sql<number>`SUM(${S.repairCost})`,
			withoutRepair: sql<number>`SUM(${S.repairCost} IS NULL)`
		})
		.from(S)
		.where(where(revisionIds, f))
		.groupBy(S.kind, S.areaId, S.areaName);
	const totals = noTotals(currency);
	const byKind = new Map<string | null, SavingsGroup>();
	const byArea = new Map<string | null, SavingsGroup>();
	for (const g of groups) {
		addGroup(totals, g);
		into(byKind, g.kind, kindWords(g.kind), g);
		into(byArea, g.areaId, g.area ?? 'No area', g);
	}
	const priced = totals.withoutRepairCost < totals.count;
	totals.paybackYears = simplePaybackYears(
		priced ? totals.repairCostMinor : null,
		totals.costMinor
	);
	const bySaving = (a: SavingsGroup, b: SavingsGroup) =>
		b.costMinor - a.costMinor || a.label.localeCompare(b.label);
	return {
		totals,
		breakdown: {
			kind: [...byKind.values()].sort(bySaving),
			area: [...byArea.values()].sort(bySaving)
		}
	};
}

/** The areas and kinds the shown surveys' saving rows have (for the filters' choices). */
async function choicesOf(db: Executor, revisionIds: string[], currency: string) {
	const unfiltered: CompanyFilters = {
		rank: 'savings',
		site: null,
		area: null,
		kind: null,
		page: 1
	};
	const { breakdown } = await aggregate(db, revisionIds, unfiltered, currency);
	return {
		areas: breakdown.area
			.filter((a) => a.key !== null)
			.sort((a, b) => a.label.localeCompare(b.label)),
		kinds: breakdown.kind.map((k) => k.key as FindingKind)
	};
}

type Kept = Omit<CompanySavings, 'company' | 'surveys' | 'filters'> & { applied: CompanyFilters };
const kept = viewCache<Kept>({
	maxSize: 20_000,
	size: (k) => k.items.length + k.pareto.length + 1
});

/**
 * The list for a company and filters (the caller decided the person may see this company's
 * published surveys). A filter naming a site or area the company's shown surveys do not have
 * is no filter the list can apply: it answers as if that filter were not set, and says so
 * through `filters` (the page shows what was applied).
 */
export async function companySavings(
	db: Executor,
	firmId: string,
	company: { id: string; name: string },
	asked: CompanyFilters
): Promise<CompanySavings> {
	const all = await shownSurveys(db, firmId, company.id);
	const site = asked.site !== null && all.some((s) => s.siteId === asked.site) ? asked.site : null;
	const shown = site === null ? all : all.filter((s) => s.siteId === site);
	const currencies = new Set(shown.map((s) => s.currency));
	const mixedCurrencies = currencies.size > 1;
	const currency = shown[0]?.currency ?? 'EUR';
	const revisionIds = mixedCurrencies ? [] : shown.map((s) => s.revisionId);
	const key = JSON.stringify([revisionIds, asked.rank, asked.area, asked.kind, asked.page]);
	const view = await kept(key, async () => {
		const empty = revisionIds.length === 0;
		const choices = empty ? { areas: [], kinds: [] } : await choicesOf(db, revisionIds, currency);
		const area =
			asked.area !== null && choices.areas.some((a) => a.key === asked.area) ? asked.area : null;
		const kind = asked.kind !== null && choices.kinds.includes(asked.kind) ? asked.kind : null;
		const f: CompanyFilters = { ...asked, site, area, kind };
		const [rows, { totals, breakdown }] = empty
			? [[], { totals: noTotals(currency), breakdown: { kind: [], area: [] } }]
			: await Promise.all([page(db, revisionIds, f), aggregate(db, revisionIds, f, currency)]);
		const pareto = empty
			? []
			: await sampledRunningSums(
					db,
					{ table: S, cols, where: where(revisionIds, f) },
					f.rank,
					totals.count,
					LADDER_PARETO_POINTS
				);
		const bySurvey = new Map(shown.map((s) => [s.revisionId, s]));
		return {
			shown,
			mixedCurrencies,
			choices: { sites: all.map((s) => ({ id: s.siteId, name: s.site })), ...choices },
			items: rows.map((r) => {
				const s = bySurvey.get(r.revisionId)!;
				return {
					...savingsItem(r, s.currency, {
						rank: num(r.place),
						saving: num(r.cumulativeSaving),
						repair: num(r.cumulativeRepair)
					}),
					surveyId: s.surveyId,
					survey: s.name,
					site: s.site
				};
			}),
			pages: Math.max(1, Math.ceil(totals.count / LADDER_PAGE_ITEMS)),
			totals,
			breakdown,
			pareto,
			applied: f
		};
	});
	const { applied, ...rest } = view;
	return { company, surveys: all, filters: applied, ...rest };
}

/** The client companies of the firm with a published survey (staff pick one on the Ladder). */
export async function companiesWithPublications(db: Executor, firmId: string) {
	return db
		.selectDistinct({ id: clientCompanies.id, name: clientCompanies.name })
		.from(clientCompanies)
		.innerJoin(sites, eq(sites.clientCompanyId, clientCompanies.id))
		.innerJoin(surveys, eq(surveys.siteId, sites.id))
		.where(and(eq(clientCompanies.firmId, firmId), isNotNull(surveys.publishedAt)))
		.orderBy(asc(clientCompanies.name));
}
