/**
 * Heat loss per square metre from a vertical flat surface (a tank or vessel wall, a
 * large duct side): Churchill–Chu natural convection over the height, flat-plate forced
 * convection along the wind, combined as for pipes, plus grey-body radiation.
 */
import { filmProperties } from './air-properties';
import {
	combineMixedConvection,
	nusseltFlatPlateForced,
	nusseltVerticalPlateNatural,
	rayleighNumber,
	reynoldsNumber
} from './convection';
import { greyBodyFlux } from './radiation';
import {
	checkAmbient,
	checkEmissivity,
	checkHotTemperature,
	checkWindSpeed,
	positiveUpTo
} from './validate';

/** Tallest or longest surface accepted [m]. */
const LENGTH_MAX = 50;

export interface FlatSurfaceInput {
	/** Height of the vertical surface [m], the length buoyant flow runs along. */
	height: number;
	/** Length of the surface along the wind [m]; defaults to the height. */
	windLength?: number;
	/** Surface temperature [K]; not below the ambient. */
	surfaceTemperature: number;
	/** Air and surroundings temperature [K]. */
	ambientTemperature: number;
	/** Wind speed along the surface [m/s]. */
	windSpeed: number;
	/** Grey-body emissivity, 0 < ε ≤ 1. */
	emissivity: number;
}

export interface FlatSurfaceHeatLoss {
	/** Heat lost per square metre [W/m²]. */
	total: number;
	/** Convective part [W/m²]. */
	convection: number;
	/** Radiative part [W/m²]. */
	radiation: number;
	/** Convection coefficient [W/(m² K)]. */
	convectionCoefficient: number;
}

/** Heat loss per square metre [W/m²] from a vertical flat surface at a known temperature. */
export function flatSurfaceHeatLoss(input: FlatSurfaceInput): FlatSurfaceHeatLoss {
	const height = positiveUpTo('height', input.height, LENGTH_MAX, 'm');
	const windLength = positiveUpTo('windLength', input.windLength ?? height, LENGTH_MAX, 'm');
	const ambient = checkAmbient(input.ambientTemperature);
	const surface = checkHotTemperature('surfaceTemperature', input.surfaceTemperature, ambient);
	const wind = checkWindSpeed(input.windSpeed);
	const emissivity = checkEmissivity('emissivity', input.emissivity);

	const air = filmProperties(surface, ambient);
	const dT = surface - ambient;
	const ra = rayleighNumber(
		height,
		dT,
		air.expansionCoefficient,
		air.kinematicViscosity,
		air.prandtlNumber
	);
	const hNatural =
		(nusseltVerticalPlateNatural(ra, air.prandtlNumber) * air.thermalConductivity) / height;
	const re = reynoldsNumber(wind, windLength, air.kinematicViscosity);
	const hForced =
		(nusseltFlatPlateForced(re, air.prandtlNumber) * air.thermalConductivity) / windLength;
	// Combine the coefficients, not the Nusselt numbers: the two use different lengths.
	const h = combineMixedConvection(hNatural, hForced);
	const convection = h * dT;
	const radiation = greyBodyFlux(emissivity, surface, ambient);
	return { total: convection + radiation, convection, radiation, convectionCoefficient: h };
}
