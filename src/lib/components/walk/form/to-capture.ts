/**
 * A form's raw values → a capture in base units, checked first field by field (messages in
 * the person's units and words), then by findingCaptureSchema for the rules that span fields;
 * whatever the schema still finds is put on the field it concerns.
 */
import { findingCaptureSchema, type FindingCapture } from '$lib/schemas/capture';
import type { FindingKind } from '$lib/schemas/finding-vocabulary';
import { fieldsFor, isRequired, isShown } from './fields';
import { readable } from './quantity';
import { readField } from './read-field';
import type { FieldSpec, FormContext, FormValues, Problems } from './types';

export type CaptureResult = { capture: FindingCapture } | { problems: Problems };

/** Sets a dotted path ('inputs.layers.0.thickness'), making objects and arrays on the way. */
function setPath(target: Record<string, unknown>, path: string, value: unknown): void {
	const keys = path.split('.');
	let node: Record<string, unknown> = target;
	keys.slice(0, -1).forEach((key, i) => {
		if (node[key] === undefined) node[key] = /^\d+$/.test(keys[i + 1]) ? [] : {};
		node = node[key] as Record<string, unknown>;
	});
	node[keys[keys.length - 1]] = value;
}

function photoIds(values: FormValues): string[] {
	try {
		const ids: unknown = JSON.parse(values.photoIds || '[]');
		return Array.isArray(ids) ? ids.filter((id): id is string => typeof id === 'string') : [];
	} catch {
		return [];
	}
}

/** Rules across fields that the person should read in their own units. */
function crossChecks(
	kind: FindingKind,
	read: Record<string, string | number | undefined>,
	ctx: FormContext,
	problems: Problems
): void {
	if (kind === 'trap' && typeof read.backPressure === 'number') {
		const header = ctx.headers.find((h) => h.id === read.headerId);
		if (header && read.backPressure >= header.pressure) {
			problems.backPressure = `The return’s back pressure must be below the header’s ${readable('pressure', header.pressure, ctx)}`;
		}
	}
	if (kind === 'insulation') {
		const { surfaceTemperature: surface, ambient } = read;
		if (typeof surface === 'number' && typeof ambient === 'number' && surface <= ambient) {
			problems.surfaceTemperature = `The surface must be warmer than the air around it (${readable('temperature', ambient, ctx)})`;
		}
	}
}

/** Which field a schema issue's path concerns ('form' when none). */
export function fieldForPath(fields: readonly FieldSpec[], path: readonly PropertyKey[]): string {
	const dotted = path.map(String).join('.');
	const exact = fields.find((f) => f.path === dotted);
	if (exact) return exact.key;
	// A whole layer or list refused: put it on the first field inside it.
	const inside = fields.find((f) => f.path !== undefined && f.path.startsWith(`${dotted}.`));
	return inside?.key ?? 'form';
}

/** The message for a schema issue on a field: always ours, in the person's units. */
function fieldMessage(field: FieldSpec | undefined, values: FormValues, fallback: string): string {
	if (field === undefined) return fallback;
	const text = (values[field.key] ?? '').trim();
	if (text === '') return field.missing;
	return field.input === 'number' ? `Check the ${field.label.toLowerCase()}` : field.missing;
}

/** Builds and checks the capture. */
export function toCapture(kind: FindingKind, values: FormValues, ctx: FormContext): CaptureResult {
	const fields = fieldsFor(kind, ctx.system);
	const problems: Problems = {};
	const read: Record<string, string | number | undefined> = {};
	const raw: Record<string, unknown> = {
		id: ctx.id,
		surveyId: ctx.surveyId,
		kind,
		location: '',
		notes: '',
		photoIds: photoIds(values),
		createdAt: ctx.createdAt,
		updatedAt: ctx.updatedAt,
		inputs: {}
	};
	for (const field of fields) {
		if (!isShown(field, values)) continue;
		const reading = readField(field, values[field.key] ?? '', ctx);
		if (reading.problem !== undefined) {
			problems[field.key] = reading.problem;
			continue;
		}
		read[field.key] = reading.value;
		if (reading.value === undefined) {
			if (isRequired(field, values)) problems[field.key] = field.missing;
		} else if (field.path !== undefined) {
			setPath(raw, field.path, reading.value);
		}
	}
	crossChecks(kind, read, ctx, problems);
	const parsed = findingCaptureSchema.safeParse(raw);
	if (!parsed.success) {
		for (const issue of parsed.error.issues) {
			const key = fieldForPath(fields, issue.path);
			if (key in problems) continue;
			problems[key] = fieldMessage(
				fields.find((f) => f.key === key),
				values,
				'This finding could not be put together: check the fields above'
			);
		}
	}
	if (Object.keys(problems).length > 0 || !parsed.success) return { problems };
	return { capture: parsed.data };
}
