/**
 * Device cookies (OWASP, "Slow Down Online Guessing Attacks with Device Cookies"): a browser
 * that has signed in to an account gets a cookie naming that account, signed by the server, so
 * its later sign-ins are counted apart from everyone else's. Failures from other browsers (an
 * attacker's) then slow down only other browsers; this one keeps its own small allowance.
 *
 * The cookie holds up to five entries (a shared computer may serve a few people), newest first,
 * each `nonce.signature` with signature = HMAC-SHA256(key, userId + "." + nonce): no e-mail
 * address or id is readable from it, and it proves nothing but "this browser signed in to that
 * account before". It is not a session and never signs anyone in.
 */
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Cookies } from '@sveltejs/kit';
import { secureCookies } from './lucia';
import { signingKey } from './secret';

export const DEVICE_COOKIE = 'steamwisp_device';
const MAX_ENTRIES = 5;
/** A browser unused for half a year is a stranger again. */
const MAX_AGE_S = 180 * 24 * 3600;
const ENTRY = /^([A-Za-z0-9_-]{22})\.([A-Za-z0-9_-]{43})$/;

async function signature(userId: string, nonce: string): Promise<Buffer> {
	return createHmac('sha256', await signingKey('device-cookie'))
		.update(`${userId}.${nonce}`)
		.digest();
}

function entries(value: string | undefined): { nonce: string; sig: string }[] {
	return (value ?? '')
		.split('~')
		.slice(0, MAX_ENTRIES)
		.map((e) => ENTRY.exec(e))
		.filter((m): m is RegExpExecArray => m !== null)
		.map((m) => ({ nonce: m[1], sig: m[2] }));
}

/** The nonce of this browser's entry for the account, or null (none, or not ours). */
export async function knownDevice(value: string | undefined, userId: string) {
	for (const e of entries(value)) {
		const expected = await signature(userId, e.nonce);
		const given = Buffer.from(e.sig, 'base64url');
		if (given.length === expected.length && timingSafeEqual(given, expected)) return e.nonce;
	}
	return null;
}

/** The cookie after a successful sign-in: a fresh entry for this account first, then the others. */
export async function deviceCookieAfterSignIn(value: string | undefined, userId: string) {
	const previous = await knownDevice(value, userId);
	const nonce = randomBytes(16).toString('base64url');
	const sig = (await signature(userId, nonce)).toString('base64url');
	const others = entries(value)
		.filter((e) => e.nonce !== previous)
		.map((e) => `${e.nonce}.${e.sig}`);
	return [`${nonce}.${sig}`, ...others].slice(0, MAX_ENTRIES).join('~');
}

export function setDeviceCookie(cookies: Cookies, value: string) {
	cookies.set(DEVICE_COOKIE, value, {
		path: '/',
		httpOnly: true,
		sameSite: 'lax',
		secure: secureCookies,
		maxAge: MAX_AGE_S
	});
}
