/** The leak: component, header and its equivalent hole, measured or judged by the plume. */
import { LEAK_COMPONENT_OPTIONS, LEAK_SIZE_MODE_OPTIONS, LEAK_SIZE_OPTIONS } from '../options';
import { type FieldSpec, type FormValues } from '../types';
import { is, location, area, notes, header, L } from './common';

export function leakFields(): FieldSpec[] {
	const measured = is('sizeMode', 'measured');
	const guided = (v: FormValues) => !measured(v);
	return [
		location,
		area,
		{
			key: 'component',
			label: 'Leaking from',
			input: 'select',
			path: 'inputs.component',
			options: LEAK_COMPONENT_OPTIONS,
			noun: 'a component',
			missing: 'Choose where the leak is'
		},
		header('leak is on'),
		{
			key: 'sizeMode',
			label: 'Leak size',
			input: 'choice',
			options: LEAK_SIZE_MODE_OPTIONS,
			noun: 'a way to size the leak',
			missing: 'Choose how to size the leak'
		},
		{
			key: 'holeDiameter',
			label: 'Equivalent hole size',
			input: 'number',
			quantity: 'shortLength',
			limit: L.holeDiameter,
			path: 'inputs.holeDiameter',
			shown: measured,
			required: measured,
			noun: 'a hole size',
			missing: 'Enter the equivalent hole size'
		},
		{
			key: 'sizeClass',
			label: 'What the plume looks like',
			input: 'choice',
			path: 'inputs.sizeClass',
			options: LEAK_SIZE_OPTIONS,
			shown: guided,
			required: guided,
			noun: 'a size',
			missing: 'Choose the plume that matches the leak'
		},
		notes
	];
}
