import type { Handle } from '@sveltejs/kit';
import { lucia } from '$lib/server/auth/lucia';

/** Fills locals.user and locals.session from the session cookie; refreshes or clears it. */
export const handle: Handle = async ({ event, resolve }) => {
	event.locals.user = null;
	event.locals.session = null;
	const sessionId = event.cookies.get(lucia.sessionCookieName);
	if (sessionId) {
		const { session, user } = await lucia.validateSession(sessionId);
		if (session && user && !user.disabledAt) {
			if (session.fresh) {
				const cookie = lucia.createSessionCookie(session.id);
				event.cookies.set(cookie.name, cookie.value, { path: '.', ...cookie.attributes });
			}
			event.locals.session = { id: session.id, expiresAt: session.expiresAt, fresh: session.fresh };
			event.locals.user = {
				id: user.id,
				firmId: user.firmId,
				email: user.email,
				name: user.name,
				role: user.role,
				clientCompanyId: user.clientCompanyId
			};
		} else {
			if (session) await lucia.invalidateSession(session.id);
			const blank = lucia.createBlankSessionCookie();
			event.cookies.set(blank.name, blank.value, { path: '.', ...blank.attributes });
		}
	}
	return resolve(event);
};
