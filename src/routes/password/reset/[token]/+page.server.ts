import { error, redirect } from '@sveltejs/kit';
import { setPasswordSchema } from '$lib/schemas/account';
import { mailLinkOrigin } from '$lib/server/auth/origin';
import { describeReset, resetPassword } from '$lib/server/auth/reset';
import { deadLink } from '$lib/server/auth/tokens';
import { formProblem, parseForm } from '$lib/server/forms';
import type { Actions, PageServerLoad } from './$types';

// The token is in the path: keep it out of Referer headers and caches.
const privateHeaders = { 'referrer-policy': 'no-referrer', 'cache-control': 'no-store' };

/** Opening the link only looks at it; the token is spent when the new password is saved. */
export const load: PageServerLoad = async ({ params, setHeaders }) => {
	setHeaders(privateHeaders);
	const found = await describeReset(params.token);
	if (found.state !== 'valid') error(deadLink[found.state].status, deadLink[found.state].message);
	return { email: found.email };
};

export const actions: Actions = {
	default: async ({ request, params, url, getClientAddress }) => {
		const form = await parseForm(request, setPasswordSchema);
		if (!form.ok) return form.failure;
		const outcome = await resetPassword(params.token, form.data.password, {
			origin: mailLinkOrigin(url),
			address: getClientAddress()
		});
		if (outcome.kind === 'dead') {
			const dead = deadLink[outcome.state];
			return formProblem(dead.status, dead.message, { dead: true });
		}
		redirect(303, '/signin?done=reset');
	}
};
