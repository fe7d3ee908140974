import { sql } from 'drizzle-orm';
import type { Db } from '../db/types';
import { hashPassword } from '../auth/password';
import * as schema from '../db/schema';
import { demoClients, demoFirms, demoPassword, demoSites, demoSurveys, demoUsers } from './demo';
import { renameOldDemoPlaces } from './renames';
import { seedCosts } from './seed-costs';
import { seedConflicts, seedMaltings } from './seed-desk';
import { seedDemoFindings } from './seed-findings';
import { seedPublishedRevisions } from './seed-revisions';

/**
 * Writes the demo scenario. Idempotent: rows have fixed ids and existing rows are left as
 * people may have edited them (only missing rows are inserted).
 */
export async function seedDemo(db: Db): Promise<void> {
	const { firms, clientCompanies, users, sites, headers, surveys, surveyAuditors } = schema;
	const keep = { set: { id: sql`id` } };
	await renameOldDemoPlaces(db);
	for (const f of demoFirms) {
		await db
			.insert(firms)
			.values({ id: f.id, name: f.name, defaultCurrency: f.currency, defaultUnitSystem: f.units })
			.onDuplicateKeyUpdate(keep);
	}
	await db
		.insert(clientCompanies)
		.values([...demoClients])
		.onDuplicateKeyUpdate(keep);

	const passwordHash = await hashPassword(demoPassword);
	for (const u of demoUsers) {
		await db
			.insert(users)
			.values({ ...u, clientCompanyId: u.clientCompanyId ?? null, passwordHash })
			.onDuplicateKeyUpdate(keep);
	}
	for (const { headers: list, ...site } of demoSites) {
		const firm = demoFirms.find((f) => f.id === site.firmId)!;
		await db
			.insert(sites)
			.values({ ...site, unitSystem: firm.units, currency: firm.currency })
			.onDuplicateKeyUpdate(keep);
		for (const h of list) {
			await db
				.insert(headers)
				.values({ ...h, siteId: site.id })
				.onDuplicateKeyUpdate(keep);
		}
	}
	for (const { auditorIds, ...survey } of demoSurveys) {
		await db.insert(surveys).values(survey).onDuplicateKeyUpdate(keep);
		for (const userId of auditorIds) {
			await db
				.insert(surveyAuditors)
				.values({ surveyId: survey.id, userId })
				.onDuplicateKeyUpdate({ set: { userId: sql`user_id` } });
		}
	}
	await seedDemoFindings(db);
	await seedMaltings(db);
	await seedConflicts(db);
	await seedCosts(db);
	await seedPublishedRevisions(db);
}
