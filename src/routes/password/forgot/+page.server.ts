import { forgotPasswordSchema } from '$lib/schemas/account';
import { tooManyMessage } from '$lib/server/auth/limits';
import { mailLinkOrigin } from '$lib/server/auth/origin';
import { requestReset } from '$lib/server/auth/reset';
import { formProblem, parseForm } from '$lib/server/forms';
import type { Actions } from './$types';

export const actions: Actions = {
	default: async ({ request, url, getClientAddress }) => {
		const form = await parseForm(request, forgotPasswordSchema, ['email']);
		if (!form.ok) return form.failure;
		const outcome = await requestReset(form.data.email, {
			origin: mailLinkOrigin(url),
			address: getClientAddress()
		});
		if (outcome.kind === 'throttled') {
			return formProblem(429, tooManyMessage(outcome.waitMs), {
				values: { email: form.data.email }
			});
		}
		// The same words whether or not the address has an account.
		return { sent: true, email: form.data.email };
	}
};
