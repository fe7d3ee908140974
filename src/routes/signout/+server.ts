import { error, redirect } from '@sveltejs/kit';
import { auditAuth } from '$lib/server/auth/audit';
import { lucia } from '$lib/server/auth/lucia';
import { fromOwnPages } from '$lib/server/auth/origin';
import { clearSessionCookie } from '$lib/server/auth/sessions';
import type { RequestHandler } from './$types';

/**
 * Ends this session on the server and clears the cookie. POST only (a link or an image cannot
 * sign anyone out), and only from this app's own pages: SvelteKit refuses cross-site form
 * posts, but a post without a form content type passes its check, so the origin is checked
 * here too. The answer tells the browser to drop its HTTP cache of this site
 * (Clear-Site-Data); the page has already emptied the device's own caches but the app shell
 * (SignOut.svelte). Storage stays: the device database keeps each person's unsent work.
 */
export const POST: RequestHandler = async ({
	locals,
	cookies,
	request,
	url,
	setHeaders,
	getClientAddress
}) => {
	if (!fromOwnPages(request, url)) {
		error(403, 'Sign out from a Steamwisp page: this request came from another site.');
	}
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
	setHeaders({ 'clear-site-data': '"cache"' });
	redirect(303, '/');
};
