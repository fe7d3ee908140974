import { clientFormSchema } from '$lib/schemas/desk-sites';
import { createClient, firmClientList } from '$lib/server/desk/clients';
import { parseForm } from '$lib/server/forms';
import { requireRole } from '$lib/server/policy';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	return { clients: await firmClientList(user) };
};

export const actions: Actions = {
	create: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const form = await parseForm(event.request, clientFormSchema, [
			'name',
			'contactEmail',
			'notes'
		]);
		if (!form.ok) return form.failure;
		const id = await createClient(user, form.data);
		return { created: { id, name: form.data.name } };
	}
};
