/**
 * A site's cost basis history: saving a basis adds the next numbered version (earlier ones never
 * change), makes it the site's current one, writes an audit row, and brings the site's figures
 * onto it — re-priced from stored flows, or recomputed when the trap factors (physics) moved.
 * Surveys with a frozen basis (published) keep theirs.
 */
import { and, asc, desc, eq, isNotNull, sql } from 'drizzle-orm';
import type { CostBasis } from '../../schemas/site';
import { recordChange } from '../audit';
import { costBases, sites, surveys, users } from '../db/schema';
import type { Db, Executor } from '../db/types';
import { recomputeSite, repriceSite } from './refresh';

export interface SavedBasis {
	id: string;
	number: number;
	/** Findings whose figures moved onto it. */
	refreshed: number;
	/** Whether the physics was recomputed (trap factors changed) rather than only re-priced. */
	recomputed: boolean;
}

/** The money side of a basis as stored: the site keeps its own atmosphere. */
export function storedBasis(basis: CostBasis): CostBasis {
	const { elevation: _e, atmosphericPressure: _p, ...money } = basis;
	return money;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/**
 * Saves a validated basis (costBasisSchema) as the site's next version. The caller has checked
 * the person may change this site (it is of their firm).
 */
export async function saveCostBasis(
	db: Db,
	input: { firmId: string; siteId: string; actorId: string; basis: CostBasis; note?: string | null }
): Promise<SavedBasis> {
	const basis = storedBasis(input.basis);
	const saved = await db.transaction(async (tx) => {
		const [site] = await tx
			.select({ id: sites.id, costBasisId: sites.costBasisId })
			.from(sites)
			.where(and(eq(sites.id, input.siteId), eq(sites.firmId, input.firmId)))
			.for('update');
		if (!site) throw new Error('No such site in this firm');
		const [previous] = site.costBasisId
			? await tx.select().from(costBases).where(eq(costBases.id, site.costBasisId))
			: [];
		const [{ last }] = await tx
			.select({ last: sql<number>`COALESCE(MAX(${costBases.number}), 0)` })
			.from(costBases)
			.where(eq(costBases.siteId, site.id));
		const id = crypto.randomUUID();
		const number = Number(last) + 1;
		await tx.insert(costBases).values({
			id,
			siteId: site.id,
			number,
			basis,
			note: input.note?.trim() || null,
			createdBy: input.actorId
		});
		await tx
			.update(sites)
			.set({ costBasisId: id, currency: basis.currency })
			.where(eq(sites.id, site.id));
		await recordChange(tx, {
			firmId: input.firmId,
			actorId: input.actorId,
			entity: 'cost-basis',
			entityId: id,
			action: 'create',
			before: previous ? { id: previous.id, number: previous.number, basis: previous.basis } : null,
			after: { siteId: site.id, number, basis }
		});
		return { id, number, physicsMoved: !same(previous?.basis.trapFactors, basis.trapFactors) };
	});
	// After commit: every later read (a push, a page) already sees the new basis.
	const refreshed = saved.physicsMoved
		? await recomputeSite(db, input.siteId)
		: await repriceSite(db, input.siteId);
	return { id: saved.id, number: saved.number, refreshed, recomputed: saved.physicsMoved };
}

export interface BasisVersion {
	id: string;
	number: number;
	basis: CostBasis;
	note: string | null;
	createdAt: Date;
	createdBy: string | null;
	current: boolean;
	/** Surveys that keep this basis (published or closed). */
	frozenFor: { id: string; name: string }[];
}

/** Every basis the site has had, newest first. */
export async function costBasisHistory(tx: Executor, siteId: string): Promise<BasisVersion[]> {
	const [site] = await tx
		.select({ costBasisId: sites.costBasisId })
		.from(sites)
		.where(eq(sites.id, siteId));
	const rows = await tx
		.select({
			id: costBases.id,
			number: costBases.number,
			basis: costBases.basis,
			note: costBases.note,
			createdAt: costBases.createdAt,
			createdBy: users.name
		})
		.from(costBases)
		.leftJoin(users, eq(users.id, costBases.createdBy))
		.where(eq(costBases.siteId, siteId))
		.orderBy(desc(costBases.number));
	const frozen = await tx
		.select({ id: surveys.id, name: surveys.name, basisId: surveys.costBasisId })
		.from(surveys)
		.where(and(eq(surveys.siteId, siteId), isNotNull(surveys.costBasisId)))
		.orderBy(asc(surveys.name));
	return rows.map((r) => ({
		...r,
		current: r.id === site?.costBasisId,
		frozenFor: frozen.filter((f) => f.basisId === r.id).map(({ id, name }) => ({ id, name }))
	}));
}

/** Freezes a survey on the basis it is priced on now (publishing does this). */
export async function freezeSurveyBasis(tx: Executor, surveyId: string): Promise<string | null> {
	const [row] = await tx
		.select({ basisId: sql<string | null>`COALESCE(${surveys.costBasisId}, ${sites.costBasisId})` })
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(eq(surveys.id, surveyId));
	if (!row) return null;
	await tx.update(surveys).set({ costBasisId: row.basisId }).where(eq(surveys.id, surveyId));
	return row.basisId;
}
