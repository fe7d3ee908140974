import { G_N, STANDARD_ATMOSPHERE_MPA } from './constants';
import { UnitError, describeValue } from './errors';

/*
 * U.S. Standard Atmosphere, 1976 (identical to the ICAO standard atmosphere below 32 km),
 * lowest layer, with the constants as the document defines them.
 */
const T0 = 288.15; // sea-level temperature, K
const LAPSE = 0.0065; // temperature gradient in the troposphere, K per geopotential metre
const M0 = 28.9644; // mean molar mass of sea-level air, kg/kmol
const R_STAR = 8314.32; // gas constant as adopted by the 1976 standard, J/(kmol K)
const R0 = 6_356_766; // effective Earth radius for geopotential altitude, m
const EXPONENT = (G_N * M0) / (R_STAR * LAPSE); // 5.255 876…

/** Elevations accepted, metres above mean sea level (the troposphere layer's range). */
export const ELEVATION_RANGE_M = { min: -5000, max: 11_000 } as const;

/**
 * Atmospheric pressure at a site elevation by the U.S. Standard Atmosphere (1976) barometric
 * formula for the troposphere: p = p0 (1 − L·H/T0)^(g0·M0/(R*·L)), H the geopotential
 * altitude of the geometric elevation z, H = r0·z/(r0 + z).
 *
 * A standard day only: real barometric pressure varies with weather by a few percent, so a
 * measured site value is better when there is one.
 *
 * @param elevation site elevation above mean sea level, m (−5000 to 11 000)
 * @returns atmospheric pressure, MPa absolute
 */
export function atmosphericPressureAtElevation(elevation: number): number {
	const { min, max } = ELEVATION_RANGE_M;
	if (
		typeof elevation !== 'number' ||
		!Number.isFinite(elevation) ||
		elevation < min ||
		elevation > max
	) {
		throw new UnitError(
			`Elevation ${describeValue(elevation)} m is outside ${min} to ${max} m ` +
				'(the standard atmosphere troposphere)',
			'm',
			elevation
		);
	}
	const geopotential = (R0 * elevation) / (R0 + elevation);
	return STANDARD_ATMOSPHERE_MPA * (1 - (LAPSE * geopotential) / T0) ** EXPONENT;
}
