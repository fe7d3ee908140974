/**
 * The fields of each kind of finding, in the order they appear on the phone. Limits come from
 * src/lib/schemas/ranges.ts (base units); a field says how it is typed and what a message
 * calls it, and `toCapture` does the rest.
 */
import { INPUT_LIMITS } from '$lib/schemas/ranges';
import type { FindingKind } from '$lib/schemas/finding-vocabulary';
import type { UnitSystemId } from '$lib/units';
import {
	INSULATION_ITEM_OPTIONS,
	INSULATION_MATERIAL_OPTIONS,
	INSULATION_STATE_OPTIONS,
	LEAK_COMPONENT_OPTIONS,
	LEAK_SIZE_MODE_OPTIONS,
	LEAK_SIZE_OPTIONS,
	sizeOptions,
	TEMPERATURE_SOURCE_OPTIONS,
	TRAP_CONDITION_OPTIONS,
	TRAP_DISCHARGE_OPTIONS,
	TRAP_TEST_METHOD_OPTIONS,
	TRAP_TYPE_OPTIONS
} from './options';
import { always, type FieldSpec, type FormValues } from './types';

const is =
	(key: string, ...values: string[]) =>
	(v: FormValues) =>
		values.includes(v[key] ?? '');

const location: FieldSpec = {
	key: 'location',
	label: 'Location',
	input: 'text',
	path: 'location',
	noun: 'a location',
	missing: 'Say where it is',
	hint: 'Where someone else will find it: line, floor, column, equipment'
};
const area: FieldSpec = {
	key: 'areaId',
	label: 'Area',
	input: 'select',
	path: 'areaId',
	noun: 'an area',
	missing: 'Pick the area'
};
const notes: FieldSpec = {
	key: 'notes',
	label: 'Notes',
	input: 'textarea',
	path: 'notes',
	noun: 'notes',
	missing: 'Add a note'
};
const header = (what: string, shown?: FieldSpec['shown']): FieldSpec => ({
	key: 'headerId',
	label: 'Header',
	input: 'select',
	path: 'headerId',
	required: shown ?? always,
	shown,
	noun: 'a header',
	missing: `Pick the header this ${what}`
});

const T = INPUT_LIMITS.trap;
const L = INPUT_LIMITS.leak;
const I = INPUT_LIMITS.insulation;
const H = INPUT_LIMITS.header;
const temperatureTest = is('testMethod', 'temperature', 'combined');

function trapFields(system: UnitSystemId): FieldSpec[] {
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

function leakFields(): FieldSpec[] {
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

function insulationFields(system: UnitSystemId): FieldSpec[] {
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

function headerFields(): FieldSpec[] {
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

const cache = new Map<string, FieldSpec[]>();

/** The fields of a kind, for a unit system (sizes are named DN or NPS). */
export function fieldsFor(kind: FindingKind, system: UnitSystemId): FieldSpec[] {
	const key = `${kind}/${system}`;
	let fields = cache.get(key);
	if (!fields) {
		fields =
			kind === 'trap'
				? trapFields(system)
				: kind === 'leak'
					? leakFields()
					: kind === 'insulation'
						? insulationFields(system)
						: headerFields();
		cache.set(key, fields);
	}
	return fields;
}

export function isShown(field: FieldSpec, values: FormValues): boolean {
	return field.shown === undefined || field.shown(values);
}

export function isRequired(field: FieldSpec, values: FormValues): boolean {
	return isShown(field, values) && field.required !== undefined && field.required(values);
}

/** The fields on screen for these values. */
export function visibleFields(kind: FindingKind, system: UnitSystemId, values: FormValues) {
	return fieldsFor(kind, system).filter((f) => isShown(f, values));
}
