/**
 * The firm's change counter: every synced write takes the next value as its change_seq, so a
 * device's pull cursor sees each change once and in order.
 */
import { and, eq, sql } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { changeCounters, sites, surveyAuditors, syncTombstones } from '../db/schema';
import type { Executor, Tx } from '../db/types';

/**
 * Next change_seq of the firm, inside the caller's transaction. The counter row stays locked
 * until that transaction commits, so per firm the values are unique and handed out in commit
 * order (a pull never skips a change committed later with a smaller number).
 */
export async function nextChangeSeq(tx: Tx, firmId: string): Promise<number> {
	await tx
		.insert(changeCounters)
		.values({ firmId, value: 0 })
		.onDuplicateKeyUpdate({ set: { firmId: sql`firm_id` } });
	const [row] = await tx
		.select({ value: changeCounters.value })
		.from(changeCounters)
		.where(eq(changeCounters.firmId, firmId))
		.for('update');
	const next = Number(row.value) + 1;
	await tx.update(changeCounters).set({ value: next }).where(eq(changeCounters.firmId, firmId));
	return next;
}

/**
 * Moves the firm's counter on by one with no row taking the value (a pull's cursor only ever
 * lands on values rows carry, so it skips it). For writes that change what the Desk lists
 * without giving rows a change_seq of their own — a review, a site re-priced or recomputed in
 * batches — so the review table's cached views (keyed on the counter,
 * $lib/server/desk/findings-cache) expire. Inside a transaction it locks the counter row until
 * commit, as nextChangeSeq does; after batches, call it on its own.
 */
export async function touchFirm(db: Executor, firmId: string): Promise<void> {
	await db
		.insert(changeCounters)
		.values({ firmId, value: 1 })
		.onDuplicateKeyUpdate({ set: { value: sql`${changeCounters.value} + 1` } });
}

/** touchFirm for the firm that owns the site. */
export async function touchSiteFirm(db: Executor, siteId: string): Promise<void> {
	const [site] = await db.select({ firmId: sites.firmId }).from(sites).where(eq(sites.id, siteId));
	if (site) await touchFirm(db, site.firmId);
}

/**
 * Takes an auditor off a survey and leaves a tombstone for their devices to drop it on the
 * next pull. Returns false when they were not assigned (nothing written).
 */
export async function unassignAuditor(
	tx: Tx,
	firmId: string,
	surveyId: string,
	userId: string
): Promise<boolean> {
	const where = and(eq(surveyAuditors.surveyId, surveyId), eq(surveyAuditors.userId, userId));
	const [hit] = await tx.select().from(surveyAuditors).where(where).for('update');
	if (!hit) return false;
	await tx.delete(surveyAuditors).where(where);
	const changeSeq = await nextChangeSeq(tx, firmId);
	await tx.insert(syncTombstones).values({
		id: randomUUID(),
		firmId,
		userId,
		entity: 'survey',
		entityId: surveyId,
		changeSeq
	});
	return true;
}
