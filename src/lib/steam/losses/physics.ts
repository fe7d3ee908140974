/**
 * The physics of a finding: what it loses (steam and condensate with their enthalpies, or heat
 * at a surface), the state of the steam, its notes, risk and cautions. It depends on the
 * finding's inputs, its header and the site's atmosphere and trap factors only, never on fuel,
 * prices, efficiency, feedwater, return or hours: ./pricing.ts turns it into money, so a site
 * that changes its cost basis is re-priced from stored physics without recomputing any of this.
 */
import { type Caution, cautionsFor } from './cautions';
import { headerLoss, insulationLoss, leakLoss, type LossCore, trapLoss } from './finding-losses';
import type { FindingInput, Header, PhysicsBasis } from './inputs';
import { siteAtmosphere } from './site-basis';

/** What a finding's physics needs from its site. */
export interface PhysicsSite {
	/** Atmosphere (measured or from elevation) and trap factors; null: standard atmosphere. */
	costBasis: PhysicsBasis | null;
	headers: readonly Header[];
}

/** A finding's physics, plain data (stored as JSON beside the finding on the server). */
export interface FindingPhysics extends LossCore {
	findingId: string;
	kind: FindingInput['kind'];
	/** Site atmospheric pressure the physics used, MPa absolute. */
	atmosphere: number;
	cautions: Caution[];
}

/**
 * The physics of one finding. Throws a plain Error for a missing header or an input out of
 * range (the same messages evaluateFinding gives).
 */
export function findingPhysics(finding: FindingInput, site: PhysicsSite): FindingPhysics {
	const atmosphere = siteAtmosphere(site.costBasis ?? {}).value;
	const context = {
		atmosphere,
		trapFactors: site.costBasis?.trapFactors,
		headers: site.headers ?? []
	};
	const core = lossFor(finding, context);
	return {
		findingId: finding.id,
		kind: finding.kind,
		atmosphere,
		...core,
		cautions: cautionsFor({
			kind: finding.kind,
			condition: finding.kind === 'trap' ? finding.inputs.condition : undefined,
			ventsSteam: core.ventsSteam,
			hotSurface: core.hotSurface
		})
	};
}

function lossFor(finding: FindingInput, context: Parameters<typeof trapLoss>[1]): LossCore {
	switch (finding.kind) {
		case 'trap':
			return trapLoss(finding, context);
		case 'leak':
			return leakLoss(finding, context);
		case 'insulation':
			return insulationLoss(finding, context);
		case 'header':
			return headerLoss(finding, context);
	}
}
