/**
 * The energy chain: a loss at the point of use → heat the boiler must replace → fuel energy at
 * the boiler's efficiency → cost and CO2 per year; lost water → makeup water and treatment.
 * Fuel energy = steam lost × (h_steam − h_feedwater) ÷ boiler efficiency, and for surface
 * heat loss, heat ÷ boiler efficiency (US DOE steam fact sheet "Benchmark the Fuel Cost of
 * Steam Generation": cost of steam = fuel price × Δh ÷ boiler efficiency).
 */
import { requireFinite, requireNonNegative } from './sourced';

/** Seconds in an hour. */
const HOUR_S = 3600;

/** Makeup water density, kg/m³: 1000 (common practice; cold water is 999–1000 kg/m³). */
export const MAKEUP_WATER_DENSITY = 1000;

/**
 * Throws a plain message unless 0 < η ≤ 1.
 * @param label what the efficiency is of, as a person reads it ("Turbine isentropic efficiency")
 */
export function requireEfficiency(efficiency: number, label = 'Boiler efficiency'): number {
	requireFinite(label, efficiency, '(a fraction)');
	if (efficiency <= 0 || efficiency > 1) {
		throw new Error(
			`${label} must be greater than 0 and at most 1, got ${efficiency}` +
				(efficiency > 1 && efficiency <= 100
					? ` (enter ${efficiency / 100} for ${efficiency} %)`
					: '')
		);
	}
	return efficiency;
}

/** Throws unless 0 < hours ≤ 8784 (a leap year). */
export function requireHours(hours: number): number {
	requireFinite('Operating hours', hours, 'h per year');
	if (hours <= 0 || hours > 8784) {
		throw new Error(
			`Operating hours must be greater than 0 and at most 8784 h per year, got ${hours}`
		);
	}
	return hours;
}

/**
 * Heat the boiler must put into feedwater to replace steam lost, W.
 * @param steamFlow steam lost, kg/s
 * @param steamEnthalpy h of the lost steam (at the header), kJ/kg
 * @param feedwaterEnthalpy h of the feedwater, kJ/kg
 */
export function steamHeatRate(
	steamFlow: number,
	steamEnthalpy: number,
	feedwaterEnthalpy: number
): number {
	requireNonNegative('Steam flow', steamFlow, 'kg/s');
	requireFinite('Steam enthalpy', steamEnthalpy, 'kJ/kg');
	requireFinite('Feedwater enthalpy', feedwaterEnthalpy, 'kJ/kg');
	if (steamEnthalpy <= feedwaterEnthalpy) {
		throw new Error(
			`Steam enthalpy (${steamEnthalpy.toFixed(1)} kJ/kg) must exceed feedwater enthalpy (${feedwaterEnthalpy.toFixed(1)} kJ/kg): check the feedwater temperature`
		);
	}
	return steamFlow * (steamEnthalpy - feedwaterEnthalpy) * 1000;
}

/**
 * Heat carried away by hot condensate lost to drain, W, counted above feedwater enthalpy (the
 * boiler would otherwise have been fed it at least that hot). Condensate cooler than feedwater
 * carries no heat above it: 0, and only its water is lost.
 */
export function condensateHeatRate(
	condensateFlow: number,
	condensateEnthalpy: number,
	feedwaterEnthalpy: number
): number {
	requireNonNegative('Condensate flow', condensateFlow, 'kg/s');
	requireFinite('Condensate enthalpy', condensateEnthalpy, 'kJ/kg');
	return condensateFlow * Math.max(0, condensateEnthalpy - feedwaterEnthalpy) * 1000;
}

/** Fuel power to replace heat lost, W: heat ÷ boiler efficiency. */
export function fuelPower(heatRate: number, boilerEfficiency: number): number {
	requireNonNegative('Heat lost', heatRate, 'W');
	return heatRate / requireEfficiency(boilerEfficiency);
}

export interface AnnualBasis {
	/** Hours per year the loss runs, (0, 8784]. */
	hours: number;
	/** Fuel price per GJ of fuel, major currency units. */
	fuelPricePerGJ: number;
	/** kg CO2 per GJ of fuel. */
	emissionFactor: number;
	/** Makeup water plus treatment price per m³, major currency units. */
	waterPricePerM3: number;
}

export interface AnnualLoss {
	/** Fuel energy per year, GJ. */
	fuelEnergy: number;
	/** Fuel cost per year, major units. */
	fuelCost: number;
	/** CO2 per year, kg. */
	co2: number;
	/** Makeup water per year, m³. */
	water: number;
	/** Makeup water and treatment cost per year, major units. */
	waterCost: number;
	/** Fuel plus water cost per year, major units. */
	totalCost: number;
}

/**
 * A year of a steady loss.
 * @param fuelPowerW fuel power, W
 * @param makeupFlow water that must be made up, kg/s
 */
export function annualLoss(fuelPowerW: number, makeupFlow: number, basis: AnnualBasis): AnnualLoss {
	requireNonNegative('Fuel power', fuelPowerW, 'W');
	requireNonNegative('Makeup water flow', makeupFlow, 'kg/s');
	const seconds = requireHours(basis.hours) * HOUR_S;
	const price = requireNonNegative('Fuel price', basis.fuelPricePerGJ, 'per GJ');
	const factor = requireNonNegative('Emission factor', basis.emissionFactor, 'kg CO2/GJ');
	const waterPrice = requireNonNegative('Water price', basis.waterPricePerM3, 'per m³');
	const fuelEnergy = (fuelPowerW * seconds) / 1e9;
	const water = (makeupFlow * seconds) / MAKEUP_WATER_DENSITY;
	const fuelCost = fuelEnergy * price;
	const waterCost = water * waterPrice;
	return {
		fuelEnergy,
		fuelCost,
		co2: fuelEnergy * factor,
		water,
		waterCost,
		totalCost: fuelCost + waterCost
	};
}

/**
 * Fuel cost of one tonne of steam, major units per t: price per GJ × Δh ÷ efficiency, the
 * DOE fact sheet's $/1000 lb formula in SI (Δh in kJ/kg is MJ/t, so ÷ 1000 gives GJ/t).
 */
export function steamFuelCostPerTonne(
	steamEnthalpy: number,
	feedwaterEnthalpy: number,
	boilerEfficiency: number,
	fuelPricePerGJ: number
): number {
	const heatPerKg = steamHeatRate(1, steamEnthalpy, feedwaterEnthalpy) / 1e3; // kJ/kg
	requireNonNegative('Fuel price', fuelPricePerGJ, 'per GJ');
	return (fuelPricePerGJ * heatPerKg) / (1000 * requireEfficiency(boilerEfficiency));
}
