/**
 * A stored capture → the form's values, in the person's units, so an existing finding opens
 * for editing exactly as it would have been typed.
 */
import type { FindingCapture } from '$lib/schemas/capture';
import { fieldsFor } from './fields';
import { inputText } from './quantity';
import type { FormContext, FormValues } from './types';

function getPath(source: unknown, path: string): unknown {
	return path.split('.').reduce<unknown>((node, key) => {
		if (node === null || typeof node !== 'object') return undefined;
		return (node as Record<string, unknown>)[key];
	}, source);
}

export function fromCapture(capture: FindingCapture, ctx: FormContext): FormValues {
	const values: FormValues = { photoIds: JSON.stringify(capture.photoIds) };
	for (const field of fieldsFor(capture.kind, ctx.system)) {
		if (field.path === undefined) continue;
		const value = getPath(capture, field.path);
		if (typeof value === 'number') {
			values[field.key] =
				field.input === 'number' ? inputText(field.quantity, value, ctx) : String(value);
		} else if (typeof value === 'string') {
			values[field.key] = value;
		}
	}
	// Form-only choices, read back from what was stored.
	if (capture.kind === 'leak') {
		values.sizeMode = capture.inputs.holeDiameter !== undefined ? 'measured' : 'guide';
	}
	if (capture.kind === 'insulation') {
		values.temperatureSource =
			capture.inputs.processTemperature !== undefined ? 'measured' : 'header';
	}
	return values;
}
