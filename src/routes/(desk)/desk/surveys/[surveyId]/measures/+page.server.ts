import { error, redirect } from '@sveltejs/kit';
import { applyLibraryForm } from '$lib/server/costs/desk';
import { readForm, readNestedForm } from '$lib/server/forms';
import { createMeasureForm, measuresPage } from '$lib/server/measures/desk';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

/** A survey's measures with their sums, and pricing its repairs from the library. */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'read');
	const page = await measuresPage(user.id, survey.id);
	if (!page) error(404, 'Not found.');
	return page;
};

async function writer(event: RequestEvent) {
	const user = requireRole(event, 'survey.manage');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'write');
	const page = await measuresPage(user.id, survey.id);
	if (!page) error(404, 'Not found.');
	return { user, surveyId: survey.id, currency: page.survey.currency };
}

export const actions: Actions = {
	price: async (event) => {
		const { user, surveyId } = await writer(event);
		const out = await applyLibraryForm(user, surveyId, await readForm(event.request));
		if (!out) error(404, 'Not found.');
		return out;
	},
	create: async (event) => {
		const { user, surveyId, currency } = await writer(event);
		const fields = await readNestedForm(event.request, { lists: ['findingIds'] });
		const t = { firmId: user.firmId, actorId: user.id, surveyId };
		const out = await createMeasureForm(t, currency, fields);
		if ('missing' in out) error(404, 'Not found.');
		if ('created' in out) redirect(303, `/desk/surveys/${surveyId}/measures/${out.created}`);
		return out;
	}
};
