import { fail, redirect } from '@sveltejs/kit';
import { homeFor, safeNext, signInSchema } from '$lib/schemas/account';
import { roleSchema } from '$lib/schemas/roles';
import {
	claimAttempt,
	clearAttempts,
	pruneAttempts,
	refundAttempt
} from '$lib/server/auth/attempts';
import { addressDigest, auditAuth } from '$lib/server/auth/audit';
import { tooManyMessage } from '$lib/server/auth/limits';
import { lucia } from '$lib/server/auth/lucia';
import { verifyPassword } from '$lib/server/auth/password';
import { startSession } from '$lib/server/auth/sessions';
import { accountForSignIn, noteSignIn } from '$lib/server/auth/sign-in';
import { readForm } from '$lib/server/forms';
import type { Actions, PageServerLoad } from './$types';

const notices: Record<string, string> = {
	welcome: 'Your account is ready. Sign in with your new password.',
	reset: 'Your password was changed and every device was signed out. Sign in with the new one.',
	'signed-out-everywhere': 'You were signed out on every device.'
};

export const load: PageServerLoad = ({ locals, url }) => {
	if (locals.user)
		redirect(303, safeNext(url.searchParams.get('next')) ?? homeFor[locals.user.role]);
	return {
		next: safeNext(url.searchParams.get('next')),
		notice: notices[url.searchParams.get('done') ?? ''] ?? null
	};
};

// Verifying against a real hash when the account does not exist keeps the answer's timing alike.
const decoyHash =
	'$argon2id$v=19$m=19456,t=2,p=1$SfeMs8BjhbrBZdm5ze/uBQ$YM8C/Ol3WvA3f0oP1z+GM1r80PaDEgZEMmImT9X1yeE';

const mismatch = 'That e-mail address and password do not match an active account.';

export const actions: Actions = {
	default: async ({ request, cookies, locals, getClientAddress }) => {
		const form = await readForm(request);
		const parsed = signInSchema.safeParse(form);
		if (!parsed.success) {
			return fail(400, { email: String(form.email ?? ''), error: parsed.error.issues[0].message });
		}
		const { email, password, next } = parsed.data;
		const address = getClientAddress();
		const keys = [
			{ scope: 'sign-in:account', subject: email },
			{ scope: 'sign-in:address', subject: address }
		] as const;

		const user = await accountForSignIn(email);
		const subject = {
			firmId: user?.firmId ?? null,
			subjectId: user?.id ?? null,
			after: user ? undefined : { email: addressDigest(email) },
			actorId: null,
			address
		};
		// Counted before the password is checked, so parallel guesses cannot outrun the limit.
		const claim = await claimAttempt([...keys]);
		if (!claim.allowed) {
			await auditAuth({ action: 'sign-in-throttled', ...subject });
			return fail(429, { email, error: tooManyMessage(claim.waitMs) });
		}
		const ok = await verifyPassword(user?.passwordHash ?? decoyHash, password);
		if (!user || !ok || user.disabledAt) {
			await auditAuth({ action: 'sign-in-failed', ...subject });
			return fail(400, { email, error: mismatch });
		}
		await clearAttempts(keys[0]);
		await refundAttempt(keys[1]);
		// A fresh session id on every sign-in; any session this browser had ends (no fixation).
		if (locals.session) await lucia.invalidateSession(locals.session.id);
		await startSession(cookies, user.id, request.headers.get('user-agent'));
		await noteSignIn(user.id);
		await auditAuth({ ...subject, action: 'sign-in', actorId: user.id });
		// Housekeeping that needs no scheduler: old counters and expired sessions go now and then.
		await pruneAttempts();
		await lucia.deleteExpiredSessions();
		redirect(303, safeNext(next) ?? homeFor[roleSchema.parse(user.role)]);
	}
};
