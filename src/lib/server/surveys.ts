import { and, asc, desc, eq, isNotNull } from 'drizzle-orm';
import { db } from './db';
import { clientCompanies, sites, surveys } from './db/schema';

/** Surveys of one firm with their site and client, newest first (Desk overview). */
export function firmSurveys(firmId: string) {
	return db
		.select({
			id: surveys.id,
			name: surveys.name,
			status: surveys.status,
			startsOn: surveys.startsOn,
			endsOn: surveys.endsOn,
			site: sites.name,
			client: clientCompanies.name
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.where(eq(surveys.firmId, firmId))
		.orderBy(desc(surveys.startsOn), asc(surveys.name));
}

/** Published surveys of one client company's sites (Ladder overview). */
export function publishedSurveysForClient(firmId: string, clientCompanyId: string) {
	return db
		.select({
			id: surveys.id,
			name: surveys.name,
			site: sites.name,
			publishedAt: surveys.publishedAt
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(
			and(
				eq(surveys.firmId, firmId),
				eq(sites.clientCompanyId, clientCompanyId),
				isNotNull(surveys.publishedAt)
			)
		)
		.orderBy(desc(surveys.publishedAt));
}
