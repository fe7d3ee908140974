import { error } from '@sveltejs/kit';
import { uuidSchema } from '$lib/schemas/common';
import { conflictFormSchema, mergeFormSchema } from '$lib/schemas/desk-finding';
import { DESK_LOCKED_MESSAGE } from '$lib/server/publish/lock';
import type { ResolutionKind, ResolveOutcome } from '$lib/server/desk/conflicts';
import { MOVED_MESSAGE } from '$lib/server/desk/finding-edit';
import { openConflict, settleConflict } from '$lib/server/desk/finding-pages';
import { formProblem, parseForm } from '$lib/server/forms';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import type { Actions, PageServerLoad, RequestEvent } from './$types';

const hide = (): never => error(404, 'Not found.');

export const load: PageServerLoad = async (event) => {
	const user = requireRole(event, 'desk.open');
	const access = await requireSurveyAccess(user, event.params.surveyId, 'read');
	if (!uuidSchema.safeParse(event.params.conflictId).success) hide();
	return (await openConflict(user, access.id, event.params.conflictId)) ?? hide();
};

async function writer(event: RequestEvent) {
	const user = requireRole(event, 'survey.manage');
	const access = await requireSurveyAccess(user, event.params.surveyId, 'write');
	if (!uuidSchema.safeParse(event.params.conflictId).success) hide();
	return { user, surveyId: access.id, conflictId: event.params.conflictId };
}

const DONE: Record<ResolutionKind, string> = {
	'kept-server': 'Settled: the server’s finding stays, and the device’s edit is kept on record.',
	'kept-device': 'Settled: the device’s edit is now the finding’s next version.',
	merged: 'Settled: the merged finding is its next version.'
};

function answer(how: ResolutionKind, outcome: ResolveOutcome, choices: Record<string, string>) {
	switch (outcome.kind) {
		case 'resolved':
			return { done: DONE[how], version: outcome.version };
		case 'missing':
			return hide();
		case 'settled':
			return formProblem(409, 'This conflict was already settled by someone else.');
		case 'moved':
			return formProblem(409, MOVED_MESSAGE, { values: choices });
		case 'frozen':
			return formProblem(409, DESK_LOCKED_MESSAGE, { values: choices });
		case 'refused':
			return formProblem(400, outcome.message, { values: choices, errors: outcome.errors });
	}
}

async function keep(event: RequestEvent, how: 'kept-server' | 'kept-device') {
	const { user, surveyId, conflictId } = await writer(event);
	const form = await parseForm(event.request, conflictFormSchema);
	if (!form.ok) return form.failure;
	const outcome = await settleConflict(user, {
		surveyId,
		conflictId,
		openedVersion: form.data.version,
		how
	});
	return answer(how, outcome, {});
}

export const actions: Actions = {
	keepServer: (event) => keep(event, 'kept-server'),
	keepDevice: (event) => keep(event, 'kept-device'),
	merge: async (event) => {
		const { user, surveyId, conflictId } = await writer(event);
		const form = await parseForm(event.request, mergeFormSchema, [], { nested: true });
		if (!form.ok) return form.failure;
		const choices = form.data.choice;
		const outcome = await settleConflict(user, {
			surveyId,
			conflictId,
			openedVersion: form.data.version,
			how: 'merged',
			choices
		});
		const kept = Object.fromEntries(Object.entries(choices).map(([k, v]) => [`choice.${k}`, v]));
		return answer('merged', outcome, kept);
	}
};
