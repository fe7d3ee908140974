/** Authorization matrix entries for publishing a survey (see authorization-matrix.table.ts). */
import { REVISION_NOTE_MAX } from '../../src/lib/schemas/publish';
import { type Case, deskAction, deskPage, mine } from './support/matrix-kit';
import type { Tenant } from './support/tenants';

const publishPath = (t: Tenant) => `/desk/surveys/${t.surveyId}/publish`;
/** Refused before anything is written (own firm), hidden across firms. */
const refused = deskAction({ own: 400, other: 404 }, { own: 400, other: 404 });

// The tenant's survey is in the field: a note over the limit is refused as bad input before
// anything is read, and a correction is refused because nothing is published — both harmless
// to repeat. Publishing itself, readiness and the lock: tests/integration/publish.spec.ts and
// tests/e2e/desk-publish.e2e.ts.
export const publishMatrix: Record<string, Record<string, Case>> = {
	// A published survey of the demo client's site: its users and the firm's staff see it; the
	// other firm's people 404; auditors have no Ladder (403).
	'/(ladder)/ladder/surveys/[surveyId]': {
		GET: {
			request: (t) => ({ path: `/ladder/surveys/${t.clientSurveyId}` }),
			expect: { anonymous: 'signin', admin: mine, consultant: mine, auditor: 403, client: mine }
		}
	},
	'/(desk)/desk/surveys/[surveyId]/publish': {
		GET: {
			request: (t) => ({ path: publishPath(t) }),
			expect: { ...deskPage, admin: mine, consultant: mine }
		},
		'POST ?/publish': {
			request: (t) => ({ path: publishPath(t), form: { note: 'x'.repeat(REVISION_NOTE_MAX + 1) } }),
			expect: refused
		},
		'POST ?/correct': {
			request: (t) => ({ path: publishPath(t), form: {} }),
			expect: refused
		}
	}
};
