/** The insulation gap: what is bare, how much, its temperature, the air, what to fit. */
import type { UnitSystemId } from '$lib/units';
import {
	INSULATION_ITEM_OPTIONS,
	INSULATION_MATERIAL_OPTIONS,
	INSULATION_STATE_OPTIONS,
	sizeOptions,
	TEMPERATURE_SOURCE_OPTIONS
} from '../options';
import { always, type FieldSpec } from '../types';
import { is, location, area, notes, header, I } from './common';
import { INPUT_LIMITS } from '$lib/schemas/ranges';

export function insulationFields(system: UnitSystemId): FieldSpec[] {
	const surface = is('item', 'surface');
	const fitting = is('item', 'valve', 'flange-pair');
	const measured = is('temperatureSource', 'measured');
	const number = (
		key: string,
		label: string,
		quantity: FieldSpec['quantity'],
		limit: FieldSpec['limit'],
		path: string,
		noun: string,
		shown?: FieldSpec['shown']
	): FieldSpec => ({
		key,
		label,
		input: 'number',
		quantity,
		limit,
		path,
		shown,
		required: shown ?? always,
		noun: `${/^[aeiou]/i.test(noun) ? 'an' : 'a'} ${noun}`,
		missing: `Enter the ${noun}`
	});
	return [
		{
			key: 'item',
			label: 'What is bare',
			input: 'choice',
			path: 'inputs.item',
			options: INSULATION_ITEM_OPTIONS,
			required: always,
			noun: 'an item',
			missing: 'Choose what is bare'
		},
		{
			key: 'size',
			label: 'Pipe size',
			input: 'select',
			path: 'inputs.dn',
			numeric: true,
			// Insulation models start at DN 15 (ASTM C585 sizes; see steam/heat/pipe-sizes.ts).
			options: sizeOptions(system, 15),
			shown: (v) => !surface(v),
			required: (v) => !surface(v),
			noun: 'a pipe size',
			missing: 'Choose the pipe size'
		},
		number(
			'length',
			'Bare length',
			'length',
			I.length,
			'inputs.length',
			'bare length',
			is('item', 'pipe')
		),
		{
			...number('count', 'How many', undefined, I.count, 'inputs.count', 'count', fitting),
			noun: 'a count',
			missing: 'Enter how many are bare'
		},
		number('area', 'Bare area', 'area', I.area, 'inputs.area', 'bare area', surface),
		number(
			'height',
			'Surface height',
			'length',
			I.height,
			'inputs.height',
			'surface height',
			surface
		),
		{
			key: 'temperatureSource',
			label: 'Its temperature',
			input: 'choice',
			options: TEMPERATURE_SOURCE_OPTIONS,
			required: always,
			noun: 'a temperature source',
			missing: 'Choose where its temperature comes from'
		},
		header('item carries', (v) => !measured(v)),
		number(
			'surfaceTemperature',
			'Surface temperature',
			'temperature',
			I.processTemperature,
			'inputs.processTemperature',
			'surface temperature',
			measured
		),
		number(
			'ambient',
			'Ambient air',
			'temperature',
			I.ambientTemperature,
			'inputs.ambientTemperature',
			'ambient air temperature'
		),
		number('wind', 'Wind', 'speed', I.windSpeed, 'inputs.windSpeed', 'wind speed'),
		{
			key: 'surfaceState',
			label: 'As found',
			input: 'select',
			path: 'inputs.surfaceState',
			options: INSULATION_STATE_OPTIONS,
			noun: 'a state',
			missing: 'Choose what the surface is like today'
		},
		{
			key: 'material',
			label: 'Proposed insulation',
			input: 'select',
			path: 'inputs.layers.0.material',
			options: INSULATION_MATERIAL_OPTIONS,
			required: always,
			noun: 'a material',
			missing: 'Choose the insulation to fit'
		},
		number(
			'thickness',
			'Thickness',
			'shortLength',
			INPUT_LIMITS.layer.thickness,
			'inputs.layers.0.thickness',
			'insulation thickness'
		),
		number(
			'bareEmissivity',
			'Bare surface emissivity',
			undefined,
			I.bareEmissivity,
			'inputs.bareEmissivity',
			'emissivity for the bare surface'
		),
		number(
			'jacketEmissivity',
			'Jacket emissivity',
			undefined,
			I.jacketEmissivity,
			'inputs.jacketEmissivity',
			'emissivity for the jacket'
		),
		location,
		area,
		notes
	];
}
