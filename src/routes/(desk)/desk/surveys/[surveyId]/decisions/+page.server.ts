import { error } from '@sveltejs/kit';
import { answerFormSchema } from '$lib/schemas/decisions';
import { answerComment, deskDecisionsPage } from '$lib/server/decisions/desk';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import type { Actions, PageServerLoad } from './$types';

/**
 * The client's decisions and comments on one survey (docs/decisions.md), for the firm's admins
 * and consultants; other firms' ids 404, auditors and clients 403. Consultants answer here.
 */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'read');
	const page = await deskDecisionsPage(survey.id);
	if (!page) error(404, 'Not found.');
	return page;
};

export const actions: Actions = {
	answer: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const survey = await requireSurveyAccess(user, event.params.surveyId, 'write');
		const form = await parseForm(event.request, answerFormSchema, ['body', 'kind', 'itemId']);
		if (!form.ok) return form.failure;
		const { kind, itemId, body } = form.data;
		const outcome = await answerComment(user, survey.id, { kind, id: itemId }, body);
		if (!outcome.ok) {
			if (outcome.status === 404) error(404, outcome.message);
			return formProblem(outcome.status, outcome.message, { values: form.fields });
		}
		return { action: 'answer', itemId, done: 'Your answer is on the client’s page.' };
	}
};
