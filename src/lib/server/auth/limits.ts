/**
 * Abuse limits with back-off, as pure arithmetic over a counter (failures, time of the last
 * one). ./attempts.ts keeps the counters in MariaDB so every app process shares them.
 *
 * A subject gets `allowance` failures freely; after that it waits `firstLockMs`, doubling with
 * every further failure up to `maxLockMs`: a delay that grows, never a lock an administrator
 * has to lift. A quiet `windowMs` since the last failure starts the count afresh. Following
 * OWASP's advice on account lockout, the sign-in scopes count failed attempts only, and only
 * browsers that have not signed in to the account before (no device cookie, ./device.ts) share
 * the account's and the network address's counts; a known browser has a count of its own, so
 * nobody else's guesses can keep its owner out. Numbers are common practice for interactive
 * sign-in (a handful of tries per account, a generous budget per network address, which may be
 * a whole office behind NAT).
 */
export interface LimitRule {
	allowance: number;
	firstLockMs: number;
	maxLockMs: number;
	windowMs: number;
}

const minute = 60_000;
const hour = 60 * minute;

export const limitRules = {
	'sign-in:account': { allowance: 5, firstLockMs: minute, maxLockMs: hour, windowMs: 24 * hour },
	'sign-in:address': { allowance: 30, firstLockMs: minute, maxLockMs: hour, windowMs: 24 * hour },
	/** One known browser's own failures for the account its device cookie names. */
	'sign-in:device': { allowance: 5, firstLockMs: minute, maxLockMs: hour, windowMs: 24 * hour },
	/** Wrong current passwords typed on the account page (a borrowed session cannot guess on). */
	'change:account': { allowance: 5, firstLockMs: minute, maxLockMs: hour, windowMs: 24 * hour },
	'reset:account': {
		allowance: 3,
		firstLockMs: 5 * minute,
		maxLockMs: 6 * hour,
		windowMs: 24 * hour
	},
	'reset:address': { allowance: 20, firstLockMs: minute, maxLockMs: hour, windowMs: 24 * hour }
} as const satisfies Record<string, LimitRule>;

export type LimitScope = keyof typeof limitRules;

export interface Counter {
	attempts: number;
	lastAttemptAt: Date;
}

function stale(rule: LimitRule, c: Counter, now: Date): boolean {
	return now.getTime() - c.lastAttemptAt.getTime() >= rule.windowMs;
}

/** How long the subject must still wait before its next attempt, in ms (0: it may try now). */
export function waitMs(rule: LimitRule, c: Counter, now: Date): number {
	if (stale(rule, c, now) || c.attempts < rule.allowance) return 0;
	const doublings = Math.min(c.attempts - rule.allowance, 30);
	const lock = Math.min(rule.firstLockMs * 2 ** doublings, rule.maxLockMs);
	return Math.max(0, c.lastAttemptAt.getTime() + lock - now.getTime());
}

/** The counter after one more attempt at `now`. */
export function countAttempt(rule: LimitRule, c: Counter, now: Date): Counter {
	return { attempts: stale(rule, c, now) ? 1 : c.attempts + 1, lastAttemptAt: now };
}

/** "Too many attempts, try again in 3 minutes." — whole minutes, rounded up, at least one. */
export function tooManyMessage(ms: number): string {
	const minutes = Math.max(1, Math.ceil(ms / minute));
	return `Too many attempts, try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`;
}

/**
 * The network address a limit counts under: IPv4 addresses whole, IPv6 by their /64 (one
 * subscriber or site is handed a whole /64 and can pick any address in it at will), IPv4 mapped
 * into IPv6 as the IPv4 address it is. Anything else is kept as it came.
 */
export function addressKey(address: string): string {
	const bare = address.trim().toLowerCase().replace(/%.*$/, '');
	const groups = ipv6Groups(bare);
	if (!groups) return bare;
	if (groups.slice(0, 5).every((g) => g === '0') && groups[5] === 'ffff') {
		const [hi, lo] = [parseInt(groups[6], 16), parseInt(groups[7], 16)];
		return [hi >> 8, hi & 255, lo >> 8, lo & 255].join('.');
	}
	return `${groups.slice(0, 4).join(':')}::/64`;
}

/** The eight groups of an IPv6 address, each without leading zeros, or null if it is not one. */
function ipv6Groups(address: string): string[] | null {
	if (!address.includes(':')) return null;
	let text = address;
	// A trailing dotted quad (::1.2.3.4) is the last two groups.
	const quad = /(\d{1,3})\.(\d{1,3})\.(\d{1,3})\.(\d{1,3})$/.exec(text);
	if (quad) {
		const b = quad.slice(1).map(Number);
		if (b.some((n) => n > 255)) return null;
		text = `${text.slice(0, quad.index)}${((b[0] << 8) | b[1]).toString(16)}:${((b[2] << 8) | b[3]).toString(16)}`;
	}
	const halves = text.split('::');
	if (halves.length > 2) return null;
	const head = halves[0] ? halves[0].split(':') : [];
	const tail = halves.length === 2 && halves[1] ? halves[1].split(':') : [];
	const missing = 8 - head.length - tail.length;
	if (halves.length === 1 ? missing !== 0 : missing < 1) return null;
	const all = [...head, ...Array<string>(halves.length === 2 ? missing : 0).fill('0'), ...tail];
	if (!all.every((g) => /^[0-9a-f]{1,4}$/.test(g))) return null;
	return all.map((g) => parseInt(g, 16).toString(16));
}
