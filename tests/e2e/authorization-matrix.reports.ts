/** Authorization matrix entries for a survey's reports (see authorization-matrix.table.ts). */
import type { Case } from './support/matrix-kit';
import { mine } from './support/matrix-kit';

// The savings list's rule (docs/reports.md): staff of the survey's firm and that client's users
// get the report of a published survey of the demo client's site; the other firm's people, asking
// for this firm's ids, get 404; auditors have no business with reports (403); nobody signed in 401.
// Unpublished surveys, other client companies and revisions: tests/integration/reports.spec.ts.
const report = (file: string): Record<string, Case> => ({
	GET: {
		request: (t) => ({ path: `/api/surveys/${t.clientSurveyId}/${file}` }),
		expect: { anonymous: 401, admin: mine, consultant: mine, auditor: 403, client: mine }
	}
});

export const reportsMatrix: Record<string, Record<string, Case>> = {
	'/api/surveys/[id]/report.pdf': report('report.pdf'),
	'/api/surveys/[id]/findings.xlsx': report('findings.xlsx'),
	'/api/surveys/[id]/findings.csv': report('findings.csv')
};
