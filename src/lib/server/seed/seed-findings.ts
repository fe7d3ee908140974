import { and, eq, isNull, sql } from 'drizzle-orm';
import { findingCaptureSchema } from '../../schemas/capture';
import { findingSchema } from '../../schemas/finding';
import type { CostBasis } from '../../schemas/site';
import { assetForCapture } from '../assets';
import { pricingContext } from '../pricing/context';
import { figureColumns } from '../pricing/figures';
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

/** Each demo site's first cost basis (fixed ids, so a rerun finds them). */
export const demoCostBases: { id: string; siteId: string; basis: CostBasis }[] = [
	{ id: '5e7a000b-0000-4000-8000-000000000001', siteId: demoSites[0].id, basis: creameryCostBasis },
	{ id: '5e7a000b-0000-4000-8000-000000000002', siteId: demoSites[1].id, basis: paperMillCostBasis }
];

/**
 * Cost bases (only where a site has none yet), areas, the published spring survey, and priced
 * findings with their traps. Each trap capture goes through assetForCapture, as a synced one
 * would: the first test of a tag creates its asset (with the register's fixed id), later ones
 * update its details only when they changed, so a second run changes nothing.
 */
export async function seedDemoFindings(db: Db): Promise<void> {
	const { sites, areas, surveys, findings, costBases } = schema;
	const keep = { set: { id: sql`id` } };
	for (const { id, siteId, basis } of demoCostBases) {
		// The site keeps its own atmosphere; the basis holds the money side.
		const { elevation: _e, atmosphericPressure: _p, ...money } = basis;
		await db
			.insert(costBases)
			.values({
				id,
				siteId,
				number: 1,
				basis: money,
				note: 'Agreed at the kick-off meeting (demo)'
			})
			.onDuplicateKeyUpdate(keep);
		await db
			.update(sites)
			.set({ costBasisId: id, currency: basis.currency })
			.where(and(eq(sites.id, siteId), isNull(sites.costBasisId)));
	}
	// The spring survey is with the client: it keeps the basis it was priced on.
	await db
		.insert(surveys)
		.values({ ...demoPublishedSurvey, costBasisId: demoCostBases[0].id })
		.onDuplicateKeyUpdate(keep);
	await db.insert(areas).values(demoAreas).onDuplicateKeyUpdate(keep);

	const site = demoSites[0];
	await db.transaction(async (tx) => {
		const context = await pricingContext(tx, site.id);
		for (const raw of demoFindings) {
			const finding = findingSchema.parse(raw);
			const capture = findingCaptureSchema.parse(captureOf(raw));
			const newAssetId = capture.assetTag ? registerTrap(capture.assetTag).assetId : undefined;
			const asset = await assetForCapture(tx, site.id, capture, newAssetId);
			await tx
				.insert(findings)
				.values({
					...captureColumns(capture, asset?.id ?? null),
					id: capture.id,
					surveyId: capture.surveyId,
					...figureColumns(context, finding),
					repairCost: finding.repairCost ?? null,
					status: finding.status,
					version: raw.version
				})
				.onDuplicateKeyUpdate(keep);
		}
	});
}
