import { redirect } from '@sveltejs/kit';
import { newSurveySchema } from '$lib/schemas/desk-surveys';
import { createSurvey } from '$lib/server/desk/survey-changes';
import { assignablePeople, siteChoices } from '$lib/server/desk/surveys';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole } from '$lib/server/policy';
import type { Actions, PageServerLoad } from './$types';

const KEEP = ['siteId', 'name', 'startsOn', 'endsOn', 'auditorIds'];

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	const [sites, people] = await Promise.all([
		siteChoices(user.firmId),
		assignablePeople(user.firmId)
	]);
	// Only one of the firm's own sites is preselected; any other id is ignored.
	const asked = event.url.searchParams.get('site');
	const site = sites.find((s) => s.id === asked)?.id ?? '';
	return { sites, people, site };
};

export const actions: Actions = {
	default: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const form = await parseForm(event.request, newSurveySchema, KEEP, {
			nested: true,
			lists: ['auditorIds']
		});
		if (!form.ok) return form.failure;
		const outcome = await createSurvey(user, form.data);
		if (!outcome.ok) {
			const { siteId, name, startsOn, endsOn, auditorIds } = form.data;
			return formProblem(400, outcome.message, {
				values: { siteId, name, startsOn, endsOn, auditorIds },
				errors: outcome.field ? { [outcome.field]: outcome.message } : {}
			});
		}
		redirect(303, `/desk/surveys/${outcome.id}`);
	}
};
