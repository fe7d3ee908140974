import { requireRole } from '$lib/server/policy';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = (event) => {
	const user = requireRole(event, 'ladder.open');
	return { user: { name: user.name, role: user.role } };
};
