/**
 * The server's own figures for a finding: the engine run on the stored capture with the site's
 * cost basis and header list (a device's numbers are never taken). A site without a valid cost
 * basis, or a capture the engine refuses, stores no figures; the finding itself is kept.
 */
import type { FindingCapture } from '../../schemas/capture';
import type { ServerResults } from '../../schemas/sync';
import { fromMinorUnits } from '../../steam/index';
import type { Executor } from '../db/types';
import { pricingContext, type PricingContext } from '../pricing/context';
import { figureColumns, type FigureColumns } from '../pricing/figures';

/** What pricing and placing a capture needs from its site, read once per push. */
export type SiteFacts = PricingContext;

export function siteFacts(tx: Executor, siteId: string): Promise<SiteFacts> {
	return pricingContext(tx, siteId);
}

/**
 * siteFacts read once per push: later mutations of the batch share the first read. A failed
 * read is not kept, so the retried mutation reads again.
 */
export function siteFactsOnce(
	tx: Executor,
	cache: Map<string, Promise<SiteFacts>>,
	siteId: string
): Promise<SiteFacts> {
	let facts = cache.get(siteId);
	if (!facts) {
		facts = siteFacts(tx, siteId).catch((e: unknown) => {
			cache.delete(siteId);
			throw e;
		});
		cache.set(siteId, facts);
	}
	return facts;
}

/** Why the capture cannot be stored on this site (a header or area of another), or null. */
export function misplaced(site: SiteFacts, c: FindingCapture): string | null {
	if (c.headerId && !site.headers.some((h) => h.id === c.headerId)) {
		return 'The header this finding names is not one of this site’s headers';
	}
	if (c.areaId && !site.areaIds.has(c.areaId)) {
		return 'The area this finding names is not one of this site’s areas';
	}
	return null;
}

/**
 * The engine run on the capture with the site's cost basis and headers: physics and money
 * columns. A site without a valid cost basis, or a capture the engine refuses, gets no
 * figures (and the reason); the finding is kept.
 */
export function priceCapture(
	site: SiteFacts,
	capture: FindingCapture,
	repairCost: number | null
): FigureColumns {
	return figureColumns(site, repairCost === null ? capture : { ...capture, repairCost });
}

/** The stored figures a device is sent back on pull (serverResultsSchema), or null. */
export function figuresForDevice(
	f: {
		resultsEngine: string | null;
		steamLoss: number | null;
		heatLoss: number | null;
		fuelEnergy: number | null;
		cost: number | null;
		co2: number | null;
		water: number | null;
	},
	currency: string
): ServerResults | null {
	if (!f.resultsEngine || f.heatLoss === null || f.cost === null) return null;
	return {
		engine: f.resultsEngine,
		steamLoss: f.steamLoss,
		heatLoss: f.heatLoss,
		fuelEnergy: f.fuelEnergy ?? 0,
		cost: fromMinorUnits(f.cost, currency),
		currency,
		co2: f.co2 ?? 0,
		water: f.water ?? 0
	};
}
