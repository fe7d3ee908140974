import { redirect } from '@sveltejs/kit';
import { lucia } from '$lib/server/auth/lucia';
import type { RequestHandler } from './$types';

/** Ends this session on the server and clears the cookie. */
export const POST: RequestHandler = async ({ locals, cookies }) => {
	if (locals.session) await lucia.invalidateSession(locals.session.id);
	const blank = lucia.createBlankSessionCookie();
	cookies.set(blank.name, blank.value, { path: '.', ...blank.attributes });
	redirect(303, '/');
};
