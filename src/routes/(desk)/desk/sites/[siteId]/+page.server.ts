import { siteFormSchema, siteFormValues } from '$lib/schemas/desk-sites';
import { personUnits, saveSite, siteDetail } from '$lib/server/desk/sites';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole, requireSiteAccess } from '$lib/server/policy';
import { error } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';

const FIELDS = ['name', 'address', 'elevation', 'atmosphericPressure', 'unitSystem', 'currency'];

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
	const units = await personUnits(user);
	const { site, surveys } = await siteDetail(user, id);
	if (!site) error(404, 'Not found.');
	return { site, surveys, units, values: siteFormValues(site, units) };
};

export const actions: Actions = {
	save: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
		const form = await parseForm(event.request, siteFormSchema(await personUnits(user)), FIELDS);
		if (!form.ok) return form.failure;
		const outcome = await saveSite(user, id, form.data);
		if (outcome.kind === 'currency-locked') {
			const message = `This site's prices are in ${outcome.currency}. To price it in ${form.data.currency}, save a new cost basis in ${form.data.currency} (on the cost basis page): changing the code here would re-label the old prices without converting them.`;
			return formProblem(400, message, {
				values: form.fields,
				errors: { currency: message }
			});
		}
		return { saved: { changed: outcome.changed, recomputed: outcome.recomputed } };
	}
};
