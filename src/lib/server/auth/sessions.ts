import type { Cookies } from '@sveltejs/kit';
import { lucia } from './lucia';

/** Starts a session for a person and sets the cookie. */
export async function startSession(cookies: Cookies, userId: string, userAgent: string | null) {
	const session = await lucia.createSession(userId, {
		userAgent: userAgent?.slice(0, 255) ?? null
	});
	const cookie = lucia.createSessionCookie(session.id);
	cookies.set(cookie.name, cookie.value, { path: '/', ...cookie.attributes });
}

/** Clears the session cookie in this browser. */
export function clearSessionCookie(cookies: Cookies) {
	const blank = lucia.createBlankSessionCookie();
	cookies.set(blank.name, blank.value, { path: '/', ...blank.attributes });
}

/** Ends every session of a person, on every device. */
export async function endAllSessions(userId: string) {
	await lucia.invalidateUserSessions(userId);
}
