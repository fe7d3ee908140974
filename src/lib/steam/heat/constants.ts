/**
 * Physical constants and the engine's validity ranges for surface heat loss.
 * Temperatures in K, lengths in m, speeds in m/s.
 */

/** Stefan–Boltzmann constant [W/(m² K⁴)], CODATA 2018 (exact since the 2019 SI). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/** Standard acceleration of gravity [m/s²] (3rd CGPM, 1901). */
export const STANDARD_GRAVITY = 9.80665;

/** 0 °C in K. */
export const ZERO_CELSIUS = 273.15;

/**
 * Ambient air temperatures accepted [K]: −50 to 60 °C. The lower end is the first row of the
 * air-property table; nobody audits a steam plant in hotter air than 60 °C.
 */
export const AMBIENT_MIN = 223.15;
export const AMBIENT_MAX = 333.15;

/**
 * Hottest surface or process temperature accepted [K]: 650 °C, the highest maximum use
 * temperature of the insulation materials carried, and above any saturated-steam service.
 */
export const SURFACE_MAX = 923.15;

/** Largest outside diameter accepted [m]: above NPS 24 ducts and vessels, Ra stays below 10¹². */
export const DIAMETER_MAX = 3;

/** Strongest wind accepted [m/s] (a violent storm on the Beaufort scale). */
export const WIND_MAX = 35;

/** Thickest single insulation layer accepted [m]. */
export const THICKNESS_MAX = 1;

/** Converts °F to K. */
export function fahrenheitToKelvin(fahrenheit: number): number {
	return ((fahrenheit - 32) * 5) / 9 + ZERO_CELSIUS;
}
