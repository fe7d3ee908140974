/**
 * One finding at the Desk: its capture, photos (uploaded or still on the device), the stored
 * figures and whether they are current, and the calculation computed live by the engine on
 * the survey's pricing context, step by step with every assumption and its source. Every read
 * names the firm, so another firm's ids find nothing (the route answers 404).
 */
import { and, asc, eq, inArray, isNull, or, sql, type AnyColumn } from 'drizzle-orm';
import type { FindingCapture } from '../../schemas/capture';
import type { CostBasis } from '../../schemas/site';
import type { SiteHeader } from '../../schemas/snapshot';
import {
	findingPhysics,
	priceFinding,
	siteAtmosphere,
	type Caution,
	type FindingEvaluation,
	type FindingPhysics
} from '../../steam/index';
import {
	areas,
	assets,
	costBases,
	findings,
	headers,
	photos,
	sites,
	surveys,
	users
} from '../db/schema';
import type { Db, Executor } from '../db/types';
import { pricingContext, type PricingContext } from '../pricing/context';
import { figureState, type FigureState } from '../pricing/state';
import { captureFromRow } from '../walk/capture-row';
import { calculation, type Calculation } from './finding-steps';
import type { EditSite } from './finding-form';
import { unitSystemOf } from '../walk/person';

export interface DeskSurvey {
	id: string;
	name: string;
	status: string;
	siteId: string;
	siteName: string;
	currency: string;
	/** The basis the survey is priced on now (frozen when published, else the site's). */
	basisId: string | null;
	elevation: number | null;
	atmosphericPressure: number | null;
}

/** A survey of the firm, or null (another firm's, or none). */
export async function deskSurvey(db: Executor, firmId: string, surveyId: string) {
	const [row] = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			status: surveys.status,
			siteId: sites.id,
			siteName: sites.name,
			currency: sites.currency,
			basisId: sql<string | null>`COALESCE(${surveys.costBasisId}, ${sites.costBasisId})`,
			elevation: sites.elevation,
			atmosphericPressure: sites.atmosphericPressure
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(and(eq(surveys.id, surveyId), eq(surveys.firmId, firmId)))
		.limit(1);
	return (row as DeskSurvey | undefined) ?? null;
}

/** MPa absolute: measured, else from elevation, else standard. */
export function atmosphereOf(s: Pick<DeskSurvey, 'elevation' | 'atmosphericPressure'>): number {
	return siteAtmosphere({
		...(s.elevation === null ? {} : { elevation: s.elevation }),
		...(s.atmosphericPressure === null ? {} : { atmosphericPressure: s.atmosphericPressure })
	}).value;
}

/** What the edit form converts against: units, atmosphere, the site's headers and areas. */
export async function editSite(
	db: Executor,
	userId: string,
	survey: DeskSurvey,
	keep: { headerId?: string; areaId?: string } = {}
): Promise<EditSite> {
	const liveOr = (retired: AnyColumn, id: AnyColumn, own?: string) =>
		own ? or(isNull(retired), eq(id, own)) : isNull(retired);
	const siteHeaders = await db
		.select({
			id: headers.id,
			name: headers.name,
			pressure: headers.pressure,
			designTemperature: headers.designTemperature,
			operatingHours: headers.operatingHours,
			sortOrder: headers.sortOrder
		})
		.from(headers)
		.where(
			and(eq(headers.siteId, survey.siteId), liveOr(headers.retiredAt, headers.id, keep.headerId))
		)
		.orderBy(asc(headers.sortOrder), asc(headers.name));
	const siteAreas = await db
		.select({ id: areas.id, name: areas.name })
		.from(areas)
		.where(and(eq(areas.siteId, survey.siteId), liveOr(areas.retiredAt, areas.id, keep.areaId)))
		.orderBy(asc(areas.sortOrder), asc(areas.name));
	return {
		system: await unitSystemOf(db, userId),
		atmosphericPressure: atmosphereOf(survey),
		headers: siteHeaders.map((h): SiteHeader => ({
			id: h.id,
			name: h.name,
			pressure: h.pressure,
			sortOrder: h.sortOrder,
			...(h.designTemperature === null ? {} : { designTemperature: h.designTemperature }),
			...(h.operatingHours === null ? {} : { operatingHours: h.operatingHours })
		})),
		areas: siteAreas,
		currency: survey.currency
	};
}

export interface LiveFigures {
	physics: FindingPhysics | null;
	evaluation: FindingEvaluation | null;
	/** Why the engine gave nothing (an input out of range, a missing header or basis). */
	problem: string | null;
	cautions: Caution[];
	calculation: Calculation | null;
}

/** The engine on the capture now, on the survey's context. */
export function liveFigures(
	ctx: PricingContext,
	capture: FindingCapture,
	repairCost: number | null,
	units: { system: EditSite['system']; atmosphere: number; currency: string }
): LiveFigures {
	const input = repairCost === null ? capture : { ...capture, repairCost };
	let physics: FindingPhysics;
	try {
		physics = findingPhysics(input, { costBasis: ctx.physicsBasis, headers: ctx.headers });
	} catch (e) {
		const problem = e instanceof Error ? e.message : String(e);
		return { physics: null, evaluation: null, problem, cautions: [], calculation: null };
	}
	let evaluation: FindingEvaluation | null = null;
	let problem: string | null = null;
	const basis: CostBasis | null = ctx.costBasis;
	try {
		if (basis) evaluation = priceFinding(physics, basis, repairCost ?? undefined);
	} catch (e) {
		problem = e instanceof Error ? e.message : String(e);
	}
	const calc = calculation(
		capture,
		physics,
		evaluation,
		evaluation ? basis : null,
		ctx.headers,
		repairCost,
		units
	);
	return { physics, evaluation, problem, cautions: physics.cautions, calculation: calc };
}

