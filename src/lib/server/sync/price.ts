/**
 * The server's own figures for a finding: the engine run on the stored capture with the site's
 * cost basis and header list (a device's numbers are never taken). A site without a valid cost
 * basis, or a capture the engine refuses, stores no results; the finding itself is kept.
 */
import { eq } from 'drizzle-orm';
import type { FindingCapture } from '../../schemas/capture';
import { costBasisSchema, type CostBasis } from '../../schemas/site';
import type { ServerResults } from '../../schemas/sync';
import { evaluateFinding, type Header } from '../../steam/index';
import { ENGINE_VERSION } from '../../steam/version';
import { areas, headers, sites } from '../db/schema';
import type { Executor } from '../db/types';

export interface Priced {
	/** The engine's whole evaluation as stored in findings.results, or null. */
	results: Record<string, unknown> | null;
	engine: string | null;
}

/** What pricing and placing a capture needs from its site, read once per push. */
export interface SiteFacts {
	costBasis: CostBasis | null;
	/** Every header of the site, retired ones too: a finding keeps the header it was recorded on. */
	headers: Header[];
	areaIds: Set<string>;
}

export async function siteFacts(tx: Executor, siteId: string): Promise<SiteFacts> {
	const [site] = await tx
		.select({ costBasis: sites.costBasis })
		.from(sites)
		.where(eq(sites.id, siteId))
		.limit(1);
	const basis = costBasisSchema.safeParse(site?.costBasis);
	const siteHeaders = await tx
		.select({
			id: headers.id,
			name: headers.name,
			pressure: headers.pressure,
			designTemperature: headers.designTemperature
		})
		.from(headers)
		.where(eq(headers.siteId, siteId));
	const siteAreas = await tx.select({ id: areas.id }).from(areas).where(eq(areas.siteId, siteId));
	return {
		costBasis: basis.success ? basis.data : null,
		headers: siteHeaders.map((h) => ({
			id: h.id,
			name: h.name,
			pressure: h.pressure,
			...(h.designTemperature === null ? {} : { designTemperature: h.designTemperature })
		})),
		areaIds: new Set(siteAreas.map((a) => a.id))
	};
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
 * The engine run on the capture with the site's cost basis and headers. A site without a
 * valid cost basis, or a capture the engine refuses, gets no results; the finding is kept.
 */
export function priceCapture(
	site: SiteFacts,
	capture: FindingCapture,
	repairCost: number | null
): Priced {
	if (!site.costBasis) return { results: null, engine: null };
	try {
		const finding = repairCost === null ? capture : { ...capture, repairCost };
		const evaluation = evaluateFinding(finding, {
			costBasis: site.costBasis,
			headers: site.headers
		});
		return { results: JSON.parse(JSON.stringify(evaluation)), engine: ENGINE_VERSION };
	} catch {
		return { results: null, engine: null };
	}
}

/** Stored figures as JSON_VALUE reads them (text, or null when absent). */
export type StoredFigures = Record<
	'steamLoss' | 'heatLoss' | 'fuelEnergy' | 'cost' | 'currency' | 'co2' | 'water',
	string | null
>;

/** The part of stored results a device is sent back on pull (serverResultsSchema). */
export function figuresForDevice(f: StoredFigures, engine: string | null): ServerResults | null {
	if (!engine || f.heatLoss === null) return null;
	const num = (v: string | null) => {
		const n = Number(v);
		return v !== null && Number.isFinite(n) ? n : 0;
	};
	return {
		engine,
		steamLoss: f.steamLoss === null || f.steamLoss === 'null' ? null : num(f.steamLoss),
		heatLoss: num(f.heatLoss),
		fuelEnergy: num(f.fuelEnergy),
		cost: num(f.cost),
		currency: f.currency ?? '',
		co2: num(f.co2),
		water: num(f.water)
	};
}
