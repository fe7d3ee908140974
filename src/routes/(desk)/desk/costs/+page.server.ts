import { error } from '@sveltejs/kit';
import { costsPage, retireEntryForm, saveEntryForm } from '$lib/server/costs/desk';
import { readForm } from '$lib/server/forms';
import { requireRole } from '$lib/server/policy';
import type { Actions, PageServerLoad } from './$types';

/** The firm's cost library (docs/costs.md): admins and consultants read and edit it. */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	return costsPage(user.firmId);
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, 'survey.manage');
		return saveEntryForm(user, await readForm(event.request));
	},
	retire: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const out = await retireEntryForm(user, await readForm(event.request));
		if (!out) error(404, 'Not found.');
		return out;
	}
};
