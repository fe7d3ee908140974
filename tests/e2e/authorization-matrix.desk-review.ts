/** Authorization matrix entries for the Desk's the findings review, its API and conflicts (see authorization-matrix.table.ts). */
import { type Case, deskAction, deskPage, mine } from './support/matrix-kit';

/** No finding has this id: the bulk review refuses it (400) without writing anything. */
const noSuchFinding = '00000000-0000-4000-8000-0000000000f1';

// ── helper-table: the review table, its API and its bulk review ──────────────────────────
const reviewTable: Record<string, Record<string, Case>> = {
	'/api/surveys/[id]/findings': {
		GET: {
			request: (t) => ({ path: `/api/surveys/${t.surveyId}/findings?sort=cost` }),
			expect: { anonymous: 401, admin: mine, consultant: mine, auditor: 403, client: 403 }
		}
	},
	'/(desk)/desk/surveys/[surveyId]/findings': {
		GET: {
			request: (t) => ({ path: `/desk/surveys/${t.surveyId}/findings` }),
			expect: { ...deskPage, admin: mine, consultant: mine }
		},
		'POST ?/review': {
			request: (t) => ({
				path: `/desk/surveys/${t.surveyId}/findings`,
				form: { findingIds: noSuchFinding, reviewed: 'yes' }
			}),
			expect: deskAction({ own: 400, other: 404 }, { own: 400, other: 404 })
		}
	}
};
// ── end helper-table ─────────────────────────────────────────────────────────────────────

export const deskReviewMatrix: Record<string, Record<string, Case>> = {
	...reviewTable
};
