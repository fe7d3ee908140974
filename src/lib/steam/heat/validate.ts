/**
 * Input checks shared by the heat-loss models. Every failure is a SteamRangeError naming the
 * quantity with its unit, the value given and the valid range, never a NaN further on.
 */
import { SteamRangeError, inRange } from '../errors';
import {
	AMBIENT_MAX,
	AMBIENT_MIN,
	DIAMETER_MAX,
	SURFACE_MAX,
	THICKNESS_MAX,
	WIND_MAX
} from './constants';

/** Throws unless 0 < value ≤ max and finite. Returns the value. */
export function positiveUpTo(quantity: string, value: number, max: number, unit: string): number {
	if (!Number.isFinite(value) || value <= 0 || value > max) {
		throw new SteamRangeError(quantity, value, `greater than 0 and at most ${max} ${unit}`);
	}
	return value;
}

/** Outside diameter [m]: 0 < D ≤ 3 m. */
export function checkDiameter(quantity: string, value: number): number {
	return positiveUpTo(quantity, value, DIAMETER_MAX, 'm');
}

/** Insulation thickness [m]: 0 < t ≤ 1 m. */
export function checkThickness(quantity: string, value: number): number {
	return positiveUpTo(quantity, value, THICKNESS_MAX, 'm');
}

/** Grey-body emissivity: 0 < ε ≤ 1. */
export function checkEmissivity(quantity: string, value: number): number {
	return positiveUpTo(quantity, value, 1, '(dimensionless)');
}

/** Wind speed [m/s]: 0 ≤ V ≤ 35 m/s. */
export function checkWindSpeed(value: number): number {
	return inRange('windSpeed', value, 0, WIND_MAX, 'm/s');
}

/** Ambient air temperature [K]: 223.15 to 333.15 K (−50 to 60 °C). */
export function checkAmbient(value: number): number {
	return inRange('ambientTemperature', value, AMBIENT_MIN, AMBIENT_MAX, 'K');
}

/**
 * A hot temperature [K] that must not be below the ambient: heat-loss models here are for hot
 * service only (cold service needs condensation control, which is not modelled).
 */
export function checkHotTemperature(quantity: string, value: number, ambient: number): number {
	return inRange(quantity, value, ambient, SURFACE_MAX, 'K (not below the ambient temperature)');
}

/** A count of items: a whole number from 1 to max. */
export function checkCount(quantity: string, value: number, max: number): number {
	if (!Number.isInteger(value) || value < 1 || value > max) {
		throw new SteamRangeError(quantity, value, `a whole number from 1 to ${max}`);
	}
	return value;
}
