import { char, index, int, mysqlTable, primaryKey, varchar } from 'drizzle-orm/mysql-core';
import { at, createdAt } from './columns';

/**
 * Counters behind the abuse limits (sign-in, password-reset requests), one row per scope and
 * subject. They live in the database, not in a process, so every app server behind a load
 * balancer sees the same count. The subject (an e-mail address or a client address) is stored
 * only as its SHA-256, so the table does not collect addresses people mistyped.
 */
export const attemptCounters = mysqlTable(
	'attempt_counters',
	{
		/** e.g. sign-in:account, sign-in:address, reset:account, reset:address */
		scope: varchar('scope', { length: 24 }).notNull(),
		subjectHash: char('subject_hash', { length: 64 }).notNull(),
		/** Attempts counted in the current window (a success on the account scope clears it). */
		attempts: int('attempts').notNull().default(0),
		lastAttemptAt: at('last_attempt_at').notNull(),
		createdAt: createdAt()
	},
	(t) => [
		primaryKey({ columns: [t.scope, t.subjectHash] }),
		index('attempt_counters_last_idx').on(t.lastAttemptAt)
	]
);

/**
 * Keys the app signs with (the device cookies of sign-in, ../../auth/device.ts), made once at
 * random by the first process that needs one and shared by every process through the database.
 * STEAMWISP_SECRET, when set, is used instead and nothing is kept here.
 */
export const serverKeys = mysqlTable('server_keys', {
	name: varchar('name', { length: 32 }).primaryKey(),
	/** 32 random bytes, hex. */
	secret: char('secret', { length: 64 }).notNull(),
	createdAt: createdAt()
});
