import { redirect } from '@sveltejs/kit';
import { auditAuth } from '$lib/server/auth/audit';
import { lucia } from '$lib/server/auth/lucia';
import { clearSessionCookie } from '$lib/server/auth/sessions';
import type { RequestHandler } from './$types';

/**
 * Ends this session on the server and clears the cookie. POST only (a link or an image cannot
 * sign anyone out), and SvelteKit refuses cross-site form posts.
 */
export const POST: RequestHandler = async ({ locals, cookies, getClientAddress }) => {
	if (locals.session && locals.user) {
		await lucia.invalidateSession(locals.session.id);
		await auditAuth({
			action: 'sign-out',
			firmId: locals.user.firmId,
			actorId: locals.user.id,
			subjectId: locals.user.id,
			address: getClientAddress()
		});
	}
	clearSessionCookie(cookies);
	redirect(303, '/');
};
