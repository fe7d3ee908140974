import { error, redirect } from '@sveltejs/kit';
import { acceptInvitationSchema } from '$lib/schemas/account';
import { acceptInvitation, describeInvitation } from '$lib/server/auth/invitations';
import { deadLink } from '$lib/server/auth/tokens';
import { formProblem, parseForm } from '$lib/server/forms';
import type { Actions, PageServerLoad } from './$types';

// The token is in the path: keep it out of Referer headers and caches.
const privateHeaders = { 'referrer-policy': 'no-referrer', 'cache-control': 'no-store' };

/** Opening the link only looks at it (mail scanners open links too); saving spends it. */
export const load: PageServerLoad = async ({ params, setHeaders }) => {
	setHeaders(privateHeaders);
	const found = await describeInvitation(params.token);
	if (found.state !== 'valid') error(deadLink[found.state].status, deadLink[found.state].message);
	return { email: found.email, role: found.role, firmName: found.firmName };
};

export const actions: Actions = {
	default: async ({ request, params, getClientAddress }) => {
		const form = await parseForm(request, acceptInvitationSchema, ['name']);
		if (!form.ok) return form.failure;
		const outcome = await acceptInvitation(params.token, form.data, getClientAddress());
		if (outcome.kind === 'dead') {
			const dead = deadLink[outcome.state];
			return formProblem(dead.status, dead.message, { dead: true });
		}
		if (outcome.kind === 'taken') {
			return formProblem(
				409,
				'This address already has a Steamwisp account. Sign in with it, or ask for an invitation to another address.',
				{ dead: true }
			);
		}
		redirect(303, '/signin?done=welcome');
	}
};
