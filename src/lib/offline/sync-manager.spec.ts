import 'fake-indexeddb/auto';
import Dexie from 'dexie';
import { afterEach, describe, expect, it } from 'vitest';
import { saveFinding } from './findings';
import { retryDelay, LAST_RETRY_MS } from './sync-backoff';
import { createSyncManager } from './sync-manager.svelte';
import { describeSync, initialSyncState } from './sync-state';
import { SITE_ID, SURVEY_ID, testDb, trapCapture } from './spec-fixtures';

const dbs: Dexie[] = [];
afterEach(async () => {
	for (const d of dbs.splice(0)) await d.delete();
});
/** A device database holding one survey (so an exchange pulls, as on a working phone). */
const fresh = async () => {
	const d = testDb();
	dbs.push(d);
	await d.surveys.put({ id: SURVEY_ID, siteId: SITE_ID, cursor: 0 } as never);
	return d;
};

/** Timers run by hand: the test decides when a scheduled try happens. */
function manualTimers() {
	const pending = new Map<number, { run: () => void; ms: number }>();
	let next = 1;
	return {
		pending,
		setTimeout: (run: () => void, ms: number) => {
			pending.set(next, { run, ms });
			return next++;
		},
		clearTimeout: (h: unknown) => pending.delete(h as number),
		retries: () => [...pending.values()].filter((p) => p.ms !== 60_000)
	};
}

const emptyPull = () => Response.json({ changes: [], cursor: 0, more: false });

describe('back-off', () => {
	it('waits between 1 s and a step that doubles, never past 5 min', () => {
		// Full jitter: random 0 gives the floor, random near 1 the whole step.
		expect(retryDelay(1, 0)).toBe(1000);
		expect(retryDelay(1, 0.5)).toBe(1500);
		expect(retryDelay(2, 0.5)).toBe(2500);
		expect(retryDelay(3, 0.999)).toBeGreaterThan(7900);
		expect(retryDelay(3, 0.999)).toBeLessThan(8000);
		expect(retryDelay(9, 0.999)).toBeLessThanOrEqual(LAST_RETRY_MS);
		expect(retryDelay(40, 0.999)).toBe(retryDelay(9, 0.999));
		expect(retryDelay(40, 0)).toBe(1000);
	});
});

