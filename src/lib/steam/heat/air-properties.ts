/**
 * Air properties for convection correlations, linearly interpolated in Çengel & Ghajar
 * Table A-15 (see air-properties-table.ts), evaluated at the film temperature as the
 * correlations of Churchill–Chu and Churchill–Bernstein prescribe.
 */
import { inRange } from '../errors';
import { AIR_TABLE_A15 } from './air-properties-table';
import { ZERO_CELSIUS } from './constants';

export interface AirProperties {
	/** Temperature the properties are evaluated at [K]. */
	temperature: number;
	/** Thermal conductivity k [W/(m K)]. */
	thermalConductivity: number;
	/** Kinematic viscosity ν [m²/s]. */
	kinematicViscosity: number;
	/** Prandtl number Pr [-]. */
	prandtlNumber: number;
	/** Volumetric expansion coefficient β [1/K]: 1/T for an ideal gas. */
	expansionCoefficient: number;
}

/** Lowest and highest temperatures of the table [K]. */
export const AIR_T_MIN = AIR_TABLE_A15[0][0] + ZERO_CELSIUS;
export const AIR_T_MAX = AIR_TABLE_A15[AIR_TABLE_A15.length - 1][0] + ZERO_CELSIUS;

/**
 * Properties of dry air at 1 atm at temperature T [K] (223.15 to 773.15 K), linear between
 * table rows, as the table's own text advises.
 */
export function airProperties(T: number): AirProperties {
	inRange('air temperature', T, AIR_T_MIN, AIR_T_MAX, 'K');
	const celsius = T - ZERO_CELSIUS;
	let i = 1;
	while (i < AIR_TABLE_A15.length - 1 && AIR_TABLE_A15[i][0] < celsius) i++;
	const lo = AIR_TABLE_A15[i - 1];
	const hi = AIR_TABLE_A15[i];
	const w = (celsius - lo[0]) / (hi[0] - lo[0]);
	const lerp = (column: number) => lo[column] + w * (hi[column] - lo[column]);
	return {
		temperature: T,
		thermalConductivity: lerp(3),
		kinematicViscosity: lerp(5),
		prandtlNumber: lerp(6),
		expansionCoefficient: 1 / T
	};
}

/** Film temperature (Ts + T∞)/2 [K], where natural and forced convection properties are taken. */
export function filmTemperature(surface: number, ambient: number): number {
	return (surface + ambient) / 2;
}

/** Air properties at the film temperature between a surface and the ambient [K]. */
export function filmProperties(surface: number, ambient: number): AirProperties {
	return airProperties(filmTemperature(surface, ambient));
}
