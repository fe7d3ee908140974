import { headerFormSchema, headerFormValues } from '$lib/schemas/desk-headers';
import { headerIdSchema } from '$lib/schemas/desk-sites';
import { addHeader, retireHeader, siteHeaders, updateHeader } from '$lib/server/desk/headers';
import { personUnits, siteAtmosphereOf, siteDetail } from '$lib/server/desk/sites';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole, requireSiteAccess } from '$lib/server/policy';
import { error, type RequestEvent } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';

const FIELDS = [
	'headerId',
	'name',
	'pressure',
	'steam',
	'superheat',
	'temperature',
	'operatingHours'
];

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
	const [units, atmosphere, { site }, list] = await Promise.all([
		personUnits(user),
		siteAtmosphereOf(id),
		siteDetail(user, id),
		siteHeaders(id)
	]);
	if (!site) error(404, 'Not found.');
	return {
		site: { id: site.id, name: site.name },
		units,
		atmosphere,
		headers: list.map((h) => ({
			id: h.id,
			retired: h.retiredAt !== null,
			values: headerFormValues(h, units, atmosphere)
		}))
	};
};

/** The person, the site, and the header form read against the site's own atmosphere. */
async function headerForm(event: RequestEvent, withId: boolean) {
	const user = requireRole(event, 'survey.manage');
	const { id } = await requireSiteAccess(user, event.params.siteId ?? '', 'write');
	const schema = headerFormSchema(await personUnits(user), await siteAtmosphereOf(id), withId);
	return { user, siteId: id, form: await parseForm(event.request, schema, FIELDS) };
}

const duplicate = (fields: Record<string, string>, retired: boolean) => {
	const message = retired
		? `A retired header of this site is already called “${fields.name}”: choose another name.`
		: `This site already has a header called “${fields.name}”: choose another name.`;
	return formProblem(400, message, { values: fields, errors: { name: message } });
};

export const actions: Actions = {
	add: async (event) => {
		const { user, siteId, form } = await headerForm(event, false);
		if (!form.ok) return form.failure;
		const outcome = await addHeader(user, siteId, form.data);
		if (outcome.kind === 'duplicate') return duplicate(form.fields, outcome.retired);
		if (outcome.kind === 'missing') error(404, 'Not found.');
		return { headerAdded: form.data.name };
	},
	update: async (event) => {
		const { user, siteId, form } = await headerForm(event, true);
		if (!form.ok) return form.failure;
		const outcome = await updateHeader(user, siteId, form.data.headerId!, form.data);
		if (outcome.kind === 'duplicate') return duplicate(form.fields, outcome.retired);
		if (outcome.kind === 'missing') error(404, 'Not found.');
		return { headerSaved: { name: form.data.name, recomputed: outcome.recomputed } };
	},
	retire: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
		const form = await parseForm(event.request, headerIdSchema);
		if (!form.ok) return form.failure;
		if (!(await retireHeader(user, id, form.data.headerId))) error(404, 'Not found.');
		return { headerRetired: true };
	}
};
