/** Authorization matrix entries for the Desk's the findings review, its API and conflicts (see authorization-matrix.table.ts). */
import { type Case, mine } from './support/matrix-kit';

// ── helper-table: the review table, its API and its bulk review ──────────────────────────
const reviewTable: Record<string, Record<string, Case>> = {
	'/api/surveys/[id]/findings': {
		GET: {
			request: (t) => ({ path: `/api/surveys/${t.surveyId}/findings?sort=cost` }),
			expect: { anonymous: 401, admin: mine, consultant: mine, auditor: 403, client: 403 }
		}
	}
};
// ── end helper-table ─────────────────────────────────────────────────────────────────────

export const deskReviewMatrix: Record<string, Record<string, Case>> = {
	...reviewTable
};
