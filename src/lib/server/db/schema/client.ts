import { date, index, mysqlTable, text } from 'drizzle-orm/mysql-core';
import { at, createdAt, id, uuid, word } from './columns';
import { findings, measures, surveys } from './surveys';
import { users } from './tenancy';

/**
 * The client's decisions on published findings or measures: approved, scheduled, repaired,
 * declined. Kept as a history (newest wins) so the audit trail shows who decided what, when.
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
		/** approved | scheduled | repaired | declined */
		decision: word('decision').notNull(),
		scheduledFor: date('scheduled_for', { mode: 'string' }),
		note: text('note'),
		decidedBy: uuid('decided_by')
			.notNull()
			.references(() => users.id),
		createdAt: createdAt()
	},
	(t) => [
		index('decisions_finding_idx').on(t.findingId),
		index('decisions_measure_idx').on(t.measureId)
	]
);

/** Conversation on a finding, a measure or the survey as a whole. */
export const comments = mysqlTable(
	'comments',
	{
		id: id(),
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id),
		findingId: uuid('finding_id').references(() => findings.id),
		measureId: uuid('measure_id').references(() => measures.id),
		authorId: uuid('author_id')
			.notNull()
			.references(() => users.id),
		body: text('body').notNull(),
		deletedAt: at('deleted_at'),
		createdAt: createdAt()
	},
	(t) => [index('comments_survey_idx').on(t.surveyId)]
);
