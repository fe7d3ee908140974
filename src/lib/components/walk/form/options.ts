/**
 * Choices in the trade's words, from the vocabulary's *_LABELS: raw ids never reach a screen.
 */
import { NOMINAL_SIZES } from '$lib/schemas/common';
import {
	INSULATION_ITEM_LABELS,
	INSULATION_MATERIAL_LABELS,
	INSULATION_STATE_LABELS,
	LEAK_COMPONENT_LABELS,
	LEAK_SIZE_CLASS_LABELS,
	TRAP_CONDITION_LABELS,
	TRAP_DISCHARGE_LABELS,
	TRAP_TEST_METHOD_LABELS,
	TRAP_TYPE_LABELS
} from '$lib/schemas/finding-vocabulary';
import type { UnitSystemId } from '$lib/units';
import type { Option } from './types';

function fromLabels(labels: Record<string, string>): Option[] {
	return Object.entries(labels).map(([value, label]) => ({ value, label }));
}

export const TRAP_TYPE_OPTIONS = fromLabels(TRAP_TYPE_LABELS);
export const TRAP_CONDITION_OPTIONS = fromLabels(TRAP_CONDITION_LABELS);
export const TRAP_DISCHARGE_OPTIONS = fromLabels(TRAP_DISCHARGE_LABELS);
export const TRAP_TEST_METHOD_OPTIONS = fromLabels(TRAP_TEST_METHOD_LABELS);
export const LEAK_SIZE_OPTIONS = fromLabels(LEAK_SIZE_CLASS_LABELS);
export const LEAK_COMPONENT_OPTIONS = fromLabels(LEAK_COMPONENT_LABELS);
export const INSULATION_ITEM_OPTIONS = fromLabels(INSULATION_ITEM_LABELS);
export const INSULATION_MATERIAL_OPTIONS = fromLabels(INSULATION_MATERIAL_LABELS);
export const INSULATION_STATE_OPTIONS = fromLabels(INSULATION_STATE_LABELS);

export const LEAK_SIZE_MODE_OPTIONS: Option[] = [
	{ value: 'guide', label: 'Judge it by the plume' },
	{ value: 'measured', label: 'Measured or estimated hole' }
];

export const TEMPERATURE_SOURCE_OPTIONS: Option[] = [
	{ value: 'header', label: 'From the header it carries' },
	{ value: 'measured', label: 'Measured on the surface' }
];

/**
 * Nominal sizes as the person names them: "DN 15" (SI) or "NPS 1/2" (US). The value is always
 * the DN, which is what is stored. `fromDn` drops the sizes a model does not cover.
 */
export function sizeOptions(system: UnitSystemId, fromDn = 0): Option[] {
	return NOMINAL_SIZES.filter((s) => s.dn >= fromDn).map((s) => ({
		value: String(s.dn),
		label: system === 'US' ? `NPS ${s.nps}` : `DN ${s.dn}`
	}));
}
