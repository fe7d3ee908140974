/**
 * Runs the sync client (`syncOnce`) when it should: on start, when the browser comes online,
 * every minute while the app is open, when the page is shown again, on "Send now", and when
 * the service worker passes on a Background Sync (tag `steamwisp-outbox`). One exchange at a
 * time: a trigger during a run asks for one follow-up, never a second concurrent drain.
 * Retryable trouble (no signal, server trouble) waits with back-off (sync-backoff.ts); a
 * problem a person must solve (signed out, refused) waits for them.
 */
import { liveQuery } from 'dexie';
import type { DeviceDatabase } from './db';
import { syncCounts } from './sync-counts';
import { getMeta } from './sync-meta';
import { syncOnce } from './sync';
import { retryDelay } from './sync-backoff';
import { initialSyncState, type SyncState } from './sync-state';

export const SYNC_TAG = 'steamwisp-outbox';
export const SYNC_INTERVAL_MS = 60_000;

export interface SyncManagerOptions {
	db: DeviceDatabase;
	fetch: typeof fetch;
	now?: () => Date;
	random?: () => number;
	setTimeout?: (run: () => void, ms: number) => unknown;
	clearTimeout?: (handle: unknown) => void;
	/**
	 * Web Locks (`navigator.locks` where the browser has it): two tabs of the Walk on one
	 * device take turns, so their exchanges never drain the same outbox at once.
	 */
	locks?: Pick<LockManager, 'request'>;
	/**
	 * Asks the browser to wake the app when a connection returns (Background Sync); called
	 * after each exchange that ends in retryable trouble. Defaults to requestBackgroundSync
	 * when a window is given.
	 */
	backgroundSync?: () => Promise<void>;
	/** Where the triggers come from (the page's window; absent in tests). */
	window?: Pick<Window, 'addEventListener' | 'removeEventListener'> & {
		document?: Pick<Document, 'visibilityState'>;
	};
}

export class SyncManager {
	state = $state<SyncState>(initialSyncState());
	private failures = 0;
	private running: Promise<void> | null = null;
	private again = false;
	private timer: unknown = null;
	private interval: unknown = null;
	private started = false;
	private stopped = false;
	private readonly cleanup: (() => void)[] = [];

	constructor(private readonly o: SyncManagerOptions) {}

	// eslint-disable-next-line svelte/prefer-svelte-reactivity -- a moment read once, never kept as state
	private now = () => this.o.now?.() ?? new Date();
	private later = (run: () => void, ms: number) =>
		(this.o.setTimeout ?? ((r, t) => globalThis.setTimeout(r, t)))(run, ms);
	private cancel = (h: unknown) =>
		(this.o.clearTimeout ?? ((x) => globalThis.clearTimeout(x as number)))(h);

	/** Starts watching the device's queue and the triggers, and runs once. */
	start(): void {
		if (this.started) return;
		this.started = true;
		this.stopped = false;
		const { db } = this.o;
		const counts = liveQuery(() => syncCounts(db)).subscribe((c) => {
			const more = c.findingsWaiting + c.photosWaiting;
			const before = this.state.findingsWaiting + this.state.photosWaiting;
			Object.assign(this.state, c);
			// Something new to send while all was quiet: send it now rather than in a minute.
			if (more > before && this.state.phase === 'idle') void this.run();
		});
		this.cleanup.push(() => counts.unsubscribe());
		const w = this.o.window;
		if (w) {
			const onOnline = () => this.sendNow();
			const onShow = () => {
				if (w.document?.visibilityState !== 'hidden') void this.run();
			};
			w.addEventListener('online', onOnline);
			w.addEventListener('visibilitychange', onShow);
			this.cleanup.push(() => {
				w.removeEventListener('online', onOnline);
				w.removeEventListener('visibilitychange', onShow);
			});
		}
		const tick = () => {
			// While a back-off wait runs, the minute's tick leaves it to the wait: otherwise the
			// back-off would never grow past a minute for a server that is struggling.
			if (this.timer === null) void this.run();
			this.interval = this.later(tick, SYNC_INTERVAL_MS);
		};
		this.interval = this.later(tick, SYNC_INTERVAL_MS);
		void this.run();
	}

	stop(): void {
		this.stopped = true;
		this.started = false;
		for (const c of this.cleanup.splice(0)) c();
		if (this.timer !== null) this.cancel(this.timer);
		if (this.interval !== null) this.cancel(this.interval);
		this.timer = this.interval = null;
	}

	/** "Send now": at once, forgetting the back-off. */
	sendNow(): Promise<void> {
		this.failures = 0;
		if (this.timer !== null) this.cancel(this.timer);
		this.timer = null;
		return this.run();
	}

	/** One exchange (or, during one, a single follow-up after it). */
	run(): Promise<void> {
		if (this.running) {
			this.again = true;
			return this.running;
		}
		this.running = this.loop().finally(() => (this.running = null));
		return this.running;
	}

	private async loop(): Promise<void> {
		do {
			this.again = false;
			await this.exchange();
		} while (this.again && !this.stopped);
	}

	private async exchange(): Promise<void> {
		this.state.phase = 'sending';
		let summary;
		try {
			const once = () => syncOnce(this.o.db, { fetch: this.o.fetch, now: this.now });
			const locks = this.o.locks ?? (this.o.window ? globalThis.navigator?.locks : undefined);
			summary = locks ? await locks.request(`${this.o.db.name}-sync`, once) : await once();
		} catch (e) {
			summary = {
				problem: {
					kind: 'retry' as const,
					retryable: true,
					message: `This device could not finish sending (${(e as Error).message}); it tries again`
				}
			};
		}
		const problem = summary.problem;
		if (!problem) {
			this.failures = 0;
			Object.assign(this.state, {
				phase: 'idle',
				problem: null,
				nextTryAt: null,
				// As syncOnce kept it: an exchange that needed no request is no contact.
				lastExchangeAt:
					(await getMeta<string>(this.o.db, 'lastExchangeAt')) ?? this.state.lastExchangeAt
			});
			return;
		}
		if (!problem.retryable) {
			Object.assign(this.state, {
				phase: 'needs-attention',
				problem: problem.message,
				nextTryAt: null
			});
			return;
		}
		this.failures++;
		const wait = retryDelay(this.failures, (this.o.random ?? Math.random)());
		const at = new Date(this.now().getTime() + wait).toISOString(); // eslint-disable-line svelte/prefer-svelte-reactivity -- formatted at once
		Object.assign(this.state, {
			phase: problem.kind === 'offline' ? 'offline' : 'waiting-to-retry',
			problem: problem.message,
			nextTryAt: at
		});
		const wake = this.o.backgroundSync ?? (this.o.window ? requestBackgroundSync : undefined);
		// Registration is ignored where Background Sync is not offered, and so is its failure.
		void wake?.().catch(() => {});
		if (this.stopped) return;
		if (this.timer !== null) this.cancel(this.timer);
		this.timer = this.later(() => {
			this.timer = null;
			void this.run();
		}, wait);
	}
}

export function createSyncManager(options: SyncManagerOptions): SyncManager {
	return new SyncManager(options);
}

/**
 * Asks the browser to wake the service worker when a connection returns (Background Sync,
 * where the browser has it); the worker then tells open pages to send. Ignored elsewhere.
 */
export async function requestBackgroundSync(): Promise<void> {
	try {
		const registration = await navigator.serviceWorker?.ready;
		const sync = (registration as { sync?: { register(tag: string): Promise<void> } } | undefined)
			?.sync;
		await sync?.register(SYNC_TAG);
	} catch {
		// Not offered, or refused (permissions): the page's own triggers still run.
	}
}
