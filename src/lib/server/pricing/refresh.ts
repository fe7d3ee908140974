/**
 * Bringing a site's figures up to date, in batches:
 * - `repriceSite`: a new cost basis. Money only, from each finding's stored flows; the physics
 *   is not recomputed (docs/desk.md, "Figures").
 * - `recomputeSite`: something the physics depends on changed (a header, the atmosphere, trap
 *   factors, the engine). Physics and money from the stored inputs.
 * - `refreshStaleFigures`: after migrating or upgrading the engine, every finding whose figures
 *   are not current is recomputed or re-priced, whichever it needs.
 * A survey that is published keeps its own (frozen) basis; the rest follow the site's current.
 *
 * The findings to do are listed first (ids only, from the survey index), then worked in batches
 * of REFRESH_BATCH, each its own short transaction, by REFRESH_WORKERS connections at once so the
 * database's work on one batch overlaps the engine's on the next.
 */
import { and, asc, eq, inArray, isNull, ne, or, sql, type SQL } from 'drizzle-orm';
import { ENGINE_VERSION } from '../../steam/version';
import { assets, findings, sites, surveys } from '../db/schema';
import type { Db, Executor, Tx } from '../db/types';
import { touchSiteFirm } from '../sync/counter';
import { captureFromRow } from '../walk/capture-row';
import { pricingContext, type PricingContext } from './context';
import { figureColumns, moneyColumns, prepareBasis, type PreparedBasis } from './figures';
import { writeFigures, type FigureRow } from './write';

/** Findings read and written per transaction: short locks, bounded memory. */
export const REFRESH_BATCH = 4000;
/** Batches in flight at once (connections used). */
export const REFRESH_WORKERS = 2;

export interface RefreshCount {
	repriced: number;
	recomputed: number;
}

