import {
	MAX_PUSH_MUTATIONS,
	mutationSchema,
	pushResponseSchema,
	type Mutation
} from '$lib/schemas/sync';
import type { DeviceDatabase, OutboxEntry } from './db';
import type { SyncProblem } from './sync-problem';
import { problemFromStatus } from './sync-problem';

/**
 * Pushing the outbox (docs/sync.md). Batches go oldest first. A batch carries at most one
 * entry per finding: the next edit of the same finding waits for the previous one's answer,
 * and then is sent on the version the server answered (its baseVersion rewritten in the same
 * transaction as that answer, so a crash in between cannot leave it stale). Chaining guessed
 * versions inside one batch would let a later edit land on top of another device's edit
 * whenever the first one conflicted; waiting costs one round trip per repeated edit.
 */

export interface PushTally {
	pushed: number;
	duplicates: number;
	conflicts: number;
	rejected: number;
}

/** The next batch: outbox order, stopping before a finding already in it. */
async function nextBatch(db: DeviceDatabase, size: number): Promise<OutboxEntry[]> {
	const head = await db.outbox.orderBy('seq').limit(size).toArray();
	const records = new Set<string>();
	const batch: OutboxEntry[] = [];
	for (const e of head) {
		if (records.has(e.recordId)) break;
		records.add(e.recordId);
		batch.push(e);
	}
	return batch;
}

/** The entry as the push takes it, checked with the server's own schema; or why it cannot go. */
function toMutation(entry: OutboxEntry): Mutation | string {
	const made = draftMutation(entry);
	if (typeof made === 'string') return made;
	const checked = mutationSchema.safeParse(made);
	// Sent as stored: the check only vouches for it.
	if (checked.success) return made;
	const issue = checked.error.issues[0];
	return `This change cannot be sent as it is (${issue.path.join('.')}: ${issue.message})`;
}

function draftMutation(entry: OutboxEntry): Mutation | string {
	const base = {
		mutationId: entry.mutationId,
		entity: 'finding' as const,
		id: entry.recordId,
		baseVersion: entry.baseVersion
	};
	if (entry.op === 'upsert') {
		if (entry.payload === null) return 'This change has nothing to send';
		return { ...base, op: 'upsert', data: entry.payload };
	}
	if (!entry.surveyId) return 'This deletion does not know its survey';
	return { ...base, op: 'delete', data: { surveyId: entry.surveyId } };
}

async function markRefused(db: DeviceDatabase, entries: OutboxEntry[], reason: string) {
	await db.outbox.bulkUpdate(entries.map((e) => ({ key: e.seq!, changes: { lastError: reason } })));
}

/**
 * Counted as tried before the request leaves: the server may apply it even if no answer comes
 * back, and deleteFinding must then queue a deletion rather than drop the finding as unsent.
 */
async function markTried(db: DeviceDatabase, entries: OutboxEntry[]) {
	await db.outbox.bulkUpdate(
		entries.map((e) => ({ key: e.seq!, changes: { attempts: e.attempts + 1 } }))
	);
	for (const e of entries) e.attempts++;
}

