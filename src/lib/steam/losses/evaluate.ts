/**
 * One entry point for every finding: `evaluateFinding(finding, site)` → steam, heat, fuel,
 * cost, CO2, water, payback, risk, cautions and the sourced assumptions behind the numbers.
 * The device and the server call this same function; the server never trusts a device's sums.
 */
import { type Caution, cautionsFor } from './cautions';
import { annualLoss, fuelPower, steamFuelCostPerTonne } from './energy-chain';
import { netPresentValue, type Payback, simplePayback } from './economics';
import { headerLoss, insulationLoss, leakLoss, type LossCore, trapLoss } from './finding-losses';
import type { HeaderReading } from './header';
import type { CostBasis, FindingInput, Header } from './inputs';
import type { InsulationGap } from './insulation';
import { fromMinorUnits, money, type Money } from './money';
import type { OrificeFlow } from './orifice';
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
 * Prices a finding against its site's cost basis and header list.
 * Throws a plain Error for a missing cost basis or header, or any input out of range.
 */
export function evaluateFinding(finding: FindingInput, site: SiteInput): FindingEvaluation {
	if (site === null || site === undefined)
		throw new Error('No site given: a finding is priced against its site');
	const basis = resolveBasis(site.costBasis);
	const costBasis = site.costBasis!; // resolveBasis has thrown when it is missing
	const context = { basis, costBasis, headers: site.headers ?? [] };
	const core = lossFor(finding, context);
	const fuelW = fuelPower(core.heatRate, basis.boilerEfficiency);
	const year = annualLoss(fuelW, core.makeupFlow, {
		hours: core.hours,
		fuelPricePerGJ: basis.fuelPricePerGJ.value,
		emissionFactor: basis.emissionFactor.value,
		waterPricePerM3: basis.waterPricePerM3
	});
	const currency = basis.currency;
	const repair =
		finding.repairCost === undefined ? null : fromMinorUnits(finding.repairCost, currency);
	const payback: Payback =
		finding.kind === 'header'
			? { years: null, note: 'A header reading has no repair to pay back' }
			: repair === null
				? { years: null, note: 'No repair cost yet' }
				: simplePayback(repair, year.totalCost);
	const { discountRate, lifeYears } = costBasis;
	const npv =
		repair !== null &&
		finding.kind !== 'header' &&
		discountRate !== undefined &&
		lifeYears !== undefined
			? money(
					netPresentValue({
						repairCost: repair,
						annualSaving: year.totalCost,
						discountRate,
						lifeYears
					}),
					currency
				)
			: null;
	const hoursSource = core.hours === basis.hours ? 'site cost basis' : 'finding (override)';
	return {
		findingId: finding.id,
		kind: finding.kind,
		steamLoss: core.steamFlow === null ? null : core.steamFlow * 3600,
		heatLoss: core.heatRate / 1000,
		fuelEnergy: year.fuelEnergy,
		cost: money(year.totalCost, currency),
		fuelCost: money(year.fuelCost, currency),
		waterCost: money(year.waterCost, currency),
		co2: year.co2,
		water: year.water,
		operatingHours: core.hours,
		repairCost: repair === null ? null : money(repair, currency),
		payback,
		npv,
		riskNote: core.riskNote,
		notes: core.notes,
		cautions: cautionsFor({
			kind: finding.kind,
			condition: finding.kind === 'trap' ? finding.inputs.condition : undefined,
			ventsSteam: core.ventsSteam,
			hotSurface: core.hotSurface
		}),
		assumptions: [
			...core.assumptions,
			{
				key: 'operatingHours',
				label: 'Operating hours',
				value: core.hours,
				unit: 'h/yr',
				source: hoursSource
			},
			...basis.assumptions
		],
		orifice: core.orifice,
		insulation: core.insulation,
		header: core.reading === null ? null : withSteamCost(core.reading, basis, currency)
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

function withSteamCost(
	reading: HeaderReading,
	basis: ReturnType<typeof resolveBasis>,
	currency: string
) {
	const fuel = steamFuelCostPerTonne(
		reading.enthalpy,
		basis.feedwaterEnthalpy,
		basis.boilerEfficiency,
		basis.fuelPricePerGJ.value
	);
	// A tonne of steam not returned as condensate must be made up with a cubic metre of water.
	const water = (1 - basis.condensateReturnFraction) * basis.waterPricePerM3;
	return {
		...reading,
		fuelCostPerTonne: money(fuel, currency),
		steamCostPerTonne: money(fuel + water, currency)
	};
}
