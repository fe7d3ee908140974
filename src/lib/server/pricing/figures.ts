/**
 * The columns a finding's figures are stored in: its physics (flows + detail), and its money on
 * the basis in force as typed columns (what lists sort and total by), each stamped with the
 * engine version and the cost basis that made it. A capture the engine refuses, or a site with
 * no cost basis yet, stores the reason instead of figures; the finding itself is always kept.
 */
import {
	findingPhysics,
	money,
	type FindingInput,
	type FindingPhysics,
	type PhysicsFlows,
	priceFlows,
	resolveBasis
} from '../../steam/index';
import { ENGINE_VERSION } from '../../steam/version';
import type { CostBasis } from '../../schemas/site';
import type { PricingContext } from './context';
import { splitPhysics, type PhysicsDetail } from './stored';

export interface MoneyColumns {
	resultsEngine: string | null;
	pricedBasisId: string | null;
	pricedAt: Date | null;
	pricingNote: string | null;
	steamLoss: number | null;
	heatLoss: number | null;
	fuelEnergy: number | null;
	cost: number | null;
	co2: number | null;
	water: number | null;
	paybackYears: number | null;
}

export interface FigureColumns extends MoneyColumns {
	flows: PhysicsFlows | null;
	physics: PhysicsDetail | null;
	physicsEngine: string | null;
}

const NO_MONEY = {
	resultsEngine: null,
	pricedBasisId: null,
	pricedAt: null,
	steamLoss: null,
	heatLoss: null,
	fuelEnergy: null,
	cost: null,
	co2: null,
	water: null,
	paybackYears: null
} as const;

const NO_BASIS =
	'No figures yet: the site has no cost basis. Set one on the site page and every finding is priced.';

/** The error's words, kept short enough for the column. */
const reason = (e: unknown) => (e instanceof Error ? e.message : String(e)).slice(0, 255);

/** A basis resolved once and used for many findings (a site re-pricing). */
export interface PreparedBasis {
	id: string;
	costBasis: CostBasis;
	resolved: ReturnType<typeof resolveBasis>;
}

export function prepareBasis(id: string | null, costBasis: CostBasis | null): PreparedBasis | null {
	if (id === null || costBasis === null) return null;
	return { id, costBasis, resolved: resolveBasis(costBasis) };
}

/** Money columns of stored flows on a prepared basis (null basis: no figures, with why). */
export function moneyColumns(
	flows: PhysicsFlows,
	basis: PreparedBasis | null,
	repairCost: number | null,
	now = new Date()
): MoneyColumns {
	if (basis === null) return { ...NO_MONEY, pricingNote: NO_BASIS };
	try {
		const p = priceFlows(flows, basis.resolved, basis.costBasis, repairCost ?? undefined);
		return {
			resultsEngine: ENGINE_VERSION,
			pricedBasisId: basis.id,
			pricedAt: now,
			pricingNote: null,
			steamLoss: flows.steamFlow === null ? null : flows.steamFlow * 3600,
			heatLoss: p.heatRate / 1000,
			fuelEnergy: p.year.fuelEnergy,
			cost: money(p.year.totalCost, basis.costBasis.currency).minor,
			co2: p.year.co2,
			water: p.year.water,
			paybackYears: p.payback.years
		};
	} catch (e) {
		return { ...NO_MONEY, pricingNote: reason(e) };
	}
}

/** Physics and money of a finding on its site's context. */
export function figureColumns(
	ctx: PricingContext,
	finding: FindingInput,
	now = new Date()
): FigureColumns {
	let physics: FindingPhysics;
	try {
		physics = findingPhysics(finding, { costBasis: ctx.physicsBasis, headers: ctx.headers });
	} catch (e) {
		return {
			...NO_MONEY,
			pricingNote: reason(e),
			flows: null,
			physics: null,
			// This engine's verdict on these inputs: nothing to recompute until one of them moves.
			physicsEngine: ENGINE_VERSION
		};
	}
	const stored = splitPhysics(physics);
	let basis: PreparedBasis | null = null;
	let basisProblem: string | null = null;
	try {
		basis = prepareBasis(ctx.basisId, ctx.costBasis);
	} catch (e) {
		basisProblem = reason(e);
	}
	const money = basisProblem
		? { ...NO_MONEY, pricingNote: basisProblem }
		: moneyColumns(stored.flows, basis, finding.repairCost ?? null, now);
	return {
		...money,
		flows: stored.flows,
		physics: stored.physics,
		physicsEngine: ENGINE_VERSION
	};
}