/** Pushes until the outbox is empty or something stops the drain. */
export async function pushOutbox(
	db: DeviceDatabase,
	fetchFn: typeof fetch,
	deviceId: string,
	batchSize: number,
	now: () => Date
): Promise<{ tally: PushTally; problem?: SyncProblem }> {
	const tally: PushTally = { pushed: 0, duplicates: 0, conflicts: 0, rejected: 0 };
	const size = Math.max(1, Math.min(batchSize, MAX_PUSH_MUTATIONS));
	// After the server refused a whole batch as unreadable, entries go one by one, so the
	// others still go and only the unreadable one keeps the reason.
	let oneByOne = false;
	for (;;) {
		let batch = await nextBatch(db, oneByOne ? 1 : size);
		if (batch.length === 0) return { tally };
		const mutations: Mutation[] = [];
		for (const entry of batch) {
			const m = toMutation(entry);
			if (typeof m === 'string') {
				// Those before it go first; it stops the drain when its turn comes.
				if (mutations.length > 0) break;
				await markRefused(db, [entry], m);
				tally.rejected++;
				return { tally, problem: { kind: 'rejected', retryable: false, message: m } };
			}
			mutations.push(m);
		}
		batch = batch.slice(0, mutations.length);
		await markTried(db, batch);
		let response: Response;
		try {
			response = await fetchFn('/api/sync/push', {
				method: 'POST',
				headers: { 'content-type': 'application/json' },
				body: JSON.stringify({ deviceId, mutations })
			});
		} catch {
			// Nothing changes here: the same mutation ids go again, and the server answers a
			// repeat as a duplicate.
			return { tally, problem: problemFromStatus(0) };
		}
		if ((response.status === 400 || response.status === 413) && batch.length > 1) {
			oneByOne = true;
			continue;
		}
		if (response.status === 400 || response.status === 413) {
			const body = (await response.json().catch(() => ({}))) as { message?: unknown };
			const reason =
				typeof body.message === 'string' ? body.message : 'The server could not read these changes';
			await markRefused(db, batch, reason);
			return { tally, problem: { kind: 'bad-request', retryable: false, message: reason } };
		}
		if (!response.ok) {
			return { tally, problem: problemFromStatus(response.status, batch[0].surveyId) };
		}
		const parsed = pushResponseSchema.safeParse(await response.json().catch(() => null));
		if (!parsed.success || parsed.data.results.length !== batch.length) {
			return { tally, problem: problemFromStatus(502) };
		}
		const stop = await applyAnswers(db, batch, parsed.data.results, tally, now().toISOString());
		if (stop) return { tally, problem: stop };
	}
}

type Result = ReturnType<typeof pushResponseSchema.parse>['results'][number];

/** One transaction per batch: the answers and what follows from them, or nothing. */
async function applyAnswers(
	db: DeviceDatabase,
	batch: OutboxEntry[],
	results: Result[],
	tally: PushTally,
	at: string
): Promise<SyncProblem | undefined> {
	// Checked before anything is written: an answer that does not match is not applied at all.
	if (results.some((r, i) => r.mutationId !== batch[i].mutationId)) {
		return { kind: 'retry', retryable: true, message: 'The server answered out of order' };
	}
	return db.transaction('rw', [db.outbox, db.findings, db.conflicts, db.photos], async () => {
		let stop: SyncProblem | undefined;
		for (let i = 0; i < batch.length; i++) {
			const entry = batch[i];
			const result = results[i];
			if (result.status === 'rejected') {
				// Kept with its reason; the drain stops after this batch. The other answers of the
				// batch are still the server's word (it applied them), so they are taken.
				const reason = result.reason ?? 'The server refused this change';
				await db.outbox.update(entry.seq!, { lastError: reason });
				tally.rejected++;
				stop ??= { kind: 'rejected', retryable: false, message: reason };
				continue;
			}
			await db.outbox.delete(entry.seq!);
			const later = await db.outbox
				.where('[recordId+seq]')
				.between([entry.recordId, entry.seq!], [entry.recordId, Infinity], false, true)
				.toArray();
			const finding = await db.findings.get(entry.recordId);
			if (result.status === 'conflict') {
				tally.conflicts++;
				await db.conflicts.put({
					mutationId: entry.mutationId,
					recordId: entry.recordId,
					surveyId: entry.surveyId ?? finding?.surveyId ?? '',
					capture: entry.payload,
					serverVersion: result.version ?? 0,
					reason: result.reason ?? 'The server kept another edit of this finding',
					createdAt: at
				});
				// Kept as typed and still pending, so a pull does not replace it before the Desk
				// settles it. Later edits keep their old base and are kept as conflicts too.
				if (finding) await db.findings.put({ ...finding, conflict: 1, pending: 1 });
				continue;
			}
			if (result.status === 'duplicate') tally.duplicates++;
			else tally.pushed++;
			const version = result.version ?? entry.baseVersion;
			// The next edit of this finding was made on what this one now is on the server.
			for (const next of later) {
				if (next.baseVersion === entry.baseVersion) {
					await db.outbox.update(next.seq!, { baseVersion: version });
				}
			}
			if (!finding) continue;
			if (later.length === 0 && finding.deleted === 1 && entry.op === 'delete') {
				await db.findings.delete(finding.id);
				// The finding is gone for good: its photos too, sent or not.
				await db.photos.where('findingId').equals(finding.id).delete();
				continue;
			}
			await db.findings.put({
				...finding,
				version,
				pending: later.length === 0 && finding.conflict !== 1 ? 0 : 1
			});
		}
		return stop;
	});
}
