import { HOUR_S, LB_KG } from './constants';
import type { UnitTable } from './unit-def';

/** Mass flow units; base kg/s. lb = 0.453 592 37 kg exactly (NIST SP 811 B.8). */
export const massFlowUnits = {
	'kg/s': { label: 'kg/s', name: 'kilograms per second', factor: 1 },
	'kg/h': { label: 'kg/h', name: 'kilograms per hour', factor: 1 / HOUR_S },
	't/h': { label: 't/h', name: 'tonnes per hour', factor: 1000 / HOUR_S },
	'lb/h': { label: 'lb/h', name: 'pounds per hour', factor: LB_KG / HOUR_S }
} as const satisfies UnitTable;

/** Mass units; base kg. t = 1000 kg (NIST SP 811 B.8, "ton, metric"). */
export const massUnits = {
	kg: { label: 'kg', name: 'kilograms', factor: 1 },
	t: { label: 't', name: 'tonnes', factor: 1000 },
	lb: { label: 'lb', name: 'pounds', factor: LB_KG }
} as const satisfies UnitTable;
