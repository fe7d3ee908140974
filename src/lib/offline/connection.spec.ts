import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
	connection,
	probe,
	PROBE_EVERY_MS,
	reportContact,
	serverFetch,
	watchConnection
} from './connection.svelte';

/** A fake fetch that answers from a queue: a Response, or an Error to throw (a network failure). */
function fakeFetch(...answers: (Response | Error)[]) {
	return vi.fn(async (_input: RequestInfo | URL, _init?: RequestInit) => {
		const next = answers.shift();
		if (next === undefined) throw new Error('unexpected fetch');
		if (next instanceof Error) throw next;
		return next;
	});
}

const health = () => Response.json({ status: 'ok' });

beforeEach(() => {
	connection.state = 'unknown';
	connection.lastContact = null;
});
afterEach(() => {
	vi.unstubAllGlobals();
	vi.useRealTimers();
});

describe('reportContact', () => {
	it('goes online with the time of contact, and offline without forgetting it', () => {
		reportContact(true);
		expect(connection.state).toBe('online');
		const contact = connection.lastContact;
		expect(contact).not.toBeNull();
		reportContact(false);
		expect(connection).toEqual({ state: 'offline', lastContact: contact });
	});
});

describe('serverFetch', () => {
	it('counts a 401 or a 404 as contact with the server, and returns it', async () => {
		vi.stubGlobal('fetch', fakeFetch(new Response('no', { status: 401 })));
		const response = await serverFetch('/api/me');
		expect(response.status).toBe(401);
		expect(connection.state).toBe('online');
	});

	it('goes offline on a network failure and throws it on', async () => {
		reportContact(true);
		vi.stubGlobal('fetch', fakeFetch(new TypeError('Failed to fetch')));
		await expect(serverFetch('/api/surveys')).rejects.toThrow('Failed to fetch');
		expect(connection.state).toBe('offline');
	});

	it('says nothing about the connection when the caller cancelled', async () => {
		reportContact(true);
		const controller = new AbortController();
		controller.abort();
		vi.stubGlobal('fetch', fakeFetch(new DOMException('aborted', 'AbortError')));
		await expect(serverFetch('/api/surveys', { signal: controller.signal })).rejects.toThrow();
		expect(connection.state).toBe('online');
	});

	it('treats a redirect to another origin (a captive portal) as offline', async () => {
		vi.stubGlobal('location', new URL('https://audit.example.test/walk'));
		const portal = new Response('<html>sign in to the Wi-Fi</html>');
		Object.defineProperty(portal, 'redirected', { value: true });
		Object.defineProperty(portal, 'url', { value: 'https://portal.example.net/login' });
		vi.stubGlobal('fetch', fakeFetch(portal));
		await serverFetch('/api/surveys');
		expect(connection.state).toBe('offline');
	});
});

describe('probe', () => {
	it('asks the health route, uncached, and is online when it answers', async () => {
		const fetch = fakeFetch(health());
		vi.stubGlobal('fetch', fetch);
		expect(await probe()).toBe(true);
		expect(connection.state).toBe('online');
		expect(fetch.mock.calls[0][0]).toBe('/api/health');
		expect(fetch.mock.calls[0][1]).toMatchObject({ cache: 'no-store' });
		expect(fetch.mock.calls[0][1]?.signal).toBeInstanceOf(AbortSignal);
	});

	it('counts a degraded server (503 with its health body) as reached', async () => {
		vi.stubGlobal('fetch', fakeFetch(Response.json({ status: 'degraded' }, { status: 503 })));
		expect(await probe()).toBe(true);
		expect(connection.state).toBe('online');
	});

	it('is offline when something else answers with a page of its own', async () => {
		vi.stubGlobal('fetch', fakeFetch(new Response('<html>Welcome to the guest Wi-Fi</html>')));
		expect(await probe()).toBe(false);
		expect(connection.state).toBe('offline');
	});

	it('runs one probe at a time', async () => {
		const fetch = fakeFetch(health(), health());
		vi.stubGlobal('fetch', fetch);
		await Promise.all([probe(), probe(), probe()]);
		expect(fetch).toHaveBeenCalledTimes(1);
		await probe();
		expect(fetch).toHaveBeenCalledTimes(2);
	});
});

describe('watchConnection', () => {
	function fakePage() {
		const win = new EventTarget();
		const doc = Object.assign(new EventTarget(), { visibilityState: 'visible' });
		vi.stubGlobal('window', win);
		vi.stubGlobal('document', doc);
		return { win, doc };
	}

	it('probes at start, goes offline on the offline event and probes on the online event', async () => {
		const { win } = fakePage();
		const fetch = fakeFetch(health(), health());
		vi.stubGlobal('fetch', fetch);
		const stop = watchConnection();
		await vi.waitFor(() => expect(connection.state).toBe('online'));
		win.dispatchEvent(new Event('offline'));
		expect(connection.state).toBe('offline');
		win.dispatchEvent(new Event('online'));
		await vi.waitFor(() => expect(connection.state).toBe('online'));
		expect(fetch).toHaveBeenCalledTimes(2);
		stop();
		win.dispatchEvent(new Event('offline'));
		expect(connection.state).toBe('online');
	});

	it('probes every 30 s while the page is visible, not while hidden, and stops when told', async () => {
		vi.useFakeTimers();
		const { doc } = fakePage();
		const fetch = fakeFetch(health(), health(), health());
		vi.stubGlobal('fetch', fetch);
		const stop = watchConnection();
		await vi.advanceTimersByTimeAsync(PROBE_EVERY_MS);
		expect(fetch).toHaveBeenCalledTimes(2);
		doc.visibilityState = 'hidden';
		await vi.advanceTimersByTimeAsync(3 * PROBE_EVERY_MS);
		expect(fetch).toHaveBeenCalledTimes(2);
		doc.visibilityState = 'visible';
		doc.dispatchEvent(new Event('visibilitychange'));
		await vi.advanceTimersByTimeAsync(0);
		expect(fetch).toHaveBeenCalledTimes(3);
		stop();
		await vi.advanceTimersByTimeAsync(3 * PROBE_EVERY_MS);
		expect(fetch).toHaveBeenCalledTimes(3);
	});
});
