/**
 * A survey row inside a writer's transaction: locked for update, and moved on in the firm's
 * change feed (devices pull it again, docs/sync.md). Shared by the Desk's survey changes and
 * publishing.
 */
import { and, eq, sql } from 'drizzle-orm';
import { surveys } from './db/schema';
import type { Tx } from './db/types';
import { nextChangeSeq } from './sync/counter';

/** The firm's survey row locked for update inside `tx`, or null when there is none. */
export async function lockSurvey(tx: Tx, firmId: string, surveyId: string) {
	const [row] = await tx
		.select()
		.from(surveys)
		.where(and(eq(surveys.id, surveyId), eq(surveys.firmId, firmId)))
		.for('update');
	return row ?? null;
}

/** The columns that move a survey on: its version and its place in the firm's feed. */
export async function bumpSurvey(tx: Tx, firmId: string) {
	return { version: sql`${surveys.version} + 1`, changeSeq: await nextChangeSeq(tx, firmId) };
}
