import { eq } from 'drizzle-orm';
import { db } from '../db';
import { users } from '../db/schema';
import { sendMailLater } from '../mail/send';
import { passwordChangedMessage } from '../mail/templates/messages';
import { claimAttempt, clearAttempts } from './attempts';
import { auditAuth } from './audit';
import { hashPassword, verifyPassword } from './password';
import { endAllSessions } from './sessions';
import { revokeResetLinks } from './tokens';

export type ChangeOutcome =
	{ kind: 'changed' } | { kind: 'wrong-current' } | { kind: 'throttled'; waitMs: number };

/**
 * Changes a signed-in person's password after checking the current one (limited like sign-in,
 * so a borrowed session cannot be used to guess it), withdraws open reset links, then ends
 * every session of the account; the caller starts a fresh one for this browser.
 */
export async function changePassword(
	user: SessionUser,
	current: string,
	next: string,
	ctx: { origin: string; address: string }
): Promise<ChangeOutcome> {
	// Counted per person apart from sign-in: someone guessing at the sign-in form must not be
	// able to stop the owner from changing the password.
	const key = { scope: 'change:account', subject: user.id } as const;
	const claim = await claimAttempt([key]);
	if (!claim.allowed) return { kind: 'throttled', waitMs: claim.waitMs };
	const [row] = await db
		.select({ passwordHash: users.passwordHash })
		.from(users)
		.where(eq(users.id, user.id));
	if (!row?.passwordHash || !(await verifyPassword(row.passwordHash, current))) {
		return { kind: 'wrong-current' };
	}
	await clearAttempts(key);
	const passwordHash = await hashPassword(next);
	await db.transaction(async (tx) => {
		await tx.update(users).set({ passwordHash }).where(eq(users.id, user.id));
		// A reset link sent before the change would undo it.
		await revokeResetLinks(tx, user.id);
		await auditAuth(
			{
				action: 'password-change',
				firmId: user.firmId,
				actorId: user.id,
				subjectId: user.id,
				address: ctx.address
			},
			tx
		);
	});
	await endAllSessions(user.id);
	sendMailLater({
		to: user.email,
		firmId: user.firmId,
		message: passwordChangedMessage({ name: user.name, url: `${ctx.origin}/password/forgot` })
	});
	return { kind: 'changed' };
}
