import {
	double,
	index,
	int,
	json,
	mysqlTable,
	primaryKey,
	text,
	tinyint,
	unique,
	varchar
} from 'drizzle-orm/mysql-core';
import { at, createdAt, id, money, uuid, word } from './columns';
import { costBases } from './sites';
import { surveys } from './surveys';
import { users } from './tenancy';
import type { SavingsTotals } from '../../savings/totals';

/** The totals of a published revision as they stood: the savings list's totals, frozen. */
export type RevisionTotals = SavingsTotals;

/**
 * One publication of a survey to its client company (docs/publishing.md): revision 1 is the
 * first, each correction published after it the next, with a note of what changed. The
 * figures the client sees are the revision's frozen snapshot (survey_revision_findings), priced
 * on `cost_basis_id`.
 */
export const surveyRevisions = mysqlTable(
	'survey_revisions',
	{
		id: id(),
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id),
		/** 1, 2, 3… per survey. */
		number: int('number').notNull(),
		publishedAt: at('published_at').notNull(),
		publishedBy: uuid('published_by').references(() => users.id),
		/** The cost basis the snapshot was priced on (the survey's frozen basis). */
		costBasisId: uuid('cost_basis_id').references(() => costBases.id),
		/** What changed since the revision before (required from revision 2 on). */
		note: text('note'),
		totals: json('totals').$type<RevisionTotals>().notNull(),
		/** Findings in the snapshot. */
		findingCount: int('finding_count').notNull(),
		/** The client's users told by e-mail, and how many of those messages failed to send. */
		mailSent: int('mail_sent').notNull().default(0),
		mailFailed: int('mail_failed').notNull().default(0),
		createdAt: createdAt()
	},
	(t) => [unique('survey_revisions_number_uq').on(t.surveyId, t.number)]
);

/**
 * The published figures of every live finding of a revision, as they stood when it was
 * published, written in one INSERT … SELECT: the client's view and the reports of a revision
 * read these rows, so later edits, re-pricing or corrections never move them.
 */
export const surveyRevisionFindings = mysqlTable(
	'survey_revision_findings',
	{
		revisionId: uuid('revision_id')
			.notNull()
			.references(() => surveyRevisions.id, { onDelete: 'cascade' }),
		findingId: uuid('finding_id').notNull(),
		kind: word('kind').notNull(),
		status: word('status').notNull(),
		condition: word('condition'),
		tag: varchar('tag', { length: 64 }),
		location: varchar('location', { length: 255 }),
		areaId: uuid('area_id'),
		areaName: varchar('area_name', { length: 160 }),
		headerId: uuid('header_id'),
		headerName: varchar('header_name', { length: 160 }),
		measureId: uuid('measure_id'),
		/** 1 when the figures were current on the revision's basis (the savings list's rule). */
		figuresCurrent: tinyint('figures_current').notNull(),
		steamLoss: double('steam_kg_h'),
		heatLoss: double('heat_kw'),
		fuelEnergy: double('fuel_gj'),
		cost: money('cost_minor'),
		co2: double('co2_kg'),
		water: double('water_m3'),
		repairCost: money('repair_cost_minor'),
		paybackYears: double('payback_years'),
		pricedBasisId: uuid('priced_basis_id'),
		/** The finding's version when it was published. */
		findingVersion: int('finding_version').notNull()
	},
	(t) => [
		primaryKey({ columns: [t.revisionId, t.findingId] }),
		index('survey_revision_findings_cost_idx').on(t.revisionId, t.cost),
		index('survey_revision_findings_finding_idx').on(t.findingId)
	]
);

/**
 * The measures of a revision as they stood when it was published: name, description and the
 * job's own costs (their findings are the snapshot rows with this measure_id), so a correction
 * that edits or deletes a measure never moves what the client was shown.
 */
export const surveyRevisionMeasures = mysqlTable(
	'survey_revision_measures',
	{
		revisionId: uuid('revision_id')
			.notNull()
			.references(() => surveyRevisions.id, { onDelete: 'cascade' }),
		measureId: uuid('measure_id').notNull(),
		name: varchar('name', { length: 160 }).notNull(),
		description: text('description'),
		accessCost: money('access_cost_minor').notNull(),
		scaffoldCost: money('scaffold_cost_minor').notNull(),
		shutdownCost: money('shutdown_cost_minor').notNull(),
		otherCost: money('other_cost_minor').notNull(),
		otherCostLabel: varchar('other_cost_label', { length: 120 }),
		sortOrder: int('sort_order').notNull(),
		createdAt: at('created_at').notNull()
	},
	(t) => [primaryKey({ columns: [t.revisionId, t.measureId] })]
);

export type SurveyRevisionRow = typeof surveyRevisions.$inferSelect;
