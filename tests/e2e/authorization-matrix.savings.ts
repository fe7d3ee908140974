/** Authorization matrix entries for the ranked savings list (see authorization-matrix.table.ts). */
import type { Case } from './support/matrix-kit';
import { deskPage, mine } from './support/matrix-kit';

// A published survey of the demo client's site: staff of its firm and that client's users see
// its list; the other firm's people get 404; auditors have no business with savings (403).
// Client users and unpublished or other companies' surveys: tests/integration/savings.spec.ts.
export const savingsMatrix: Record<string, Record<string, Case>> = {
	'/(desk)/desk/surveys/[surveyId]/savings': {
		GET: {
			request: (t) => ({ path: `/desk/surveys/${t.clientSurveyId}/savings?rank=co2` }),
			expect: { ...deskPage, admin: mine, consultant: mine }
		}
	},
	'/api/surveys/[id]/savings': {
		GET: {
			request: (t) => ({ path: `/api/surveys/${t.clientSurveyId}/savings?rank=payback` }),
			expect: { anonymous: 401, admin: mine, consultant: mine, auditor: 403, client: mine }
		}
	}
};