describe('sync manager', () => {
	it('backs off after network trouble, longer each time, and Send now starts again at once', async () => {
		const db = await fresh();
		const timers = manualTimers();
		let calls = 0;
		const m = createSyncManager({
			db,
			fetch: async () => {
				calls++;
				throw new TypeError('no signal');
			},
			random: () => 0.5,
			now: () => new Date('2026-11-20T10:00:00Z'),
			...timers
		});
		await m.run();
		expect(m.state.phase).toBe('offline');
		expect(m.state.problem).toMatch(/could not be reached/);
		expect(timers.retries().map((t) => t.ms)).toEqual([1500]);
		expect(m.state.nextTryAt).toBe('2026-11-20T10:00:01.500Z');
		const [first] = timers.retries();
		timers.pending.clear();
		first.run();
		await m.run();
		// The scheduled try plus the follow-up it asked for: two more failures, longer waits.
		expect(timers.retries().at(-1)!.ms).toBeGreaterThan(1500);
		const before = calls;
		timers.pending.clear();
		await m.sendNow();
		expect(calls).toBe(before + 1);
		expect(timers.retries().map((t) => t.ms)).toEqual([1500]);
	});

	it('waits longer after each failure up to 5 min, and starts over after a success', async () => {
		const db = await fresh();
		const timers = manualTimers();
		let failing = true;
		const m = createSyncManager({
			db,
			fetch: async () => {
				if (failing) return new Response('{"message":"busy"}', { status: 503 });
				return emptyPull();
			},
			random: () => 0.999,
			...timers
		});
		const waits: number[] = [];
		for (let i = 0; i < 12; i++) {
			await m.run();
			expect(m.state.phase).toBe('waiting-to-retry');
			waits.push(timers.retries().at(-1)!.ms);
			timers.pending.clear();
		}
		for (let i = 1; i < waits.length; i++) {
			expect(waits[i]).toBeGreaterThanOrEqual(waits[i - 1]);
		}
		expect(waits[1]).toBeGreaterThan(waits[0]);
		expect(Math.max(...waits)).toBeLessThanOrEqual(LAST_RETRY_MS);
		expect(waits.at(-1)).toBeGreaterThan(LAST_RETRY_MS * 0.99);
		expect(m.state.problem).toMatch(/server had trouble \(503\)/);

		failing = false;
		await m.run();
		expect(m.state).toMatchObject({ phase: 'idle', problem: null, nextTryAt: null });
		expect(timers.retries()).toEqual([]);
		failing = true;
		await m.run();
		expect(timers.retries().map((t) => t.ms)).toEqual([waits[0]]);
	});

	it('while a back-off wait runs, the minute’s tick does not knock; the wait does', async () => {
		const db = await fresh();
		const timers = manualTimers();
		let calls = 0;
		const wakes: string[] = [];
		const m = createSyncManager({
			db,
			fetch: async () => {
				calls++;
				throw new TypeError('no signal');
			},
			random: () => 0.5,
			backgroundSync: async () => {
				wakes.push('registered');
			},
			...timers
		});
		m.start();
		await m.run();
		const afterStart = calls;
		// Retryable trouble asks the browser to wake the app when the signal returns.
		expect(wakes.length).toBeGreaterThan(0);
		const tick = [...timers.pending.entries()].find(([, t]) => t.ms === 60_000)!;
		timers.pending.delete(tick[0]);
		tick[1].run();
		await m.run().catch(() => {});
		// Only the explicit m.run() above went out, not the tick.
		expect(calls).toBe(afterStart + 1);
		expect([...timers.pending.values()].some((t) => t.ms === 60_000)).toBe(true);
		m.stop();
		expect(timers.pending.size).toBe(0);
	});

	it('runs one exchange at a time: triggers during a run ask for one follow-up', async () => {
		const db = await fresh();
		let release!: () => void;
		let calls = 0;
		const m = createSyncManager({
			db,
			fetch: async () => {
				calls++;
				if (calls === 1) await new Promise<void>((r) => (release = r));
				return emptyPull();
			},
			...manualTimers()
		});
		const a = m.run();
		const b = m.run();
		const c = m.sendNow();
		// Wait for the first exchange to reach the network (a busy machine may take a while).
		for (let i = 0; i < 200 && calls === 0; i++) await new Promise((r) => setTimeout(r, 10));
		await new Promise((r) => setTimeout(r, 20));
		expect(calls).toBe(1);
		release();
		await Promise.all([a, b, c]);
		expect(calls).toBe(2);
		expect(m.state.phase).toBe('idle');
		expect(m.state.lastExchangeAt).not.toBeNull();
	});

	it('takes the device’s sync lock for each exchange, so two tabs take turns', async () => {
		const db = await fresh();
		const held: string[] = [];
		const m = createSyncManager({
			db,
			fetch: async () => emptyPull(),
			locks: {
				request: (async (name: string, run: () => Promise<unknown>) => {
					held.push(name);
					return run();
				}) as never
			},
			...manualTimers()
		});
		await m.run();
		expect(held).toEqual([`${db.name}-sync`]);
		expect(m.state.phase).toBe('idle');
	});

	it('a problem a person must solve waits for them: no retry timer', async () => {
		const db = await fresh();
		const timers = manualTimers();
		const m = createSyncManager({
			db,
			fetch: async () => new Response('{"message":"Sign in"}', { status: 401 }),
			...timers
		});
		await m.run();
		expect(m.state.phase).toBe('needs-attention');
		expect(m.state.problem).toMatch(/Signed out/);
		expect(timers.retries()).toEqual([]);
	});

	it('starts at once, counts what waits, and runs again when the browser comes online', async () => {
		const db = await fresh();
		await saveFinding(db, trapCapture());
		const listeners = new Map<string, () => void>();
		let calls = 0;
		const m = createSyncManager({
			db,
			fetch: async () => {
				calls++;
				throw new TypeError('no signal');
			},
			random: () => 0,
			window: {
				addEventListener: (type: string, fn: () => void) => listeners.set(type, fn),
				removeEventListener: (type: string) => listeners.delete(type)
			} as never,
			...manualTimers()
		});
		m.start();
		await m.run();
		await new Promise((r) => setTimeout(r, 20));
		expect(m.state.findingsWaiting).toBe(1);
		const before = calls;
		listeners.get('online')!();
		await m.run();
		expect(calls).toBeGreaterThan(before);
		m.stop();
		expect(listeners.size).toBe(0);
	});
});

describe('an exchange with nothing to do', () => {
	it('makes no request on a device with no survey and counts as no contact', async () => {
		const db = testDb();
		dbs.push(db);
		let calls = 0;
		const m = createSyncManager({
			db,
			fetch: async () => {
				calls++;
				return emptyPull();
			},
			...manualTimers()
		});
		await m.run();
		expect(calls).toBe(0);
		expect(m.state.lastExchangeAt).toBeNull();
		expect(describeSync(m.state).headline).toBe('Nothing waiting to send');
	});
});

describe('describeSync', () => {
	it('says nothing is waiting, not "All sent", until the server has answered', () => {
		expect(describeSync(initialSyncState()).headline).toBe('Nothing waiting to send');
		const offline = {
			...initialSyncState(),
			phase: 'offline' as const,
			lastExchangeAt: '2026-11-20T09:00:00Z'
		};
		expect(describeSync(offline).headline).toBe('Nothing waiting to send');
	});
	const now = new Date('2026-11-20T10:45:00');
	it('says all sent, and when', () => {
		const w = describeSync(
			{ ...initialSyncState(), lastExchangeAt: new Date('2026-11-20T10:42:00').toISOString() },
			now
		);
		expect(w.headline).toBe('All sent');
		expect(w.details).toContain('Last exchange with the server: 10:42.');
	});
	it('says what waits, and what needs attention, in words', () => {
		const w = describeSync(
			{
				...initialSyncState(),
				phase: 'waiting-to-retry',
				findingsWaiting: 3,
				photosWaiting: 1,
				conflicts: 1,
				refused: 2,
				problem: 'The server had trouble (503); changes stay on this device and go later',
				nextTryAt: new Date('2026-11-20T10:46:00').toISOString()
			},
			now
		);
		expect(w.headline).toBe('3 findings and 1 photo waiting to send');
		expect(w.details.join(' ')).toMatch(/1 edit clashed .* kept/);
		expect(w.details.join(' ')).toMatch(/2 changes refused/);
		expect(w.details).toContain('Trying again at 10:46.');
		expect(w.details).toContain('Nothing exchanged with the server from this device yet.');
	});
});
