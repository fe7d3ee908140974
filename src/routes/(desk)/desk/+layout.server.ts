import { mailboxAvailable } from '$lib/server/mail/dev-mailbox';
import { requireRole, roleCan } from '$lib/server/policy';
import type { LayoutServerLoad } from './$types';

export const load: LayoutServerLoad = (event) => {
	const user = requireRole(event, 'desk.open');
	return {
		user: { name: user.name, role: user.role },
		nav: {
			people: roleCan(user.role, 'people.view'),
			mailbox: roleCan(user.role, 'mailbox.read') && mailboxAvailable()
		}
	};
};
