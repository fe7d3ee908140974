import { redirect } from '@sveltejs/kit';
import { changePasswordSchema, homeFor } from '$lib/schemas/account';
import { tooManyMessage } from '$lib/server/auth/limits';
import { mailLinkOrigin } from '$lib/server/auth/origin';
import { changePassword } from '$lib/server/auth/password-change';
import { clearSessionCookie, signOutEverywhere, startSession } from '$lib/server/auth/sessions';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole } from '$lib/server/policy';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = (event) => {
	const user = requireRole(event, 'account.own');
	return {
		person: { name: user.name, email: user.email, role: user.role },
		home: homeFor[user.role]
	};
};

export const actions: Actions = {
	/** Ends every session of this person, this browser's included. */
	signOutEverywhere: async (event) => {
		const user = requireRole(event, 'account.own');
		await signOutEverywhere(user, event.getClientAddress());
		clearSessionCookie(event.cookies);
		// As /signout does: the browser drops what it kept of this person's pages.
		event.setHeaders({ 'clear-site-data': '"cache"' });
		redirect(303, '/signin?done=signed-out-everywhere');
	},

	changePassword: async (event) => {
		const user = requireRole(event, 'account.own');
		const form = await parseForm(event.request, changePasswordSchema);
		if (!form.ok) return form.failure;
		const outcome = await changePassword(user, form.data.current, form.data.password, {
			origin: mailLinkOrigin(event.url),
			address: event.getClientAddress()
		});
		if (outcome.kind === 'throttled') {
			return formProblem(429, tooManyMessage(outcome.waitMs));
		}
		if (outcome.kind === 'wrong-current') {
			const error = 'That is not your current password.';
			return formProblem(400, error, { errors: { current: error } });
		}
		await startSession(event.cookies, user.id, event.request.headers.get('user-agent'));
		return { changed: true };
	}
};
