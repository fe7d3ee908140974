/**
 * Password reset by e-mail. The request always gets the same answer, sent at once, whether or
 * not the address has an account (everything else happens afterwards), so nobody can use
 * the form to find out who works with whom. Requests are limited per address and per network
 * address like sign-in, so the form cannot be used to flood someone's inbox.
 */
import { randomUUID } from 'node:crypto';
import { TransactionRollbackError, and, eq, isNull } from 'drizzle-orm';
import { db } from '../db';
import { tokens, users } from '../db/schema';
import { sendMailLater } from '../mail/send';
import { passwordChangedMessage, passwordResetMessage } from '../mail/templates/messages';
import { claimAttempt, clearAttempts } from './attempts';
import { addressKey } from './limits';
import { addressDigest, auditAuth } from './audit';
import { hashPassword } from './password';
import { endAllSessions } from './sessions';
import {
	expiresIn,
	lookUpToken,
	newToken,
	revokeResetLinks,
	spendToken,
	tokenLifetimeMs,
	type TokenLookup
} from './tokens';

interface Context {
	origin: string;
	address: string;
}

export type ResetRequestOutcome =
	| { kind: 'done'; settled: Promise<void> }
	| { kind: 'throttled'; waitMs: number; settled: Promise<void> };

/**
 * Answers at once, the same way for every address: the only work done before answering is the
 * limit check, which is keyed by what was typed. Looking the account up, issuing the link, the
 * audit row and the message all happen after the answer (`settled` says when; tests wait for
 * it), so not even the time the answer takes depends on whether the address has an account.
 */
export async function requestReset(email: string, ctx: Context): Promise<ResetRequestOutcome> {
	const claim = await claimAttempt([
		{ scope: 'reset:account', subject: email },
		{ scope: 'reset:address', subject: addressKey(ctx.address) }
	]);
	const settled = afterAnswer(() =>
		claim.allowed ? issueReset(email, ctx) : noteThrottled(email, ctx)
	);
	return claim.allowed
		? { kind: 'done', settled }
		: { kind: 'throttled', waitMs: claim.waitMs, settled };
}

/** Runs `work` once the current request has had its answer; logs a failure, never throws. */
function afterAnswer(work: () => Promise<void>): Promise<void> {
	return new Promise<void>((resolve) => setImmediate(resolve)).then(work).catch((e: unknown) => {
		console.error(`steamwisp: password reset request: ${(e as Error).message}`);
	});
}

async function activeAccount(email: string) {
	const [user] = await db
		.select({ id: users.id, firmId: users.firmId, name: users.name, disabledAt: users.disabledAt })
		.from(users)
		.where(eq(users.email, email))
		.limit(1);
	return { user, known: user && !user.disabledAt ? user : null };
}

async function noteThrottled(email: string, ctx: Context) {
	const { known } = await activeAccount(email);
	await auditAuth({
		action: 'reset-throttled',
		firmId: known?.firmId ?? null,
		actorId: null,
		subjectId: known?.id ?? null,
		after: known ? undefined : { email: addressDigest(email) },
		address: ctx.address
	});
}

async function issueReset(email: string, ctx: Context) {
	const { user, known } = await activeAccount(email);
	if (!known) {
		await auditAuth({
			action: 'reset-request',
			firmId: null,
			actorId: null,
			subjectId: null,
			after: { email: addressDigest(email), outcome: user ? 'disabled' : 'no-account' },
			address: ctx.address
		});
		return;
	}
	const { token, hash } = newToken();
	await db.transaction(async (tx) => {
		// Only the newest link works.
		await revokeResetLinks(tx, known.id);
		const id = randomUUID();
		await tx.insert(tokens).values({
			id,
			firmId: known.firmId,
			purpose: 'password-reset',
			tokenHash: hash,
			email,
			userId: known.id,
			expiresAt: expiresIn('password-reset')
		});
		await auditAuth(
			{
				action: 'reset-request',
				firmId: known.firmId,
				actorId: null,
				subjectId: known.id,
				after: { tokenId: id },
				address: ctx.address
			},
			tx
		);
	});
	sendMailLater({
		to: email,
		firmId: known.firmId,
		message: passwordResetMessage({
			name: known.name,
			url: `${ctx.origin}/password/reset/${token}`,
			minutes: tokenLifetimeMs['password-reset'] / 60_000
		})
	});
}

/** What the reset page shows before the new password is chosen. */
export async function describeReset(token: string) {
	const found = await lookUpToken(token, 'password-reset');
	if (found.state !== 'valid') return found;
	return { state: 'valid' as const, email: found.row.email };
}

export type ResetOutcome =
	{ kind: 'done'; email: string } | { kind: 'dead'; state: Exclude<TokenLookup['state'], 'valid'> };

/**
 * Spends the link and sets the password; then every session of the account ends (whoever had
 * the old password is out) and the owner is told by e-mail.
 */
export async function resetPassword(
	token: string,
	password: string,
	ctx: Context
): Promise<ResetOutcome> {
	const found = await lookUpToken(token, 'password-reset');
	if (found.state !== 'valid') return { kind: 'dead', state: found.state };
	const row = found.row;
	if (!row.userId) return { kind: 'dead', state: 'unknown' };
	const userId = row.userId;
	const passwordHash = await hashPassword(password);
	const outcome = await db
		.transaction(async (tx) => {
			if (!(await spendToken(tx, row.id))) return null;
			const [result] = await tx
				.update(users)
				.set({ passwordHash })
				.where(and(eq(users.id, userId), isNull(users.disabledAt)));
			if (result.affectedRows !== 1) tx.rollback();
			await revokeResetLinks(tx, userId);
			await auditAuth(
				{
					action: 'password-reset',
					firmId: row.firmId,
					actorId: userId,
					subjectId: userId,
					after: { tokenId: row.id },
					address: ctx.address
				},
				tx
			);
			return true;
		})
		.catch((e: unknown) => {
			// The account was disabled since the link was sent: the link is dead with it.
			if (e instanceof TransactionRollbackError) return false;
			throw e;
		});
	if (outcome === null) return { kind: 'dead', state: 'used' };
	if (outcome === false) return { kind: 'dead', state: 'revoked' };
	await endAllSessions(userId);
	await clearAttempts({ scope: 'sign-in:account', subject: row.email });
	const [user] = await db.select({ name: users.name }).from(users).where(eq(users.id, userId));
	sendMailLater({
		to: row.email,
		firmId: row.firmId,
		message: passwordChangedMessage({ name: user.name, url: `${ctx.origin}/password/forgot` })
	});
	return { kind: 'done', email: row.email };
}
