import { requireRole } from '$lib/server/policy';
import { firmSurveys } from '$lib/server/surveys';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	return { surveys: await firmSurveys(user.firmId) };
};
