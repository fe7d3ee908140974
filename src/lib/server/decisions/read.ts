/**
 * Reading decisions and comments (docs/decisions.md): an item's history (newest first; the one
 * not superseded is its current decision) and its comment thread (oldest first), and the
 * current decision of every item of a survey — the one source the Ladder's lists, the Desk and
 * confirmed savings read a client's decision from.
 */
import { and, asc, desc, eq, inArray, isNotNull, isNull, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/mysql-core';
import {
	DECISION_LABELS,
	REPAIR_OUTCOME_LABELS,
	type Decision,
	type ItemRef,
	type RepairOutcome
} from '../../schemas/decisions';
import { comments, decisions, users } from '../db/schema';
import type { Executor } from '../db/types';

export interface DecisionEntry {
	id: string;
	decision: Decision;
	/** The decision in words ("Repair booked"). */
	words: string;
	scheduledFor: string | null;
	assignee: string | null;
	repairedOn: string | null;
	reason: string | null;
	/** Who decided; null for a decision carried over from a finding's old status. */
	decidedBy: string | null;
	at: Date;
	current: boolean;
	outcome: RepairOutcome | null;
	outcomeWords: string | null;
}

export interface CommentEntry {
	id: string;
	body: string;
	author: string;
	/** The author answered for the consulting firm (admin or consultant), else the client. */
	fromFirm: boolean;
	at: Date;
	/** The decision it came with, in words, if any. */
	withDecision: string | null;
}

const itemWhere = (ref: ItemRef, table: typeof decisions | typeof comments): SQL =>
	ref.kind === 'finding' ? eq(table.findingId, ref.id) : eq(table.measureId, ref.id);

const decisionColumns = {
	id: decisions.id,
	findingId: decisions.findingId,
	measureId: decisions.measureId,
	decision: decisions.decision,
	scheduledFor: decisions.scheduledFor,
	assignee: decisions.assignee,
	repairedOn: decisions.repairedOn,
	reason: decisions.reason,
	decidedBy: users.name,
	at: decisions.createdAt,
	supersededAt: decisions.supersededAt,
	outcome: decisions.outcome
};

interface DecisionRead {
	id: string;
	decision: string;
	scheduledFor: string | null;
	assignee: string | null;
	repairedOn: string | null;
	reason: string | null;
	decidedBy: string | null;
	at: Date;
	supersededAt: Date | null;
	outcome: string | null;
}

function entry(r: DecisionRead): DecisionEntry {
	const decision = r.decision as Decision;
	const outcome = r.outcome as RepairOutcome | null;
	return {
		id: r.id,
		decision,
		words: DECISION_LABELS[decision] ?? decision,
		scheduledFor: r.scheduledFor,
		assignee: r.assignee,
		repairedOn: r.repairedOn,
		reason: r.reason,
		decidedBy: r.decidedBy,
		at: r.at,
		current: r.supersededAt === null,
		outcome,
		outcomeWords: outcome === null ? null : (REPAIR_OUTCOME_LABELS[outcome] ?? outcome)
	};
}

/** Every decision on the item, newest first (the current one first). */
export async function decisionHistory(db: Executor, ref: ItemRef): Promise<DecisionEntry[]> {
	const rows = await db
		.select(decisionColumns)
		.from(decisions)
		.leftJoin(users, eq(users.id, decisions.decidedBy))
		.where(itemWhere(ref, decisions))
		.orderBy(desc(isNull(decisions.supersededAt)), desc(decisions.createdAt), desc(decisions.id));
	return rows.map(entry);
}

const withDecision = alias(decisions, 'with_decision');

/** The item's comments, oldest first. */
export async function commentThread(db: Executor, ref: ItemRef): Promise<CommentEntry[]> {
	const rows = await threadWhere(db, and(itemWhere(ref, comments), isNull(comments.deletedAt))!);
	return rows.map((r) => r.comment);
}

async function threadWhere(db: Executor, where: SQL) {
	const rows = await db
		.select({
			id: comments.id,
			findingId: comments.findingId,
			measureId: comments.measureId,
			body: comments.body,
			author: users.name,
			role: users.role,
			at: comments.createdAt,
			decision: withDecision.decision
		})
		.from(comments)
		.innerJoin(users, eq(users.id, comments.authorId))
		.leftJoin(withDecision, eq(withDecision.id, comments.decisionId))
		.where(where)
		.orderBy(asc(comments.createdAt), asc(comments.id));
	return rows.map((r) => ({
		itemId: (r.findingId ?? r.measureId) as string,
		comment: {
			id: r.id,
			body: r.body,
			author: r.author,
			fromFirm: r.role === 'admin' || r.role === 'consultant',
			at: r.at,
			withDecision: r.decision === null ? null : (DECISION_LABELS[r.decision as Decision] ?? null)
		}
	}));
}

/** Every decision and live comment of a survey, by item id (the Desk's decisions page). */
export async function surveyActivity(db: Executor, surveyId: string) {
	const [decided, thread] = await Promise.all([
		db
			.select(decisionColumns)
			.from(decisions)
			.leftJoin(users, eq(users.id, decisions.decidedBy))
			.where(eq(decisions.surveyId, surveyId))
			.orderBy(desc(isNull(decisions.supersededAt)), desc(decisions.createdAt), desc(decisions.id)),
		threadWhere(db, and(eq(comments.surveyId, surveyId), isNull(comments.deletedAt))!)
	]);
	const history = new Map<string, DecisionEntry[]>();
	for (const r of decided) {
		const key = (r.findingId ?? r.measureId) as string;
		history.set(key, [...(history.get(key) ?? []), entry(r)]);
	}
	const threads = new Map<string, CommentEntry[]>();
	for (const { itemId, comment } of thread) {
		threads.set(itemId, [...(threads.get(itemId) ?? []), comment]);
	}
	return { history, comments: threads };
}

/** The current decision of each of the given findings or measures, by item id. */
export async function currentDecisions(
	db: Executor,
	itemIds: string[]
): Promise<Map<string, DecisionEntry>> {
	if (itemIds.length === 0) return new Map();
	const rows = await db
		.select({ ...decisionColumns, item: decisions.currentItem })
		.from(decisions)
		.leftJoin(users, eq(users.id, decisions.decidedBy))
		.where(and(isNotNull(decisions.currentItem), inArray(decisions.currentItem, itemIds)));
	return new Map(rows.map((r) => [r.item as string, entry(r)]));
}
