/**
 * Attempt counters in MariaDB (table attempt_counters), shared by every app process. What stays
 * counted is failures only: `claimAttempt` takes a place in the count before the password is
 * checked, inside a row lock, so a burst of parallel guesses against several servers cannot
 * slip past the allowance; when the password was right, `giveBack` returns that place as if
 * the attempt had never been made (count and time of the last failure both), so a correct
 * sign-in neither counts nor prolongs a wait.
 */
import { createHash } from 'node:crypto';
import { and, eq, lt, sql } from 'drizzle-orm';
import { db } from '../db';
import { attemptCounters } from '../db/schema';
import { countAttempt, limitRules, waitMs, type Counter, type LimitScope } from './limits';

export interface AttemptKey {
	scope: LimitScope;
	/** An e-mail address (lower case), a network address key, a device or person id. */
	subject: string;
}

/** One counter's place taken by a claim: what it was before, what the claim made it. */
interface Held {
	scope: LimitScope;
	subjectHash: string;
	before: Counter;
	after: Counter;
}

export type Claim =
	| { allowed: true; held: Held[]; counts: Partial<Record<LimitScope, number>> }
	| { allowed: false; waitMs: number };

const hashOf = (subject: string) => createHash('sha256').update(subject, 'utf8').digest('hex');

/** The database's clock, so several app servers with drifting clocks agree. */
async function dbNow(): Promise<Date> {
	const [rows] = (await db.execute(sql`SELECT NOW(3) AS now`)) as unknown as [{ now: Date }[]];
	return new Date(rows[0].now);
}

/**
 * Counts one attempt for every key, unless any of them must still wait: then nothing is
 * counted and the longest wait is returned. `counts` says what each count is now, this
 * attempt included.
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
			const held: Held[] = [];
			const counts: Partial<Record<LimitScope, number>> = {};
			for (const row of locked) {
				const scope = row.scope as LimitScope;
				const next = countAttempt(limitRules[scope], row, at);
				await tx
					.update(attemptCounters)
					.set(next)
					.where(
						and(
							eq(attemptCounters.scope, row.scope),
							eq(attemptCounters.subjectHash, row.subjectHash)
						)
					);
				held.push({
					scope,
					subjectHash: row.subjectHash,
					before: { attempts: row.attempts, lastAttemptAt: row.lastAttemptAt },
					after: next
				});
				counts[scope] = next.attempts;
			}
			return { allowed: true, held, counts } as const;
		})
	);
}

/**
 * Returns the places a claim took (the attempt succeeded). A counter nobody touched since is
 * put back exactly as it was; one that counted later attempts meanwhile gives back one.
 */
export async function giveBack(claim: Extract<Claim, { allowed: true }>, scopes?: LimitScope[]) {
	for (const h of claim.held) {
		if (scopes && !scopes.includes(h.scope)) continue;
		const key = and(
			eq(attemptCounters.scope, h.scope),
			eq(attemptCounters.subjectHash, h.subjectHash)
		);
		const [restored] = await db
			.update(attemptCounters)
			.set(h.before)
			.where(
				and(
					key,
					eq(attemptCounters.attempts, h.after.attempts),
					eq(attemptCounters.lastAttemptAt, h.after.lastAttemptAt)
				)
			);
		if (restored.affectedRows === 1) continue;
		await db
			.update(attemptCounters)
			.set({ attempts: sql`GREATEST(${attemptCounters.attempts} - 1, 0)` })
			.where(key);
	}
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
