import { describe, expect, it } from 'vitest';
import { countAttempt, limitRules, tooManyMessage, waitMs, type LimitRule } from './limits';

const rule: LimitRule = {
	allowance: 5,
	firstLockMs: 60_000,
	maxLockMs: 3_600_000,
	windowMs: 86_400_000
};
const t0 = new Date('2026-03-01T08:00:00Z');
const at = (ms: number) => new Date(t0.getTime() + ms);

/** Counts n attempts made one second apart, starting at t0. */
function after(n: number) {
	let c = { attempts: 0, lastAttemptAt: new Date(0) };
	for (let i = 0; i < n; i++) c = countAttempt(rule, c, at(i * 1000));
	return c;
}

describe('back-off', () => {
	it('lets the allowance through without waiting', () => {
		for (let n = 0; n < 5; n++) expect(waitMs(rule, after(n), at(n * 1000))).toBe(0);
	});

	it('locks for the first lock once the allowance is used', () => {
		const c = after(5); // last attempt at t0 + 4 s
		expect(waitMs(rule, c, at(4000))).toBe(60_000);
		expect(waitMs(rule, c, at(4000 + 59_999))).toBe(1);
		expect(waitMs(rule, c, at(4000 + 60_000))).toBe(0);
	});

	it('doubles with every further attempt, up to the ceiling', () => {
		const lock = (n: number) => {
			const c = after(n);
			return waitMs(rule, c, c.lastAttemptAt);
		};
		expect(lock(6)).toBe(120_000);
		expect(lock(7)).toBe(240_000);
		expect(lock(11)).toBe(3_600_000); // 64 min capped at 60
		expect(lock(200)).toBe(3_600_000);
	});

	it('starts afresh after a quiet window', () => {
		const c = after(9);
		const later = new Date(c.lastAttemptAt.getTime() + 86_400_000);
		expect(waitMs(rule, c, later)).toBe(0);
		expect(countAttempt(rule, c, later).attempts).toBe(1);
	});

	it('gives each network address more room than each account', () => {
		expect(limitRules['sign-in:address'].allowance).toBeGreaterThan(
			limitRules['sign-in:account'].allowance
		);
	});
});

describe('the message', () => {
	it.each([
		[1, 'Too many attempts, try again in 1 minute.'],
		[60_000, 'Too many attempts, try again in 1 minute.'],
		[60_001, 'Too many attempts, try again in 2 minutes.'],
		[3_600_000, 'Too many attempts, try again in 60 minutes.']
	])('%d ms → %s', (ms, text) => expect(tooManyMessage(ms)).toBe(text));
});
