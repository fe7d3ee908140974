import { error, fail } from '@sveltejs/kit';
import { uuidSchema } from '$lib/schemas/common';
import { findingCostFormSchema } from '$lib/schemas/costs';
import { findingEditFormSchema, reviewFormSchema } from '$lib/schemas/desk-finding';
import { findingCostForm } from '$lib/server/costs/desk';
import { MOVED_MESSAGE } from '$lib/server/desk/finding-edit';
import { openFinding, reviewFinding, saveFindingEdit } from '$lib/server/desk/finding-pages';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { DESK_LOCKED_MESSAGE } from '$lib/server/publish/lock';
import type { Actions, PageServerLoad, RequestEvent } from './$types';
import { typedBack } from './typed-back';

const hide = (): never => error(404, 'Not found.');

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const access = await requireSurveyAccess(user, event.params.surveyId, 'read');
	if (!uuidSchema.safeParse(event.params.findingId).success) hide();
	return (await openFinding(user, access.id, event.params.findingId)) ?? hide();
};

/** The person and the survey an action changes (403 read-only, 404 hidden or another firm's). */
async function writer(event: RequestEvent) {
	const user = requireRole(event, 'survey.manage');
	const access = await requireSurveyAccess(user, event.params.surveyId, 'write');
	if (!uuidSchema.safeParse(event.params.findingId).success) hide();
	return { user, surveyId: access.id, findingId: event.params.findingId };
}

export const actions: Actions = {
	edit: async (event) => {
		const { user, surveyId, findingId } = await writer(event);
		const form = await parseForm(event.request, findingEditFormSchema, [], { nested: true });
		if (!form.ok) {
			// Only the version or the repair cost can fail here; the rest is read below.
			const { errors, error: message } = form.failure.data;
			return fail(400, { action: 'edit', values: null, layers: null, errors, error: message });
		}
		const typed = typedBack(form.fields);
		const outcome = await saveFindingEdit(user, surveyId, findingId, form.data);
		switch (outcome.kind) {
			case 'written':
				return { action: 'edit', saved: outcome.version };
			case 'problems':
				return fail(400, {
					action: 'edit',
					...typed,
					errors: outcome.problems,
					error: 'Some fields need another look: see the messages beside them. Nothing was saved.'
				});
			case 'moved':
				return fail(409, { action: 'edit', ...typed, errors: {}, error: MOVED_MESSAGE });
			case 'misplaced':
				return fail(400, {
					action: 'edit',
					...typed,
					errors: { [outcome.field]: outcome.message },
					error: `${outcome.message}. Nothing was saved.`
				});
			case 'frozen':
				return fail(409, { action: 'edit', ...typed, errors: {}, error: DESK_LOCKED_MESSAGE });
			case 'missing':
				return hide();
		}
	},

	/** The repair cost and where it came from: the library, an edited figure or a quote. */
	cost: async (event) => {
		const { user, surveyId, findingId } = await writer(event);
		const form = await parseForm(event.request, findingCostFormSchema, [
			'source',
			'amount',
			'note'
		]);
		if (!form.ok) return form.failure;
		const { source, amount, note } = form.data;
		const choice =
			source === 'edited' || source === 'quote' ? { source, amount, note } : { source };
		const target = { firmId: user.firmId, actorId: user.id, surveyId, findingId };
		const outcome = await findingCostForm(target, choice);
		if (outcome.kind === 'frozen') return formProblem(409, DESK_LOCKED_MESSAGE);
		if (outcome.kind === 'missing') return hide();
		if (outcome.kind === 'unmatched') {
			return formProblem(400, outcome.message, {
				values: form.fields,
				errors: { source: outcome.message }
			});
		}
		return { action: 'cost', costSaved: source };
	},

	review: async (event) => {
		const { user, surveyId, findingId } = await writer(event);
		const form = await parseForm(event.request, reviewFormSchema);
		if (!form.ok) return form.failure;
		const reviewed = form.data.reviewed === 'yes';
		const outcome = await reviewFinding(user, surveyId, findingId, reviewed);
		if (outcome === 'frozen') return formProblem(409, DESK_LOCKED_MESSAGE);
		if (outcome === 'missing') {
			return formProblem(404, 'This finding is not on the survey (or was deleted).');
		}
		return { action: 'review', reviewed };
	}
};
