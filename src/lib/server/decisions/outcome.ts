/**
 * Where confirmed savings write what a later survey found of a repaired item
 * (docs/decisions.md, "Verified"): the outcome on the item's current decision when that is
 * "repaired" — verified (working) or still failing — with when, and the later survey and
 * finding (a re-tested tag or a re-found location) that showed it. The decision stays the
 * client's; the outcome is the firm's evidence beside it. Runs in the caller's transaction.
 */
import { and, eq } from 'drizzle-orm';
import type { ItemRef, RepairOutcome } from '../../schemas/decisions';
import { decisions } from '../db/schema';
import type { Executor } from '../db/types';

export interface OutcomeEvidence {
	outcome: RepairOutcome;
	/** The later survey and its finding that showed it. */
	surveyId: string;
	findingId: string | null;
	at: Date;
}

/** Sets the outcome; false when the item's current decision is not "repaired" (nothing set). */
export async function recordRepairOutcome(
	tx: Executor,
	ref: ItemRef,
	evidence: OutcomeEvidence
): Promise<boolean> {
	const [result] = await tx
		.update(decisions)
		.set({
			outcome: evidence.outcome,
			outcomeAt: evidence.at,
			outcomeSurveyId: evidence.surveyId,
			outcomeFindingId: evidence.findingId
		})
		.where(and(eq(decisions.currentItem, ref.id), eq(decisions.decision, 'repaired')));
	return Number((result as { affectedRows?: number }).affectedRows ?? 0) > 0;
}
