/**
 * One mutation, one transaction (docs/sync.md). The mutation id is looked up first under a
 * lock, so a replay — even one racing its original — changes nothing and gets the first answer
 * again. Applied and conflicting mutations are recorded with their answer; a rejected one is
 * not, so the device may send it again once the reason is gone (e.g. the survey reopened).
 */
import { eq } from 'drizzle-orm';
import type { Mutation, MutationResult } from '../../schemas/sync';
import { mutationResultSchema } from '../../schemas/sync';
import { appliedMutations } from '../db/schema';
import { DEVICE_LOCKED_REASON, findingsFrozen } from '../publish/lock';
import type { Db, Tx } from '../db/types';
import { RECORDING_STAGES, type PushContext } from './context';
import { applyDelete } from './delete';
import { withRetry } from './retry';
import { applyUpsert } from './upsert';

/** The survey a mutation belongs to (authorized before anything is applied). */
export const surveyOf = (m: Mutation): string => m.data.surveyId;

function replay(
	seen: typeof appliedMutations.$inferSelect,
	ctx: PushContext,
	m: Mutation
): MutationResult {
	const first = mutationResultSchema.safeParse(seen.outcome);
	if (seen.userId !== ctx.user.id || !first.success) {
		return {
			mutationId: m.mutationId,
			status: 'rejected',
			reason: 'This change id was used before for another change: nothing was changed'
		};
	}
	// An applied change answers `duplicate`; a conflict stays a conflict (the edit is still
	// held for the desk, and the device must go on showing it).
	if (first.data.status === 'conflict') return first.data;
	return { ...first.data, status: 'duplicate' };
}

async function applyIn(tx: Tx, ctx: PushContext, m: Mutation): Promise<MutationResult> {
	const [seen] = await tx
		.select()
		.from(appliedMutations)
		.where(eq(appliedMutations.id, m.mutationId))
		.limit(1)
		.for('update');
	if (seen) return replay(seen, ctx, m);
	const survey = ctx.surveys.get(surveyOf(m));
	if (!survey) throw new Error(`Survey of mutation ${m.mutationId} was not authorized`);
	// Read under the survey row's lock: a publication committed since the batch was
	// authorized freezes the findings (docs/publishing.md); the device keeps its change.
	if (await findingsFrozen(tx, survey.id)) {
		return { mutationId: m.mutationId, status: 'rejected', reason: DEVICE_LOCKED_REASON };
	}
	if (!RECORDING_STAGES.includes(survey.stage)) {
		return {
			mutationId: m.mutationId,
			status: 'rejected',
			reason:
				'This survey is no longer open for recording (it is with the client or closed): ' +
				'ask the consultant to reopen it, or to take this change at the desk'
		};
	}
	const result =
		m.op === 'upsert'
			? await applyUpsert(tx, ctx, survey, m)
			: await applyDelete(tx, ctx, survey, m);
	if (result.status === 'rejected') return result;
	await tx.insert(appliedMutations).values({
		id: m.mutationId,
		userId: ctx.user.id,
		deviceId: ctx.deviceId,
		firmId: ctx.user.firmId,
		outcome: result
	});
	return result;
}

export function applyMutation(db: Db, ctx: PushContext, m: Mutation): Promise<MutationResult> {
	return withRetry(() =>
		db.transaction((tx) => applyIn(tx, ctx, m), { isolationLevel: 'read committed' })
	);
}
