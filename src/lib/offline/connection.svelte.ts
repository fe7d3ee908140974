/**
 * The connection as the app actually sees it: did the last request reach our server?
 * `navigator.onLine` is not the source of truth: it says "online" on captive Wi-Fi that
 * reaches nothing, and some Chromium builds report it wrongly after a reload served by the
 * service worker. Every request result is reported here (serverFetch does it), the browser's
 * online/offline events prompt a check, and a light probe of `/api/health` runs while the
 * page is visible.
 */

export type ConnectionState = 'unknown' | 'online' | 'offline';

export const connection = $state<{ state: ConnectionState; lastContact: string | null }>({
	state: 'unknown',
	/** When a response last arrived from our server (ISO, UTC). */
	lastContact: null
});

/** Records one request's outcome: true = a response came from our server. */
export function reportContact(ok: boolean): void {
	if (ok) {
		connection.state = 'online';
		// eslint-disable-next-line svelte/prefer-svelte-reactivity -- formatted once, never kept as a Date
		connection.lastContact = new Date().toISOString();
	} else {
		connection.state = 'offline';
	}
}

/**
 * A response redirected to another origin came from something between us and the server
 * (a captive portal's sign-in page), not from the server.
 */
function fromOurServer(response: Response): boolean {
	if (response.type === 'error' || response.status === 0) return false;
	if (response.redirected && typeof location !== 'undefined' && response.url) {
		return new URL(response.url).origin === location.origin;
	}
	return true;
}

/** The caller gave up (navigated away, cancelled): says nothing about the connection. */
function abortedByCaller(init: RequestInit | undefined): boolean {
	const reason: unknown = init?.signal?.aborted ? init.signal.reason : undefined;
	return (
		reason !== undefined && !(reason instanceof DOMException && reason.name === 'TimeoutError')
	);
}

/**
 * fetch, reporting what it learns about the connection. Any answer from our server counts as
 * contact, a 401 or 404 too; a network error, a timeout or a captive portal counts as offline.
 * Returns the Response or throws like fetch.
 */
export async function serverFetch(input: RequestInfo | URL, init?: RequestInit): Promise<Response> {
	let response: Response;
	try {
		response = await globalThis.fetch(input, init);
	} catch (error) {
		if (!abortedByCaller(init)) reportContact(false);
		throw error;
	}
	reportContact(fromOurServer(response));
	return response;
}

let probing: Promise<boolean> | null = null;

/** Asks our server's health route whether it is there (one probe at a time); true = reached. */
export function probe(): Promise<boolean> {
	if (probing) return probing;
	const current = checkHealth().finally(() => {
		if (probing === current) probing = null;
	});
	probing = current;
	return current;
}

async function checkHealth(): Promise<boolean> {
	try {
		const response = await globalThis.fetch('/api/health', {
			cache: 'no-store',
			headers: { accept: 'application/json' },
			signal: AbortSignal.timeout(5000)
		});
		// A portal may answer 200 with its own page: only our health answer counts.
		let ours = fromOurServer(response);
		if (ours) {
			const body: unknown = await response.json().catch(() => null);
			ours = typeof body === 'object' && body !== null && 'status' in body;
		}
		reportContact(ours);
		return ours;
	} catch {
		reportContact(false);
		return false;
	}
}

/** Probe interval while the page is visible, ms. */
export const PROBE_EVERY_MS = 30_000;

/**
 * Follows the connection for as long as the page runs: the browser's offline event marks it
 * offline at once, its online event (and the page becoming visible again) prompts a probe,
 * and a probe runs at start and every 30 s while the page is visible.
 * @returns a function that stops all of it
 */
export function watchConnection(): () => void {
	const visible = () => document.visibilityState === 'visible';
	const onOffline = () => reportContact(false);
	const onOnline = () => void probe();
	const onVisibility = () => {
		if (visible()) void probe();
	};
	window.addEventListener('offline', onOffline);
	window.addEventListener('online', onOnline);
	document.addEventListener('visibilitychange', onVisibility);
	const timer = setInterval(() => {
		if (visible()) void probe();
	}, PROBE_EVERY_MS);
	void probe();
	return () => {
		window.removeEventListener('offline', onOffline);
		window.removeEventListener('online', onOnline);
		document.removeEventListener('visibilitychange', onVisibility);
		clearInterval(timer);
	};
}
