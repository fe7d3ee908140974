/**
 * Attempt counters in MariaDB (table attempt_counters), shared by every app process.
 * `claimAttempt` counts an attempt before the password is even checked, inside a row lock, so
 * a burst of parallel guesses against several servers cannot slip past the allowance; a
 * successful sign-in then clears the account's count and refunds the address its one attempt.
 */
import { createHash } from 'node:crypto';
import { and, eq, lt, sql } from 'drizzle-orm';
import { db } from '../db';
import { attemptCounters } from '../db/schema';
import { countAttempt, limitRules, waitMs, type LimitScope } from './limits';

export interface AttemptKey {
	scope: LimitScope;
	/** An e-mail address (lower case) or a client network address. */
	subject: string;
}

export type Claim = { allowed: true } | { allowed: false; waitMs: number };

const hashOf = (subject: string) => createHash('sha256').update(subject, 'utf8').digest('hex');

/** The database's clock, so several app servers with drifting clocks agree. */
async function dbNow(): Promise<Date> {
	const [rows] = (await db.execute(sql`SELECT NOW(3) AS now`)) as unknown as [{ now: Date }[]];
	return new Date(rows[0].now);
}

/**
 * Counts one attempt for every key, unless any of them must still wait: then nothing is
 * counted and the longest wait is returned.
 */
export async function claimAttempt(keys: AttemptKey[], now?: Date): Promise<Claim> {
	const at = now ?? (await dbNow());
	const rows = keys.map((k) => ({ scope: k.scope, subjectHash: hashOf(k.subject) }));
	// Make sure the rows exist outside the transaction: locking a duplicate inside it would
	// take a shared lock first and deadlock with a concurrent claim.
	await db
		.insert(attemptCounters)
		.ignore()
		.values(rows.map((r) => ({ ...r, attempts: 0, lastAttemptAt: at })));
	return withDeadlockRetry(() =>
		db.transaction(async (tx) => {
			const locked = await tx
				.select()
				.from(attemptCounters)
				.where(keyFilter(rows))
				.orderBy(attemptCounters.scope, attemptCounters.subjectHash)
				.for('update');
			let longest = 0;
			for (const row of locked) {
				longest = Math.max(longest, waitMs(limitRules[row.scope as LimitScope], row, at));
			}
			if (longest > 0) return { allowed: false, waitMs: longest } as const;
			for (const row of locked) {
				const next = countAttempt(limitRules[row.scope as LimitScope], row, at);
				await tx
					.update(attemptCounters)
					.set(next)
					.where(
						and(
							eq(attemptCounters.scope, row.scope),
							eq(attemptCounters.subjectHash, row.subjectHash)
						)
					);
			}
			return { allowed: true } as const;
		})
	);
}

/** Forgets a subject's count (the account signed in successfully). */
export async function clearAttempts(key: AttemptKey): Promise<void> {
	await db
		.delete(attemptCounters)
		.where(
			and(
				eq(attemptCounters.scope, key.scope),
				eq(attemptCounters.subjectHash, hashOf(key.subject))
			)
		);
}

/** Gives back the attempt a success used (the address keeps its other failures). */
export async function refundAttempt(key: AttemptKey): Promise<void> {
	await db
		.update(attemptCounters)
		.set({ attempts: sql`GREATEST(${attemptCounters.attempts} - 1, 0)` })
		.where(
			and(
				eq(attemptCounters.scope, key.scope),
				eq(attemptCounters.subjectHash, hashOf(key.subject))
			)
		);
}

/** Drops counters nobody touched for two days (kept small; called on successful sign-ins). */
export async function pruneAttempts(): Promise<void> {
	await db
		.delete(attemptCounters)
		.where(lt(attemptCounters.lastAttemptAt, sql`NOW(3) - INTERVAL 2 DAY`))
		.limit(500);
}

function keyFilter(rows: { scope: string; subjectHash: string }[]) {
	const each = sql.join(
		rows.map(
			(r) =>
				sql`(${attemptCounters.scope} = ${r.scope} AND ${attemptCounters.subjectHash} = ${r.subjectHash})`
		),
		sql` OR `
	);
	return sql`(${each})`;
}

async function withDeadlockRetry<T>(run: () => Promise<T>, tries = 3): Promise<T> {
	for (let i = 1; ; i++) {
		try {
			return await run();
		} catch (e) {
			const code =
				(e as { code?: string; cause?: { code?: string } }).cause?.code ??
				(e as { code?: string }).code;
			if (i >= tries || (code !== 'ER_LOCK_DEADLOCK' && code !== 'ER_LOCK_WAIT_TIMEOUT')) throw e;
		}
	}
}
