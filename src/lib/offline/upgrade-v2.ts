import type { Transaction } from 'dexie';
import { findingCaptureSchema, type FindingCapture } from '$lib/schemas/capture';
import { lifecycleStatus, type FindingStatus } from '$lib/schemas/finding-vocabulary';
import type { DeviceFinding, DevicePhoto, OutboxEntry, SetAsideRow } from './db';

/**
 * Version 1 → 2 of the device database. Version 1 had no sync, so nothing it holds was ever
 * accepted by a server: carried findings get version 0 and pending 1, and each gets an outbox
 * entry so it is sent. Whatever does not fit the new shape is moved to `setAside` as it was,
 * with the reason, never dropped.
 */

/** Version-1 rows as they may lie on a phone (read as unknown and checked). */
interface V1Finding {
	id: string;
	surveyId?: unknown;
	record?: unknown;
	updatedAt?: unknown;
}
interface V1Photo {
	id: string;
	findingId: string;
	blob: Blob;
	contentType: string;
	uploaded: 0 | 1;
	createdAt: string;
}
interface V1Outbox {
	seq: number;
	mutationId: string;
	entity: string;
	entityId: string;
	payload: unknown;
	attempts: number;
	lastError?: string;
	createdAt: string;
}

type Carried =
	| { ok: true; capture: FindingCapture; status: FindingStatus; deleted: boolean }
	| { ok: false; reason: string };

/** What a whole stored finding adds to a capture: the Desk's part and the server's. */
const STORED_KEYS = [
	'status',
	'repairCost',
	'reviewed',
	'reviewedAt',
	'reviewedBy',
	'version',
	'deleted'
] as const;

/**
 * A version-1 record as a capture: either already one, or a whole stored finding of that
 * time (capture fields plus status, repair cost, version, deleted; no photo ids yet).
 */
export function captureFromV1(record: unknown): Carried {
	const direct = findingCaptureSchema.safeParse(record);
	if (direct.success) return { ok: true, capture: direct.data, status: 'draft', deleted: false };
	if (typeof record !== 'object' || record === null || Array.isArray(record)) {
		return { ok: false, reason: firstIssue(direct.error.issues) };
	}
	const fields: Record<string, unknown> = { ...record };
	const status = fields.status;
	const deleted = fields.deleted === true;
	for (const key of STORED_KEYS) delete fields[key];
	fields.photoIds ??= [];
	const parsed = findingCaptureSchema.safeParse(fields);
	if (!parsed.success) return { ok: false, reason: firstIssue(parsed.error.issues) };
	return {
		ok: true,
		capture: parsed.data,
		status: (typeof status === 'string' && lifecycleStatus(status)) || 'draft',
		deleted
	};
}

function firstIssue(issues: readonly { path: PropertyKey[]; message: string }[]): string {
	const issue = issues[0];
	if (!issue) return 'Not a finding this version can read';
	const where = issue.path.map(String).join('.');
	return `Not a finding this version can read (${where ? `${where}: ` : ''}${issue.message})`;
}

export async function upgradeToV2(tx: Transaction): Promise<void> {
	const now = new Date().toISOString();
	const aside: SetAsideRow[] = [];
	const setAside = (store: string, key: unknown, row: unknown, reason: string) =>
		aside.push({ store, key: String(key), row, reason, setAsideAt: now });

	// A version-1 survey is a bare summary (no site, headers or stage): taking the survey
	// offline again brings all of it, so the old row is only kept for the record.
	const surveys = tx.table('surveys');
	for (const row of await surveys.toArray()) {
		setAside('surveys', row.id, row, 'A version-1 survey summary: take the survey offline again');
	}
	await surveys.clear();

	const findings = tx.table<V1Finding | DeviceFinding, string>('findings');
	const carried = new Map<string, DeviceFinding>();
	for (const row of (await findings.toArray()) as V1Finding[]) {
		const result = captureFromV1(row.record);
		if (!result.ok) {
			setAside('findings', row.id, row, result.reason);
			continue;
		}
		carried.set(row.id, {
			id: row.id,
			surveyId: result.capture.surveyId,
			kind: result.capture.kind,
			capture: result.capture,
			version: 0,
			status: result.status,
			pending: result.deleted ? 0 : 1,
			deleted: result.deleted ? 1 : 0,
			updatedAt: typeof row.updatedAt === 'string' ? row.updatedAt : result.capture.updatedAt
		});
	}
	await findings.clear();
	await findings.bulkPut([...carried.values()]);

	const photos = tx.table<V1Photo | DevicePhoto, string>('photos');
	await photos.toCollection().modify((photo) => {
		const old = photo as V1Photo;
		const upgraded: DevicePhoto = {
			...old,
			surveyId: carried.get(old.findingId)?.surveyId ?? '',
			// No thumbnail was ever made: the photo itself stands in until it is replaced.
			thumbnail: old.blob,
			width: 0,
			height: 0,
			bytes: old.blob?.size ?? 0
		};
		Object.assign(photo, upgraded);
	});

	const outbox = tx.table<V1Outbox | OutboxEntry, number>('outbox');
	const entries: OutboxEntry[] = [];
	const dropped: number[] = [];
	for (const row of (await outbox.toArray()) as V1Outbox[]) {
		const finding = carried.get(row.entityId);
		const fromPayload = captureFromV1(row.payload);
		const payload = fromPayload.ok ? fromPayload.capture : finding?.capture;
		const reason =
			row.entity !== 'finding'
				? 'A version-1 photo entry: photos now upload from the photo store'
				: finding?.deleted === 1
					? 'A change to a finding deleted before it was ever sent'
					: payload === undefined
						? fromPayload.ok
							? 'Unreadable'
							: fromPayload.reason
						: null;
		if (reason !== null || payload === undefined) {
			setAside('outbox', row.seq, row, reason ?? 'Unreadable');
			dropped.push(row.seq);
			continue;
		}
		entries.push({
			seq: row.seq,
			mutationId: row.mutationId,
			entity: 'finding',
			op: 'upsert',
			recordId: row.entityId,
			baseVersion: 0,
			payload,
			attempts: row.attempts,
			...(row.lastError === undefined ? {} : { lastError: row.lastError }),
			createdAt: row.createdAt
		});
	}
	await outbox.bulkDelete(dropped);
	await outbox.bulkPut(entries);

	// A carried finding with nothing queued would never reach the server: queue it.
	const queued = new Set(entries.map((e) => e.recordId));
	const missing = [...carried.values()].filter((f) => f.pending === 1 && !queued.has(f.id));
	await outbox.bulkAdd(
		missing.map((f) => ({
			mutationId: crypto.randomUUID(),
			entity: 'finding' as const,
			op: 'upsert' as const,
			recordId: f.id,
			baseVersion: 0,
			payload: f.capture,
			attempts: 0,
			createdAt: now
		}))
	);

	if (aside.length > 0) await tx.table<SetAsideRow, number>('setAside').bulkAdd(aside);
}
