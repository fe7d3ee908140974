import { error } from '@sveltejs/kit';
import { readSavingsQuery } from '$lib/schemas/savings';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { savingsPage } from '$lib/server/publish/savings-page';
import type { PageServerLoad } from './$types';

/**
 * The ranked savings list of a survey with its totals, Pareto chart and breakdown; the order is
 * the address's `rank` (the API's own parameter, so a view can be shared).
 */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'read');
	const read = readSavingsQuery(event.url.searchParams);
	if (!read.ok) error(400, read.message);
	const page = await savingsPage(user.id, survey.id, read.query.rank, read.query.revision);
	if (!page) error(404, 'Not found.');
	if ('missing' in page) error(404, page.missing);
	return page;
};
