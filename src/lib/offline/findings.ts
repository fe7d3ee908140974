import { findingCaptureSchema, type FindingCapture } from '$lib/schemas/capture';
import type { DeviceAsset, DeviceDatabase, DeviceFinding, OutboxEntry } from './db';

/**
 * Recording on the device: a finding and its outbox entry are written in one transaction, so
 * the device never holds a change it will not send, nor queues one it does not hold.
 *
 * Every save appends its own outbox entry (no merging with an earlier queued one: the sync
 * may be sending that one at this moment). The server applies them in order.
 */

export interface CaptureIssue {
	/** Dotted path of the field, e.g. 'inputs.orificeDiameter'; '' for the whole capture. */
	path: string;
	message: string;
}

/** A capture the device will not store, with one plain message per field. Nothing was written. */
export class CaptureRefused extends Error {
	readonly issues: CaptureIssue[];
	constructor(issues: CaptureIssue[]) {
		super(
			issues.length === 1
				? `Not saved: ${issues[0].message}`
				: `Not saved: ${issues.length} things to put right (${issues.map((i) => i.message).join('; ')})`
		);
		this.name = 'CaptureRefused';
		this.issues = issues;
	}
}

function toIssues(issues: readonly { path: PropertyKey[]; message: string }[]): CaptureIssue[] {
	return issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
}

function outboxEntry(
	op: OutboxEntry['op'],
	recordId: string,
	baseVersion: number,
	payload: FindingCapture | null,
	now: string,
	surveyId: string
): OutboxEntry {
	return {
		mutationId: crypto.randomUUID(),
		entity: 'finding',
		op,
		recordId,
		baseVersion,
		payload,
		// A delete has no payload, yet its push names the survey (docs/sync.md).
		surveyId,
		attempts: 0,
		createdAt: now
	};
}

/**
 * Checks and stores a capture (new or changed) and queues it for the server.
 * @throws CaptureRefused when the capture is not valid; nothing is written then.
 */
export async function saveFinding(db: DeviceDatabase, capture: unknown): Promise<DeviceFinding> {
	const parsed = findingCaptureSchema.safeParse(capture);
	if (!parsed.success) throw new CaptureRefused(toIssues(parsed.error.issues));
	const data = parsed.data;
	const now = new Date().toISOString();

	return db.transaction('rw', [db.findings, db.outbox, db.surveys, db.assets], async () => {
		const stored = await db.findings.get(data.id);
		if (stored && stored.surveyId !== data.surveyId) {
			throw new CaptureRefused([
				{ path: 'surveyId', message: 'This finding belongs to another survey' }
			]);
		}
		const finding: DeviceFinding = {
			id: data.id,
			surveyId: data.surveyId,
			kind: data.kind,
			capture: data,
			version: stored?.version ?? 0,
			status: stored?.status ?? 'draft',
			pending: 1,
			deleted: 0,
			updatedAt: now
		};
		await db.findings.put(finding);
		await db.outbox.add(outboxEntry('upsert', data.id, finding.version, data, now, data.surveyId));
		if (data.kind === 'trap' && data.assetTag !== undefined) await rememberTrap(db, data);
		return finding;
	});
}

/**
 * A trap tag the device has not seen becomes a device-made asset, so the next test of that
 * tag on this site fills in its details. The next snapshot that lists the tag replaces it.
 */
async function rememberTrap(
	db: DeviceDatabase,
	trap: Extract<FindingCapture, { kind: 'trap' }>
): Promise<void> {
	const survey = await db.surveys.get(trap.surveyId);
	if (!survey || trap.assetTag === undefined) return;
	const known = await db.assets
		.where('[siteId+tag]')
		.equals([survey.siteId, trap.assetTag])
		.first();
	if (known && known.local !== 1) return;
	const { trapType, dn, orificeDiameter, discharge, backPressure } = trap.inputs;
	const asset: DeviceAsset = {
		id: known?.id ?? crypto.randomUUID(),
		siteId: survey.siteId,
		kind: 'trap',
		tag: trap.assetTag,
		location: trap.location === '' ? null : trap.location,
		areaId: trap.areaId ?? null,
		headerId: trap.headerId ?? null,
		details: {
			trapType,
			dn,
			...(orificeDiameter === undefined ? {} : { orificeDiameter }),
			discharge,
			...(backPressure === undefined ? {} : { backPressure })
		},
		lastResult: known?.lastResult ?? null,
		local: 1
	};
	await db.assets.put(asset);
}

export type DeleteOutcome = 'removed' | 'marked' | 'missing';

/**
 * Deletes a finding.
 *
 * - Never sent (version 0, and no queued entry for it has been tried): removed outright with
 *   its queued upserts, photos and drafts, since the server has nothing to delete → 'removed'.
 * - Otherwise it is marked deleted (hidden from the round) and a delete is queued against the
 *   server version → 'marked'. A tried entry may have reached the server, so it counts as sent.
 */
export async function deleteFinding(db: DeviceDatabase, id: string): Promise<DeleteOutcome> {
	const now = new Date().toISOString();
	return db.transaction('rw', [db.findings, db.outbox, db.photos, db.drafts], async () => {
		const stored = await db.findings.get(id);
		if (!stored) return 'missing';
		const queued = await db.outbox.where('recordId').equals(id).toArray();
		if (stored.version === 0 && queued.every((e) => e.attempts === 0)) {
			await db.outbox.bulkDelete(queued.map((e) => e.seq!));
			await db.photos.where('findingId').equals(id).delete();
			await db.drafts
				.where('surveyId')
				.equals(stored.surveyId)
				.filter((d) => d.findingId === id)
				.delete();
			await db.findings.delete(id);
			return 'removed';
		}
		await db.findings.put({ ...stored, deleted: 1, pending: 1, updatedAt: now });
		await db.outbox.add(outboxEntry('delete', id, stored.version, null, now, stored.surveyId));
		await db.drafts
			.where('surveyId')
			.equals(stored.surveyId)
			.filter((d) => d.findingId === id)
			.delete();
		return 'marked';
	});
}
