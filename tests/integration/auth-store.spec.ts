/**
 * The database side of sign-in limits and e-mailed links: counters that hold under concurrent
 * claims, and tokens that can be spent once only, even by two transactions racing.
 */
import { randomUUID } from 'node:crypto';
import { and, eq, sql } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import {
	claimAttempt,
	clearAttempts,
	giveBack,
	type AttemptKey
} from '../../src/lib/server/auth/attempts';
import { lookUpToken, newToken, spendToken } from '../../src/lib/server/auth/tokens';
import { db, pool } from '../../src/lib/server/db';
import { attemptCounters, tokens } from '../../src/lib/server/db/schema';
import { demoFirms } from '../../src/lib/server/seed/demo';

afterAll(() => pool.end());

const account = (): AttemptKey => ({
	scope: 'sign-in:account',
	subject: `${randomUUID()}@example.test`
});
const address = (): AttemptKey => ({
	scope: 'sign-in:address',
	subject: `2001:db8::${randomUUID().slice(0, 4)}`
});
const t0 = new Date('2026-06-01T10:00:00.000Z');
const later = (ms: number) => new Date(t0.getTime() + ms);

async function attemptsOf(key: AttemptKey): Promise<number | null> {
	const [row] = await db
		.select({ attempts: attemptCounters.attempts })
		.from(attemptCounters)
		.where(
			and(
				eq(attemptCounters.scope, key.scope),
				eq(attemptCounters.subjectHash, sql`SHA2(${key.subject}, 256)`)
			)
		);
	return row ? row.attempts : null;
}

describe('attempt counters', () => {
	it('allow the allowance, then make the subject wait, then double the wait', async () => {
		const key = account();
		for (let i = 0; i < 5; i++)
			expect(await claimAttempt([key], later(i))).toMatchObject({
				allowed: true,
				counts: { 'sign-in:account': i + 1 }
			});
		expect(await claimAttempt([key], later(4))).toEqual({ allowed: false, waitMs: 60_000 });
		expect(await attemptsOf(key)).toBe(5);
		expect(await claimAttempt([key], later(4 + 60_000))).toMatchObject({ allowed: true });
		expect(await claimAttempt([key], later(4 + 60_000))).toEqual({
			allowed: false,
			waitMs: 120_000
		});
	});

	it('count nothing for any key while one of them must wait', async () => {
		const acc = account();
		const addr = address();
		for (let i = 0; i < 5; i++) await claimAttempt([acc], t0);
		expect((await claimAttempt([acc, addr], t0)).allowed).toBe(false);
		expect(await attemptsOf(addr)).toBe(0);
	});

	it('hold under twenty concurrent claims: exactly the allowance gets through', async () => {
		const key = account();
		const claims = await Promise.all(Array.from({ length: 20 }, () => claimAttempt([key], t0)));
		expect(claims.filter((c) => c.allowed)).toHaveLength(5);
		expect(await attemptsOf(key)).toBe(5);
	});

	it('give a claim back exactly as the counter was, or clear the count', async () => {
		const acc = account();
		const addr = address();
		for (let i = 0; i < 3; i++) await claimAttempt([acc, addr], later(i));
		const [before] = await db
			.select({ at: attemptCounters.lastAttemptAt })
			.from(attemptCounters)
			.where(eq(attemptCounters.subjectHash, sql`SHA2(${addr.subject}, 256)`));
		const claim = await claimAttempt([acc, addr], later(60_000));
		if (!claim.allowed) throw new Error('the fourth attempt must be allowed');
		await giveBack(claim, ['sign-in:address']);
		await clearAttempts(acc);
		expect(await attemptsOf(addr)).toBe(3);
		const [after] = await db
			.select({ at: attemptCounters.lastAttemptAt })
			.from(attemptCounters)
			.where(eq(attemptCounters.subjectHash, sql`SHA2(${addr.subject}, 256)`));
		// The time of the last failure is back too: a success never prolongs a wait.
		expect(after.at).toEqual(before.at);
		expect(await attemptsOf(acc)).toBeNull();
	});

	it('give one back when later attempts were counted meanwhile', async () => {
		const addr = address();
		const mine = await claimAttempt([addr], later(0));
		await claimAttempt([addr], later(1));
		if (!mine.allowed) throw new Error('the first attempt must be allowed');
		await giveBack(mine);
		expect(await attemptsOf(addr)).toBe(1);
	});

	it('store subjects only as hashes', async () => {
		const key = account();
		await claimAttempt([key], t0);
		const [row] = await db.execute(
			sql`SELECT COUNT(*) AS n FROM attempt_counters WHERE subject_hash = ${key.subject}`
		);
		expect(Number((row as unknown as { n: number }[])[0].n)).toBe(0);
		expect(await attemptsOf(key)).toBe(1);
	});
});

describe('e-mailed link tokens', () => {
	async function insert(expiresInSeconds: number) {
		const { token, hash } = newToken();
		const id = randomUUID();
		await db.insert(tokens).values({
			id,
			firmId: demoFirms[0].id,
			purpose: 'invite',
			tokenHash: hash,
			email: `${id}@example.test`,
			role: 'auditor',
			expiresAt: sql`NOW(3) + INTERVAL ${expiresInSeconds} SECOND`
		});
		return { id, token };
	}

	it('are stored only as their SHA-256', async () => {
		const { id, token } = await insert(60);
		const [row] = await db.select().from(tokens).where(eq(tokens.id, id));
		expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);
		expect(JSON.stringify(row)).not.toContain(token);
	});

	it('can be spent once, even by two transactions racing', async () => {
		const { id, token } = await insert(60);
		expect((await lookUpToken(token, 'invite')).state).toBe('valid');
		const spent = await Promise.all([1, 2].map(() => db.transaction((tx) => spendToken(tx, id))));
		expect(spent.sort()).toEqual([false, true]);
		expect((await lookUpToken(token, 'invite')).state).toBe('used');
	});

	it('cannot be spent once expired, and say so', async () => {
		const { id, token } = await insert(-1);
		expect((await lookUpToken(token, 'invite')).state).toBe('expired');
		expect(await db.transaction((tx) => spendToken(tx, id))).toBe(false);
	});

	it('are looked up by purpose: an invitation is no reset link', async () => {
		const { token } = await insert(60);
		expect((await lookUpToken(token, 'password-reset')).state).toBe('unknown');
		expect((await lookUpToken('not-a-token', 'invite')).state).toBe('unknown');
	});
});
