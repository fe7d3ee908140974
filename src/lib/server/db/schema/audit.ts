import { bigint, index, json, mysqlTable, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, uuid } from './columns';
import { firms, users } from './tenancy';

/** Who changed what, when: every write through the app appends one row. */
export const auditLog = mysqlTable(
	'audit_log',
	{
		id: bigint('id', { mode: 'number', unsigned: true }).autoincrement().primaryKey(),
		firmId: uuid('firm_id').references(() => firms.id),
		actorId: uuid('actor_id').references(() => users.id),
		/** e.g. finding, survey, site, user */
		entity: varchar('entity', { length: 32 }).notNull(),
		entityId: varchar('entity_id', { length: 64 }).notNull(),
		/** e.g. create, update, delete, publish, decide, invite, sign-in */
		action: varchar('action', { length: 32 }).notNull(),
		before: json('before'),
		after: json('after'),
		address: varchar('address', { length: 64 }),
		/** The device a synced change came from (docs/sync.md); null for changes made in a page. */
		deviceId: uuid('device_id'),
		createdAt: createdAt()
	},
	(t) => [
		index('audit_entity_idx').on(t.entity, t.entityId),
		index('audit_firm_idx').on(t.firmId, t.createdAt)
	]
);

/**
 * Mutations already applied from devices, by the device's mutation id: a replayed push finds
 * its id here and changes nothing (idempotent sync).
 */
export const appliedMutations = mysqlTable('applied_mutations', {
	id: uuid('id').primaryKey(),
	userId: uuid('user_id')
		.notNull()
		.references(() => users.id),
	/** The device that sent it, and the firm it was applied in (null for rows before sync). */
	deviceId: uuid('device_id'),
	firmId: uuid('firm_id').references(() => firms.id),
	/** The first answer given, returned again to a replay. */
	outcome: json('outcome'),
	createdAt: createdAt()
});

/** Per-firm monotonic counter handing out change_seq values for the pull cursor. */
export const changeCounters = mysqlTable('change_counters', {
	firmId: uuid('firm_id')
		.primaryKey()
		.references(() => firms.id),
	value: bigint('value', { mode: 'number', unsigned: true }).notNull().default(0)
});
