import { pullResponseSchema, type Change } from '$lib/schemas/sync';
import type { DeviceDatabase } from './db';
import type { SyncProblem } from './sync-problem';
import { problemFromStatus } from './sync-problem';
import { setMeta } from './sync-meta';

/**
 * Pulling what changed on the server since the device's cursor, page by page; each page and
 * the cursor after it are written in one transaction, so a cut pull resumes where it stopped.
 * Like storeSnapshot, a finding changed here and not yet accepted (pending) is never replaced.
 */
export async function pullChanges(
	db: DeviceDatabase,
	fetchFn: typeof fetch,
	since: number,
	limit?: number,
	/** This device's id (meta), so the Desk can show when it last fetched. */
	device?: string
): Promise<{ pulled: number; cursor: number; problem?: SyncProblem }> {
	let cursor = since;
	const pageSize = limit === undefined ? '' : `&limit=${limit}`;
	const named = device === undefined ? '' : `&device=${encodeURIComponent(device)}`;
	let pulled = 0;
	for (;;) {
		let response: Response;
		try {
			response = await fetchFn(`/api/sync/pull?since=${cursor}${pageSize}${named}`);
		} catch {
			return { pulled, cursor, problem: problemFromStatus(0) };
		}
		if (!response.ok) return { pulled, cursor, problem: problemFromStatus(response.status) };
		const parsed = pullResponseSchema.safeParse(await response.json().catch(() => null));
		if (!parsed.success) {
			return {
				pulled,
				cursor,
				problem: {
					kind: 'retry',
					retryable: true,
					message: 'The server sent changes this device could not read; nothing was changed'
				}
			};
		}
		const page = parsed.data;
		await applyPage(db, page.changes, cursor, page.cursor);
		pulled += page.changes.length;
		// A page that does not move the cursor would loop for ever.
		if (!page.more || page.cursor <= cursor) return { pulled, cursor: page.cursor };
		cursor = page.cursor;
	}
}

async function applyPage(
	db: DeviceDatabase,
	changes: Change[],
	since: number,
	cursor: number
): Promise<void> {
	await db.transaction(
		'rw',
		[db.findings, db.photos, db.surveys, db.outbox, db.drafts, db.meta, db.conflicts],
		async () => {
			for (const change of changes) {
				if (change.entity === 'finding') await applyFinding(db, change);
				else await applySurvey(db, change);
			}
			await setMeta(db, 'cursor', cursor);
			// Each survey remembers how far it is pulled (pullCursor starts from the smallest).
			// One whose cursor is below this page's start was stored while the pull ran: it
			// keeps its own cursor, so the next pull fetches what it missed in between.
			await db.surveys.filter((s) => s.cursor >= since && s.cursor < cursor).modify({ cursor });
		}
	);
}

async function applyFinding(db: DeviceDatabase, change: Extract<Change, { entity: 'finding' }>) {
	const local = await db.findings.get(change.id);
	if (local?.pending === 1) {
		const queued = await db.outbox.where('recordId').equals(change.id).count();
		// A conflicted finding with nothing left to send is settled once the server moves on
		// past the version it conflicted with: the Desk's answer then replaces the device's.
		const settledAt = await db.conflicts.where('recordId').equals(change.id).toArray();
		const settled =
			local.conflict === 1 &&
			queued === 0 &&
			settledAt.every((c) => change.version > c.serverVersion);
		if (!settled) return;
		await db.conflicts.where('recordId').equals(change.id).delete();
	}
	if (change.deleted || change.data === null) {
		if (!local) return;
		await db.findings.delete(change.id);
		// The finding is gone for good: its photos too, sent or not.
		await db.photos.where('findingId').equals(change.id).delete();
		return;
	}
	const capture = change.data.capture;
	// Only surveys taken offline are kept on the device.
	if (!local && !(await db.surveys.get(capture.surveyId))) return;
	await db.findings.put({
		id: capture.id,
		surveyId: capture.surveyId,
		kind: capture.kind,
		capture,
		version: change.version,
		status: change.data.status,
		pending: 0,
		deleted: 0,
		updatedAt: new Date(capture.updatedAt).toISOString()
	});
}

async function applySurvey(db: DeviceDatabase, change: Extract<Change, { entity: 'survey' }>) {
	const local = await db.surveys.get(change.id);
	if (!local) return;
	if (!change.deleted && change.data) {
		// Given back to this person (assigned again, reopened): no longer withdrawn.
		const { withdrawn: _, ...kept } = local;
		await db.surveys.put({
			...kept,
			...change.data,
			cursor: local.cursor,
			takenAt: local.takenAt
		});
		return;
	}
	const findings = await db.findings.where('surveyId').equals(change.id).toArray();
	const photos = await db.photos.where('surveyId').equals(change.id).toArray();
	const waiting =
		findings.some((f) => f.pending === 1) ||
		photos.some((p) => p.uploaded === 0) ||
		(await db.outbox.filter((e) => e.surveyId === change.id).count()) > 0;
	if (waiting) {
		await db.surveys.put({ ...local, withdrawn: 1 });
		return;
	}
	await db.findings.bulkDelete(findings.map((f) => f.id));
	await db.photos.bulkDelete(photos.map((p) => p.id));
	await db.drafts.where('surveyId').equals(change.id).delete();
	await db.surveys.delete(change.id);
}
