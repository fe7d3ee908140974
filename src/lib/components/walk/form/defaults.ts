/**
 * What a new form starts with: the previous entry of the same kind on this survey (header,
 * area, test method…), a tagged trap's details from its asset, and for insulation the usual
 * conditions indoors. Every default is typed in the person's units like any other value.
 */
import type { FindingCapture } from '$lib/schemas/capture';
import type { FindingKind } from '$lib/schemas/finding-vocabulary';
import type { AssetSnapshot } from '$lib/schemas/snapshot';
import { TRAP_CONDITION_LABELS } from '$lib/schemas/finding-vocabulary';
import { inputText } from './quantity';
import type { FormContext, FormValues } from './types';

/**
 * Insulation defaults (common practice): indoor air 20 °C (68 °F), still air, mineral wool
 * 50 mm (2 in), oxidised steel ε 0.85 bare and an aluminium jacket ε 0.1 — the engine has no
 * defaults of its own, so these are named as common practice where they are shown.
 */
export const INSULATION_DEFAULTS = {
	ambient: { SI: 293.15, US: 293.15 },
	thickness: { SI: 0.05, US: 0.0508 },
	bareEmissivity: 0.85,
	jacketEmissivity: 0.1
} as const;

/** Carried over from the last finding of the same kind on this survey. */
const CARRIED: Record<FindingKind, readonly string[]> = {
	trap: ['headerId', 'areaId', 'testMethod', 'discharge', 'backPressure'],
	leak: ['headerId', 'areaId', 'sizeMode'],
	insulation: [
		'headerId',
		'areaId',
		'temperatureSource',
		'ambient',
		'wind',
		'material',
		'thickness',
		'bareEmissivity',
		'jacketEmissivity'
	],
	header: []
};

function base(kind: FindingKind, ctx: FormContext): FormValues {
	const single: FormValues = ctx.headers.length === 1 ? { headerId: ctx.headers[0].id } : {};
	switch (kind) {
		case 'trap':
			return { ...single, discharge: 'atmosphere' };
		case 'leak':
			return { ...single, sizeMode: 'guide' };
		case 'insulation':
			return {
				...single,
				item: 'pipe',
				temperatureSource: 'header',
				ambient: inputText('temperature', INSULATION_DEFAULTS.ambient[ctx.system], ctx),
				wind: '0',
				material: 'mineral-wool',
				thickness: inputText('shortLength', INSULATION_DEFAULTS.thickness[ctx.system], ctx),
				bareEmissivity: String(INSULATION_DEFAULTS.bareEmissivity),
				jacketEmissivity: String(INSULATION_DEFAULTS.jacketEmissivity)
			};
		case 'header':
			return { ...single };
	}
}

/**
 * Starting values for a new finding.
 * @param previous the values of the last finding of this kind on the survey (fromCapture)
 */
export function newFormValues(
	kind: FindingKind,
	ctx: FormContext,
	previous?: FormValues
): FormValues {
	const values = base(kind, ctx);
	if (previous) {
		for (const key of CARRIED[kind]) {
			if (previous[key] !== undefined && previous[key] !== '') values[key] = previous[key];
		}
	}
	return values;
}

/** The values a tagged trap's asset fills in (trap type, size, orifice, discharge, header…). */
export function assetValues(asset: AssetSnapshot, ctx: FormContext): FormValues {
	const values: FormValues = { tag: asset.tag };
	if (asset.location) values.location = asset.location;
	if (asset.areaId) values.areaId = asset.areaId;
	if (asset.headerId && ctx.headers.some((h) => h.id === asset.headerId)) {
		values.headerId = asset.headerId;
	}
	const d = asset.details;
	if (d) {
		values.trapType = d.trapType;
		values.size = String(d.dn);
		if (d.orificeDiameter !== undefined) {
			values.orifice = inputText('shortLength', d.orificeDiameter, ctx);
		}
		if (d.discharge) values.discharge = d.discharge;
		if (d.backPressure !== undefined) {
			values.backPressure = inputText('pressure', d.backPressure, ctx);
		}
	}
	return values;
}

const DAY = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

/** "Last tested 14 Apr 2026: failed open", or null for a trap never tested. */
export function lastResultText(asset: Pick<AssetSnapshot, 'lastResult'>): string | null {
	const last = asset.lastResult;
	if (!last) return null;
	const when = DAY.format(new Date(last.testedAt));
	return `Last tested ${when}: ${TRAP_CONDITION_LABELS[last.condition].toLowerCase()}`;
}

/** The most recent capture of a kind on the survey (findings newest first). */
export function previousOfKind(
	findings: readonly { kind: FindingKind; capture: FindingCapture; id: string }[],
	kind: FindingKind,
	exceptId?: string
): FindingCapture | undefined {
	return findings.find((f) => f.kind === kind && f.id !== exceptId)?.capture;
}
