import { FT_M, HOUR_S, MILE_M } from './constants';
import type { UnitTable } from './unit-def';

/**
 * Speed units, for wind over a bare surface; base m/s. km/h = 1000 m / 3600 s;
 * mph = 1609.344 m / 3600 s = 0.447 04 m/s exactly (NIST SP 811 B.8, "mile per hour").
 */
export const speedUnits = {
	'm/s': { label: 'm/s', name: 'metres per second', factor: 1 },
	'km/h': { label: 'km/h', name: 'kilometres per hour', factor: 1000 / HOUR_S },
	mph: { label: 'mph', name: 'miles per hour', factor: MILE_M / HOUR_S },
	'ft/s': { label: 'ft/s', name: 'feet per second', factor: FT_M }
} as const satisfies UnitTable;
