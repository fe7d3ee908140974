import type { FindingKind } from '$lib/schemas/finding-vocabulary';
import type { DeviceDatabase, DeviceDraft } from './db';

/**
 * What a form holds as typed, saved on every keystroke, so a reload, a dead battery or a
 * switch to the camera loses nothing. Values are the raw strings of the fields (before any
 * unit conversion or checking): a half-typed "12," is kept as it is.
 */

/** One draft per finding form: the survey, the kind and the finding's device-made id. */
export function draftKey(surveyId: string, kind: FindingKind, findingId: string): string {
	return `${surveyId}/${kind}/${findingId}`;
}

export interface DraftInput {
	surveyId: string;
	kind: FindingKind;
	findingId: string;
	values: Record<string, string>;
}

/** Saves (overwrites) the draft of one form and returns it. */
export async function saveDraft(db: DeviceDatabase, input: DraftInput): Promise<DeviceDraft> {
	const draft: DeviceDraft = {
		key: draftKey(input.surveyId, input.kind, input.findingId),
		surveyId: input.surveyId,
		kind: input.kind,
		findingId: input.findingId,
		values: { ...input.values },
		updatedAt: new Date().toISOString()
	};
	await db.drafts.put(draft);
	return draft;
}

export async function loadDraft(db: DeviceDatabase, key: string): Promise<DeviceDraft | null> {
	return (await db.drafts.get(key)) ?? null;
}

export async function discardDraft(db: DeviceDatabase, key: string): Promise<void> {
	await db.drafts.delete(key);
}

/** A survey's unfinished forms, newest first. */
export async function surveyDrafts(db: DeviceDatabase, surveyId: string): Promise<DeviceDraft[]> {
	const drafts = await db.drafts.where('surveyId').equals(surveyId).toArray();
	// updatedAt is always made here in UTC (toISOString), so the strings sort by time.
	return drafts.sort((a, b) =>
		a.updatedAt < b.updatedAt ? 1 : a.updatedAt > b.updatedAt ? -1 : 0
	);
}
