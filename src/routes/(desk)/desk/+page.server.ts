import { firmSurveys } from '$lib/server/surveys';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
	return { surveys: await firmSurveys(locals.user!.firmId) };
};
