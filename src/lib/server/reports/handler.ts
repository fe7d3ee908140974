/**
 * The one GET handler of the three report routes (docs/reports.md), so they can never differ
 * in who may ask: the Ladder's capability, then read access to the survey — exactly as the
 * savings list (docs/savings.md): 401 nobody, 403 auditors, 404 for a survey hidden from the
 * reader; then 400 for a query it cannot read, 404 for a revision it does not have.
 */
import { error, type RequestEvent } from '@sveltejs/kit';
import { readReportQuery } from '../../schemas/reports';
import { db } from '../db';
import { requireRole, requireSurveyAccess } from '../policy';
import { reportBody, reportHeaders, surveyReport, type ReportFormat } from './report';

export function reportHandler(format: ReportFormat) {
	return async (event: RequestEvent<{ id: string }>): Promise<Response> => {
		const user = requireRole(event, 'ladder.open');
		const survey = await requireSurveyAccess(user, event.params.id, 'read');
		const read = readReportQuery(event.url.searchParams);
		if (!read.ok) error(400, read.message);
		const outcome = await surveyReport(db, user, survey.id, read.query.revision);
		if (!outcome) error(404, 'Not found.');
		if (!outcome.ok) error(404, outcome.message);
		return new Response(reportBody(format, outcome.content, { db }), {
			headers: reportHeaders(format, outcome.content)
		});
	};
}
