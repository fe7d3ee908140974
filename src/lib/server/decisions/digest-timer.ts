/**
 * The decision digest on a timer in the server process (hooks.server.ts starts it once): every
 * STEAMWISP_DIGEST_MINUTES (./digest-interval.ts) it runs `sendDecisionDigests`. Several app
 * processes may each run one: a run claims its rows, so nothing is sent twice. The timer never
 * keeps the process alive, and a failed run is logged and tried again at the next tick.
 */
import { env } from '$env/dynamic/private';
import { db } from '../db';
import { digestMinutes } from './digest-interval';
import { sendDecisionDigests } from './digest';

const started = Symbol.for('steamwisp.decisionDigestTimer');
type Holder = { [started]?: ReturnType<typeof setInterval> };

export function startDigestTimer(): void {
	const holder = globalThis as Holder;
	if (holder[started]) return;
	const minutes = digestMinutes(env);
	if (minutes === null) return;
	let running = false;
	holder[started] = setInterval(() => {
		if (running) return;
		running = true;
		sendDecisionDigests(db)
			.catch((e: unknown) =>
				console.error(`steamwisp: the decision digest failed: ${(e as Error).message}`)
			)
			.finally(() => {
				running = false;
			});
	}, minutes * 60_000);
	holder[started].unref();
}
