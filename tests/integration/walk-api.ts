/**
 * Calling route handlers and form actions directly, as SvelteKit would after its hooks (the
 * Walk's API routes, and `postForm` for any page's action).
 */
import { isActionFailure, isHttpError } from '@sveltejs/kit';
import { GET as me } from '../../src/routes/api/me/+server';
import { GET as surveys } from '../../src/routes/api/surveys/+server';
import { GET as snapshot } from '../../src/routes/api/surveys/[id]/snapshot/+server';

export type Handler = (event: never) => Response | Promise<Response>;

/** The event SvelteKit hands a route handler after its hooks, for one signed-in person. */
export function routeEvent(
	user: SessionUser | null,
	routeId: string,
	request: Request,
	params: Record<string, string> = {}
) {
	return {
		locals: { user, session: null },
		params,
		url: new URL(request.url),
		request,
		route: { id: routeId },
		getClientAddress: () => '127.0.0.1'
	};
}

export async function call(
	handler: Handler,
	routeId: string,
	user: SessionUser | null,
	path: string,
	params: Record<string, string> = {},
	init?: RequestInit
): Promise<{ status: number; body: unknown; headers: Headers }> {
	const event = routeEvent(user, routeId, new Request(`http://127.0.0.1${path}`, init), params);
	try {
		const res = await handler(event as never);
		return { status: res.status, body: await res.json(), headers: res.headers };
	} catch (e) {
		if (isHttpError(e)) return { status: e.status, body: e.body, headers: new Headers() };
		throw e;
	}
}

export const getMe = (user: SessionUser | null) => call(me, '/api/me', user, '/api/me');
export const getSurveys = (user: SessionUser | null) =>
	call(surveys, '/api/surveys', user, '/api/surveys');
export const getSnapshot = (user: SessionUser | null, id: string) =>
	call(snapshot, '/api/surveys/[id]/snapshot', user, `/api/surveys/${id}/snapshot`, { id });

/**
 * Posts a form to a page action as SvelteKit would after its hooks: a refusal comes back as
 * its status and data; an error thrown (404, 403) propagates, as it would to SvelteKit.
 */
export async function postForm(
	action: (event: never) => unknown,
	routeId: string,
	path: string,
	params: Record<string, string>,
	form: Record<string, string>,
	user: SessionUser
) {
	const request = new Request(`http://127.0.0.1${path}`, {
		method: 'POST',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams(form)
	});
	const result = await action(routeEvent(user, routeId, request, params) as never);
	if (isActionFailure(result)) {
		return { status: result.status, data: result.data as unknown as Record<string, never> };
	}
	return { status: 200, data: result as unknown as Record<string, never> };
}
