/**
 * The Brackenford survey, seeded checked and ready to publish: the files that publish it put
 * it back afterwards for the files after them.
 */
import { rows, type Db } from './db';

export const brackenford = '5e7a0006-0000-4000-8000-000000000004';

/**
 * Back to the seeded state (checked, in review, not published, nothing decided), written past
 * the app, so the firm's change counter moves and kept views are read again.
 */
export async function unpublishBrackenford(db: Db): Promise<void> {
	for (const table of ['decision_digest_outbox', 'comments', 'decisions', 'survey_revisions']) {
		await rows(db, `DELETE FROM ${table} WHERE survey_id = ?`, [brackenford]);
	}
	await rows(
		db,
		`UPDATE surveys SET status = 'in-review', published_at = NULL, cost_basis_id = NULL
		 WHERE id = ?`,
		[brackenford]
	);
	await rows(
		db,
		'UPDATE change_counters SET value = value + 1 WHERE firm_id = (SELECT firm_id FROM surveys WHERE id = ?)',
		[brackenford]
	);
}
