import { error } from '@sveltejs/kit';
import { ladderSurveyDecisions } from '$lib/server/decisions/survey';
import { ladderSurveyPage } from '$lib/server/ladder';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import type { PageServerLoad } from './$types';

/**
 * One published survey for the client (the report-ready e-mail links here): the last published
 * revision's frozen figures, each finding and measure with its current decision and a link to
 * its page (docs/decisions.md). A client user sees only their own company's published surveys;
 * anything else is 404 (policy: requireSurveyAccess). Staff of the firm may preview it.
 */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'ladder.open');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'read');
	const page = await ladderSurveyPage(user, survey.id);
	if (!page) error(404, 'Not found.');
	const decisions = await ladderSurveyDecisions(
		survey.id,
		page.findings.map((f) => f.findingId)
	);
	return { ...page, ...decisions };
};
