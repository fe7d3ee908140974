/**
 * The fields of each kind of finding, in the order they appear on the phone. Limits come from
 * src/lib/schemas/ranges.ts (base units); a field says how it is typed and what a message
 * calls it, and `toCapture` does the rest.
 */
import type { FindingKind } from '$lib/schemas/finding-vocabulary';
import type { UnitSystemId } from '$lib/units';
import { headerFields } from './fields/header';
import { insulationFields } from './fields/insulation';
import { leakFields } from './fields/leak';
import { trapFields } from './fields/trap';
import type { FieldSpec, FormValues } from './types';

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
