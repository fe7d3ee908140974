/**
 * Heat loss from the outside of a horizontal pipe (bare steel, or an insulation jacket):
 * convection by Churchill–Chu (still air) and Churchill–Bernstein (wind), combined as
 * Churchill (1977) proposes, plus grey-body radiation to surroundings at the air temperature.
 */
import { filmProperties } from './air-properties';
import {
	combineMixedConvection,
	nusseltCylinderCrossFlow,
	nusseltHorizontalCylinderNatural,
	rayleighNumber,
	reynoldsNumber
} from './convection';
import { greyBodyFlux } from './radiation';
import {
	checkAmbient,
	checkDiameter,
	checkEmissivity,
	checkHotTemperature,
	checkWindSpeed
} from './validate';

export interface BarePipeInput {
	/** Outside diameter of the surface [m]. */
	outerDiameter: number;
	/** Temperature of the outside surface [K]; not below the ambient. */
	surfaceTemperature: number;
	/** Air temperature, also taken as the temperature of the radiant surroundings [K]. */
	ambientTemperature: number;
	/** Wind speed across the pipe [m/s]; 0 for still air. */
	windSpeed: number;
	/** Grey-body emissivity of the surface, 0 < ε ≤ 1. */
	emissivity: number;
}

export interface BarePipeHeatLoss {
	/** Heat lost per metre of pipe [W/m]: convection + radiation. */
	total: number;
	/** Convective part [W/m]. */
	convection: number;
	/** Radiative part [W/m]. */
	radiation: number;
	/** Convection coefficient [W/(m² K)]. */
	convectionCoefficient: number;
	/** Nusselt numbers: still-air, wind-forced and the combination used. */
	nusselt: { natural: number; forced: number; combined: number };
}

/**
 * Heat loss per metre [W/m] from a horizontal cylinder at a known surface temperature.
 * Air properties are taken at the film temperature (Çengel & Ghajar Table A-15), β = 1/T_film.
 */
export function barePipeHeatLoss(input: BarePipeInput): BarePipeHeatLoss {
	const D = checkDiameter('outerDiameter', input.outerDiameter);
	const ambient = checkAmbient(input.ambientTemperature);
	const surface = checkHotTemperature('surfaceTemperature', input.surfaceTemperature, ambient);
	const wind = checkWindSpeed(input.windSpeed);
	const emissivity = checkEmissivity('emissivity', input.emissivity);

	const air = filmProperties(surface, ambient);
	const dT = surface - ambient;
	const ra = rayleighNumber(
		D,
		dT,
		air.expansionCoefficient,
		air.kinematicViscosity,
		air.prandtlNumber
	);
	const natural = nusseltHorizontalCylinderNatural(ra, air.prandtlNumber);
	const forced = nusseltCylinderCrossFlow(
		reynoldsNumber(wind, D, air.kinematicViscosity),
		air.prandtlNumber
	);
	const combined = combineMixedConvection(natural, forced);
	const h = (combined * air.thermalConductivity) / D;
	const perimeter = Math.PI * D;
	const convection = h * perimeter * dT;
	const radiation = greyBodyFlux(emissivity, surface, ambient) * perimeter;
	return {
		total: convection + radiation,
		convection,
		radiation,
		convectionCoefficient: h,
		nusselt: { natural, forced, combined }
	};
}
