/**
 * A header reading: measured pressure (absolute) and, when taken, temperature. From them the
 * saturation temperature, whether the steam is superheated or at saturation (and so possibly
 * wet, which a thermometer cannot tell from dry), and the enthalpy the steam carries.
 */
import { stateFromPT } from '../forward';
import { saturationTemperature } from '../region4';
import { saturatedVapour } from '../saturation';
import type { Sourced } from './sourced';
import { requireFinite, requirePositive } from './sourced';

/**
 * Band around saturation within which a reading counts as "at saturation", K. Contact and
 * infrared thermometers on a pipe read within a few kelvin of the steam at best (common
 * practice), so a smaller superheat cannot be told from saturated steam.
 */
export const SATURATION_TOLERANCE: Sourced = {
	value: 3,
	unit: 'K',
	source: 'common practice: surface thermometer accuracy on steam lines'
};

export type HeaderCondition =
	'superheated' | 'at-saturation' | 'below-saturation' | 'pressure-only';

export interface HeaderReading {
	/** Measured pressure, MPa absolute. */
	pressure: number;
	/** Saturation temperature at that pressure, K. */
	saturationTemperature: number;
	/** Measured temperature, K, or null when only the pressure was read. */
	temperature: number | null;
	/** Measured minus saturation temperature, K (negative when below), or null. */
	superheat: number | null;
	condition: HeaderCondition;
	/** Enthalpy of the steam, kJ/kg: at (p, T) when superheated, else dry saturated (an upper bound if wet). */
	enthalpy: number;
	/** Plain words for the report. */
	note: string;
}

/**
 * Interprets a header reading.
 * @param pressure measured pressure, MPa absolute
 * @param temperature measured temperature, K (optional)
 * @param tolerance saturation band, K (default SATURATION_TOLERANCE)
 */
export function readHeader(
	pressure: number,
	temperature?: number,
	tolerance = SATURATION_TOLERANCE.value
): HeaderReading {
	requirePositive('Header pressure', pressure, 'MPa');
	requirePositive('Saturation tolerance', tolerance, 'K');
	const Tsat = saturationTemperature(pressure);
	const hg = saturatedVapour(pressure).h;
	const base = { pressure, saturationTemperature: Tsat };
	if (temperature === undefined) {
		return {
			...base,
			temperature: null,
			superheat: null,
			condition: 'pressure-only',
			enthalpy: hg,
			note: 'Pressure only: steam taken as dry saturated'
		};
	}
	requireFinite('Header temperature', temperature, 'K');
	const superheat = temperature - Tsat;
	if (superheat > tolerance) {
		return {
			...base,
			temperature,
			superheat,
			condition: 'superheated',
			enthalpy: stateFromPT(pressure, temperature).h,
			note: `Superheated by ${superheat.toFixed(1)} K`
		};
	}
	if (superheat >= -tolerance) {
		return {
			...base,
			temperature,
			superheat,
			condition: 'at-saturation',
			enthalpy: hg,
			note: `At saturation (within ±${tolerance} K): possibly wet; enthalpy taken as dry saturated, an upper bound`
		};
	}
	return {
		...base,
		temperature,
		superheat,
		condition: 'below-saturation',
		enthalpy: hg,
		note: `Reads ${(-superheat).toFixed(1)} K below saturation: steam cannot be colder than saturation at this pressure; check the gauge and the thermometer, or condensate in the line`
	};
}
