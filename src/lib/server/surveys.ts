import { asc, desc, eq } from 'drizzle-orm';
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
