import type { Handle, HandleServerError, ServerInit } from '@sveltejs/kit';
import { sequence } from '@sveltejs/kit/hooks';
import { building, dev } from '$app/environment';
import { env } from '$env/dynamic/private';
import { readSession } from '$lib/server/auth/sessions';
import { startDigestTimer } from '$lib/server/decisions/digest-timer';
import { pool } from '$lib/server/db';
import { MAX_FORM_BYTES, readForm } from '$lib/server/forms';
import { guardRoute } from '$lib/server/policy';
import { baseCsp, securityHeaders } from '../server/headers.js';

// adapter-node closes the HTTP server on SIGTERM/SIGINT, then emits this; the process can only
// exit once the database pool's idle connections are closed too.
if (!dev) {
	process.once('sveltekit:shutdown', () => {
		pool.end().catch(() => {});
	});
}

/**
 * Once per server process: the e-mail digest of clients' decisions and comments on a timer
 * (docs/decisions.md, "The digest"; STEAMWISP_DIGEST_MINUTES). Not while building.
 */
export const init: ServerInit = () => {
	if (!building) startDigestTimer();
};

/**
 * Pages' form posts are small; the API's own routes set their own limits (the app's
 * BODY_SIZE_LIMIT is large, for photos). A form post declared larger is read to its end and
 * answered 413 before any page code runs, whoever sends it.
 */
const formLimit: Handle = async ({ event, resolve }) => {
	const { request, url } = event;
	const declared = Number(request.headers.get('content-length') ?? 0);
	if (request.method !== 'GET' && !url.pathname.startsWith('/api/') && declared > MAX_FORM_BYTES) {
		await readForm(request).catch(() => undefined);
		return new Response('That form is too large to accept.', {
			status: 413,
			headers: { 'content-type': 'text/plain; charset=utf-8' }
		});
	}
	return resolve(event);
};

/** Fills locals.user and locals.session from the session cookie (./lib/server/auth/sessions.ts). */
const session: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	event.locals.session = null;
	const found = await readSession(event.cookies);
	if (found) {
		const { session, user } = found;
		event.locals.session = { id: session.id, expiresAt: session.expiresAt, fresh: session.fresh };
		event.locals.user = {
			id: user.id,
			firmId: user.firmId,
			email: user.email,
			name: user.name,
			role: user.role,
			clientCompanyId: user.clientCompanyId
		};
	}
	return resolve(event);
};

/**
 * The first line of authorization: every request to a route outside the public list needs a
 * session, and a role allowed in that area (policy table). Loads, actions and endpoints check
 * again themselves; this gate also covers form actions, which run before any layout load.
 */
const guard: Handle = async ({ event, resolve }) => {
	guardRoute(event);
	return resolve(event);
};

/**
 * Headers every answer carries (server/headers.js, shared with the production server, which
 * also covers the files served before any hook runs): Content-Security-Policy — SvelteKit writes
 * pages' own, with their nonce; every other answer gets the base policy — no framing, no MIME
 * sniffing, no full URLs in Referer, HSTS over https; and nothing a signed-in person saw kept
 * in shared caches or shown again by the Back button after signing out.
 */
const headers: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	const set = (name: string, value: string) => {
		if (!response.headers.has(name)) response.headers.set(name, value);
	};
	try {
		const answerHeaders = securityHeaders({ origin: env.ORIGIN, hsts: env.STEAMWISP_HSTS });
		for (const [name, value] of Object.entries(answerHeaders)) set(name, value);
		set('content-security-policy', baseCsp);
		if (event.locals.user) set('cache-control', 'private, no-store');
	} catch {
		// Responses built from fetch() have immutable headers; they pass through unchanged.
	}
	return response;
};

// headers first so it wraps everything after it; oversized forms refused before any session
// work; guard last, once the session is known.
export const handle = sequence(headers, formLimit, session, guard);

/**
 * Unexpected errors are logged with their stack and shown to people only as a status and a
 * generic message; refusals (4xx: not found, wrong method, not a form) are answers, not faults,
 * so they are not logged as errors.
 */
export const handleError: HandleServerError = ({ error, status, message }) => {
	if (status >= 500) console.error(error);
	return { message };
};
