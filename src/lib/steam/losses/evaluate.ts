/**
 * One entry point for every finding: `evaluateFinding(finding, site)` → steam, heat, fuel,
 * cost, CO2, water, payback, risk, cautions and the sourced assumptions behind the numbers.
 * The device and the server call this same function; the server never trusts a device's sums.
 */
import type { Caution } from './cautions';
import type { Payback } from './economics';
import type { HeaderReading } from './header';
import type { CostBasis, FindingInput, Header } from './inputs';
import type { InsulationGap } from './insulation';
import type { Money } from './money';
import type { OrificeFlow } from './orifice';
import { findingPhysics } from './physics';
import { priceFinding } from './pricing';
import { resolveBasis } from './site-basis';
import type { Assumption } from './sourced';

/** What evaluateFinding needs from a site (validated by siteBasisSchema at the edges). */
export interface SiteInput {
	/** null until the consultant sets it: evaluateFinding then throws a plain message. */
	costBasis: CostBasis | null;
	headers: readonly Header[];
}

export interface FindingEvaluation {
	findingId: string;
	kind: FindingInput['kind'];
	/** Steam lost, kg/h; null for heat losses and readings, which lose no steam as such. */
	steamLoss: number | null;
	/** Heat the boiler must replace, kW. */
	heatLoss: number;
	/** Fuel energy per year, GJ. */
	fuelEnergy: number;
	/** Fuel plus water cost per year. */
	cost: Money;
	fuelCost: Money;
	waterCost: Money;
	/** CO2 per year, kg. */
	co2: number;
	/** Makeup water per year, m³. */
	water: number;
	/** Hours per year the loss was priced over. */
	operatingHours: number;
	repairCost: Money | null;
	payback: Payback;
	/** Net present value of the repair, when the site sets a discount rate and life and a repair cost is known. */
	npv: Money | null;
	riskNote: string | null;
	notes: string[];
	cautions: Caution[];
	assumptions: Assumption[];
	/** Orifice flow details (traps, leaks). */
	orifice: OrificeFlow | null;
	/** Insulation details: surface temperatures, burn-risk flags. */
	insulation: InsulationGap | null;
	/** Header reading details, with the fuel and total cost of a tonne of steam at the header. */
	header: (HeaderReading & { steamCostPerTonne: Money; fuelCostPerTonne: Money }) | null;
}

/**
 * Prices a finding against its site's cost basis and header list: its physics, then its money.
 * Throws a plain Error for a missing cost basis or header, or any input out of range.
 */
export function evaluateFinding(finding: FindingInput, site: SiteInput): FindingEvaluation {
	if (site === null || site === undefined)
		throw new Error('No site given: a finding is priced against its site');
	resolveBasis(site.costBasis); // a missing or broken basis is named before any header is
	return priceFinding(findingPhysics(finding, site), site.costBasis, finding.repairCost);
}
