/**
 * The money of a finding: its physics (./physics.ts) priced on a site's cost basis — the heat
 * the boiler must replace above feedwater, fuel at the boiler's efficiency, cost, CO2 and makeup
 * water per year, payback and NPV. Cheap and free of steam-table iterations except the two
 * saturated-liquid enthalpies of the basis, so a whole site re-prices in moments.
 */
import { netPresentValue, type Payback, simplePayback } from './economics';
import {
	annualLoss,
	type AnnualLoss,
	condensateHeatRate,
	fuelPower,
	steamFuelCostPerTonne,
	steamHeatRate
} from './energy-chain';
import type { FindingEvaluation } from './evaluate';
import type { CostBasis } from './inputs';
import { fromMinorUnits, money } from './money';
import type { FindingPhysics } from './physics';
import { annualBasis, resolveBasis, type ResolvedBasis } from './site-basis';
import type { Assumption } from './sourced';
import { stateFromTX } from '../saturation';

/** The part of a finding's physics its money depends on (the rest is notes and detail). */
export type PhysicsFlows = Pick<
	FindingPhysics,
	| 'kind'
	| 'steamFlow'
	| 'steamEnthalpy'
	| 'returnable'
	| 'condensateFlow'
	| 'condensateEnthalpy'
	| 'surfaceHeat'
	| 'hours'
>;

/** A finding's year on one basis: what the figures of a list are made of. */
export interface PricedFlows {
	/** Heat the boiler replaces, W (makeup heating included). */
	heatRate: number;
	/** Water made up, kg/s. */
	makeupFlow: number;
	/** Share of lost steam that came back with the return. */
	returned: number;
	/** Hours per year priced over. */
	hours: number;
	year: AnnualLoss;
	makeup: { enthalpy: number; heatRate: number } | null;
	/** Repair cost in major units, null when unknown. */
	repair: number | null;
	payback: Payback;
	/** Major units, null without a discount rate, life and repair cost. */
	npv: number | null;
}

/**
 * Prices the flows of a finding on a resolved basis. Pure arithmetic on the flows and two
 * saturated-liquid enthalpies, so re-pricing a whole site is cheap.
 * @param repairCost integer minor units of the basis currency, when known
 */
export function priceFlows(
	flows: PhysicsFlows,
	basis: ResolvedBasis,
	costBasis: CostBasis,
	repairCost?: number
): PricedFlows {
	const hfw = basis.feedwaterEnthalpy;
	const steam =
		flows.steamFlow === null || flows.steamEnthalpy === null
			? 0
			: steamHeatRate(flows.steamFlow, flows.steamEnthalpy, hfw);
	const condensate =
		flows.condensateEnthalpy === null
			? 0
			: condensateHeatRate(flows.condensateFlow, flows.condensateEnthalpy, hfw);
	const returned = flows.returnable ? basis.condensateReturnFraction : 0;
	const makeupFlow = (flows.steamFlow ?? 0) * (1 - returned) + flows.condensateFlow;
	const makeup = makeupHeating(makeupFlow, costBasis, hfw);
	const heatRate = steam + condensate + flows.surfaceHeat + (makeup?.heatRate ?? 0);
	const hours = flows.hours ?? basis.hours;
	const year = annualLoss(
		fuelPower(heatRate, basis.boilerEfficiency),
		makeupFlow,
		annualBasis(basis, hours)
	);
	const repair = repairCost === undefined ? null : fromMinorUnits(repairCost, basis.currency);
	const header = flows.kind === 'header';
	const payback: Payback = header
		? { years: null, note: 'A header reading has no repair to pay back' }
		: repair === null
			? { years: null, note: 'No repair cost yet' }
			: simplePayback(repair, year.totalCost);
	const { discountRate, lifeYears } = costBasis;
	const npv =
		repair !== null && !header && discountRate !== undefined && lifeYears !== undefined
			? netPresentValue({
					repairCost: repair,
					annualSaving: year.totalCost,
					discountRate,
					lifeYears
				})
			: null;
	return { heatRate, makeupFlow, returned, hours, year, makeup, repair, payback, npv };
}

/**
 * Heat to raise makeup water from its own temperature to feedwater temperature, W (energy
 * balance on the feed tank: water not returned enters cold and is heated by the plant).
 * Null when the basis gives no makeup temperature or nothing is made up; zero heat when makeup
 * arrives at or above feedwater temperature.
 */
