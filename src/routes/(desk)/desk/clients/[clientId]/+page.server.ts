import { clientFormSchema, siteFormSchema, siteFormValues } from '$lib/schemas/desk-sites';
import { requireClient, saveClient } from '$lib/server/desk/clients';
import { addSite, clientSites, firmCurrency, personUnits } from '$lib/server/desk/sites';
import { parseForm } from '$lib/server/forms';
import { requireRole } from '$lib/server/policy';
import type { Actions, PageServerLoad } from './$types';

// `which` (a hidden field) tells the page which of its two forms a refusal belongs to.
const SITE_FIELDS = [
	'which',
	'name',
	'address',
	'elevation',
	'atmosphericPressure',
	'unitSystem',
	'currency'
];

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	const client = await requireClient(user, event.params.clientId);
	const units = await personUnits(user);
	return {
		client,
		units,
		sites: await clientSites(user, client.id),
		// A new site starts in the person's units and the firm's default currency.
		newSite: siteFormValues(
			{
				name: '',
				address: null,
				elevation: null,
				atmosphericPressure: null,
				unitSystem: units,
				currency: await firmCurrency(user)
			},
			units
		)
	};
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const client = await requireClient(user, event.params.clientId);
		const form = await parseForm(event.request, clientFormSchema, [
			'which',
			'name',
			'contactEmail',
			'notes'
		]);
		if (!form.ok) return form.failure;
		const changed = await saveClient(user, client.id, form.data);
		return { saved: changed };
	},
	addSite: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const client = await requireClient(user, event.params.clientId);
		const schema = siteFormSchema(await personUnits(user));
		const form = await parseForm(event.request, schema, SITE_FIELDS);
		if (!form.ok) return form.failure;
		const id = await addSite(user, client.id, form.data);
		return { siteAdded: { id, name: form.data.name } };
	}
};
