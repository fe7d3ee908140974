import { sql } from 'drizzle-orm';
import {
	bigint,
	check,
	date,
	index,
	mysqlTable,
	text,
	uniqueIndex,
	varchar
} from 'drizzle-orm/mysql-core';
import { at, createdAt, id, uuid, word } from './columns';
import { findings, measures, surveys } from './surveys';
import { firms, users } from './tenancy';

/**
 * The client's decisions on published findings or measures (docs/decisions.md): approved,
 * scheduled, repaired, declined — the one place a client's decision lives (a finding's status
 * is its lifecycle only). Each row belongs to exactly one finding or one measure (CHECK). Kept
 * as a history: a new decision supersedes the current one (`superseded_at` set) and the row
 * with none is the current decision, at most one per item (`current_item`, unique).
 */
export const decisions = mysqlTable(
	'decisions',
	{
		id: id(),
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id),
		findingId: uuid('finding_id').references(() => findings.id),
		measureId: uuid('measure_id').references(() => measures.id),
		/** approved | scheduled | repaired | declined (DECISIONS in $lib/schemas/decisions) */
		decision: word('decision').notNull(),
		/** The day the repair is booked for (scheduled). */
		scheduledFor: date('scheduled_for', { mode: 'string' }),
		/** Who will do it, in the client's words (scheduled; optional). */
		assignee: varchar('assignee', { length: 160 }),
		/** The day it was repaired (repaired). */
		repairedOn: date('repaired_on', { mode: 'string' }),
		/** Why it is not going ahead (declined). */
		reason: text('reason'),
		/** Null only for decisions carried over from a finding's old status (migration 0012). */
		decidedBy: uuid('decided_by').references(() => users.id),
		/** When a newer decision on the same item replaced this one; null: the current one. */
		supersededAt: at('superseded_at'),
		/** The item while this is its current decision, else null: unique, so one per item. */
		currentItem: varchar('current_item', { length: 36 }).generatedAlwaysAs(
			sql`IF(superseded_at IS NULL, COALESCE(finding_id, measure_id), NULL)`,
			{ mode: 'stored' }
		),
		/**
		 * What a later survey found of a repaired item (confirmed savings, docs/decisions.md):
		 * verified | still-failing, when, and the later survey and finding that showed it.
		 */
		outcome: word('outcome'),
		outcomeAt: at('outcome_at'),
		outcomeSurveyId: uuid('outcome_survey_id').references(() => surveys.id),
		outcomeFindingId: uuid('outcome_finding_id'),
		createdAt: createdAt()
	},
	(t) => [
		index('decisions_finding_idx').on(t.findingId),
		index('decisions_measure_idx').on(t.measureId),
		index('decisions_survey_idx').on(t.surveyId, t.createdAt),
		uniqueIndex('decisions_current_uq').on(t.currentItem),
		check('decisions_one_item', sql`(finding_id IS NULL) <> (measure_id IS NULL)`),
		check('decisions_outcome_repaired', sql`outcome IS NULL OR decision = 'repaired'`)
	]
);

/**
 * Conversation on a finding, a measure (never both: CHECK) or the survey as a whole; a comment
 * given with a decision names it.
 */
export const comments = mysqlTable(
	'comments',
	{
		id: id(),
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id),
		findingId: uuid('finding_id').references(() => findings.id),
		measureId: uuid('measure_id').references(() => measures.id),
		/** The decision this comment came with, if any. */
		decisionId: uuid('decision_id').references(() => decisions.id),
		authorId: uuid('author_id')
			.notNull()
			.references(() => users.id),
		body: text('body').notNull(),
		deletedAt: at('deleted_at'),
		createdAt: createdAt()
	},
	(t) => [
		index('comments_survey_idx').on(t.surveyId),
		index('comments_finding_idx').on(t.findingId),
		index('comments_measure_idx').on(t.measureId),
		check('comments_one_item', sql`finding_id IS NULL OR measure_id IS NULL`)
	]
);

/**
 * The digest's outbox: one row per new decision or comment, written in its transaction;
 * `sendDecisionDigests` claims the unsent rows, mails each of the survey's consultants once per
 * batch and marks them sent (docs/decisions.md, "The digest").
 */
export const decisionDigestOutbox = mysqlTable(
	'decision_digest_outbox',
	{
		id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id),
		decisionId: uuid('decision_id').references(() => decisions.id, { onDelete: 'cascade' }),
		commentId: uuid('comment_id').references(() => comments.id, { onDelete: 'cascade' }),
		/** Who made it: their own digest leaves it out. */
		actorId: uuid('actor_id').references(() => users.id),
		/** A digest run that took the row (and when): another run leaves it alone meanwhile. */
		claim: varchar('claim', { length: 36 }),
		claimedAt: at('claimed_at'),
		sentAt: at('sent_at'),
		createdAt: createdAt()
	},
	(t) => [
		index('decision_digest_outbox_unsent_idx').on(t.sentAt, t.id),
		index('decision_digest_outbox_claim_idx').on(t.claim),
		check('decision_digest_outbox_one_event', sql`(decision_id IS NULL) <> (comment_id IS NULL)`)
	]
);

export type DecisionRow = typeof decisions.$inferSelect;
