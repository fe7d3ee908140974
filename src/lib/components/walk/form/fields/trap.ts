/** The trap test: tag, trap details, header, discharge, test readings, condition. */
import type { UnitSystemId } from '$lib/units';
import {
	sizeOptions,
	TRAP_CONDITION_OPTIONS,
	TRAP_DISCHARGE_OPTIONS,
	TRAP_TEST_METHOD_OPTIONS,
	TRAP_TYPE_OPTIONS
} from '../options';
import { always, type FieldSpec } from '../types';
import { is, location, area, notes, header, T, temperatureTest } from './common';

export function trapFields(system: UnitSystemId): FieldSpec[] {
	return [
		{
			key: 'tag',
			label: 'Tag',
			input: 'tag',
			path: 'assetTag',
			noun: 'a tag',
			missing: 'Give the tag'
		},
		location,
		area,
		{
			key: 'trapType',
			label: 'Trap type',
			input: 'select',
			path: 'inputs.trapType',
			options: TRAP_TYPE_OPTIONS,
			required: always,
			noun: 'a trap type',
			missing: 'Choose the trap’s type'
		},
		{
			key: 'size',
			label: 'Size',
			input: 'select',
			path: 'inputs.dn',
			numeric: true,
			options: sizeOptions(system),
			required: always,
			noun: 'a size',
			missing: 'Choose the trap’s connection size'
		},
		{
			key: 'orifice',
			label: 'Discharge orifice',
			input: 'number',
			quantity: 'shortLength',
			limit: T.orificeDiameter,
			path: 'inputs.orificeDiameter',
			noun: 'an orifice diameter',
			missing: 'Enter the orifice diameter'
		},
		header('trap is on'),
		{
			key: 'discharge',
			label: 'Discharges',
			input: 'choice',
			path: 'inputs.discharge',
			options: TRAP_DISCHARGE_OPTIONS,
			required: always,
			noun: 'a discharge',
			missing: 'Choose where the trap discharges'
		},
		{
			key: 'backPressure',
			label: 'Return back pressure',
			input: 'number',
			quantity: 'pressure',
			limit: T.backPressure,
			path: 'inputs.backPressure',
			shown: is('discharge', 'condensate-return'),
			required: is('discharge', 'condensate-return'),
			noun: 'a back pressure',
			missing: 'Enter the return’s back pressure'
		},
		{
			key: 'testMethod',
			label: 'Test method',
			input: 'select',
			path: 'inputs.testMethod',
			options: TRAP_TEST_METHOD_OPTIONS,
			noun: 'a test method',
			missing: 'Choose how the trap was tested'
		},
		{
			key: 'inletTemperature',
			label: 'Inlet temperature',
			input: 'number',
			quantity: 'temperature',
			limit: T.inletTemperature,
			path: 'inputs.inletTemperature',
			shown: temperatureTest,
			noun: 'an inlet temperature',
			missing: 'Enter the inlet temperature'
		},
		{
			key: 'outletTemperature',
			label: 'Outlet temperature',
			input: 'number',
			quantity: 'temperature',
			limit: T.outletTemperature,
			path: 'inputs.outletTemperature',
			shown: temperatureTest,
			noun: 'an outlet temperature',
			missing: 'Enter the outlet temperature'
		},
		{
			key: 'condition',
			label: 'Condition',
			input: 'choice',
			path: 'inputs.condition',
			options: TRAP_CONDITION_OPTIONS,
			required: always,
			noun: 'a condition',
			missing: 'Choose the trap’s condition'
		},
		notes
	];
}
