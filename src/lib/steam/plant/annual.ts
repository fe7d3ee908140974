/**
 * A plant opportunity's year on the site's cost basis, by the same energy chain as a finding's
 * (../losses/energy-chain.ts): heat at the boiler → fuel at the boiler's efficiency → fuel
 * energy, cost and CO2 per year; water no longer made up → makeup water and treatment. Plant
 * figures are in kW (kg/s × kJ/kg); the chain takes W, so they are converted here only.
 */
import { HOUR_S } from '../../units/constants';
import { annualLoss, type AnnualLoss, fuelPower, requireHours } from '../losses/energy-chain';
import type { CostBasis } from '../losses/inputs';
import { money, type Money } from '../losses/money';
import { annualBasis, resolveBasis, type ResolvedBasis } from '../losses/site-basis';
import type { Assumption } from '../losses/sourced';
import { stateFromTX } from '../saturation';

/** The site's cost basis resolved, with the hours an opportunity runs. */
export interface PlantBasis {
	basis: ResolvedBasis;
	costBasis: CostBasis;
	/** Hours per year, (0, 8784]. */
	hours: number;
	/** Where the hours come from. */
	hoursSource: string;
}

/**
 * Resolves the site's cost basis (plain errors for anything missing) and the hours per year.
 * @param operatingHours hours this opportunity runs, when they differ from the site's
 */
export function plantBasis(
	costBasis: CostBasis | null | undefined,
	operatingHours?: number
): PlantBasis {
	const basis = resolveBasis(costBasis);
	if (operatingHours === undefined) {
		return { basis, costBasis: costBasis!, hours: basis.hours, hoursSource: 'site cost basis' };
	}
	return {
		basis,
		costBasis: costBasis!,
		hours: requireHours(operatingHours),
		hoursSource: 'entered for this opportunity'
	};
}

export interface PlantYear {
	/** Heat at the boiler, kW. */
	heat: number;
	/** Fuel power, kW: heat ÷ boiler efficiency. */
	fuelPower: number;
	/** Makeup water, kg/s. */
	waterFlow: number;
	/** Hours per year priced over. */
	hours: number;
	/** Fuel energy GJ, CO2 kg and water m³ per year, and their costs in major units. */
	year: AnnualLoss;
	fuelCost: Money;
	waterCost: Money;
	/** Fuel plus water. */
	total: Money;
}

/**
 * A year of a steady heat and makeup-water flow on the basis.
 * @param heat kW at the boiler (≥ 0)
 * @param waterFlow kg/s of makeup water (≥ 0)
 */
export function plantYear(
	heat: number,
	waterFlow: number,
	{ basis, hours }: PlantBasis
): PlantYear {
	const fuelW = fuelPower(heat * 1000, basis.boilerEfficiency);
	const year = annualLoss(fuelW, waterFlow, annualBasis(basis, hours));
	return {
		heat,
		fuelPower: fuelW / 1000,
		waterFlow,
		hours,
		year,
		fuelCost: money(year.fuelCost, basis.currency),
		waterCost: money(year.waterCost, basis.currency),
		total: money(year.totalCost, basis.currency)
	};
}

/** kg per year of a steady flow in kg/s over the hours. */
export function perYear(flow: number, hours: number): number {
	return flow * hours * HOUR_S;
}

/** The hours and the cost basis's own assumptions, for a result's assumption list. */
export function basisAssumptions({ basis, hours, hoursSource }: PlantBasis): Assumption[] {
	return [
		{
			key: 'operatingHours',
			label: 'Operating hours',
			value: hours,
			unit: 'h/yr',
			source: hoursSource
		},
		...basis.assumptions
	];
}

/** Makeup water's enthalpy (saturated liquid at its temperature), kJ/kg; null when not given. */
export function makeupEnthalpy({ costBasis }: PlantBasis): number | null {
	const T = costBasis.makeupWaterTemperature;
	return T === undefined ? null : stateFromTX(T, 0).h;
}
