/**
 * What a capture form opens with: a draft left on the device (a reload, a crash or a closed
 * tab keeps what was typed), else the finding being edited, else a new finding's defaults —
 * with a fresh id made once and kept in the draft from the first keystroke.
 */
import type { FindingKind } from '$lib/schemas/finding-vocabulary';
import type { FindingCapture } from '$lib/schemas/capture';
import type { AssetSnapshot } from '$lib/schemas/snapshot';
import { assetValues, newFormValues, previousOfKind } from './defaults';
import { fromCapture } from './from-capture';
import type { FormContext, FormValues } from './types';

export interface DraftLike {
	findingId: string;
	kind: FindingKind;
	values: Record<string, string>;
}

export interface OpenInput {
	kind: FindingKind;
	findingId?: string;
	tag?: string;
	findings: readonly { id: string; kind: FindingKind; capture: FindingCapture }[];
	assets: readonly AssetSnapshot[];
	/** The survey's drafts, newest first. */
	drafts: readonly DraftLike[];
	ctx: FormContext;
	now: string;
	newId: () => string;
}

export interface Opened {
	findingId: string;
	values: FormValues;
	/** Opened from a draft left earlier. */
	restored: boolean;
}

/** Values of a tag's asset, when the survey knows the tag (case as typed on the label). */
export function assetFor(assets: readonly AssetSnapshot[], tag: string) {
	const wanted = tag.trim().toLowerCase();
	return wanted === '' ? undefined : assets.find((a) => a.tag.toLowerCase() === wanted);
}

/** A new finding's starting values: previous entry of the kind, then the tag's asset. */
export function freshValues(input: Omit<OpenInput, 'drafts' | 'findingId'>): FormValues {
	const previous = previousOfKind(input.findings, input.kind);
	const values = newFormValues(
		input.kind,
		input.ctx,
		previous ? fromCapture(previous, input.ctx) : undefined
	);
	if (input.tag) {
		const asset = assetFor(input.assets, input.tag);
		Object.assign(values, asset ? assetValues(asset, input.ctx) : { tag: input.tag });
	}
	return { ...values, photoIds: '[]', createdAt: input.now };
}

export function openForm(input: OpenInput): Opened {
	const { kind, findingId, drafts, findings } = input;
	if (findingId !== undefined) {
		const draft = drafts.find((d) => d.findingId === findingId && d.kind === kind);
		if (draft) return { findingId, values: { ...draft.values }, restored: true };
		const existing = findings.find((f) => f.id === findingId);
		if (existing) {
			const values = fromCapture(existing.capture, input.ctx);
			return {
				findingId,
				values: { ...values, createdAt: existing.capture.createdAt },
				restored: false
			};
		}
		return { findingId, values: freshValues(input), restored: false };
	}
	const wanted = input.tag?.trim().toLowerCase();
	const left = drafts.find(
		(d) =>
			d.kind === kind &&
			!findings.some((f) => f.id === d.findingId) &&
			(wanted === undefined || (d.values.tag ?? '').trim().toLowerCase() === wanted)
	);
	if (left) return { findingId: left.findingId, values: { ...left.values }, restored: true };
	return { findingId: input.newId(), values: freshValues(input), restored: false };
}
