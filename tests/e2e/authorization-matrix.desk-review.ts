/** Authorization matrix entries for the Desk's the findings review, its API and conflicts (see authorization-matrix.table.ts). */
import { type Case, deskAction, deskPage, mine } from './support/matrix-kit';
import { findingCostOperations } from './authorization-matrix.costs';
import type { Tenant } from './support/tenants';

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
		},
		// No measure chosen: refused (400) before anything is read or written.
		'POST ?/addToMeasure': {
			request: (t) => ({
				path: `/desk/surveys/${t.surveyId}/findings`,
				form: { measureId: '', findingIds: noSuchFinding }
			}),
			expect: deskAction({ own: 400, other: 404 }, { own: 400, other: 404 })
		}
	}
};
// ── end helper-table ─────────────────────────────────────────────────────────────────────

// ── helper-detail: one finding in detail, and sync conflicts ─────────────────────────────
const findingPath = (t: Tenant) => `/desk/surveys/${t.findingSurveyId}/findings/${t.findingId}`;
const conflictsPath = (t: Tenant) => `/desk/surveys/${t.findingSurveyId}/conflicts`;
const conflictPath = (t: Tenant) => `${conflictsPath(t)}/${t.conflictId}`;
/** An action refused before anything is written (own firm), hidden across firms. */
const refusedAction = deskAction({ own: 400, other: 404 }, { own: 400, other: 404 });
const staffPage = { ...deskPage, admin: mine, consultant: mine };

const findingDetail: Record<string, Record<string, Case>> = {
	'/(desk)/desk/surveys/[surveyId]/findings/[findingId]': {
		GET: { request: (t) => ({ path: findingPath(t) }), expect: staffPage },
		...findingCostOperations,
		// Only the version: every input is missing, so the edit is refused field by field.
		'POST ?/edit': {
			request: (t) => ({ path: findingPath(t), form: { version: '1' } }),
			expect: refusedAction
		},
		// The brewhouse survey is published, so its findings are frozen (docs/publishing.md): the
		// firm's staff are refused with 409 and nothing changes; other firms' people get 404.
		'POST ?/review': {
			request: (t) => ({ path: findingPath(t), form: { reviewed: 'no' } }),
			expect: deskAction({ own: 409, other: 404 }, { own: 409, other: 404 })
		}
	},
	'/(desk)/desk/surveys/[surveyId]/conflicts': {
		GET: { request: (t) => ({ path: conflictsPath(t) }), expect: staffPage }
	},
	'/(desk)/desk/surveys/[surveyId]/conflicts/[conflictId]': {
		GET: { request: (t) => ({ path: conflictPath(t) }), expect: staffPage },
		// Version 0 is no version a finding has: refused before anything is settled.
		'POST ?/keepServer': {
			request: (t) => ({ path: conflictPath(t), form: { version: '0' } }),
			expect: refusedAction
		},
		'POST ?/keepDevice': {
			request: (t) => ({ path: conflictPath(t), form: { version: '0' } }),
			expect: refusedAction
		},
		'POST ?/merge': {
			request: (t) => ({ path: conflictPath(t), form: { version: '0' } }),
			expect: refusedAction
		}
	}
};
// ── end helper-detail ────────────────────────────────────────────────────────────────────

export const deskReviewMatrix: Record<string, Record<string, Case>> = {
	...reviewTable,
	...findingDetail
};
