/**
 * What pricing a finding needs from its site, read once: the cost basis in force (the survey's
 * frozen one, else the site's current one) with the site's own atmosphere laid over it, the
 * physics side of the site (atmosphere, trap factors), every header (retired ones too: a
 * finding keeps the header it was recorded on) and the area ids.
 */
import { eq } from 'drizzle-orm';
import { costBasisSchema, type CostBasis } from '../../schemas/site';
import type { Header, PhysicsBasis } from '../../steam/index';
import { areas, costBases, headers, sites } from '../db/schema';
import type { Executor } from '../db/types';

export interface PricingContext {
	siteId: string;
	/** The cost_bases row figures are priced on; null: the site has none yet. */
	basisId: string | null;
	/** That basis, valid, with the site's atmosphere; null when there is none (or it is broken). */
	costBasis: CostBasis | null;
	physicsBasis: PhysicsBasis;
	headers: Header[];
	areaIds: Set<string>;
}

export interface SiteAtmosphere {
	elevation: number | null;
	atmosphericPressure: number | null;
}

/** The site's own atmosphere, as the engine's cost basis fields. */
export function atmosphereFields(
	site: SiteAtmosphere
): Pick<CostBasis, 'elevation' | 'atmosphericPressure'> {
	return {
		...(site.elevation === null ? {} : { elevation: site.elevation }),
		...(site.atmosphericPressure === null ? {} : { atmosphericPressure: site.atmosphericPressure })
	};
}

/** A stored basis with the site's atmosphere, validated; null when it does not validate. */
export function engineBasis(stored: unknown, site: SiteAtmosphere): CostBasis | null {
	if (stored === null || typeof stored !== 'object') return null;
	const { elevation: _e, atmosphericPressure: _p, ...rest } = stored as Record<string, unknown>;
	const parsed = costBasisSchema.safeParse({ ...rest, ...atmosphereFields(site) });
	return parsed.success ? parsed.data : null;
}

/** Header rows as the engine's headers. */
export function engineHeader(h: {
	id: string;
	name: string;
	pressure: number;
	designTemperature: number | null;
	operatingHours: number | null;
}): Header {
	return {
		id: h.id,
		name: h.name,
		pressure: h.pressure,
		...(h.designTemperature === null ? {} : { designTemperature: h.designTemperature }),
		...(h.operatingHours === null ? {} : { operatingHours: h.operatingHours })
	};
}

/**
 * The pricing context of a site; `basisId` names a frozen basis (a published survey's) to use
 * instead of the site's current one.
 */
export async function pricingContext(
	tx: Executor,
	siteId: string,
	basisId?: string | null
): Promise<PricingContext> {
	const [site] = await tx
		.select({
			elevation: sites.elevation,
			atmosphericPressure: sites.atmosphericPressure,
			costBasisId: sites.costBasisId
		})
		.from(sites)
		.where(eq(sites.id, siteId))
		.limit(1);
	const id = basisId ?? site?.costBasisId ?? null;
	const [basis] = id
		? await tx
				.select({ basis: costBases.basis })
				.from(costBases)
				.where(eq(costBases.id, id))
				.limit(1)
		: [];
	const atmosphere = site ?? { elevation: null, atmosphericPressure: null };
	const costBasis = basis ? engineBasis(basis.basis, atmosphere) : null;
	const siteHeaders = await tx
		.select({
			id: headers.id,
			name: headers.name,
			pressure: headers.pressure,
			designTemperature: headers.designTemperature,
			operatingHours: headers.operatingHours
		})
		.from(headers)
		.where(eq(headers.siteId, siteId));
	const siteAreas = await tx.select({ id: areas.id }).from(areas).where(eq(areas.siteId, siteId));
	return {
		siteId,
		basisId: costBasis ? id : null,
		costBasis,
		physicsBasis: {
			...atmosphereFields(atmosphere),
			...(costBasis?.trapFactors ? { trapFactors: costBasis.trapFactors } : {})
		},
		headers: siteHeaders.map(engineHeader),
		areaIds: new Set(siteAreas.map((a) => a.id))
	};
}
