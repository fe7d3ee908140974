import {
	boolean,
	char,
	double,
	index,
	int,
	mysqlTable,
	uniqueIndex,
	varchar
} from 'drizzle-orm/mysql-core';
import { at, createdAt, id, money, updatedAt, uuid, version, word } from './columns';
import { firms, users } from './tenancy';

/**
 * The firm's cost library (docs/costs.md): what one repair costs, by what a finding records.
 * One typed row per entry; `entry_key` is the entry's identity inside the firm
 * (`trap-repair:thermodynamic:15`, `insulation:50:40`, `labour`…), made by
 * $lib/costs/keys from the typed columns, so a finding is matched on one indexed equality.
 * Every change bumps `version` and writes an audit row (before/after), and a finding priced
 * from an entry keeps the entry's id and version: where a figure came from stays traceable.
 */
export const costEntries = mysqlTable(
	'cost_entries',
	{
		id: id(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		/** trap-repair | trap-replacement | insulation | fitting-cover | leak-repair | labour */
		kind: word('kind').notNull(),
		entryKey: varchar('entry_key', { length: 96 }).notNull(),
		/** Trap entries: the trap type. */
		trapType: word('trap_type'),
		/** Trap, insulation and fitting entries: nominal size DN. */
		dn: int('dn'),
		/** Insulation: total proposed thickness, mm. */
		thicknessMm: int('thickness_mm'),
		/** Fitting cover: valve | flange-pair. */
		fittingKind: word('fitting_kind'),
		/** Leak repair: the size class. */
		sizeClass: word('size_class'),
		/** ISO 4217 currency of the figures below. */
		currency: char('currency', { length: 3 }).notNull(),
		/**
		 * Material and parts per unit (one trap, one metre, one cover, one leak), minor units; for
		 * the labour entry, the rate per hour.
		 */
		unitCost: money('unit_cost_minor').notNull(),
		/** Labour hours per unit, charged at the firm's labour entry of the same currency. */
		labourHours: double('labour_hours'),
		/** Invented demonstration figures (the seed's), shown as "demo values". */
		demo: boolean('demo').notNull().default(false),
		note: varchar('note', { length: 255 }),
		updatedBy: uuid('updated_by').references(() => users.id),
		deletedAt: at('deleted_at'),
		version: version(),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [
		uniqueIndex('cost_entries_key_uq').on(t.firmId, t.entryKey),
		index('cost_entries_firm_kind_idx').on(t.firmId, t.kind)
	]
);

export type CostEntryRow = typeof costEntries.$inferSelect;
