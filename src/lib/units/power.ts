import { BTU_IT_J, HOUR_S, THERM_J } from './constants';
import type { UnitTable } from './unit-def';

/** Power units; base W. Btu is the International Table Btu (NIST SP 811 B.8). */
export const powerUnits = {
	W: { label: 'W', name: 'watts', factor: 1 },
	kW: { label: 'kW', name: 'kilowatts', factor: 1e3 },
	MW: { label: 'MW', name: 'megawatts', factor: 1e6 },
	'Btu/h': { label: 'Btu/h', name: 'Btu per hour', factor: BTU_IT_J / HOUR_S },
	'MMBtu/h': { label: 'MMBtu/h', name: 'million Btu per hour', factor: (1e6 * BTU_IT_J) / HOUR_S }
} as const satisfies UnitTable;

/**
 * Energy units; base J (coherent with power in W, so annual energy = W × s). kWh = 3.6 MJ
 * exactly; therm = 100 000 Btu_IT, the EC therm (NIST SP 811 B.8).
 */
export const energyUnits = {
	J: { label: 'J', name: 'joules', factor: 1 },
	kJ: { label: 'kJ', name: 'kilojoules', factor: 1e3 },
	MJ: { label: 'MJ', name: 'megajoules', factor: 1e6 },
	GJ: { label: 'GJ', name: 'gigajoules', factor: 1e9 },
	kWh: { label: 'kWh', name: 'kilowatt hours', factor: 3.6e6 },
	MWh: { label: 'MWh', name: 'megawatt hours', factor: 3.6e9 },
	Btu: { label: 'Btu', name: 'British thermal units', factor: BTU_IT_J },
	MMBtu: { label: 'MMBtu', name: 'million Btu', factor: 1e6 * BTU_IT_J },
	therm: { label: 'therm', name: 'therms', factor: THERM_J }
} as const satisfies UnitTable;
