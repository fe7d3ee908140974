/**
 * Marking findings checked at the Desk (or no longer checked): `reviewed_at` / `reviewed_by`,
 * and a draft becomes `reviewed` (a `reviewed` one goes back to draft when unmarked). All or
 * nothing: every id must be a live finding of the survey, else nothing is written. One audit
 * row per finding that changed, in the same transaction.
 *
 * Neither the finding's version nor its change-feed position moves: the review is the Desk's,
 * no edit of the capture, so a device holding the finding is not put into conflict by it; the
 * firm's counter moves on (touchFirm) so the review table's cached views expire.
 */
import { and, eq, inArray, isNull } from 'drizzle-orm';
import { recordChange } from '../audit';
import { findings, surveys } from '../db/schema';
import type { Db } from '../db/types';
import { findingsFrozen } from '../publish/lock';
import { touchFirm } from '../sync/counter';

export interface ReviewInput {
	firmId: string;
	actorId: string;
	surveyId: string;
	findingIds: string[];
	/** true: mark checked; false: mark not checked. */
	reviewed: boolean;
}

export type ReviewOutcome =
	| { ok: true; changed: number; unchanged: number }
	| { ok: false; unknown: string[]; frozen: false }
	/** The survey is published: its findings stay as they went to the client. */
	| { ok: false; unknown: []; frozen: true };

export async function markReviewed(db: Db, input: ReviewInput): Promise<ReviewOutcome> {
	const ids = [...new Set(input.findingIds)];
	if (ids.length === 0) return { ok: true, changed: 0, unchanged: 0 };
	return db.transaction(async (tx) => {
		// The survey row before the findings', in the order a publication takes them.
		if (await findingsFrozen(tx, input.surveyId)) {
			return { ok: false as const, unknown: [] as [], frozen: true as const };
		}
		const rows = await tx
			.select({
				id: findings.id,
				status: findings.status,
				reviewedAt: findings.reviewedAt,
				reviewedBy: findings.reviewedBy
			})
			.from(findings)
			.innerJoin(surveys, eq(surveys.id, findings.surveyId))
			.where(
				and(
					inArray(findings.id, ids),
					eq(findings.surveyId, input.surveyId),
					eq(surveys.firmId, input.firmId),
					isNull(findings.deletedAt)
				)
			)
			.for('update');
		if (rows.length !== ids.length) {
			const found = new Set(rows.map((r) => r.id));
			return {
				ok: false as const,
				unknown: ids.filter((id) => !found.has(id)),
				frozen: false as const
			};
		}
		const now = new Date();
		let changed = 0;
		for (const row of rows) {
			if ((row.reviewedAt !== null) === input.reviewed) continue;
			const after = input.reviewed
				? {
						reviewedAt: now,
						reviewedBy: input.actorId,
						status: row.status === 'draft' ? 'reviewed' : row.status
					}
				: {
						reviewedAt: null,
						reviewedBy: null,
						status: row.status === 'reviewed' ? 'draft' : row.status
					};
			await tx.update(findings).set(after).where(eq(findings.id, row.id));
			await recordChange(tx, {
				firmId: input.firmId,
				actorId: input.actorId,
				entity: 'finding',
				entityId: row.id,
				action: input.reviewed ? 'review' : 'unreview',
				before: { status: row.status, reviewedAt: row.reviewedAt, reviewedBy: row.reviewedBy },
				after
			});
			changed++;
		}
		if (changed > 0) await touchFirm(tx, input.firmId); // the table's cached views expire
		return { ok: true as const, changed, unchanged: rows.length - changed };
	});
}
