import { error } from '@sveltejs/kit';
import { bulkReviewSchema } from '$lib/schemas/desk-findings';
import { reviewFindings, tableFacts } from '$lib/server/desk/findings-table';
import { formProblem, parseForm, readNestedForm } from '$lib/server/forms';
import { addToMeasureForm, measureChoices } from '$lib/server/measures/desk';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { DESK_LOCKED_MESSAGE } from '$lib/server/publish/lock';
import type { Actions, PageServerLoad } from './$types';

/** The table's frame: its rows come from GET /api/surveys/[id]/findings, fetched by the page. */
export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'survey.manage');
	const survey = await requireSurveyAccess(user, event.params.surveyId, 'write');
	const [facts, measures] = await Promise.all([
		tableFacts(user, survey.id),
		measureChoices(survey.id)
	]);
	if (!facts) error(404, 'Not found.');
	return { ...facts, measures };
};

export const actions: Actions = {
	/** Marks the ticked findings checked (reviewed=yes) or not checked (reviewed=no), all or none. */
	review: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const survey = await requireSurveyAccess(user, event.params.surveyId, 'write');
		const form = await parseForm(event.request, bulkReviewSchema, ['findingIds', 'reviewed'], {
			nested: true,
			lists: ['findingIds']
		});
		if (!form.ok) return form.failure;
		const reviewed = form.data.reviewed === 'yes';
		const outcome = await reviewFindings({
			firmId: user.firmId,
			actorId: user.id,
			surveyId: survey.id,
			findingIds: form.data.findingIds,
			reviewed
		});
		if (!outcome.ok && outcome.frozen) return formProblem(409, DESK_LOCKED_MESSAGE);
		if (!outcome.ok) {
			return formProblem(
				400,
				`${outcome.unknown.length === 1 ? 'One of the ticked findings is' : `${outcome.unknown.length} of the ticked findings are`} not in this survey (or was deleted). Nothing was changed.`,
				{ values: { findingIds: form.data.findingIds, reviewed: form.data.reviewed } }
			);
		}
		return { reviewed, changed: outcome.changed, unchanged: outcome.unchanged };
	},

	/** Puts the ticked findings into one of the survey's measures (moving them from any other). */
	addToMeasure: async (event) => {
		const user = requireRole(event, 'survey.manage');
		const survey = await requireSurveyAccess(user, event.params.surveyId, 'write');
		const fields = await readNestedForm(event.request, { lists: ['findingIds'] });
		const t = { firmId: user.firmId, actorId: user.id, surveyId: survey.id };
		return addToMeasureForm(t, fields);
	}
};
