import { error, redirect } from '@sveltejs/kit';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = ({ locals, url }) => {
	if (!locals.user) redirect(303, `/signin?next=${encodeURIComponent(url.pathname)}`);
	if (locals.user.role === 'auditor')
		error(403, 'Ladder is for client users and their consultants.');
	return { user: { name: locals.user.name, role: locals.user.role } };
};
