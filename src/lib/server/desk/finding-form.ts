/**
 * The Desk's edit form of one finding, between the stored capture and the posted text: the
 * Walk's field definitions and unit handling (src/lib/components/walk/form) for every field
 * they have, plus what the Desk adds — any number of insulation layers as numbered rows, a
 * custom conductivity, the repair cost. Messages are the Walk's (the person's units), keyed
 * by the form's own names (`orifice`, `layers.1.thickness`), so each shows beside its input.
 * Inputs the form has no field for (a condensate load, an outer diameter) are carried over
 * from the stored capture, never dropped.
 */
import { findingCaptureSchema, type FindingCapture } from '../../schemas/capture';
import {
	repairCostTextSchema,
	type FindingEditForm,
	type LayerRow
} from '../../schemas/desk-finding';
import { INPUT_LIMITS } from '../../schemas/ranges';
import type { SiteHeader } from '../../schemas/snapshot';
import { fromMinorUnits, toMinorUnits } from '../../steam/index';
import type { UnitSystemId } from '../../units/index';
import { fieldForPath, toCapture } from '../../components/walk/form/to-capture';
import { fromCapture } from '../../components/walk/form/from-capture';
import { fieldsFor } from '../../components/walk/form/fields';
import { inputText } from '../../components/walk/form/quantity';
import { readField } from '../../components/walk/form/read-field';
import type {
	FieldSpec,
	FormContext,
	FormValues,
	Problems
} from '../../components/walk/form/types';

export interface EditSite {
	system: UnitSystemId;
	/** MPa absolute. */
	atmosphericPressure: number;
	headers: readonly SiteHeader[];
	areas: readonly { id: string; name: string }[];
	currency: string;
}

export function formContext(
	site: EditSite,
	capture: FindingCapture,
	now = new Date()
): FormContext {
	const changed = now.toISOString();
	return {
		system: site.system,
		atmosphericPressure: site.atmosphericPressure,
		headers: site.headers,
		areas: site.areas,
		id: capture.id,
		surveyId: capture.surveyId,
		createdAt: capture.createdAt,
		updatedAt: Date.parse(changed) < Date.parse(capture.createdAt) ? capture.createdAt : changed
	};
}

/** The form as it opens (or as the capture would have been typed). */
export interface EditValues {
	values: FormValues;
	layers: LayerRow[];
}

export function formValuesOf(
	capture: FindingCapture,
	repairCost: number | null,
	site: EditSite
): EditValues {
	const ctx = formContext(site, capture);
	const values = fromCapture(capture, ctx);
	delete values.photoIds;
	delete values.thickness;
	delete values.material;
	values.repairCost = repairCost === null ? '' : String(fromMinorUnits(repairCost, site.currency));
	const layers =
		capture.kind === 'insulation'
			? capture.inputs.layers.map((l) => ({
					thickness: inputText('shortLength', l.thickness, ctx),
					material: typeof l.material === 'string' ? l.material : 'custom',
					conductivity: typeof l.material === 'string' ? '' : String(l.material.conductivity)
				}))
			: [];
	return { values, layers };
}

const layerSpec = (kind: 'thickness' | 'material', system: UnitSystemId): FieldSpec =>
	fieldsFor('insulation', system).find((f) => f.key === kind)!;

const conductivitySpec: FieldSpec = {
	key: 'conductivity',
	label: 'Conductivity',
	input: 'number',
	limit: INPUT_LIMITS.layer.conductivity,
	noun: 'a conductivity in W/(m K)',
	missing: 'Enter the material’s conductivity in W/(m K)'
};

/** Every layer row read in the person's units; problems keyed `layers.<i>.<field>`. */
function readLayers(rows: LayerRow[], ctx: FormContext, problems: Problems) {
	if (rows.length === 0) problems['layers.0.material'] = 'Propose at least one insulation layer';
	const thickness = layerSpec('thickness', ctx.system);
	const material = { ...layerSpec('material', ctx.system) };
	material.options = [...(material.options ?? []), { value: 'custom', label: 'Own conductivity' }];
	return rows.map((row, i) => {
		const at = (field: string, message: string) => (problems[`layers.${i}.${field}`] = message);
		const t = readField(thickness, row.thickness, ctx);
		if (t.problem !== undefined) at('thickness', t.problem);
		else if (t.value === undefined) at('thickness', thickness.missing);
		const m = readField(material, row.material, ctx);
		if (m.problem !== undefined) at('material', m.problem);
		else if (m.value === undefined) at('material', material.missing);
		let chosen: unknown = m.value;
		if (m.value === 'custom') {
			const k = readField(conductivitySpec, row.conductivity, ctx);
			if (k.problem !== undefined) at('conductivity', k.problem);
			else if (k.value === undefined) at('conductivity', conductivitySpec.missing);
			chosen = { conductivity: k.value };
		}
		return { thickness: t.value, material: chosen };
	});
}

/** Inputs of the stored capture that no field of this form covers. */
function uncovered(
	existing: FindingCapture,
	fields: readonly FieldSpec[]
): Record<string, unknown> {
	const covered = new Set(
		fields
			.map((f) => f.path)
			.filter((p): p is string => p?.startsWith('inputs.') ?? false)
			.map((p) => p.split('.')[1])
	);
	return Object.fromEntries(Object.entries(existing.inputs).filter(([k]) => !covered.has(k)));
}

export type FormCapture =
	{ capture: FindingCapture; repairCost: number | null } | { problems: Problems };

/** The posted form → the finding's next capture and repair cost, or messages per field. */
export function captureFromForm(
	existing: FindingCapture,
	form: FindingEditForm,
	site: EditSite,
	now = new Date()
): FormCapture {
	const ctx = formContext(site, existing, now);
	const fields = fieldsFor(existing.kind, ctx.system);
	const { repairCost: costText, layers: rows, fields: typed } = form;
	const values: FormValues = {
		...typed,
		photoIds: JSON.stringify(existing.photoIds)
	};
	const problems: Problems = {};
	let layers: unknown[] = [];
	if (existing.kind === 'insulation') {
		layers = readLayers(rows, ctx, problems);
		// Stand-ins for the Walk's single layer: the rows above are what is kept.
		values.material = 'mineral-wool';
		values.thickness = inputText('shortLength', 0.05, ctx);
	}
	const built = toCapture(existing.kind, values, ctx);
	if ('problems' in built) Object.assign(problems, built.problems);
	delete problems.thickness;
	delete problems.material;
	let repairCost: number | null = null;
	const cost = repairCostTextSchema.safeParse(costText);
	if (!cost.success) problems.repairCost = cost.error.issues[0].message;
	else if (cost.data !== '') {
		try {
			repairCost = toMinorUnits(Number(cost.data), site.currency);
		} catch {
			problems.repairCost = 'Enter the repair cost as a plain amount, e.g. 1200 or 1200.50';
		}
	}
	if ('problems' in built || Object.keys(problems).length > 0) return { problems };
	const raw = {
		...built.capture,
		inputs: {
			...uncovered(existing, fields),
			...built.capture.inputs,
			...(existing.kind === 'insulation' ? { layers } : {})
		}
	};
	const parsed = findingCaptureSchema.safeParse(raw);
	if (parsed.success) return { capture: parsed.data, repairCost };
	for (const issue of parsed.error.issues) {
		const path = issue.path.map(String);
		const key =
			path[0] === 'inputs' && path[1] === 'layers' && path[2] !== undefined
				? `layers.${path.slice(2, 4).join('.')}`
				: fieldForPath(fields, issue.path);
		problems[key] ??= issue.message;
	}
	return { problems };
}
