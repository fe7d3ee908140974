/**
 * Input checks shared by the public functions: every rejected input throws a SteamRangeError
 * naming the quantity, the value given and the valid range.
 */
import { inRange, SteamRangeError } from './errors';
import { P_MAX, P_MAX_5, P_MIN, T_MAX, T_MAX_12, T_MIN } from './constants';

/** Checks 1 Pa ≤ p ≤ 100 MPa. */
export function checkPressure(p: number): void {
	inRange('pressure p', p, P_MIN, P_MAX, 'MPa');
}

/** Checks 273.15 K ≤ T ≤ 2273.15 K, and p ≤ 50 MPa above 1073.15 K (region 5). */
export function checkPressureTemperature(p: number, T: number): void {
	checkPressure(p);
	inRange('temperature T', T, T_MIN, T_MAX, 'K');
	if (T > T_MAX_12 && p > P_MAX_5) {
		throw new SteamRangeError(
			'pressure p',
			p,
			`${P_MIN} to ${P_MAX_5} MPa at temperatures above ${T_MAX_12} K (T = ${T} K)`
		);
	}
}

/** Checks 0 ≤ x ≤ 1. */
export function checkDryness(x: number): void {
	if (!Number.isFinite(x) || x < 0 || x > 1) {
		throw new SteamRangeError('dryness fraction x', x, '0 to 1 (kg vapour per kg of mixture)');
	}
}

/** Checks that a value is a finite number (its range depends on the pressure; checked later). */
export function checkFinite(quantity: string, value: number, validRange: string): void {
	if (!Number.isFinite(value)) throw new SteamRangeError(quantity, value, validRange);
}
