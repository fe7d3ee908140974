import { error } from '@sveltejs/kit';
import { readSavingsQuery } from '$lib/schemas/savings';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { surveySavingsJson } from '$lib/server/savings/survey-savings';
import type { RequestHandler } from './$types';

/**
 * The ranked savings list (docs/savings.md): a survey's findings that save money, ranked by
 * annual saving, payback or CO2 avoided, with its measures, totals and a breakdown by kind and
 * area. Staff of the survey's firm, and the client company's users once the survey is published
 * (the Ladder's capability, then read access); 404 when hidden, 400 for a parameter it cannot
 * read. A client always gets the last published revision's frozen figures (also while a
 * correction is open); staff the live ones until it is published; `?revision=N` an earlier one.
 */
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'ladder.open');
	const survey = await requireSurveyAccess(user, event.params.id, 'read');
	const read = readSavingsQuery(event.url.searchParams);
	if (!read.ok) error(400, read.message);
	const reader = user.role === 'client' ? 'client' : 'staff';
	const out = await surveySavingsJson(survey.id, reader, read.query);
	if (!out) error(404, 'Not found.');
	if (!out.ok) error(404, out.message);
	return new Response(out.body, {
		headers: {
			'content-type': 'application/json',
			'content-length': String(out.body.byteLength),
			'cache-control': 'private, no-store'
		}
	});
};
