import { error } from '@sveltejs/kit';
import { publishFormSchema } from '$lib/schemas/publish';
import { mailLinkOrigin } from '$lib/server/auth/origin';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { openCorrection, publishSurvey } from '$lib/server/publish/publish';
import { publishPage } from '$lib/server/publish/revisions';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

/** Publishing a survey to its client: readiness, revisions, who is told (docs/publishing.md). */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'read');
	const page = await publishPage(user, survey.id);
	if (!page) error(404, 'Not found.');
	return { ...page, mayPublish: user.role === 'admin' || user.role === 'consultant' };
};

async function writer(event: RequestEvent) {
	const user = requireRole(event, 'survey.manage');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'write');
	return { user, surveyId: survey.id };
}

/** Where the e-mail's link points; null when this server has no public URL to give. */
function origin(url: URL): string | null {
	try {
		return mailLinkOrigin(url);
	} catch {
		return null;
	}
}

export const actions: Actions = {
	publish: async (event) => {
		const { user, surveyId } = await writer(event);
		const form = await parseForm(event.request, publishFormSchema, ['note']);
		if (!form.ok) return form.failure;
		const outcome = await publishSurvey(user, surveyId, {
			note: form.data.note,
			origin: origin(event.url)
		});
		if (!outcome.ok) {
			return formProblem(400, outcome.message, {
				values: form.fields,
				errors: outcome.field === 'note' ? { note: outcome.message } : {}
			});
		}
		return { action: 'publish', revision: outcome.revision, mail: outcome.mail };
	},
	correct: async (event) => {
		const { user, surveyId } = await writer(event);
		const outcome = await openCorrection(user, surveyId);
		if (!outcome.ok) return formProblem(400, outcome.message);
		return { action: 'correct', revision: outcome.revision };
	}
};
