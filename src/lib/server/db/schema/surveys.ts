import {
	date,
	double,
	index,
	int,
	json,
	mysqlTable,
	primaryKey,
	text,
	varchar
} from 'drizzle-orm/mysql-core';
import type { PhysicsDetail } from '../../pricing/stored';
import type { PhysicsFlows } from '../../../steam/losses/pricing';
import { at, changeSeq, createdAt, id, money, updatedAt, uuid, version, word } from './columns';
import { costEntries } from './costs';
import { areas, assets, costBases, headers, sites } from './sites';
import { firms, users } from './tenancy';

/** One visit to a site by one or more auditors. */
export const surveys = mysqlTable(
	'surveys',
	{
		id: id(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		siteId: uuid('site_id')
			.notNull()
			.references(() => sites.id),
		name: varchar('name', { length: 160 }).notNull(),
		startsOn: date('starts_on', { mode: 'string' }),
		endsOn: date('ends_on', { mode: 'string' }),
		/** planned | in-field | in-review | published | closed */
		status: word('status').notNull().default('planned'),
		publishedAt: at('published_at'),
		/**
		 * The cost basis the survey is priced on once published (frozen); null: the site's current
		 * basis, so the figures follow the site while the survey is being worked on.
		 */
		costBasisId: uuid('cost_basis_id').references(() => costBases.id),
		/** When a consultant finished checking every finding (the survey is ready to publish). */
		reviewedAt: at('reviewed_at'),
		reviewedBy: uuid('reviewed_by').references(() => users.id),
		createdBy: uuid('created_by').references(() => users.id),
		version: version(),
		changeSeq: changeSeq(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [
		index('surveys_firm_idx').on(t.firmId),
		index('surveys_site_idx').on(t.siteId),
		index('surveys_change_idx').on(t.firmId, t.changeSeq)
	]
);

/** Which auditors may record on which survey. */
export const surveyAuditors = mysqlTable(
	'survey_auditors',
	{
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id, { onDelete: 'cascade' }),
		userId: uuid('user_id')
			.notNull()
			.references(() => users.id),
		assignedAt: createdAt()
	},
	(t) => [
		primaryKey({ columns: [t.surveyId, t.userId] }),
		index('survey_auditors_user_idx').on(t.userId)
	]
);

/** A group of findings repaired as one job ("replace 14 traps in the dryer hall"). */
export const measures = mysqlTable(
	'measures',
	{
		id: id(),
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id),
		name: varchar('name', { length: 160 }).notNull(),
		description: text('description'),
		/**
		 * Overrides the sum of its findings' repair costs when set (minor units). Not used by the
		 * app (docs/costs.md: a measure costs its findings plus its own extra costs below).
		 */
		repairCost: money('repair_cost_minor'),
		/** The job's own costs beyond its findings' repairs, minor units of the site's currency. */
		accessCost: money('access_cost_minor').notNull().default(0),
		scaffoldCost: money('scaffold_cost_minor').notNull().default(0),
		shutdownCost: money('shutdown_cost_minor').notNull().default(0),
		otherCost: money('other_cost_minor').notNull().default(0),
		/** What the other cost is for. */
		otherCostLabel: varchar('other_cost_label', { length: 120 }),
		createdBy: uuid('created_by').references(() => users.id),
		sortOrder: int('sort_order').notNull().default(0),
		deletedAt: at('deleted_at'),
		version: version(),
		changeSeq: changeSeq(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [index('measures_survey_idx').on(t.surveyId)]
);

/**
 * One observation on a survey. The id is made on the device (UUID) so an offline record
 * keeps its identity through sync. `inputs` holds the kind-specific field data validated by
 * $lib/schemas/finding; `results` holds what the server computed from them with the shared
 * engine (the server never stores a loss the device computed).
 */
export const findings = mysqlTable(
	'findings',
	{
		id: id(),
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id),
		/** trap | leak | insulation | header */
		kind: word('kind').notNull(),
		assetId: uuid('asset_id').references(() => assets.id),
		headerId: uuid('header_id').references(() => headers.id),
		areaId: uuid('area_id').references(() => areas.id),
		location: varchar('location', { length: 255 }),
		notes: text('notes'),
		/**
		 * The capture's photo ids (made on the device), in the order taken. A photo is listed
		 * here before its bytes arrive; the photos table holds the ones uploaded.
		 */
		photoIds: json('photo_ids').$type<string[]>(),
		inputs: json('inputs').$type<Record<string, unknown>>().notNull(),
		/** The trap's condition (or a leak's size class): the Desk filters by it. */
		condition: word('condition'),
		/**
		 * What the server's engine made of the inputs and header, independent of the cost basis
		 * (a new basis re-prices without it moving): `flows` holds the few numbers the money is
		 * priced from (read alone when a site re-prices), `physics` the rest (state, notes,
		 * assumptions, cautions). Joined again by $lib/server/pricing/stored.
		 */
		flows: json('flows').$type<PhysicsFlows>(),
		physics: json('physics').$type<PhysicsDetail>(),
		/** Engine version that computed `physics`. */
		physicsEngine: varchar('physics_engine', { length: 32 }),
		/** Engine version that priced the figures below; null: not priced. */
		resultsEngine: varchar('results_engine', { length: 32 }),
		/** The cost basis (a row of cost_bases) the figures below were priced on. */
		pricedBasisId: uuid('priced_basis_id').references(() => costBases.id),
		pricedAt: at('priced_at'),
		/** Why there are no figures (the engine refused the inputs, or the site has no basis). */
		pricingNote: varchar('pricing_note', { length: 255 }),
		/** Figures lists sort and total by, all per year at the site's hours. Steam lost, kg/h. */
		steamLoss: double('steam_kg_h'),
		/** Heat the boiler replaces, kW. */
		heatLoss: double('heat_kw'),
		/** Fuel energy per year, GJ. */
		fuelEnergy: double('fuel_gj'),
		/** Fuel and water cost per year, minor units of the basis currency. */
		cost: money('cost_minor'),
		/** kg CO2 per year. */
		co2: double('co2_kg'),
		/** Makeup water per year, m³. */
		water: double('water_m3'),
		/** Simple payback of the repair, years; null without a repair cost or saving. */
		paybackYears: double('payback_years'),
		repairCost: money('repair_cost_minor'),
		/** Where the repair cost came from: library | edited | quote; null: no cost. */
		repairCostSource: word('repair_cost_source'),
		/** A quote's reference (supplier, number, date) or an edited figure's reason. */
		repairCostNote: varchar('repair_cost_note', { length: 160 }),
		/** The library entry (and its version) a library cost was priced from. */
		costEntryId: uuid('cost_entry_id').references(() => costEntries.id),
		costEntryVersion: int('cost_entry_version'),
		measureId: uuid('measure_id').references(() => measures.id),
		/** Lifecycle only: draft | reviewed | published. A client's decision lives in `decisions`. */
		status: word('status').notNull().default('draft'),
		recordedBy: uuid('recorded_by').references(() => users.id),
		/** The capture's createdAt: when the device recorded it. */
		recordedAt: at('recorded_at'),
		/**
		 * The capture's updatedAt: when the device last changed it (updated_at also moves when the
		 * Desk reviews the finding, which is no change to the capture).
		 */
		capturedAt: at('captured_at'),
		/** A consultant checked the capture and its figures at the Desk. */
		reviewedAt: at('reviewed_at'),
		reviewedBy: uuid('reviewed_by').references(() => users.id),
		deletedAt: at('deleted_at'),
		version: version(),
		changeSeq: changeSeq(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [
		index('findings_survey_idx').on(t.surveyId),
		index('findings_asset_idx').on(t.assetId),
		index('findings_change_idx').on(t.surveyId, t.changeSeq),
		// A pull reads findings of many surveys after one cursor, in counter order.
		index('findings_seq_idx').on(t.changeSeq),
		// The Desk's table sorts a survey's findings by these most often.
		index('findings_survey_cost_idx').on(t.surveyId, t.cost),
		index('findings_survey_status_idx').on(t.surveyId, t.status),
		index('findings_measure_idx').on(t.measureId)
	]
);

/**
 * A photo of a finding; the bytes live in photo storage under `storageKey`. A photo may arrive
 * before its finding's push (docs/sync.md), so `finding_id` has no foreign key; the survey and
 * firm do, and carry the photo's authorization.
 */
export const photos = mysqlTable(
	'photos',
	{
		id: id(),
		findingId: uuid('finding_id').notNull(),
		surveyId: uuid('survey_id')
			.notNull()
			.references(() => surveys.id),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		storageKey: varchar('storage_key', { length: 255 }).notNull(),
		contentType: varchar('content_type', { length: 64 }).notNull(),
		bytes: int('bytes').notNull(),
		width: int('width'),
		height: int('height'),
		sha256: varchar('sha256', { length: 64 }).notNull(),
		caption: varchar('caption', { length: 255 }),
		uploadedBy: uuid('uploaded_by').references(() => users.id),
		takenAt: at('taken_at'),
		deletedAt: at('deleted_at'),
		changeSeq: changeSeq(),
		createdAt: createdAt()
	},
	(t) => [index('photos_finding_idx').on(t.findingId), index('photos_survey_idx').on(t.surveyId)]
);

export type FindingRow = typeof findings.$inferSelect;
export type SurveyRow = typeof surveys.$inferSelect;
