import { sql } from 'drizzle-orm';
import { bigint, datetime, int, varchar } from 'drizzle-orm/mysql-core';

/**
 * Column helpers shared by every table.
 * - ids are UUID strings: records made on a device offline get their id there, so the
 *   server never renumbers anything a phone already holds.
 * - times are UTC with milliseconds (the server runs MariaDB at +00:00).
 * - vocabulary columns (kinds, statuses) are short strings whose allowed values live in the
 *   shared zod schemas ($lib/schemas), the one contract for device and server.
 */
export const uuid = (name: string) => varchar(name, { length: 36 });
export const id = () => uuid('id').primaryKey();
export const word = (name: string) => varchar(name, { length: 24 });

export const createdAt = () =>
	datetime('created_at', { mode: 'date', fsp: 3 })
		.notNull()
		.default(sql`CURRENT_TIMESTAMP(3)`);
export const updatedAt = () =>
	datetime('updated_at', { mode: 'date', fsp: 3 })
		.notNull()
		.default(sql`CURRENT_TIMESTAMP(3)`)
		.$onUpdate(() => new Date());
export const at = (name: string) => datetime(name, { mode: 'date', fsp: 3 });

/** Optimistic-concurrency version: bumped on every accepted change, compared on sync. */
export const version = () => int('version').notNull().default(1);
/** Position in the firm's change feed: the monotonic cursor the device pulls from. */
export const changeSeq = () =>
	bigint('change_seq', { mode: 'number', unsigned: true }).notNull().default(0);
/** Money in integer minor units of the site's currency (cents, pence…), never floating point. */
export const money = (name: string) => bigint(name, { mode: 'number' });
