/**
 * The frozen figures of a revision: every live finding of the survey with its names, typed
 * figure columns, repair cost, payback and measure, copied in one INSERT … SELECT (no row passes
 * through Node, so 100,000 findings cost one statement), inside the publishing transaction.
 */
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import {
	areas,
	assets,
	findings as F,
	headers,
	measures as M,
	surveyRevisionFindings,
	surveyRevisionMeasures
} from '../db/schema';
import type { Tx } from '../db/types';
import { figuresCurrentSql } from '../pricing/state';

/** Copies the survey's live findings into the revision's snapshot; returns how many. */
export async function writeSnapshot(
	tx: Tx,
	revisionId: string,
	surveyId: string,
	basisId: string
): Promise<number> {
	const [result] = await tx.insert(surveyRevisionFindings).select(
		tx
			.select({
				revisionId: sql<string>`${revisionId}`.as('revision_id'),
				findingId: F.id,
				kind: F.kind,
				status: F.status,
				condition: F.condition,
				tag: sql<string | null>`${assets.tag}`.as('tag'),
				location: F.location,
				areaId: F.areaId,
				areaName: sql<string | null>`${areas.name}`.as('area_name'),
				headerId: F.headerId,
				headerName: sql<string | null>`${headers.name}`.as('header_name'),
				measureId: F.measureId,
				figuresCurrent: sql<number>`${figuresCurrentSql(basisId)}`.as('figures_current'),
				steamLoss: F.steamLoss,
				heatLoss: F.heatLoss,
				fuelEnergy: F.fuelEnergy,
				cost: F.cost,
				co2: F.co2,
				water: F.water,
				repairCost: F.repairCost,
				paybackYears: F.paybackYears,
				pricedBasisId: F.pricedBasisId,
				findingVersion: F.version
			})
			.from(F)
			.leftJoin(assets, eq(assets.id, F.assetId))
			.leftJoin(areas, eq(areas.id, F.areaId))
			.leftJoin(headers, eq(headers.id, F.headerId))
			.where(and(eq(F.surveyId, surveyId), isNull(F.deletedAt)))
	);
	return Number((result as { affectedRows?: number }).affectedRows ?? 0);
}

/**
 * Copies the survey's live measures (names, descriptions, their own costs) into the revision,
 * beside its findings' snapshot; returns how many.
 */
export async function writeMeasuresSnapshot(
	tx: Tx,
	revisionId: string,
	surveyId: string
): Promise<number> {
	const [result] = await tx.insert(surveyRevisionMeasures).select(
		tx
			.select({
				revisionId: sql<string>`${revisionId}`.as('revision_id'),
				measureId: M.id,
				name: M.name,
				description: M.description,
				accessCost: M.accessCost,
				scaffoldCost: M.scaffoldCost,
				shutdownCost: M.shutdownCost,
				otherCost: M.otherCost,
				otherCostLabel: M.otherCostLabel,
				sortOrder: M.sortOrder,
				createdAt: M.createdAt
			})
			.from(M)
			.where(and(eq(M.surveyId, surveyId), isNull(M.deletedAt)))
	);
	return Number((result as { affectedRows?: number }).affectedRows ?? 0);
}

/** A revision's rows the savings list would have listed: current on its basis, saving. */
export const savingSnapshotSql = (revisionId: string) =>
	and(
		eq(surveyRevisionFindings.revisionId, revisionId),
		eq(surveyRevisionFindings.figuresCurrent, 1),
		gt(surveyRevisionFindings.cost, 0)
	)!;
