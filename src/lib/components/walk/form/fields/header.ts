/** The header reading: header, gauge pressure, temperature. */
import { always, type FieldSpec } from '../types';
import { header, H, location, notes } from './common';

export function headerFields(): FieldSpec[] {
	return [
		header('reading is on'),
		{
			key: 'pressure',
			label: 'Gauge pressure',
			input: 'number',
			quantity: 'pressure',
			limit: H.measuredPressure,
			path: 'inputs.measuredPressure',
			required: always,
			noun: 'a pressure',
			missing: 'Enter the pressure the gauge reads'
		},
		{
			key: 'temperature',
			label: 'Temperature',
			input: 'number',
			quantity: 'temperature',
			limit: H.measuredTemperature,
			path: 'inputs.measuredTemperature',
			noun: 'a temperature',
			missing: 'Enter the temperature'
		},
		location,
		notes
	];
}
