import type { Role } from '$lib/schemas/roles';

/** How roles read in sentences and lists. */
export const roleNames: Record<Role, { name: string; article: string; does: string }> = {
	admin: {
		name: 'firm admin',
		article: 'a',
		does: 'People, roles and firm settings; all survey work'
	},
	consultant: {
		name: 'consultant',
		article: 'a',
		does: 'Sites, surveys, review, pricing and publishing in Desk'
	},
	auditor: { name: 'field auditor', article: 'a', does: 'Records findings on assigned surveys' },
	client: { name: 'client user', article: 'a', does: 'Sees what is published to their company' }
};
