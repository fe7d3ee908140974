/**
 * The snapshot of one survey: everything the Walk needs to record on it with no network,
 * read in one consistent transaction together with the firm's change cursor, so a later pull
 * from that cursor brings exactly what changed after these rows were read.
 * Authorization is the caller's (route: requireRole + requireSurveyAccess).
 */
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import type { CostBasis } from '../../schemas/site';
import {
	surveySnapshotSchema,
	trapAssetDetailsSchema,
	type SurveySnapshot
} from '../../schemas/snapshot';
import {
	areas,
	assets,
	changeCounters,
	clientCompanies,
	costBases,
	findings,
	headers,
	sites,
	surveys
} from '../db/schema';
import type { Db, Tx } from '../db/types';
import { engineBasis, type SiteAtmosphere } from '../pricing/context';
import { captureFromRow } from './capture-row';
import { lastResults } from './last-results';
import { unitSystemOf } from './person';
import { surveySummaries } from './summaries';

/** The firm's change counter (0 before anything was counted). */
export async function currentCursor(tx: Tx | Db, firmId: string): Promise<number> {
	const [row] = await tx
		.select({ value: changeCounters.value })
		.from(changeCounters)
		.where(eq(changeCounters.firmId, firmId))
		.limit(1);
	return Number(row?.value ?? 0);
}

/** null when the survey does not exist; validated with surveySnapshotSchema otherwise. */
export async function loadSurveySnapshot(
	db: Db,
	user: Pick<SessionUser, 'id'>,
	surveyId: string
): Promise<SurveySnapshot | null> {
	return db.transaction((tx) => read(tx, user, surveyId), {
		isolationLevel: 'repeatable read',
		withConsistentSnapshot: true
	});
}

async function read(tx: Tx, user: Pick<SessionUser, 'id'>, surveyId: string) {
	const [survey] = await tx.select().from(surveys).where(eq(surveys.id, surveyId)).limit(1);
	if (!survey) return null;
	const cursor = await currentCursor(tx, survey.firmId);
	const [summary] = await surveySummaries(tx, eq(surveys.id, surveyId));
	const [site] = await tx
		.select({
			id: sites.id,
			name: sites.name,
			address: sites.address,
			elevation: sites.elevation,
			atmosphericPressure: sites.atmosphericPressure,
			clientName: clientCompanies.name,
			costBasis: costBases.basis
		})
		.from(sites)
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.leftJoin(
			costBases,
			eq(costBases.id, sql`COALESCE(${survey.costBasisId}, ${sites.costBasisId})`)
		)
		.where(eq(sites.id, survey.siteId));
	const siteHeaders = await tx
		.select()
		.from(headers)
		.where(and(eq(headers.siteId, site.id), isNull(headers.retiredAt)))
		.orderBy(asc(headers.sortOrder), asc(headers.name));
	const siteAreas = await tx
		.select({ id: areas.id, siteId: areas.siteId, name: areas.name, sortOrder: areas.sortOrder })
		.from(areas)
		.where(and(eq(areas.siteId, site.id), isNull(areas.retiredAt)))
		.orderBy(asc(areas.sortOrder), asc(areas.name));
	const traps = await tx
		.select()
		.from(assets)
		.where(and(eq(assets.siteId, site.id), eq(assets.kind, 'trap'), isNull(assets.retiredAt)))
		.orderBy(asc(assets.tag));
	const last = await lastResults(
		tx,
		survey,
		traps.map((a) => a.id)
	);
	const rows = await tx
		.select({ finding: findings, assetTag: assets.tag })
		.from(findings)
		.leftJoin(assets, eq(assets.id, findings.assetId))
		.where(and(eq(findings.surveyId, surveyId), isNull(findings.deletedAt)))
		.orderBy(asc(findings.recordedAt), asc(findings.id));

	return surveySnapshotSchema.parse({
		cursor,
		takenAt: new Date().toISOString(),
		unitSystem: await unitSystemOf(tx, user.id),
		survey: summary,
		site: {
			id: site.id,
			name: site.name,
			address: site.address,
			elevation: site.elevation,
			clientName: site.clientName
		},
		costBasis: storedCostBasis(site.id, site.costBasis, site),
		headers: siteHeaders.map((h) => ({
			id: h.id,
			name: h.name,
			pressure: h.pressure,
			...(h.designTemperature === null ? {} : { designTemperature: h.designTemperature }),
			...(h.operatingHours === null ? {} : { operatingHours: h.operatingHours }),
			sortOrder: h.sortOrder
		})),
		areas: siteAreas,
		assets: traps.map((a) => ({
			id: a.id,
			siteId: a.siteId,
			kind: 'trap',
			tag: a.tag,
			location: a.location,
			areaId: a.areaId,
			headerId: a.headerId,
			details: trapAssetDetailsSchema.safeParse(a.details).data ?? null,
			lastResult: last.get(a.id) ?? null
		})),
		findings: rows.map(({ finding, assetTag }) => ({
			capture: captureFromRow({ ...finding, assetTag }),
			version: finding.version,
			status: finding.status
		}))
	});
}

/**
 * The site's cost basis when it passes its checks. One that does not (edited by hand, or from
 * an older shape) is left out rather than refusing the whole snapshot: the Walk then records
 * without prices, and the Desk shows the consultant what to fix.
 */
function storedCostBasis(siteId: string, raw: unknown, site: SiteAtmosphere): CostBasis | null {
	if (raw === null || raw === undefined) return null;
	const basis = engineBasis(raw, site);
	if (!basis) console.warn(`steamwisp: cost basis of site ${siteId} fails its checks`);
	return basis;
}
