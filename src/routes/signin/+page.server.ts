import { fail, redirect } from '@sveltejs/kit';
import { homeFor, safeNext, signInSchema } from '$lib/schemas/account';
import { roleSchema } from '$lib/schemas/roles';
import { pruneAttempts } from '$lib/server/auth/attempts';
import { auditAuth } from '$lib/server/auth/audit';
import { DEVICE_COOKIE, setDeviceCookie } from '$lib/server/auth/device';
import { tooManyMessage } from '$lib/server/auth/limits';
import { lucia } from '$lib/server/auth/lucia';
import { mailLinkOrigin } from '$lib/server/auth/origin';
import { startSession } from '$lib/server/auth/sessions';
import { noteSignIn, signIn } from '$lib/server/auth/sign-in';
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

const mismatch = 'That e-mail address and password do not match an active account.';

export const actions: Actions = {
	default: async ({ request, cookies, locals, url, getClientAddress }) => {
		const form = await readForm(request);
		const parsed = signInSchema.safeParse(form);
		if (!parsed.success) {
			return fail(400, { email: String(form.email ?? ''), error: parsed.error.issues[0].message });
		}
		const { email, password, next } = parsed.data;
		const address = getClientAddress();
		const outcome = await signIn({
			email,
			password,
			address,
			device: cookies.get(DEVICE_COOKIE),
			origin: mailLinkOrigin(url)
		});
		if (outcome.kind === 'throttled') {
			return fail(429, { email, error: tooManyMessage(outcome.waitMs) });
		}
		if (outcome.kind === 'mismatch') return fail(400, { email, error: mismatch });
		const { user } = outcome;
		setDeviceCookie(cookies, outcome.device);
		// A fresh session on every sign-in; any session this browser had ends (no fixation).
		if (locals.session) await lucia.invalidateSession(locals.session.id);
		await startSession(cookies, user.id, request.headers.get('user-agent'));
		await noteSignIn(user.id);
		await auditAuth({
			action: 'sign-in',
			firmId: user.firmId,
			actorId: user.id,
			subjectId: user.id,
			address
		});
		// Housekeeping that needs no scheduler: old counters and expired sessions go now and then.
		await pruneAttempts();
		await lucia.deleteExpiredSessions();
		redirect(303, safeNext(next) ?? homeFor[roleSchema.parse(user.role)]);
	}
};
