import { and, desc, eq, isNotNull } from 'drizzle-orm';
import { db } from '$lib/server/db';
import { sites, surveys } from '$lib/server/db/schema';
import { requireRole, surveyScope } from '$lib/server/policy';
import type { PageServerLoad } from './$types';

/**
 * Published surveys this person may see: a client user their own company's, consultants and
 * admins (previewing the Ladder) their firm's. The scope comes from the policy module.
 */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'ladder.open');
	const rows = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			site: sites.name,
			publishedAt: surveys.publishedAt
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(and(surveyScope(user), isNotNull(surveys.publishedAt)))
		.orderBy(desc(surveys.publishedAt));
	return { surveys: rows };
};