/** Each survey of the site with the basis its figures should be on. */
async function surveyBases(tx: Executor, siteId: string) {
	return tx
		.select({
			id: surveys.id,
			basisId: sql<string | null>`COALESCE(${surveys.costBasisId}, ${sites.costBasisId})`,
			frozen: sql<number>`${surveys.costBasisId} IS NOT NULL`
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(eq(surveys.siteId, siteId));
}

/** Rows not yet on this basis with this engine (all rows when `all`). */
function notCurrent(basisId: string | null, all: boolean): SQL | undefined {
	if (all) return undefined;
	return or(
		basisId === null
			? sql`${findings.pricedBasisId} IS NOT NULL`
			: sql`NOT (${findings.pricedBasisId} <=> ${basisId})`,
		isNull(findings.resultsEngine),
		ne(findings.resultsEngine, ENGINE_VERSION)
	);
}

/** The ids of a survey's live findings matching `where`, in id order. */
async function idsOf(db: Db, surveyId: string, where: SQL | undefined): Promise<string[]> {
	const rows = await db
		.select({ id: findings.id })
		.from(findings)
		.where(and(eq(findings.surveyId, surveyId), isNull(findings.deletedAt), where))
		.orderBy(asc(findings.id));
	return rows.map((r) => r.id);
}

/** Runs `work` on the ids in batches, each in its own transaction, REFRESH_WORKERS at a time. */
async function inBatches(
	db: Db,
	ids: string[],
	size: number,
	work: (tx: Tx, batch: string[]) => Promise<number>
): Promise<number> {
	const batches: string[][] = [];
	for (let at = 0; at < ids.length; at += size) batches.push(ids.slice(at, at + size));
	let next = 0;
	let done = 0;
	const worker = async () => {
		while (next < batches.length) {
			const batch = batches[next++];
			const n = await db.transaction((tx) => work(tx, batch));
			done += n; // after the await: `done += await …` would add to a stale total
		}
	};
	await Promise.all(Array.from({ length: Math.min(REFRESH_WORKERS, batches.length) }, worker));
	return done;
}

/**
 * Re-prices the site's findings on the basis each survey is priced on, from stored flows: with
 * `all` (a new basis) every finding of the surveys that follow the site's basis; otherwise only
 * figures not already on their survey's basis, frozen surveys included.
 */
export async function repriceSite(
	db: Db,
	siteId: string,
	{ all = true, batchSize = REFRESH_BATCH } = {}
): Promise<number> {
	let count = 0;
	const prepared = new Map<string, Promise<PreparedBasis | null>>();
	for (const survey of await surveyBases(db, siteId)) {
		if (all && Number(survey.frozen)) continue; // a published survey keeps its own basis
		const key = survey.basisId ?? '';
		if (!prepared.has(key)) {
			prepared.set(
				key,
				pricingContext(db, siteId, survey.basisId).then((ctx) =>
					prepareBasis(ctx.basisId, ctx.costBasis)
				)
			);
		}
		const basis = await prepared.get(key)!;
		const ids = await idsOf(
			db,
			survey.id,
			and(sql`${findings.flows} IS NOT NULL`, notCurrent(basis?.id ?? null, all))
		);
		count += await inBatches(db, ids, batchSize, async (tx, batch) => {
			const rows = await tx
				.select({ id: findings.id, flows: findings.flows, repairCost: findings.repairCost })
				.from(findings)
				.where(and(inArray(findings.id, batch), isNull(findings.deletedAt)))
				.for('update');
			const now = new Date();
			const out: FigureRow[] = [];
			for (const r of rows) {
				if (r.flows !== null)
					out.push({ id: r.id, ...moneyColumns(r.flows, basis, r.repairCost, now) });
			}
			await writeFigures(tx, out, false);
			return out.length;
		});
	}
	if (count > 0) await touchSiteFirm(db, siteId);
	return count;
}

/** Physics and money of a batch of findings from their stored inputs. */
async function recomputeBatch(tx: Tx, ctx: PricingContext, batch: string[]): Promise<number> {
	const rows = await tx
		.select({ finding: findings, assetTag: assets.tag })
		.from(findings)
		.leftJoin(assets, eq(assets.id, findings.assetId))
		.where(and(inArray(findings.id, batch), isNull(findings.deletedAt)))
		.for('update');
	const now = new Date();
	const out: FigureRow[] = [];
	for (const { finding, assetTag } of rows) {
		let capture;
		try {
			capture = captureFromRow({ ...finding, assetTag });
		} catch {
			continue; // a row the capture schema refuses is a server fault: left as it is
		}
		const input =
			finding.repairCost === null ? capture : { ...capture, repairCost: finding.repairCost };
		out.push({ id: finding.id, ...figureColumns(ctx, input, now) });
	}
	await writeFigures(tx, out, true);
	return out.length;
}

/**
 * Recomputes physics and money of the site's findings from their stored inputs: those of the
 * surveys that follow the site (all, or those on one header), or — `staleOnly`, after a
 * migration or engine upgrade — those of any survey whose physics is not from this engine.
 * A published survey's figures do not follow later changes to the site.
 */
export async function recomputeSite(
	db: Db,
	siteId: string,
	{
		headerId,
		staleOnly = false,
		batchSize = REFRESH_BATCH
	}: { headerId?: string; staleOnly?: boolean; batchSize?: number } = {}
): Promise<number> {
	let count = 0;
	for (const survey of await surveyBases(db, siteId)) {
		if (!staleOnly && Number(survey.frozen)) continue;
		const ctx = await pricingContext(db, siteId, survey.basisId);
		const ids = await idsOf(
			db,
			survey.id,
			and(
				headerId === undefined ? undefined : eq(findings.headerId, headerId),
				staleOnly
					? or(isNull(findings.physicsEngine), ne(findings.physicsEngine, ENGINE_VERSION))
					: undefined
			)
		);
		count += await inBatches(db, ids, batchSize, (tx, batch) => recomputeBatch(tx, ctx, batch));
	}
	if (count > 0) await touchSiteFirm(db, siteId);
	return count;
}

/** Every site's findings brought to current figures (after a migration or an engine upgrade). */
export async function refreshStaleFigures(db: Db): Promise<RefreshCount> {
	const total: RefreshCount = { repriced: 0, recomputed: 0 };
	for (const site of await db.select({ id: sites.id }).from(sites)) {
		total.recomputed += await recomputeSite(db, site.id, { staleOnly: true });
		total.repriced += await repriceSite(db, site.id, { all: false });
	}
	return total;
}