export function makeupHeating(
	makeupFlow: number,
	costBasis: Pick<CostBasis, 'makeupWaterTemperature'>,
	hfw: number
): { enthalpy: number; heatRate: number } | null {
	if (costBasis.makeupWaterTemperature === undefined || makeupFlow === 0) return null;
	const hmu = stateFromTX(costBasis.makeupWaterTemperature, 0).h;
	return { enthalpy: hmu, heatRate: makeupFlow * Math.max(0, hfw - hmu) * 1000 };
}

/**
 * Prices a finding's physics on a cost basis.
 * @param repairCost repair cost in integer minor units of the basis currency, when known
 * Throws a plain Error for a missing or out-of-range cost basis.
 */
export function priceFinding(
	physics: FindingPhysics,
	costBasis: CostBasis | null,
	repairCost?: number
): FindingEvaluation {
	const basis = resolveBasis(costBasis);
	const cb = costBasis!; // resolveBasis has thrown when it is missing
	const priced = priceFlows(physics, basis, cb, repairCost);
	const { year, hours } = priced;
	const currency = basis.currency;
	return {
		findingId: physics.findingId,
		kind: physics.kind,
		steamLoss: physics.steamFlow === null ? null : physics.steamFlow * 3600,
		heatLoss: priced.heatRate / 1000,
		fuelEnergy: year.fuelEnergy,
		cost: money(year.totalCost, currency),
		fuelCost: money(year.fuelCost, currency),
		waterCost: money(year.waterCost, currency),
		co2: year.co2,
		water: year.water,
		operatingHours: hours,
		repairCost: priced.repair === null ? null : money(priced.repair, currency),
		payback: priced.payback,
		npv: priced.npv === null ? null : money(priced.npv, currency),
		riskNote: physics.riskNote,
		notes: physics.notes,
		cautions: physics.cautions,
		assumptions: [
			...physics.assumptions,
			...pricedAssumptions(physics, basis, priced.returned, hours, priced.makeup, cb)
		],
		orifice: physics.orifice,
		insulation: physics.insulation,
		header:
			physics.reading === null
				? null
				: { ...physics.reading, ...steamCost(physics.reading.enthalpy, basis) }
	};
}

function pricedAssumptions(
	physics: FindingPhysics,
	basis: ResolvedBasis,
	returned: number,
	hours: number,
	makeup: PricedFlows['makeup'],
	costBasis: CostBasis
): Assumption[] {
	const out: Assumption[] = [];
	if (physics.returnable && (physics.steamFlow ?? 0) > 0) {
		out.push({
			key: 'condensateReturnFraction',
			label: 'Share of blown-through steam recovered in the return',
			value: returned,
			unit: '',
			source: 'site cost basis (condensate return fraction)'
		});
	}
	out.push({
		key: 'operatingHours',
		label: 'Operating hours',
		value: hours,
		unit: 'h/yr',
		source:
			physics.hours === null || hours === basis.hours ? 'site cost basis' : physics.hoursSource!
	});
	out.push(...basis.assumptions);
	if (makeup !== null) {
		out.push(
			{
				key: 'makeupWaterTemperature',
				label: 'Makeup water temperature',
				value: costBasis.makeupWaterTemperature!,
				unit: 'K',
				source: 'site cost basis'
			},
			{
				key: 'makeupHeating',
				label: 'Heat to raise makeup water to feedwater temperature',
				value: makeup.heatRate / 1000,
				unit: 'kW',
				source: 'energy balance on the feed tank, IAPWS-IF97 enthalpies'
			}
		);
	}
	return out;
}

/** Fuel and total cost of a tonne of steam at a header reading's enthalpy. */
function steamCost(enthalpy: number, basis: ResolvedBasis) {
	const fuel = steamFuelCostPerTonne(
		enthalpy,
		basis.feedwaterEnthalpy,
		basis.boilerEfficiency,
		basis.fuelPricePerGJ.value
	);
	// A tonne of steam not returned as condensate must be made up with a cubic metre of water.
	const water = (1 - basis.condensateReturnFraction) * basis.waterPricePerM3;
	return {
		fuelCostPerTonne: money(fuel, basis.currency),
		steamCostPerTonne: money(fuel + water, basis.currency)
	};
}
