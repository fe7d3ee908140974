import { and, eq, isNull, sql } from 'drizzle-orm';
import { findingCaptureSchema } from '../../schemas/capture';
import { findingSchema } from '../../schemas/finding';
import type { CostBasis } from '../../schemas/site';
import { evaluateFinding } from '../../steam/index';
import { ENGINE_VERSION } from '../../steam/version';
import { assetForCapture } from '../assets';
import { captureColumns } from '../walk/capture-row';
import * as schema from '../db/schema';
import type { Db } from '../db/types';
import { demoAreas } from './areas';
import { demoSites } from './demo';
import { captureOf } from './demo-finding';
import {
	creameryCostBasis,
	demoFindings,
	demoPublishedSurvey,
	paperMillCostBasis
} from './findings';
import { registerTrap } from './traps';

const costBases: Record<string, CostBasis> = {
	[demoSites[0].id]: creameryCostBasis,
	[demoSites[1].id]: paperMillCostBasis
};

/**
 * Cost bases (only where a site has none yet), areas, the published spring survey, and priced
 * findings with their traps. Each trap capture goes through assetForCapture, as a synced one
 * would: the first test of a tag creates its asset (with the register's fixed id), later ones
 * update its details only when they changed, so a second run changes nothing.
 */
export async function seedDemoFindings(db: Db): Promise<void> {
	const { sites, areas, surveys, findings } = schema;
	for (const [siteId, costBasis] of Object.entries(costBases)) {
		await db
			.update(sites)
			.set({ costBasis })
			.where(and(eq(sites.id, siteId), isNull(sites.costBasis)));
	}
	const keep = { set: { id: sql`id` } };
	await db.insert(surveys).values(demoPublishedSurvey).onDuplicateKeyUpdate(keep);
	await db.insert(areas).values(demoAreas).onDuplicateKeyUpdate(keep);

	const site = demoSites[0];
	const headers = site.headers.map(({ id, name, pressure }) => ({ id, name, pressure }));
	await db.transaction(async (tx) => {
		for (const raw of demoFindings) {
			const finding = findingSchema.parse(raw);
			const capture = findingCaptureSchema.parse(captureOf(raw));
			const newAssetId = capture.assetTag ? registerTrap(capture.assetTag).assetId : undefined;
			const asset = await assetForCapture(tx, site.id, capture, newAssetId);
			const results = evaluateFinding(finding, { costBasis: creameryCostBasis, headers });
			await tx
				.insert(findings)
				.values({
					...captureColumns(capture, asset?.id ?? null),
					id: capture.id,
					surveyId: capture.surveyId,
					results: JSON.parse(JSON.stringify(results)),
					resultsEngine: ENGINE_VERSION,
					repairCost: finding.repairCost ?? null,
					status: finding.status
				})
				.onDuplicateKeyUpdate(keep);
		}
	});
}
