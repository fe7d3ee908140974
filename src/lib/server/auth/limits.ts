/**
 * Abuse limits with back-off, as pure arithmetic over a counter (attempts, time of the last
 * one). ./attempts.ts keeps the counters in MariaDB so every app process shares them.
 *
 * A subject gets `allowance` attempts freely; after that it waits `firstLockMs`, doubling with
 * every further attempt up to `maxLockMs`. A quiet `windowMs` since the last attempt starts
 * the count afresh. Numbers are common practice for interactive sign-in (a handful of tries
 * per account, a generous budget per network address, which may be a whole office behind NAT).
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
