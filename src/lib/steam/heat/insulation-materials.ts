/**
 * Insulation materials: apparent thermal conductivity as a function of mean temperature and the
 * maximum use temperature, from the ASTM material specifications' maximum-conductivity tables
 * (so a product that meets the specification does at least this well: losses computed with
 * these values are on the high side, savings on the low side).
 *
 * Table values are kept in the specifications' own units (°F, Btu·in/(h·ft²·°F)) and converted
 * here, so they can be compared with the documents line by line.
 */
import { SteamRangeError } from '../errors';
import type { InsulationMaterialName } from '../vocabulary';
import { fahrenheitToKelvin } from './constants';
import { positiveUpTo } from './validate';

/** 1 Btu_IT·in/(h·ft²·°F) in W/(m K): 1055.05585262 J × 0.0254 m / (3600 s × 0.09290304 m² × 5/9 K). */
export const BTU_IN_PER_HR_FT2_F = (1055.05585262 * 0.0254) / (3600 * 0.09290304 * (5 / 9));

export type NamedMaterial = InsulationMaterialName;

/** A custom material with a constant conductivity [W/(m K)] and, optionally, its maximum use temperature [K]. */
export interface CustomMaterial {
	conductivity: number;
	maxServiceTemperature?: number;
}

export type InsulationMaterial = NamedMaterial | CustomMaterial;

export interface MaterialData {
	/** What the data describe. */
	name: string;
	/** Maximum use temperature [K]. */
	maxServiceTemperature: number;
	/** Breakpoints of k(T), mean temperature [K] ascending, conductivity [W/(m K)]. */
	points: readonly (readonly [temperature: number, conductivity: number])[];
	/** Where the numbers come from. */
	source: string;
}

function fromSpecification(
	name: string,
	maxFahrenheit: number,
	table: readonly (readonly [fahrenheit: number, btuInch: number])[],
	source: string
): MaterialData {
	return {
		name,
		maxServiceTemperature: fahrenheitToKelvin(maxFahrenheit),
		points: table.map(([f, k]) => [fahrenheitToKelvin(f), k * BTU_IN_PER_HR_FT2_F] as const),
		source
	};
}

export const MATERIALS: Readonly<Record<NamedMaterial, MaterialData>> = {
	'mineral-wool': fromSpecification(
		'Mineral fibre pipe insulation, ASTM C547 Type II',
		1200,
		[
			[100, 0.25],
			[200, 0.29],
			[300, 0.34],
			[400, 0.4],
			[500, 0.47],
			[600, 0.55]
		],
		'ASTM C547 Type II: maximum use 1200 °F (650 °C), §4.1; maximum apparent thermal ' +
			'conductivity by mean temperature as in its Table 1 (common practice values, not yet checked against the current edition)'
	),
	'calcium-silicate': fromSpecification(
		'Calcium silicate pipe insulation, ASTM C533 Type I',
		1200,
		[
			[100, 0.41],
			[200, 0.44],
			[300, 0.47],
			[400, 0.51],
			[500, 0.55],
			[600, 0.59],
			[700, 0.64]
		],
		'ASTM C533 Type I: maximum use 1200 °F (649 °C), §4.1; maximum apparent thermal ' +
			'conductivity 0.41 Btu·in/(h·ft²·°F) at 100 °F mean; values at 200–700 °F common practice, not yet checked against the current edition'
	),
	'cellular-glass': fromSpecification(
		'Cellular glass pipe insulation, ASTM C552 Grade 6 Type II',
		800,
		[
			[0, 0.29],
			[75, 0.34],
			[200, 0.43],
			[400, 0.63]
		],
		'ASTM C552 Grade 6 Type II (pipe): maximum use 800 °F (427 °C), §1.1; maximum apparent ' +
			'thermal conductivity at 0/75/200/400 °F mean as listed in the NIA Insulation Materials ' +
			'Specification Chart (April 2024)'
	)
};

/** Highest custom conductivity accepted [W/(m K)]: well above any insulating material. */
const CUSTOM_K_MAX = 5;

/** The data behind a material: a named one from MATERIALS, or a custom constant conductivity. */
export function materialData(material: InsulationMaterial): MaterialData {
	if (typeof material === 'string') {
		const data = (MATERIALS as Record<string, MaterialData | undefined>)[material];
		if (!data) {
			throw new TypeError(
				`Unknown insulation material "${material}": use 'mineral-wool', 'calcium-silicate', ` +
					`'cellular-glass' or { conductivity } in W/(m K)`
			);
		}
		return data;
	}
	const k = positiveUpTo('conductivity', material.conductivity, CUSTOM_K_MAX, 'W/(m K)');
	const max = material.maxServiceTemperature ?? Infinity;
	if (Number.isNaN(max) || max <= 0) {
		throw new SteamRangeError('maxServiceTemperature', max, 'greater than 0 K');
	}
	return {
		name: `custom, k = ${k} W/(m K)`,
		maxServiceTemperature: max,
		points: [[0, k]],
		source: 'entered by the user'
	};
}

/**
 * Conductivity k(T) [W/(m K)] at temperature T [K]: linear between the table's mean
 * temperatures, as ASTM C680 uses the apparent conductivity–mean temperature relation.
 * Below the first point k is held constant (never extrapolated towards zero); above the last
 * point the last segment is extended (never decreasing), both stated assumptions.
 */
export function conductivityAt(data: MaterialData, T: number): number {
	const points = data.points;
	if (points.length === 1 || T <= points[0][0]) return points[0][1];
	let i = 1;
	while (i < points.length - 1 && points[i][0] < T) i++;
	const [t0, k0] = points[i - 1];
	const [t1, k1] = points[i];
	const slope = (k1 - k0) / (t1 - t0);
	return k0 + (T > t1 ? Math.max(slope, 0) : slope) * (T - t0);
}

/**
 * ∫ k(T) dT from T1 to T2 [W/m], exact for the piecewise-linear k(T) (trapezoids between
 * breakpoints). This is the Kirchhoff transform C680 uses for temperature-dependent k.
 */
export function conductivityIntegral(data: MaterialData, T1: number, T2: number): number {
	if (T2 < T1) return -conductivityIntegral(data, T2, T1);
	const cuts = [T1];
	for (const [t] of data.points) if (t > T1 && t < T2) cuts.push(t);
	cuts.push(T2);
	let sum = 0;
	for (let i = 1; i < cuts.length; i++) {
		const a = cuts[i - 1];
		const b = cuts[i];
		sum += ((conductivityAt(data, a) + conductivityAt(data, b)) / 2) * (b - a);
	}
	return sum;
}

/** Mean conductivity over [T1, T2] [W/(m K)]: the integral divided by the span. */
export function meanConductivity(data: MaterialData, T1: number, T2: number): number {
	if (T1 === T2) return conductivityAt(data, T1);
	return conductivityIntegral(data, T1, T2) / (T2 - T1);
}
