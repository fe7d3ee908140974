import { areaFormSchema, areaIdSchema, areaRenameSchema } from '$lib/schemas/desk-sites';
import {
	addArea,
	renameArea,
	retireArea,
	siteAreas,
	type AreaChange
} from '$lib/server/desk/areas';
import { siteDetail } from '$lib/server/desk/sites';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole, requireSiteAccess } from '$lib/server/policy';
import { error } from '@sveltejs/kit';
import type { Actions, PageServerLoad } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
	const [{ site }, areas] = await Promise.all([siteDetail(user, id), siteAreas(id)]);
	if (!site) error(404, 'Not found.');
	return {
		site: { id: site.id, name: site.name },
		areas: areas.map((a) => ({ id: a.id, name: a.name, retired: a.retiredAt !== null }))
	};
};

function answer(outcome: AreaChange, fields: Record<string, string>, done: object) {
	if (outcome.kind === 'missing') error(404, 'Not found.');
	if (outcome.kind === 'duplicate') {
		const message = outcome.retired
			? `A retired area of this site is already called “${fields.name}”: choose another name.`
			: `This site already has an area called “${fields.name}”: choose another name.`;
		return formProblem(400, message, { values: fields, errors: { name: message } });
	}
	return done;
}

export const actions: Actions = {
	add: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
		const form = await parseForm(event.request, areaFormSchema, ['areaId', 'name']);
		if (!form.ok) return form.failure;
		const outcome = await addArea(user, id, form.data.name);
		return answer(outcome, form.fields, { areaAdded: form.data.name });
	},
	rename: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
		const form = await parseForm(event.request, areaRenameSchema, ['areaId', 'name']);
		if (!form.ok) return form.failure;
		const outcome = await renameArea(user, id, form.data.areaId, form.data.name);
		return answer(outcome, form.fields, { areaRenamed: form.data.name });
	},
	retire: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const { id } = await requireSiteAccess(user, event.params.siteId, 'write');
		const form = await parseForm(event.request, areaIdSchema);
		if (!form.ok) return form.failure;
		if (!(await retireArea(user, id, form.data.areaId))) error(404, 'Not found.');
		return { areaRetired: true };
	}
};
