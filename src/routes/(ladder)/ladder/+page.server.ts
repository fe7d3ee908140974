import { error } from '@sveltejs/kit';
import { readLadderQuery } from '$lib/schemas/ladder';
import { ladderPage, publishedSurveys } from '$lib/server/ladder';
import { requireRole } from '$lib/server/policy';
import type { PageServerLoad } from './$types';

/**
 * The Ladder: a client company's ranked savings across its published surveys (each site's most
 * recent one, at its last published revision), filtered by the address's query string so a view
 * can be shared; and the published surveys this person may see — a client user their own
 * company's, consultants and admins (previewing the Ladder) their firm's. Scopes come from the
 * policy module.
 */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'ladder.open');
	const read = readLadderQuery(event.url.searchParams);
	if (!read.ok) error(400, read.message);
	const [page, surveys] = await Promise.all([ladderPage(user, read.query), publishedSurveys(user)]);
	return { ...page, surveys, role: user.role };
};
