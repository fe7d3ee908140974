/**
 * Sessions on lucia v3, with the session token apart from the session id, as current guidance
 * has it: the cookie carries 32 random bytes (base64url), the sessions table keeps only their
 * SHA-256 (hex) as the id. Whoever reads the table (a backup, a log of queries) cannot sign in
 * as anyone; every lucia call takes the hashed id.
 */
import { createHash, randomBytes } from 'node:crypto';
import type { Cookies } from '@sveltejs/kit';
import { db } from '../db';
import { auditAuth } from './audit';
import { lucia } from './lucia';
import { revokeResetLinks } from './tokens';

const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

/** The id a session token is kept under. */
export function sessionIdFor(token: string): string {
	return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** Starts a session for a person and sets the cookie (the token; the table gets its hash). */
export async function startSession(cookies: Cookies, userId: string, userAgent: string | null) {
	const token = randomBytes(32).toString('base64url');
	await lucia.createSession(
		userId,
		{ userAgent: userAgent?.slice(0, 255) ?? null },
		{ sessionId: sessionIdFor(token) }
	);
	const cookie = lucia.createSessionCookie(token);
	cookies.set(cookie.name, cookie.value, { path: '/', ...cookie.attributes });
	return token;
}

/**
 * The session and person this browser's cookie names, or null. Extends the cookie when lucia
 * extended the session; clears it when it names nothing valid (expired, ended, a disabled
 * person, or a cookie from before tokens were hashed).
 */
export async function readSession(cookies: Cookies) {
	const token = cookies.get(lucia.sessionCookieName);
	if (!token) return null;
	const { session, user } = TOKEN_PATTERN.test(token)
		? await lucia.validateSession(sessionIdFor(token))
		: { session: null, user: null };
	if (session && user && !user.disabledAt) {
		if (session.fresh) {
			const cookie = lucia.createSessionCookie(token);
			cookies.set(cookie.name, cookie.value, { path: '/', ...cookie.attributes });
		}
		return { session, user };
	}
	if (session) await lucia.invalidateSession(session.id);
	clearSessionCookie(cookies);
	return null;
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

/**
 * "Sign out everywhere": every session ends and every reset link still open is withdrawn (a
 * link sent to a mailbox someone else reads would otherwise let them straight back in).
 */
export async function signOutEverywhere(user: SessionUser, address: string | null) {
	await db.transaction(async (tx) => {
		await revokeResetLinks(tx, user.id);
		await auditAuth(
			{
				action: 'sign-out-everywhere',
				firmId: user.firmId,
				actorId: user.id,
				subjectId: user.id,
				address
			},
			tx
		);
	});
	await endAllSessions(user.id);
}
