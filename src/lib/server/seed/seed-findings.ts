import { and, eq, isNull, sql } from 'drizzle-orm';
import type { MySql2Database } from 'drizzle-orm/mysql2';
import { findingSchema } from '../../schemas/finding';
import type { CostBasis } from '../../schemas/site';
import { evaluateFinding } from '../../steam/index';
import { ENGINE_VERSION } from '../../steam/version';
import * as schema from '../db/schema';
import { demoSites } from './demo';
import {
	demoAssets,
	demoFindings,
	demoPublishedSurvey,
	millbeckCostBasis,
	orrinCostBasis
} from './findings';

const costBases: Record<string, CostBasis> = {
	[demoSites[0].id]: millbeckCostBasis,
	[demoSites[1].id]: orrinCostBasis
};

/** Cost bases (only where a site has none yet), assets, a published survey and priced findings. */
export async function seedDemoFindings(db: MySql2Database<typeof schema>): Promise<void> {
	const { sites, assets, surveys, findings } = schema;
	for (const [siteId, costBasis] of Object.entries(costBases)) {
		await db
			.update(sites)
			.set({ costBasis })
			.where(and(eq(sites.id, siteId), isNull(sites.costBasis)));
	}
	const keep = { set: { id: sql`id` } };
	await db.insert(surveys).values(demoPublishedSurvey).onDuplicateKeyUpdate(keep);
	await db.insert(assets).values(demoAssets).onDuplicateKeyUpdate(keep);

	const site = demoSites[0];
	const headers = site.headers.map(({ id, name, pressure }) => ({ id, name, pressure }));
	for (const raw of demoFindings) {
		const finding = findingSchema.parse(raw);
		const results = evaluateFinding(finding, { costBasis: millbeckCostBasis, headers });
		const assetId = demoAssets.find((a) => 'assetTag' in raw && a.tag === raw.assetTag)?.id ?? null;
		await db
			.insert(findings)
			.values({
				id: finding.id,
				surveyId: finding.surveyId,
				kind: finding.kind,
				assetId,
				headerId: finding.headerId ?? null,
				location: finding.location,
				notes: finding.notes,
				inputs: finding.inputs,
				results: JSON.parse(JSON.stringify(results)),
				resultsEngine: ENGINE_VERSION,
				repairCost: finding.repairCost ?? null,
				status: finding.status,
				recordedAt: new Date(finding.createdAt)
			})
			.onDuplicateKeyUpdate(keep);
	}
}