/** Basis numbers by id ("version 3"), for saying which basis figures were priced on. */
async function basisNumbers(db: Executor, ids: (string | null)[]) {
	const wanted = ids.filter((id): id is string => id !== null);
	if (wanted.length === 0) return new Map<string, number>();
	const rows = await db
		.select({ id: costBases.id, number: costBases.number })
		.from(costBases)
		.where(inArray(costBases.id, wanted));
	return new Map(rows.map((r) => [r.id, r.number]));
}

/** The stored figures' state in words (never shown as current when they are not). */
export function figureWords(state: FigureState, priced: number | null, now: number | null) {
	switch (state) {
		case 'current':
			return null;
		case 'basis':
			return priced === null
				? `These figures are not priced on the site’s cost basis${now === null ? '' : ` (version ${now})`} yet; the calculation below is.`
				: `These figures were priced on cost basis version ${priced}; the site is now on version ${now ?? '—'}. The calculation below is on version ${now ?? '—'}.`;
		case 'engine':
			return 'These figures were made by an earlier version of the engine; the calculation below is this version’s.';
		case 'none':
			return 'No stored figures for this finding yet.';
	}
}

export async function photosOf(db: Executor, firmId: string, findingId: string, ids: string[]) {
	const stored = await db
		.select({
			id: photos.id,
			caption: photos.caption,
			takenAt: photos.takenAt,
			createdAt: photos.createdAt,
			width: photos.width,
			height: photos.height
		})
		.from(photos)
		.where(
			and(eq(photos.findingId, findingId), eq(photos.firmId, firmId), isNull(photos.deletedAt))
		);
	const byId = new Map(stored.map((p) => [p.id, p]));
	const order = [...ids, ...stored.map((p) => p.id).filter((id) => !ids.includes(id))];
	return order.map((id, i) => {
		const p = byId.get(id);
		return {
			id,
			number: i + 1,
			uploaded: p !== undefined,
			caption: p?.caption ?? null,
			takenAt: p?.takenAt?.toISOString() ?? null,
			uploadedAt: p?.createdAt.toISOString() ?? null,
			width: p?.width ?? null,
			height: p?.height ?? null
		};
	});
}

/** Everything the finding page shows, or null (another firm's, deleted, or not on the survey). */
export async function findingDetail(
	db: Db,
	user: SessionUser,
	surveyId: string,
	findingId: string
) {
	const survey = await deskSurvey(db, user.firmId, surveyId);
	if (!survey) return null;
	const found = await findingOfSurvey(db, surveyId, findingId);
	if (!found || found.row.deletedAt) return null;
	const { row, capture } = found;
	const site = await editSite(db, user.id, survey, {
		headerId: capture.headerId,
		areaId: capture.areaId
	});
	const ctx = await pricingContext(db, survey.siteId, survey.basisId);
	const atmosphere = site.atmosphericPressure;
	const live = liveFigures(ctx, capture, row.repairCost, {
		system: site.system,
		atmosphere,
		currency: survey.currency
	});
	const state = figureState(row, survey.basisId);
	const numbers = await basisNumbers(db, [row.pricedBasisId, survey.basisId]);
	const names = await db
		.select({ id: users.id, name: users.name })
		.from(users)
		.where(
			inArray(
				users.id,
				[row.recordedBy, row.reviewedBy].filter((v): v is string => !!v).concat(['-'])
			)
		);
	const nameOf = (id: string | null) => names.find((n) => n.id === id)?.name ?? null;
	return {
		survey,
		site,
		finding: {
			id: row.id,
			kind: row.kind,
			version: row.version,
			status: row.status,
			capture,
			repairCost: row.repairCost,
			repairCostSource: row.repairCostSource,
			repairCostNote: row.repairCostNote,
			costEntryVersion: row.costEntryVersion,
			measureId: row.measureId,
			recordedBy: nameOf(row.recordedBy),
			reviewedAt: row.reviewedAt?.toISOString() ?? null,
			reviewedBy: nameOf(row.reviewedBy)
		},
		stored: {
			state,
			words: figureWords(
				state,
				row.pricedBasisId ? (numbers.get(row.pricedBasisId) ?? null) : null,
				survey.basisId ? (numbers.get(survey.basisId) ?? null) : null
			),
			steamLoss: row.steamLoss,
			heatLoss: row.heatLoss,
			cost: row.cost,
			pricingNote: row.pricingNote
		},
		live,
		photos: await photosOf(db, user.firmId, row.id, capture.photoIds)
	};
}

export type FindingDetail = NonNullable<Awaited<ReturnType<typeof findingDetail>>>;

/** A finding row of the survey with its capture (no lock), or null. */
export async function findingOfSurvey(db: Executor, surveyId: string, findingId: string) {
	const [hit] = await db
		.select({ row: findings, assetTag: assets.tag })
		.from(findings)
		.leftJoin(assets, eq(assets.id, findings.assetId))
		.where(and(eq(findings.id, findingId), eq(findings.surveyId, surveyId)))
		.limit(1);
	if (!hit) return null;
	return { row: hit.row, capture: captureFromRow({ ...hit.row, assetTag: hit.assetTag }) };
}
