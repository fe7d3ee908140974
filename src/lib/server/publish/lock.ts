/**
 * The lock a publication puts on a survey's findings (docs/publishing.md): while the survey is
 * published — or closed after going to the client — nothing changes them, at the Desk (edit,
 * review, conflicts) or from a device, until a consultant opens a correction. Read inside the
 * writer's own transaction with a shared lock on the survey row, so a write and a publication
 * (which locks the row for update) never interleave: the snapshot and the lock see the same rows.
 */
import { sql } from 'drizzle-orm';
import { surveys } from '../db/schema';
import type { Tx } from '../db/types';

export const DESK_LOCKED_MESSAGE =
	'This survey is published to the client, so its findings are frozen: nothing was changed. ' +
	'To change them, open a correction on the survey’s publishing page.';

export const DEVICE_LOCKED_REASON =
	'This survey is published to the client, so its findings cannot change now: ask the consultant ' +
	'to open a correction (your change stays on this device until then)';

/** Whether a survey in this stage keeps its findings as published. */
export const lockedStage = (stage: string, everPublished: boolean): boolean =>
	stage === 'published' || (stage === 'closed' && everPublished);

/** True when the survey's findings are frozen by a publication (the survey row share-locked). */
export async function findingsFrozen(tx: Tx, surveyId: string): Promise<boolean> {
	// MariaDB has no FOR SHARE (Drizzle's `.for('share')`): its shared lock is LOCK IN SHARE MODE.
	const [rows] = (await tx.execute(
		sql`SELECT ${surveys.status} AS stage, ${surveys.publishedAt} IS NOT NULL AS published
			FROM ${surveys} WHERE ${surveys.id} = ${surveyId} LOCK IN SHARE MODE`
	)) as unknown as [{ stage: string; published: number | string }[]];
	const row = rows[0];
	return row ? lockedStage(row.stage, Number(row.published) === 1) : false;
}
