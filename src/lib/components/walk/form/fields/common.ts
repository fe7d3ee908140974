/** Pieces every kind of finding's fields share: where it is, its header, notes. */
import { INPUT_LIMITS } from '$lib/schemas/ranges';
import { always, type FieldSpec, type FormValues } from '../types';

export const is =
	(key: string, ...values: string[]) =>
	(v: FormValues) =>
		values.includes(v[key] ?? '');

export const location: FieldSpec = {
	key: 'location',
	label: 'Location',
	input: 'text',
	path: 'location',
	noun: 'a location',
	missing: 'Say where it is',
	hint: 'Where someone else will find it: line, floor, column, equipment'
};
export const area: FieldSpec = {
	key: 'areaId',
	label: 'Area',
	input: 'select',
	path: 'areaId',
	noun: 'an area',
	missing: 'Pick the area'
};
export const notes: FieldSpec = {
	key: 'notes',
	label: 'Notes',
	input: 'textarea',
	path: 'notes',
	noun: 'notes',
	missing: 'Add a note'
};
export const header = (what: string, shown?: FieldSpec['shown']): FieldSpec => ({
	key: 'headerId',
	label: 'Header',
	input: 'select',
	path: 'headerId',
	required: shown ?? always,
	shown,
	noun: 'a header',
	missing: `Pick the header this ${what}`
});

export const T = INPUT_LIMITS.trap;
export const L = INPUT_LIMITS.leak;
export const I = INPUT_LIMITS.insulation;
export const H = INPUT_LIMITS.header;
export const temperatureTest = is('testMethod', 'temperature', 'combined');
