/**
 * The rows of one page of the review table: the page's findings by id with their names, figures
 * (and whether those are current), photo count and whether a conflict waits on them.
 */
import { and, eq, exists, inArray, isNull, sql } from 'drizzle-orm';
import {
	FINDING_KIND_LABELS,
	FINDING_STATUS_LABELS,
	LEAK_SIZE_CLASS_LABELS,
	TRAP_CONDITION_LABELS,
	type FindingKind,
	type FindingStatus
} from '../../schemas/finding-vocabulary';
import { areas, assets, costBases, findingConflicts, findings as F, headers } from '../db/schema';
import type { Executor } from '../db/types';
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

const conflictWaiting = (db: Executor) =>
	exists(
		db
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

function pageRowsQuery(db: Executor, ids: string[]) {
	return db
		.select({
			id: F.id,
			kind: sql`${F.kind}`,
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
			pricedCurrency: sql<
				string | null
			>`JSON_UNQUOTE(JSON_EXTRACT(${costBases.basis}, '$.currency'))`,
			co2KgYear: F.co2,
			waterM3Year: F.water,
			repairCostMinor: F.repairCost,
			paybackYears: F.paybackYears,
			physicsEngine: F.physicsEngine,
			resultsEngine: F.resultsEngine,
			pricedBasisId: F.pricedBasisId,
			pricingNote: F.pricingNote,
			photoCount: sql<number>`COALESCE(JSON_LENGTH(${F.photoIds}), 0)`,
			conflictWaiting: sql<number>`${conflictWaiting(db)}`
		})
		.from(F)
		.leftJoin(assets, eq(assets.id, F.assetId))
		.leftJoin(areas, eq(areas.id, F.areaId))
		.leftJoin(headers, eq(headers.id, F.headerId))
		.leftJoin(costBases, eq(costBases.id, F.pricedBasisId))
		.where(inArray(F.id, ids));
}

export async function pageRows(db: Executor, ids: string[], survey: SurveyPricing) {
	if (ids.length === 0) return [];
	const rows = await pageRowsQuery(db, ids);
	const byId = new Map(rows.map((r) => [r.id, r]));
	return ids.flatMap((id) => {
		const r = byId.get(id);
		return r ? [itemOf(r, survey)] : [];
	});
}

type PageRow = Awaited<ReturnType<typeof pageRowsQuery>>[number];

const conditionWords = (c: string | null) =>
	c === null
		? null
		: ((TRAP_CONDITION_LABELS as Record<string, string>)[c] ??
			(LEAK_SIZE_CLASS_LABELS as Record<string, string>)[c] ??
			c);

function itemOf(r: PageRow, survey: SurveyPricing): FindingItem {
	const { pricedCurrency, physicsEngine, resultsEngine, pricedBasisId, ...rest } = r;
	const kind = r.kind as FindingKind;
	const status = r.status as FindingStatus;
	return {
		...rest,
		kind,
		kindWords: FINDING_KIND_LABELS[kind] ?? r.kind,
		location: r.location ?? '',
		conditionWords: conditionWords(r.condition),
		status,
		statusWords: FINDING_STATUS_LABELS[status] ?? r.status,
		reviewed: r.reviewedAt !== null,
		recordedAt: r.recordedAt?.toISOString() ?? null,
		currency: pricedCurrency ?? survey.currency,
		figureState: figureState({ physicsEngine, resultsEngine, pricedBasisId }, survey.basisId),
		photoCount: Number(r.photoCount),
		conflictWaiting: Number(r.conflictWaiting) === 1
	};
}
