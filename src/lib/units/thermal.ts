import { BTU_IT_J, LB_KG } from './constants';
import type { UnitTable } from './unit-def';

/** kJ/kg per Btu_IT/lb: 2.326 exactly (NIST SP 811 B.8). */
const BTU_PER_LB_KJ_PER_KG = BTU_IT_J / LB_KG / 1000;

/** Specific enthalpy units; base kJ/kg, the engine's unit. */
export const specificEnthalpyUnits = {
	'kJ/kg': { label: 'kJ/kg', name: 'kilojoules per kilogram', factor: 1 },
	'Btu/lb': { label: 'Btu/lb', name: 'Btu per pound', factor: BTU_PER_LB_KJ_PER_KG }
} as const satisfies UnitTable;

/**
 * Specific entropy (and specific heat) units; base kJ/(kg K), the engine's unit.
 * 1 Btu_IT/(lb °F) = 2.326 × 1.8 = 4.1868 kJ/(kg K) exactly (NIST SP 811 B.8).
 */
export const specificEntropyUnits = {
	'kJ/(kg K)': { label: 'kJ/(kg·K)', name: 'kilojoules per kilogram kelvin', factor: 1 },
	'Btu/(lb degF)': {
		label: 'Btu/(lb·°F)',
		name: 'Btu per pound degree Fahrenheit',
		factor: BTU_PER_LB_KJ_PER_KG * 1.8
	}
} as const satisfies UnitTable;
