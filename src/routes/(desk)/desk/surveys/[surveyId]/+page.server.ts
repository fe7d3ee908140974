import { error } from '@sveltejs/kit';
import {
	assignSchema,
	markReviewedSchema,
	stageMoveSchema,
	surveyDetailsSchema,
	unassignSchema
} from '$lib/schemas/desk-surveys';
import { SURVEY_STAGES, type SurveyStage } from '$lib/schemas/survey';
import {
	assign,
	markReviewed,
	moveStage,
	saveDetails,
	unassign,
	type Outcome
} from '$lib/server/desk/survey-changes';
import { nextStage, STAGE_MOVES } from '$lib/server/desk/survey-stage';
import { assignablePeople, surveyOverview } from '$lib/server/desk/surveys';
import { formProblem, parseForm, type KeptValue } from '$lib/server/forms';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const access = await requireSurveyAccess(user, event.params.surveyId, 'read');
	const [overview, people] = await Promise.all([
		surveyOverview(user.firmId, access.id),
		assignablePeople(user.firmId)
	]);
	if (!overview) error(404, 'Not found.');
	const stage = overview.survey.stage as SurveyStage;
	const known = SURVEY_STAGES.includes(stage);
	const assigned = new Set(overview.auditors.map((a) => a.id));
	return {
		...overview,
		// Every move the stage allows; one the facts refuse (back to planned with findings) is
		// still offered, and answered with the reason.
		moves: known ? STAGE_MOVES[stage].filter((to) => to !== 'published') : [],
		next: known ? nextStage(stage) : null,
		unassigned: people.filter((p) => !assigned.has(p.id))
	};
};

/** The person and the survey they may change (403 read-only, 404 hidden or another firm's). */
async function writer(event: RequestEvent) {
	const user = requireRole(event, 'survey.manage');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'write');
	return { user, surveyId: survey.id };
}

/** The outcome as the page shows it: a sentence, or a 400 with the message beside its field. */
function answer(action: string, outcome: Outcome, values: Record<string, KeptValue> = {}) {
	if (outcome.ok) return { action, done: outcome.message };
	return formProblem(400, outcome.message, {
		values,
		errors: outcome.field ? { [outcome.field]: outcome.message } : {}
	});
}

export const actions: Actions = {
	details: async (event) => {
		const { user, surveyId } = await writer(event);
		const form = await parseForm(event.request, surveyDetailsSchema, [
			'name',
			'startsOn',
			'endsOn'
		]);
		if (!form.ok) return form.failure;
		return answer('details', await saveDetails(user, surveyId, form.data), form.fields);
	},
	stage: async (event) => {
		const { user, surveyId } = await writer(event);
		const form = await parseForm(event.request, stageMoveSchema);
		if (!form.ok) return form.failure;
		return answer('stage', await moveStage(user, surveyId, form.data.stage));
	},
	assign: async (event) => {
		const { user, surveyId } = await writer(event);
		const form = await parseForm(event.request, assignSchema, ['auditorIds'], {
			nested: true,
			lists: ['auditorIds']
		});
		if (!form.ok) return form.failure;
		const outcome = await assign(user, surveyId, form.data.auditorIds);
		return answer('assign', outcome, { auditorIds: form.data.auditorIds });
	},
	unassign: async (event) => {
		const { user, surveyId } = await writer(event);
		const form = await parseForm(event.request, unassignSchema);
		if (!form.ok) return form.failure;
		return answer('unassign', await unassign(user, surveyId, form.data.userId));
	},
	markReviewed: async (event) => {
		const { user, surveyId } = await writer(event);
		const form = await parseForm(event.request, markReviewedSchema);
		if (!form.ok) return form.failure;
		return answer('markReviewed', await markReviewed(user, surveyId, form.data.mark));
	}
};
