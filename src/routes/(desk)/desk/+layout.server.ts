import { error, redirect } from '@sveltejs/kit';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = ({ locals, url }) => {
	if (!locals.user) redirect(303, `/signin?next=${encodeURIComponent(url.pathname)}`);
	if (locals.user.role !== 'admin' && locals.user.role !== 'consultant') {
		error(403, 'Desk is for consultants and firm admins.');
	}
	return { user: { name: locals.user.name, role: locals.user.role } };
};
