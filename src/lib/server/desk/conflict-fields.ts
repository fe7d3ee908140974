/**
 * Two captures of one finding side by side, field by field: the server's and the one a device
 * kept in a conflict. Each field in words and the person's units (the Walk's field labels,
 * choices and unit handling), whether the two differ, and the capture a merge of per-field
 * choices makes. Pure: no database.
 */
import { findingCaptureSchema, type FindingCapture } from '../../schemas/capture';
import { INSULATION_MATERIAL_LABELS } from '../../schemas/finding-vocabulary';
import { fieldsFor } from '../../components/walk/form/fields';
import { readable } from '../../components/walk/form/quantity';
import type { FieldSpec, FormContext } from '../../components/walk/form/types';

/** Top-level capture fields a person reads (ids and times are not compared). */
const TOP = ['location', 'notes', 'headerId', 'areaId', 'assetTag', 'photoIds'] as const;
type Top = (typeof TOP)[number];

const TOP_LABELS: Record<Top, string> = {
	location: 'Location',
	notes: 'Notes',
	headerId: 'Header',
	areaId: 'Area',
	assetTag: 'Tag',
	photoIds: 'Photos'
};

export interface FieldRow {
	/** Form key of the choice: `choice.<key>`. */
	key: string;
	label: string;
	server: string;
	device: string;
	differs: boolean;
}

const NOT_GIVEN = 'not given';

function valueOf(c: FindingCapture | null, key: string): unknown {
	if (c === null) return undefined;
	if ((TOP as readonly string[]).includes(key)) return (c as Record<string, unknown>)[key];
	return (c.inputs as Record<string, unknown>)[key];
}

function specFor(fields: readonly FieldSpec[], key: string): FieldSpec | undefined {
	return fields.find((f) => f.path === key || f.path === `inputs.${key}`);
}

function layersText(value: unknown, ctx: FormContext): string {
	if (!Array.isArray(value)) return NOT_GIVEN;
	return value
		.map((l: { thickness: number; material: unknown }) => {
			const m =
				typeof l.material === 'string'
					? (INSULATION_MATERIAL_LABELS[l.material as keyof typeof INSULATION_MATERIAL_LABELS] ??
						l.material)
					: `conductivity ${(l.material as { conductivity: number }).conductivity} W/(m K)`;
			return `${readable('shortLength', l.thickness, ctx)} ${m}`;
		})
		.join('; then ');
}

/** A field's value in words. */
export function shownValue(
	key: string,
	value: unknown,
	fields: readonly FieldSpec[],
	ctx: FormContext
): string {
	if (value === undefined || value === null || value === '') return NOT_GIVEN;
	if (key === 'headerId')
		return ctx.headers.find((h) => h.id === value)?.name ?? 'a header not on this site';
	if (key === 'areaId')
		return ctx.areas?.find((a) => a.id === value)?.name ?? 'an area not on this site';
	if (key === 'photoIds') {
		const n = Array.isArray(value) ? value.length : 0;
		return n === 0 ? 'none' : n === 1 ? '1 photo' : `${n} photos`;
	}
	if (key === 'layers') return layersText(value, ctx);
	const spec = specFor(fields, key);
	if (typeof value === 'number') {
		if (spec?.options)
			return spec.options.find((o) => o.value === String(value))?.label ?? String(value);
		return spec?.quantity ? readable(spec.quantity, value, ctx, 4) : String(value);
	}
	if (typeof value === 'string') {
		return spec?.options?.find((o) => o.value === value)?.label ?? value;
	}
	return JSON.stringify(value);
}

const same = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

/** Every field either capture has, server's order first. */
export function compareCaptures(
	server: FindingCapture | null,
	device: FindingCapture | null,
	ctx: FormContext
): FieldRow[] {
	const kind = (server ?? device)?.kind;
	if (kind === undefined) return [];
	const fields = fieldsFor(kind, ctx.system);
	const inputKeys = [
		...new Set([...Object.keys(server?.inputs ?? {}), ...Object.keys(device?.inputs ?? {})])
	];
	const labelOf = (key: string) =>
		(TOP_LABELS as Record<string, string>)[key] ??
		(key === 'layers' ? 'Insulation layers' : specFor(fields, key)?.label) ??
		key.replace(/([A-Z])/g, ' $1').replace(/^./, (c) => c.toUpperCase());
	return [...TOP, ...inputKeys].map((key) => {
		const s = valueOf(server, key);
		const d = valueOf(device, key);
		return {
			key,
			label: labelOf(key),
			server: shownValue(key, s, fields, ctx),
			device: shownValue(key, d, fields, ctx),
			differs: !same(s, d)
		};
	});
}

export type Merged =
	{ capture: FindingCapture } | { problem: string; errors: Record<string, string> };

/**
 * The server's capture with the device's value for each field chosen `device`; every field
 * that differs must have a choice. Checked by the shared capture schema.
 */
export function mergeCaptures(
	server: FindingCapture,
	device: FindingCapture,
	choices: Record<string, 'server' | 'device'>,
	rows: readonly FieldRow[],
	now = new Date()
): Merged {
	if (server.kind !== device.kind) {
		return {
			problem: 'The two sides record different kinds of finding: keep one side whole instead.',
			errors: {}
		};
	}
	const errors: Record<string, string> = {};
	for (const row of rows) {
		if (row.differs && choices[row.key] === undefined) {
			errors[`choice.${row.key}`] = 'Choose the server’s value or the device’s';
		}
	}
	if (Object.keys(errors).length > 0) {
		return { problem: 'Choose a side for every field that differs.', errors };
	}
	const top: Record<string, unknown> = { ...server };
	const inputs: Record<string, unknown> = { ...server.inputs };
	for (const row of rows) {
		if (!row.differs || choices[row.key] !== 'device') continue;
		const target = (TOP as readonly string[]).includes(row.key) ? top : inputs;
		const value = valueOf(device, row.key);
		if (value === undefined) delete target[row.key];
		else target[row.key] = value;
	}
	const changed = now.toISOString();
	const parsed = findingCaptureSchema.safeParse({
		...top,
		inputs,
		updatedAt: Date.parse(changed) < Date.parse(server.createdAt) ? server.createdAt : changed
	});
	if (parsed.success) return { capture: parsed.data };
	for (const issue of parsed.error.issues) {
		const path = issue.path.map(String);
		const key = path[0] === 'inputs' ? path[1] : path[0];
		errors[`choice.${key ?? 'form'}`] ??= issue.message;
	}
	return {
		problem: 'These choices do not make a finding that holds together: see the fields marked.',
		errors
	};
}
