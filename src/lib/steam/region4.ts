/**
 * IF97 region 4, the saturation line: the saturation-pressure equation and its exact inverse,
 * the saturation-temperature equation (IAPWS R7-97(2012) eqs. 30 and 31, table 34).
 */
import { inRange, SteamRangeError } from './errors';
import { P_CRIT, T_13, T_CRIT, T_MIN } from './constants';

// Table 34.
const n1 = 0.11670521452767e4;
const n2 = -0.72421316703206e6;
const n3 = -0.17073846940092e2;
const n4 = 0.1202082470247e5;
const n5 = -0.32325550322333e7;
const n6 = 0.1491510861353e2;
const n7 = -0.48232657361591e4;
const n8 = 0.40511340542057e6;
const n9 = -0.23855557567849;
const n10 = 0.65017534844798e3;

/** Saturation pressure [MPa] at T [K], eq. 30, without a range check. */
export function psat(T: number): number {
	const theta = T + n9 / (T - n10);
	const A = theta * theta + n1 * theta + n2;
	const B = n3 * theta * theta + n4 * theta + n5;
	const C = n6 * theta * theta + n7 * theta + n8;
	const x = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
	const x2 = x * x;
	return x2 * x2;
}

/** Saturation temperature [K] at p [MPa], eq. 31, without a range check. */
export function tsat(p: number): number {
	const beta = Math.sqrt(Math.sqrt(p));
	const E = beta * beta + n3 * beta + n6;
	const F = n1 * beta * beta + n4 * beta + n7;
	const G = n2 * beta * beta + n5 * beta + n8;
	const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
	return (n10 + D - Math.sqrt((n10 + D) * (n10 + D) - 4 * (n9 + n10 * D))) / 2;
}

/** Saturation pressure at 273.15 K [MPa], where the saturation line starts (≈ 611.213 Pa). */
export const P_SAT_MIN = psat(T_MIN);
/** Saturation pressure at 623.15 K [MPa], the top of regions 1/2 along the line (≈ 16.529). */
export const P_SAT_13 = psat(T_13);

/** Checks psat(273.15 K) ≤ p ≤ 22.064 MPa, the saturation line. */
export function checkSaturationPressure(p: number): void {
	if (!(p >= P_SAT_MIN && p <= P_CRIT)) {
		// The lower limit is shown rounded up, so the value printed is itself accepted.
		const range = `0.000611213 to ${P_CRIT} MPa (the saturation line)`;
		throw new SteamRangeError('pressure p', p, range);
	}
}

/**
 * Saturation pressure of water [MPa] at temperature T [K], IF97 eq. 30.
 * @throws SteamRangeError unless 273.15 K ≤ T ≤ 647.096 K (the critical temperature)
 */
export function saturationPressure(T: number): number {
	inRange('temperature T', T, T_MIN, T_CRIT, 'K');
	return psat(T);
}

/**
 * Saturation temperature of water [K] at pressure p [MPa absolute], IF97 eq. 31.
 * @throws SteamRangeError unless psat(273.15 K) ≈ 0.000611213 MPa ≤ p ≤ 22.064 MPa
 */
export function saturationTemperature(p: number): number {
	checkSaturationPressure(p);
	return tsat(p);
}
