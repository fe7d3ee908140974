/**
 * The server's own figures for a finding: the engine run on the stored capture with the site's
 * cost basis and header list (a device's numbers are never taken). A site without a valid cost
 * basis, or a capture the engine refuses, stores no results; the finding itself is kept.
 */
import { eq } from 'drizzle-orm';
import type { FindingCapture } from '../../schemas/capture';
import { costBasisSchema } from '../../schemas/site';
import type { ServerResults } from '../../schemas/sync';
import { evaluateFinding } from '../../steam/index';
import { ENGINE_VERSION } from '../../steam/version';
import { headers, sites } from '../db/schema';
import type { Executor } from '../db/types';

export interface Priced {
	/** The engine's whole evaluation as stored in findings.results, or null. */
	results: Record<string, unknown> | null;
	engine: string | null;
}

export async function priceCapture(
	tx: Executor,
	siteId: string,
	capture: FindingCapture,
	repairCost: number | null
): Promise<Priced> {
	const [site] = await tx
		.select({ costBasis: sites.costBasis })
		.from(sites)
		.where(eq(sites.id, siteId))
		.limit(1);
	const basis = costBasisSchema.safeParse(site?.costBasis);
	if (!basis.success) return { results: null, engine: null };
	// Retired headers too: a finding keeps the header it was recorded on.
	const siteHeaders = await tx
		.select({
			id: headers.id,
			name: headers.name,
			pressure: headers.pressure,
			designTemperature: headers.designTemperature
		})
		.from(headers)
		.where(eq(headers.siteId, siteId));
	const list = siteHeaders.map((h) => ({
		id: h.id,
		name: h.name,
		pressure: h.pressure,
		...(h.designTemperature === null ? {} : { designTemperature: h.designTemperature })
	}));
	try {
		const finding = repairCost === null ? capture : { ...capture, repairCost };
		const evaluation = evaluateFinding(finding, { costBasis: basis.data, headers: list });
		return { results: JSON.parse(JSON.stringify(evaluation)), engine: ENGINE_VERSION };
	} catch {
		return { results: null, engine: null };
	}
}

/** The part of stored results a device is sent back on pull (serverResultsSchema). */
export function resultsForDevice(
	results: Record<string, unknown> | null,
	engine: string | null
): ServerResults | null {
	if (!results || !engine) return null;
	const cost = results.cost as { amount?: unknown; currency?: unknown } | undefined;
	const num = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? v : 0);
	return {
		engine,
		steamLoss: typeof results.steamLoss === 'number' ? results.steamLoss : null,
		heatLoss: num(results.heatLoss),
		fuelEnergy: num(results.fuelEnergy),
		cost: num(cost?.amount),
		currency: typeof cost?.currency === 'string' ? cost.currency : '',
		co2: num(results.co2),
		water: num(results.water)
	};
}
