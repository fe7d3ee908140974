/**
 * Writing measures (docs/costs.md): create one from picked findings, rename it and set its
 * extra costs, add or take away findings, delete it. Each runs in one transaction that reads
 * the survey's publication lock first (a published survey's measures are frozen with its
 * findings), checks every id belongs to this survey (another survey's or firm's ids change
 * nothing), moves the firm's change counter so the cached table and savings views refresh, and
 * writes one audit row.
 */
import { and, eq, inArray, isNull, sql } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import type { MeasureExtra } from '../../schemas/costs';
import { recordChange } from '../audit';
import { findings, measures, surveys } from '../db/schema';
import type { Db, Tx } from '../db/types';
import { findingsFrozen } from '../publish/lock';
import { touchFirm } from '../sync/counter';

export interface MeasureTarget {
	firmId: string;
	actorId: string;
	surveyId: string;
}

export interface MeasureDetails {
	name: string;
	description: string | null;
	extras: Record<MeasureExtra, number>;
	otherLabel: string | null;
}

/** Findings a change took out of another measure of the survey, per measure. */
export interface MovedFrom {
	measureId: string;
	name: string;
	count: number;
}

/** What putting findings into a measure did: how many, how many were in it already, moves. */
export interface Attached {
	findings: number;
	already: number;
	moved: MovedFrom[];
}

export type MeasureOutcome =
	| ({ kind: 'done'; measureId: string; name?: string } & Partial<Attached>)
	| { kind: 'frozen' }
	| { kind: 'missing' }
	/** Some picked findings are not live findings of this survey: nothing was changed. */
	| { kind: 'foreign'; count: number }
	/** The measure changed after the form was opened (its version): nothing was changed. */
	| { kind: 'moved'; version: number };

type Done = Extract<MeasureOutcome, { kind: 'done' }>;
type Step = (tx: Tx) => Promise<Done>;

/** The common frame: lock order, the survey in the firm, the counter and the audit row. */
async function inSurvey(
	db: Db,
	t: MeasureTarget,
	action: string,
	step: Step,
	audit: (outcome: Done) => unknown
): Promise<MeasureOutcome> {
	return db
		.transaction(async (tx) => {
			if (await findingsFrozen(tx, t.surveyId)) return { kind: 'frozen' as const };
			const [survey] = await tx
				.select({ id: surveys.id })
				.from(surveys)
				.where(and(eq(surveys.id, t.surveyId), eq(surveys.firmId, t.firmId)))
				.limit(1);
			if (!survey) return { kind: 'missing' as const };
			// A step refuses by throwing (refuse), so whatever it wrote goes back.
			const outcome = await step(tx);
			await touchFirm(tx, t.firmId);
			await recordChange(tx, {
				firmId: t.firmId,
				actorId: t.actorId,
				entity: 'measure',
				entityId: outcome.measureId,
				action,
				after: audit(outcome)
			});
			return outcome;
		})
		.catch((e: unknown) => {
			if (e instanceof RolledBack) return e.outcome;
			throw e;
		});
}

class RolledBack extends Error {
	constructor(readonly outcome: MeasureOutcome) {
		super('rolled back');
	}
}

/** Refuses inside a step: thrown so the transaction rolls back, returned by inSurvey. */
const refuse = (outcome: MeasureOutcome): never => {
	throw new RolledBack(outcome);
};

async function lockMeasure(tx: Tx, surveyId: string, measureId: string) {
	const [row] = await tx
		.select()
		.from(measures)
		.where(
			and(eq(measures.id, measureId), eq(measures.surveyId, surveyId), isNull(measures.deletedAt))
		)
		.for('update');
	return row ?? refuse({ kind: 'missing' });
}

/**
 * Puts findings into a measure, taking them out of any other (the move is counted per measure,
 * before the write); all must be live findings of this survey, or nothing changes.
 */
async function attach(
	tx: Tx,
	surveyId: string,
	measureId: string,
	ids: string[]
): Promise<Attached> {
	const unique = [...new Set(ids)];
	const picked = and(
		inArray(findings.id, unique),
		eq(findings.surveyId, surveyId),
		isNull(findings.deletedAt)
	);
	const held = await tx
		.select({
			measureId: findings.measureId,
			name: measures.name,
			count: sql<number>`COUNT(*)`
		})
		.from(findings)
		.innerJoin(measures, eq(measures.id, findings.measureId))
		.where(picked)
		.groupBy(findings.measureId, measures.name)
		.orderBy(measures.name);
	// mysql2 reports matched rows (FOUND_ROWS), so a finding already in the measure counts.
	const [result] = (await tx.update(findings).set({ measureId }).where(picked)) as unknown as [
		{ affectedRows: number }
	];
	if (result.affectedRows !== unique.length) {
		refuse({ kind: 'foreign', count: unique.length - result.affectedRows });
	}
	const moved = held
		.filter((h) => h.measureId !== measureId)
		.map((h) => ({ measureId: h.measureId!, name: h.name, count: Number(h.count) }));
	const already = Number(held.find((h) => h.measureId === measureId)?.count ?? 0);
	return { findings: unique.length, already, moved };
}

