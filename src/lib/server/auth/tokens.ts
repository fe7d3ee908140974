/**
 * Single-use e-mailed links (invitations, password resets). The link carries 32 random bytes;
 * the database keeps only their SHA-256, so a copy of the tokens table opens nothing. A token
 * is spent by one conditional UPDATE, so two clicks racing on two servers cannot both win.
 */
import { createHash, randomBytes } from 'node:crypto';
import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import { db } from '../db';
import { tokens } from '../db/schema';

export type TokenPurpose = 'invite' | 'password-reset';

/** How long a link works: a week to accept an invitation, an hour to reset a password. */
export const tokenLifetimeMs: Record<TokenPurpose, number> = {
	invite: 7 * 24 * 3600_000,
	'password-reset': 3600_000
};

const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

export function newToken(): { token: string; hash: string } {
	const token = randomBytes(32).toString('base64url');
	return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
	return createHash('sha256').update(token, 'utf8').digest('hex');
}

export type TokenRow = typeof tokens.$inferSelect;

export type TokenLookup =
	{ state: 'valid'; row: TokenRow } | { state: 'unknown' | 'expired' | 'used' | 'revoked' };

/** What a link's token is worth now (does not spend it: opening a link changes nothing). */
export async function lookUpToken(token: string, purpose: TokenPurpose): Promise<TokenLookup> {
	if (!TOKEN_PATTERN.test(token)) return { state: 'unknown' };
	const [found] = await db
		.select({ row: tokens, live: sql<number>`${tokens.expiresAt} > NOW(3)` })
		.from(tokens)
		.where(and(eq(tokens.tokenHash, hashToken(token)), eq(tokens.purpose, purpose)))
		.limit(1);
	if (!found) return { state: 'unknown' };
	const { row, live } = found;
	if (row.usedAt) return { state: 'used' };
	if (row.revoked) return { state: 'revoked' };
	if (!Number(live)) return { state: 'expired' };
	return { state: 'valid', row };
}

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

/** Spends a token inside the caller's transaction; false when it was spent, revoked or expired. */
export async function spendToken(tx: Tx, id: string): Promise<boolean> {
	const [result] = await tx
		.update(tokens)
		.set({ usedAt: sql`NOW(3)` })
		.where(
			and(
				eq(tokens.id, id),
				isNull(tokens.usedAt),
				eq(tokens.revoked, false),
				gt(tokens.expiresAt, sql`NOW(3)`)
			)
		);
	return result.affectedRows === 1;
}

/**
 * Withdraws every reset link of a person that is still open. Called whenever the password or
 * the person's sessions change hands (reset, change, sign-out everywhere, disable): a link sent
 * before then must not outlive it.
 */
export async function revokeResetLinks(executor: Pick<typeof db, 'update'>, userId: string) {
	await executor
		.update(tokens)
		.set({ revoked: true })
		.where(
			and(
				eq(tokens.userId, userId),
				eq(tokens.purpose, 'password-reset'),
				isNull(tokens.usedAt),
				eq(tokens.revoked, false)
			)
		);
}

/** Expiry computed by the database clock, like every other time check on tokens. */
export function expiresIn(purpose: TokenPurpose) {
	return sql`NOW(3) + INTERVAL ${Math.round(tokenLifetimeMs[purpose] / 1000)} SECOND`;
}

/** The answer a person sees for a link that no longer works (a clear 4xx, never a 500). */
export const deadLink: Record<
	Exclude<TokenLookup['state'], 'valid'>,
	{ status: number; message: string }
> = {
	unknown: { status: 404, message: 'This link is not valid. Check that you copied all of it.' },
	expired: { status: 410, message: 'This link has expired.' },
	used: { status: 410, message: 'This link has already been used.' },
	revoked: { status: 410, message: 'This link was withdrawn.' }
};
