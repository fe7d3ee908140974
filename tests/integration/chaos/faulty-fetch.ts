/**
 * A fetch that misbehaves the way a phone's network and a restarting server do, chosen by a
 * seeded Rng: it wraps an in-process fetch (one that dispatches to the route handlers) and,
 * per request, may drop it before the server sees it, drop the answer after the server
 * applied it, send it twice (the device gets the second answer), hold it back so a later
 * request overtakes it, cut a photo upload halfway, or answer 503 for a window of requests
 * ("server restart"). Every fault is logged so a failing seed says what happened.
 */
import type { Rng } from './prng';

export type Fetch = (input: string | URL | Request, init?: RequestInit) => Promise<Response>;

export type Fault =
	'none' | 'drop-request' | 'drop-answer' | 'duplicate' | 'delay' | 'cut-upload' | 'restart';

export interface FaultLog {
	url: string;
	method: string;
	fault: Fault;
}

export interface FaultyFetch {
	fetch: Fetch;
	log: FaultLog[];
	/** Requests the inner fetch (the server) actually received. */
	served: () => number;
}

/** A network error as fetch raises it. */
export const networkError = () => new TypeError('fetch failed (chaos: network cut)');

const FAULTS: Fault[] = [
	'drop-request',
	'drop-answer',
	'duplicate',
	'delay',
	'cut-upload',
	'restart'
];

export function faultyFetch(inner: Fetch, rng: Rng, faultRate = 0.35): FaultyFetch {
	const log: FaultLog[] = [];
	let served = 0;
	let restartLeft = 0;
	const serve: Fetch = async (input, init) => {
		served++;
		return inner(input, init);
	};

	const fetch: Fetch = async (input, init) => {
		const req = new Request(input, init);
		const url = req.url;
		const method = req.method;
		const body =
			method === 'GET' || method === 'HEAD' ? null : new Uint8Array(await req.arrayBuffer());
		const again = () =>
			new Request(url, { method, headers: req.headers, body: body ? body.slice() : null });
		let fault: Fault = 'none';
		if (restartLeft > 0) {
			restartLeft--;
			fault = 'restart';
		} else if (rng.chance(faultRate)) {
			fault = rng.pick(FAULTS);
			if (fault === 'cut-upload' && !(method === 'PUT' && body && body.length > 1))
				fault = 'drop-request';
			if (fault === 'restart') restartLeft = rng.int(1, 3);
		}
		log.push({ url, method, fault });
		switch (fault) {
			case 'drop-request':
				throw networkError();
			case 'restart':
				return rng.chance(0.5)
					? new Response(JSON.stringify({ message: 'Server restarting' }), { status: 503 })
					: Promise.reject(networkError());
			case 'drop-answer':
				await serve(again());
				throw networkError();
			case 'duplicate':
				await serve(again()).catch(() => undefined);
				return serve(again());
			case 'delay':
				// Yield a few turns so a concurrent request started later reaches the server first.
				for (let i = rng.int(1, 20); i > 0; i--) await new Promise((r) => setTimeout(r, 0));
				return serve(again());
			case 'cut-upload': {
				const cut = new Request(url, {
					method,
					headers: req.headers,
					body: body!.slice(0, Math.floor(body!.length / 2))
				});
				// The server sees a short body (the connection died mid-upload); the device sees an error.
				await serve(cut).catch(() => undefined);
				throw networkError();
			}
			default:
				return serve(again());
		}
	};
	return { fetch, log, served: () => served };
}