const columns = (d: MeasureDetails) => ({
	name: d.name,
	description: d.description,
	accessCost: d.extras.access,
	scaffoldCost: d.extras.scaffold,
	shutdownCost: d.extras.shutdown,
	otherCost: d.extras.other,
	otherCostLabel: d.otherLabel
});

export function createMeasure(
	db: Db,
	t: MeasureTarget,
	details: MeasureDetails,
	findingIds: string[]
): Promise<MeasureOutcome> {
	const id = randomUUID();
	return inSurvey(
		db,
		t,
		'create',
		async (tx) => {
			const [{ n }] = await tx
				.select({ n: sql<number>`COALESCE(MAX(${measures.sortOrder}), 0)` })
				.from(measures)
				.where(eq(measures.surveyId, t.surveyId));
			await tx.insert(measures).values({
				id,
				surveyId: t.surveyId,
				...columns(details),
				sortOrder: Number(n) + 1,
				createdBy: t.actorId
			});
			const added = findingIds.length
				? await attach(tx, t.surveyId, id, findingIds)
				: { findings: 0, already: 0, moved: [] };
			return { kind: 'done' as const, measureId: id, ...added };
		},
		(o) => ({ ...details, findingIds, findings: o.findings, moved: o.moved })
	);
}

/**
 * Writes the measure's name, description and extra costs as its next version, only when it is
 * still at `openedVersion` (the version the form was opened at): a change made by someone else
 * meanwhile is refused (`moved`), never overwritten blind.
 */
export function updateMeasure(
	db: Db,
	t: MeasureTarget,
	measureId: string,
	details: MeasureDetails,
	openedVersion: number
): Promise<MeasureOutcome> {
	let before: typeof measures.$inferSelect | undefined;
	return inSurvey(
		db,
		t,
		'update',
		async (tx) => {
			before = await lockMeasure(tx, t.surveyId, measureId);
			if (before.version !== openedVersion) refuse({ kind: 'moved', version: before.version });
			const version = before.version + 1;
			await tx
				.update(measures)
				.set({ ...columns(details), version })
				.where(eq(measures.id, measureId));
			return { kind: 'done' as const, measureId };
		},
		() => ({ before, after: { ...details, version: openedVersion + 1 } })
	);
}

/** Adds findings to the measure (`op` add) or takes them out of it (`op` remove). */
export function changeMembers(
	db: Db,
	t: MeasureTarget,
	measureId: string,
	op: 'add' | 'remove',
	findingIds: string[]
): Promise<MeasureOutcome> {
	return inSurvey(
		db,
		t,
		op === 'add' ? 'add-findings' : 'remove-findings',
		async (tx) => {
			const { name } = await lockMeasure(tx, t.surveyId, measureId);
			if (op === 'add') {
				const added = await attach(tx, t.surveyId, measureId, findingIds);
				return { kind: 'done' as const, measureId, name, ...added };
			}
			const [result] = (await tx
				.update(findings)
				.set({ measureId: null })
				.where(
					and(inArray(findings.id, findingIds), eq(findings.measureId, measureId))
				)) as unknown as [{ affectedRows: number }];
			return { kind: 'done' as const, measureId, findings: result.affectedRows };
		},
		(o) => ({ findingIds, findings: o.findings, moved: o.moved })
	);
}

/** Deletes the measure; its findings stay, no longer grouped. */
export function deleteMeasure(
	db: Db,
	t: MeasureTarget,
	measureId: string
): Promise<MeasureOutcome> {
	return inSurvey(
		db,
		t,
		'delete',
		async (tx) => {
			await lockMeasure(tx, t.surveyId, measureId);
			await tx.update(findings).set({ measureId: null }).where(eq(findings.measureId, measureId));
			await tx.update(measures).set({ deletedAt: new Date() }).where(eq(measures.id, measureId));
			return { kind: 'done' as const, measureId };
		},
		() => ({ deleted: true })
	);
}
