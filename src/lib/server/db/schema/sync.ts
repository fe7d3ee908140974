import { bigint, index, json, mysqlTable, primaryKey } from 'drizzle-orm/mysql-core';
import { at, createdAt, id, uuid, word } from './columns';
import { firms, users } from './tenancy';

/**
 * A device's edit the server could not apply because its baseVersion was stale: kept whole
 * (never overwritten, never dropped) until the Desk resolves it. `data` is the device's capture,
 * null for a delete.
 */
export const findingConflicts = mysqlTable(
	'finding_conflicts',
	{
		id: id(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		surveyId: uuid('survey_id').notNull(),
		findingId: uuid('finding_id').notNull(),
		userId: uuid('user_id')
			.notNull()
			.references(() => users.id),
		deviceId: uuid('device_id').notNull(),
		mutationId: uuid('mutation_id').notNull().unique(),
		baseVersion: bigint('base_version', { mode: 'number', unsigned: true }).notNull(),
		serverVersion: bigint('server_version', { mode: 'number', unsigned: true }).notNull(),
		data: json('data'),
		createdAt: createdAt(),
		resolvedAt: at('resolved_at'),
		resolvedBy: uuid('resolved_by').references(() => users.id),
		/** kept-server | kept-device | merged: how the Desk settled it. */
		resolutionKind: word('resolution_kind'),
		/** What the Desk kept (the capture written, field by field choices), for the record. */
		resolution: json('resolution').$type<Record<string, unknown>>()
	},
	(t) => [index('finding_conflicts_survey_idx').on(t.surveyId, t.findingId)]
);

/**
 * Something a person (or everyone, user_id null) must drop from their device: a survey
 * unassigned from an auditor. Pulled like any other change, by change_seq.
 */
export const syncTombstones = mysqlTable(
	'sync_tombstones',
	{
		id: id(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		userId: uuid('user_id').references(() => users.id),
		/** survey | finding */
		entity: word('entity').notNull(),
		entityId: uuid('entity_id').notNull(),
		changeSeq: bigint('change_seq', { mode: 'number', unsigned: true }).notNull(),
		createdAt: createdAt()
	},
	(t) => [index('sync_tombstones_change_idx').on(t.firmId, t.changeSeq)]
);

/** When each device of each person last exchanged with the server (the Desk's sync state). */
export const syncDevices = mysqlTable(
	'sync_devices',
	{
		userId: uuid('user_id')
			.notNull()
			.references(() => users.id),
		deviceId: uuid('device_id').notNull(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		lastPushAt: at('last_push_at'),
		lastPullAt: at('last_pull_at'),
		createdAt: createdAt()
	},
	(t) => [
		primaryKey({ columns: [t.userId, t.deviceId] }),
		index('sync_devices_firm_idx').on(t.firmId)
	]
);
