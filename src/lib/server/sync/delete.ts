/**
 * A deletion of one finding inside its mutation's transaction: the row is kept with deleted_at
 * (pulled as a tombstone), never removed; a deletion of a finding someone else changed since
 * is kept as a conflict and the finding stays.
 */
import { eq } from 'drizzle-orm';
import type { DeleteMutation, MutationResult } from '../../schemas/sync';
import { findings } from '../db/schema';
import type { Tx } from '../db/types';
import { lockFinding } from './lock';
import type { PushContext, PushSurvey } from './context';
import { nextChangeSeq } from './counter';
import { auditFinding, keepConflict } from './journal';

export async function applyDelete(
	tx: Tx,
	ctx: PushContext,
	survey: PushSurvey,
	m: DeleteMutation
): Promise<MutationResult> {
	const found = await lockFinding(tx, m.id);
	// Never reached the server (recorded and deleted offline): nothing to delete.
	if (!found) return { mutationId: m.mutationId, status: 'applied', version: 0 };
	const row = found.row;
	if (row.surveyId !== survey.id) {
		return {
			mutationId: m.mutationId,
			status: 'rejected',
			reason: 'This finding is not on the survey the deletion names: nothing was changed'
		};
	}
	if (row.deletedAt) return { mutationId: m.mutationId, status: 'applied', version: row.version };
	if (m.baseVersion !== row.version) {
		return keepConflict(
			tx,
			ctx,
			m,
			survey.id,
			row.version,
			'Someone changed this finding on the server after this device last had it: it was not ' +
				'deleted, and the deletion is kept for the desk to settle'
		);
	}
	const version = row.version + 1;
	const changeSeq = await nextChangeSeq(tx, ctx.user.firmId);
	await tx
		.update(findings)
		.set({ deletedAt: new Date(), version, changeSeq })
		.where(eq(findings.id, m.id));
	await auditFinding(tx, ctx, m.id, 'delete', found.capture, {
		version,
		mutationId: m.mutationId
	});
	return { mutationId: m.mutationId, status: 'applied', version };
}
