import { publishedSurveys } from '$lib/server/ladder';
import { requireRole } from '$lib/server/policy';
import type { PageServerLoad } from './$types';

/**
 * Published surveys this person may see: a client user their own company's, consultants and
 * admins (previewing the Ladder) their firm's. The scope comes from the policy module.
 */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'ladder.open');
	return { surveys: await publishedSurveys(user) };
};
