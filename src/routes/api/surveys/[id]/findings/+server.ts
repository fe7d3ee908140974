import { error } from '@sveltejs/kit';
import { readFindingsQuery } from '$lib/schemas/desk-findings';
import { surveyFindings } from '$lib/server/desk/findings-table';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { privateJson } from '$lib/server/walk/respond';
import type { RequestHandler } from './$types';

/**
 * The Desk's review table: one page of a survey's findings sorted, filtered and totalled
 * (docs/desk.md, "Review table"). Staff of the survey's firm; 404 when hidden, 400 for a
 * parameter it cannot read.
 */
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.manage');
	const survey = await requireSurveyAccess(user, event.params.id, 'write');
	const read = readFindingsQuery(event.url.searchParams);
	if (!read.ok) error(400, read.message);
	const page = await surveyFindings(survey.id, read.query);
	if (!page) error(404, 'Not found.');
	return privateJson(page);
};
