import { error } from '@sveltejs/kit';
import { listConflicts } from '$lib/server/desk/finding-pages';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const access = await requireSurveyAccess(user, event.params.surveyId, 'read');
	return (await listConflicts(user, access.id)) ?? error(404, 'Not found.');
};
