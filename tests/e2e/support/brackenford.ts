/**
 * The seeded Brackenford survey (checked, in review, never published) that several browser
 * tests publish: put back for the files after them. Written past the app, so the firm's change
 * counter moves and kept views are read again.
 */
import { rows, type Db } from './db';

export const brackenford = '5e7a0006-0000-4000-8000-000000000004';

export async function unpublishBrackenford(db: Db): Promise<void> {
	await rows(db, 'DELETE FROM survey_revisions WHERE survey_id = ?', [brackenford]);
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
