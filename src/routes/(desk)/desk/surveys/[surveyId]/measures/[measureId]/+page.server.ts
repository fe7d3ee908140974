import { error, redirect } from '@sveltejs/kit';
import { readNestedForm } from '$lib/server/forms';
import {
	deleteMeasureForm,
	measureIdOk,
	measurePage,
	membersForm,
	updateMeasureForm
} from '$lib/server/measures/desk';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

/** One measure: its findings, extra costs, totals, payback, NPV and IRR. */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'read');
	if (!measureIdOk(event.params.measureId)) error(404, 'Not found.');
	const page = await measurePage(user.id, survey.id, event.params.measureId);
	if (!page) error(404, 'Not found.');
	return page;
};

async function writer(event: RequestEvent) {
	const user = requireRole(event, 'survey.manage');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'write');
	const measureId = event.params.measureId ?? '';
	if (!measureIdOk(measureId)) error(404, 'Not found.');
	const page = await measurePage(user.id, survey.id, measureId);
	if (!page) error(404, 'Not found.');
	const t = { firmId: user.firmId, actorId: user.id, surveyId: survey.id };
	const fields = await readNestedForm(event.request, { lists: ['findingIds'] });
	return { t, measureId, currency: page.survey.currency, fields };
}

const answer = <T extends object>(out: T) => {
	if ('missing' in out) error(404, 'Not found.');
	return out;
};

export const actions: Actions = {
	update: async (event) => {
		const { t, measureId, currency, fields } = await writer(event);
		return answer(await updateMeasureForm(t, currency, measureId, fields));
	},
	remove: async (event) => {
		const { t, measureId, fields } = await writer(event);
		return answer(await membersForm(t, measureId, 'remove', fields));
	},
	delete: async (event) => {
		const { t, measureId } = await writer(event);
		const out = answer(await deleteMeasureForm(t, measureId));
		if ('deleted' in out) redirect(303, `/desk/surveys/${t.surveyId}/measures`);
		return out;
	}
};
