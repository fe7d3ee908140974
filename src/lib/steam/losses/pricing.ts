/**
 * The money of a finding: its physics (./physics.ts) priced on a site's cost basis — the heat
 * the boiler must replace above feedwater, fuel at the boiler's efficiency, cost, CO2 and makeup
 * water per year, payback and NPV. Cheap and free of steam-table iterations except the two
 * saturated-liquid enthalpies of the basis, so a whole site re-prices in moments.
 */
import { netPresentValue, type Payback, simplePayback } from './economics';
import {
	annualLoss,
	condensateHeatRate,
	fuelPower,
	steamFuelCostPerTonne,
	steamHeatRate
} from './energy-chain';
import type { FindingEvaluation } from './evaluate';
import type { CostBasis } from './inputs';
import { fromMinorUnits, money } from './money';
import type { FindingPhysics } from './physics';
import { resolveBasis, type ResolvedBasis } from './site-basis';
import type { Assumption } from './sourced';
import { stateFromTX } from '../saturation';

/** Flows of a finding priced on one basis: heat the boiler replaces (W) and makeup (kg/s). */
function boilerDuty(physics: FindingPhysics, basis: ResolvedBasis) {
	const hfw = basis.feedwaterEnthalpy;
	const steam =
		physics.steamFlow === null || physics.steamEnthalpy === null
			? 0
			: steamHeatRate(physics.steamFlow, physics.steamEnthalpy, hfw);
	const condensate =
		physics.condensateEnthalpy === null
			? 0
			: condensateHeatRate(physics.condensateFlow, physics.condensateEnthalpy, hfw);
	const returned = physics.returnable ? basis.condensateReturnFraction : 0;
	const makeupFlow = (physics.steamFlow ?? 0) * (1 - returned) + physics.condensateFlow;
	return { heatRate: steam + condensate + physics.surfaceHeat, makeupFlow, returned };
}

/**
 * Heat to raise makeup water from its own temperature to feedwater temperature, W (energy
 * balance on the feed tank: water not returned enters cold and is heated by the plant).
 * Zero when the basis gives no makeup temperature, or makeup arrives at or above feedwater.
 */
function makeupHeating(makeupFlow: number, costBasis: CostBasis, hfw: number) {
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
	const duty = boilerDuty(physics, basis);
	const makeup = makeupHeating(duty.makeupFlow, cb, basis.feedwaterEnthalpy);
	const heatRate = duty.heatRate + (makeup?.heatRate ?? 0);
	const hours = physics.hours ?? basis.hours;
	const year = annualLoss(fuelPower(heatRate, basis.boilerEfficiency), duty.makeupFlow, {
		hours,
		fuelPricePerGJ: basis.fuelPricePerGJ.value,
		emissionFactor: basis.emissionFactor.value,
		waterPricePerM3: basis.waterPricePerM3
	});
	const currency = basis.currency;
	const repair = repairCost === undefined ? null : fromMinorUnits(repairCost, currency);
	const header = physics.kind === 'header';
	const payback: Payback = header
		? { years: null, note: 'A header reading has no repair to pay back' }
		: repair === null
			? { years: null, note: 'No repair cost yet' }
			: simplePayback(repair, year.totalCost);
	const { discountRate, lifeYears } = cb;
	const npv =
		repair !== null && !header && discountRate !== undefined && lifeYears !== undefined
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
	return {
		findingId: physics.findingId,
		kind: physics.kind,
		steamLoss: physics.steamFlow === null ? null : physics.steamFlow * 3600,
		heatLoss: heatRate / 1000,
		fuelEnergy: year.fuelEnergy,
		cost: money(year.totalCost, currency),
		fuelCost: money(year.fuelCost, currency),
		waterCost: money(year.waterCost, currency),
		co2: year.co2,
		water: year.water,
		operatingHours: hours,
		repairCost: repair === null ? null : money(repair, currency),
		payback,
		npv,
		riskNote: physics.riskNote,
		notes: physics.notes,
		cautions: physics.cautions,
		assumptions: [
			...physics.assumptions,
			...pricedAssumptions(physics, basis, duty.returned, hours, makeup, cb)
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
	makeup: ReturnType<typeof makeupHeating>,
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
