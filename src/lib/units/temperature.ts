import type { UnitTable } from './unit-def';

/*
 * Temperature scales (NIST SP 811 B.8): T/K = t/°C + 273.15 = (t/°F + 459.67)/1.8.
 * Written as (value + offset) × factor so that each scale's absolute zero maps to 0 K exactly.
 */

/** Temperature units; base K. */
export const temperatureUnits = {
	K: { label: 'K', name: 'kelvin', factor: 1 },
	degC: { label: '°C', name: 'degree Celsius', factor: 1, offset: 273.15 },
	degF: { label: '°F', name: 'degree Fahrenheit', factor: 1 / 1.8, offset: 459.67 }
} as const satisfies UnitTable;

/**
 * Temperature differences (superheat, subcooling, surface above ambient); base K. A
 * difference has no offset: 1 °C of difference is 1 K, 1 °F of difference is 1/1.8 K.
 */
export const temperatureDifferenceUnits = {
	delta_K: { label: 'K', name: 'kelvin (difference)', factor: 1 },
	delta_degC: { label: '°C', name: 'degree Celsius (difference)', factor: 1 },
	delta_degF: { label: '°F', name: 'degree Fahrenheit (difference)', factor: 1 / 1.8 }
} as const satisfies UnitTable;
