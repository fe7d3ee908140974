/**
 * A fetch that hands each request to the app's real route handlers in this process, as
 * SvelteKit would after its hooks, signed in as one person: push, pull and the photo routes.
 * Errors come back as the answers SvelteKit gives (HttpError → its status and message; anything
 * else → 500), so a device sees what it would see over the network.
 */
import { isHttpError } from '@sveltejs/kit';
import { GET as pull } from '../../../src/routes/api/sync/pull/+server';
import { POST as push } from '../../../src/routes/api/sync/push/+server';
import { routeEvent, type Handler } from '../walk-api';
import type { Fetch } from './faulty-fetch';

const photoRoute: Record<string, unknown> =
	await import('../../../src/routes/api/photos/[id]/+server').catch(() => ({}));

function route(method: string, path: string): [Handler, string, Record<string, string>] | null {
	if (method === 'POST' && path === '/api/sync/push')
		return [push as Handler, '/api/sync/push', {}];
	if (method === 'GET' && path === '/api/sync/pull') return [pull as Handler, '/api/sync/pull', {}];
	const photo = path.match(/^\/api\/photos\/([^/]+)$/);
	const handler = photo && photoRoute[method];
	if (photo && handler) return [handler as Handler, '/api/photos/[id]', { id: photo[1] }];
	return null;
}

export function appFetch(user: SessionUser): Fetch {
	return async (input, init) => {
		const request = new Request(input, init);
		const url = new URL(request.url);
		const found = route(request.method, url.pathname);
		if (!found) return Response.json({ message: 'Not found.' }, { status: 404 });
		const [handler, id, params] = found;
		try {
			return await handler(routeEvent(user, id, request, params) as never);
		} catch (e) {
			if (isHttpError(e)) return Response.json(e.body, { status: e.status });
			return Response.json({ message: 'Internal Error' }, { status: 500 });
		}
	};
}
