/**
 * The Ladder's data. Every list goes through the policy module's scopes, so a client sees only
 * their own company's published surveys and the firm's people their firm's.
 */
import { and, desc, eq, isNotNull } from 'drizzle-orm';
import { db } from './db';
import { sites, surveys } from './db/schema';
import { surveyScope } from './policy';
import { ladderSurvey } from './publish/revisions';
import { unitSystemOf } from './walk/person';

/** Published surveys this person may see, newest publication first. */
export function publishedSurveys(user: SessionUser) {
	return db
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
}

/**
 * One survey as the Ladder shows it (the caller has checked read access): its last published
 * revision's frozen figures, biggest saving first, in the reader's unit system.
 */
export async function ladderSurveyPage(user: SessionUser, surveyId: string, limit = 100) {
	const [survey, unitSystem] = await Promise.all([
		ladderSurvey(surveyId, limit),
		unitSystemOf(db, user.id)
	]);
	return survey && { ...survey, unitSystem, limit };
}
