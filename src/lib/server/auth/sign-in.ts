/**
 * Signing in, as OWASP's advice on account lockout has it: only failures are counted; a
 * browser that signed in to the account before (a device cookie, ./device.ts) is counted on its
 * own, so nobody else's failures keep it out; other browsers share the account's count and
 * their network address's (IPv6 by /64, ./limits.ts addressKey); past the allowance each new
 * failure makes the next wait longer; and the account's owner hears of it by e-mail once, when
 * the account's count first reaches its allowance.
 */
import { eq } from 'drizzle-orm';
import { db } from '../db';
import { users } from '../db/schema';
import { sendMailLater } from '../mail/send';
import { signInAttackMessage } from '../mail/templates/messages';
import { claimAttempt, clearAttempts, giveBack, type AttemptKey } from './attempts';
import { addressDigest, auditAuth } from './audit';
import { deviceCookieAfterSignIn, knownDevice } from './device';
import { addressKey, limitRules } from './limits';
import { verifyPassword } from './password';

/** What signing in needs of the account with this (normalised) address, or undefined. */
export async function accountForSignIn(email: string) {
	const [account] = await db
		.select({
			id: users.id,
			firmId: users.firmId,
			name: users.name,
			role: users.role,
			passwordHash: users.passwordHash,
			disabledAt: users.disabledAt
		})
		.from(users)
		.where(eq(users.email, email))
		.limit(1);
	return account;
}

/** Records when the person last signed in (shown on the Desk's people page). */
export async function noteSignIn(userId: string, at = new Date()) {
	await db.update(users).set({ lastSignInAt: at }).where(eq(users.id, userId));
}

// Verifying against a real hash when the account does not exist keeps the answer's timing alike.
const decoyHash =
	'$argon2id$v=19$m=19456,t=2,p=1$SfeMs8BjhbrBZdm5ze/uBQ$YM8C/Ol3WvA3f0oP1z+GM1r80PaDEgZEMmImT9X1yeE';

export interface SignInRequest {
	email: string;
	password: string;
	/** The client's network address as the adapter reports it. */
	address: string;
	/** The browser's device cookie, if it sent one. */
	device: string | undefined;
	/** Where the warning message's link points (see mail/config.ts linkOrigin). */
	origin: string;
}

export type SignInOutcome =
	| {
			kind: 'signed-in';
			user: { id: string; firmId: string; role: string };
			/** The device cookie to set: this browser now knows the account. */
			device: string;
	  }
	| { kind: 'mismatch' }
	| { kind: 'throttled'; waitMs: number };

export async function signIn(req: SignInRequest, now?: Date): Promise<SignInOutcome> {
	const user = await accountForSignIn(req.email);
	const nonce = user ? await knownDevice(req.device, user.id) : null;
	const keys: AttemptKey[] = nonce
		? [{ scope: 'sign-in:device', subject: nonce }]
		: [
				{ scope: 'sign-in:account', subject: req.email },
				{ scope: 'sign-in:address', subject: addressKey(req.address) }
			];
	const subject = {
		firmId: user?.firmId ?? null,
		subjectId: user?.id ?? null,
		after: user ? undefined : { email: addressDigest(req.email) },
		actorId: null,
		address: req.address
	};
	// A place in the count is taken before the password is checked, so parallel guesses cannot
	// outrun the allowance; a right password gives it back below.
	const claim = await claimAttempt(keys, now);
	if (!claim.allowed) {
		await auditAuth({ action: 'sign-in-throttled', ...subject });
		return { kind: 'throttled', waitMs: claim.waitMs };
	}
	const ok = await verifyPassword(user?.passwordHash ?? decoyHash, req.password);
	if (!user || !ok || user.disabledAt) {
		await auditAuth({ action: 'sign-in-failed', ...subject });
		// Exactly one failure brings the account's count to its allowance: the start of an episode.
		const failures = claim.counts['sign-in:account'];
		if (user && !user.disabledAt && failures === limitRules['sign-in:account'].allowance) {
			await auditAuth({ action: 'sign-in-alert', ...subject, after: { failures } });
			sendMailLater({
				to: req.email,
				firmId: user.firmId,
				message: signInAttackMessage({
					name: user.name,
					failures,
					url: `${req.origin}/password/forgot`
				})
			});
		}
		return { kind: 'mismatch' };
	}
	// The right password: the browser's own count starts afresh, the address's is as before.
	await clearAttempts(keys[0]);
	await giveBack(claim, ['sign-in:address']);
	return {
		kind: 'signed-in',
		user: { id: user.id, firmId: user.firmId, role: user.role },
		device: await deviceCookieAfterSignIn(req.device, user.id)
	};
}
