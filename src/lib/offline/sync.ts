import { MAX_PUSH_MUTATIONS } from '$lib/schemas/sync';
import type { DeviceDatabase } from './db';
import { uploadPhotos } from './sync-photos';
import type { SyncProblem } from './sync-problem';
import { pushOutbox } from './sync-push';
import { pullChanges } from './sync-pull';
import { deviceId, pullCursor, setMeta } from './sync-meta';

export type { SyncProblem } from './sync-problem';

/**
 * One exchange with the server (docs/sync.md): push the outbox in order, upload photos of
 * findings the server has, pull what changed. Every answer is written before the next request,
 * so stopping anywhere loses nothing and a repeat is harmless.
 */

export interface SyncOptions {
	fetch: typeof fetch;
	now?: () => Date;
	/** Mutations per push, at most MAX_PUSH_MUTATIONS. */
	batchSize?: number;
	/** Changes per pull page (the server's default when absent). */
	pullLimit?: number;
}

export interface SyncSummary {
	pushed: number;
	duplicates: number;
	conflicts: number;
	rejected: number;
	photosSent: number;
	pulled: number;
	cursor: number;
	problem?: SyncProblem;
}

export async function syncOnce(db: DeviceDatabase, options: SyncOptions): Promise<SyncSummary> {
	const now = options.now ?? (() => new Date());
	const id = await deviceId(db);
	// Counted so that an exchange with nothing to do and no request made is no "last exchange".
	let requests = 0;
	const fetchFn: typeof fetch = (input, init) => {
		requests++;
		return options.fetch(input, init);
	};
	const push = await pushOutbox(db, fetchFn, id, options.batchSize ?? MAX_PUSH_MUTATIONS, now);
	const summary: SyncSummary = {
		...push.tally,
		photosSent: 0,
		pulled: 0,
		cursor: await pullCursor(db)
	};
	let problem = push.problem;
	// A rejected change stops the outbox, not the photos of findings already sent nor the pull.
	if (!problem || problem.kind === 'rejected' || problem.kind === 'not-found') {
		const photos = await uploadPhotos(db, fetchFn);
		summary.photosSent = photos.sent;
		problem ??= photos.problem;
		// With no survey on the device there is nothing a pull could update.
		const surveys = await db.surveys.count();
		if (surveys > 0 && (!photos.problem || !photos.problem.retryable)) {
			const pull = await pullChanges(db, fetchFn, summary.cursor, options.pullLimit, id);
			summary.pulled = pull.pulled;
			summary.cursor = pull.cursor;
			problem ??= pull.problem;
		}
	}
	await db.transaction('rw', db.meta, async () => {
		if (requests > 0 && (!problem || !problem.retryable)) {
			await setMeta(db, 'lastExchangeAt', now().toISOString());
		}
		await setMeta(db, 'lastProblem', problem?.message ?? null);
	});
	return problem ? { ...summary, problem } : summary;
}
