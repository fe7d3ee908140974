import { publishedSurveysForClient } from '$lib/server/surveys';
import type { PageServerLoad } from './$types';

export const load: PageServerLoad = async ({ locals }) => {
	const user = locals.user!;
	if (!user.clientCompanyId) return { surveys: [] };
	return { surveys: await publishedSurveysForClient(user.firmId, user.clientCompanyId) };
};
