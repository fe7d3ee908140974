import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import { db } from './db';
import { clientCompanies, sites, surveyAuditors, surveys, users } from './db/schema';
import { waitingConflictsSql } from './desk/surveys';

const findingCount = sql<number>`(SELECT COUNT(*) FROM findings f
	WHERE f.survey_id = ${surveys.id} AND f.deleted_at IS NULL)`;

/**
 * Surveys of one firm with their site and client, who records on each, how many findings and
 * waiting conflicts each has; newest first (the Desk's overview).
 */
export async function firmSurveys(firmId: string) {
	const rows = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			status: surveys.status,
			startsOn: surveys.startsOn,
			endsOn: surveys.endsOn,
			siteId: sites.id,
			site: sites.name,
			client: clientCompanies.name,
			findings: findingCount,
			waitingConflicts: waitingConflictsSql
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.where(eq(surveys.firmId, firmId))
		.orderBy(desc(surveys.startsOn), asc(surveys.name), asc(surveys.id));
	const assigned =
		rows.length === 0
			? []
			: await db
					.select({ surveyId: surveyAuditors.surveyId, name: users.name })
					.from(surveyAuditors)
					.innerJoin(users, eq(users.id, surveyAuditors.userId))
					.where(
						and(
							eq(users.firmId, firmId),
							inArray(
								surveyAuditors.surveyId,
								rows.map((r) => r.id)
							)
						)
					)
					.orderBy(asc(users.name));
	return rows.map((r) => ({
		...r,
		findings: Number(r.findings),
		waitingConflicts: Number(r.waitingConflicts),
		auditors: assigned.filter((a) => a.surveyId === r.id).map((a) => a.name)
	}));
}
