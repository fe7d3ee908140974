/**
 * The Ladder's item pages, `/ladder/findings/[findingId]` and `/ladder/measures/[measureId]`
 * (docs/decisions.md): one load and two actions shared by both. The policy decides per item
 * (requireLadderItem); the writers check again inside their transaction.
 */
import { error, type RequestEvent } from '@sveltejs/kit';
import {
	commentFormSchema,
	DECISION_LABELS,
	decisionFormSchema,
	type ItemKind
} from '../../schemas/decisions';
import { db } from '../db';
import { formProblem, parseForm } from '../forms';
import { requireLadderItem, requireRole } from '../policy';
import { ladderItemPage } from './item';
import { addComment, recordDecision, type WriteOutcome } from './write';

type ItemEvent = Pick<RequestEvent, 'locals' | 'url' | 'request' | 'route' | 'params'>;

function refOf(event: ItemEvent, kind: ItemKind) {
	const id = kind === 'finding' ? event.params.findingId : event.params.measureId;
	return { kind, id: id ?? '' };
}

export async function loadItem(event: ItemEvent, kind: ItemKind) {
	const user = requireRole(event, 'ladder.open');
	const facts = await requireLadderItem(user, refOf(event, kind), 'read');
	const page = await ladderItemPage(db, user, facts);
	if (!page) error(404, 'Not found.');
	return { ...page, mayDecide: facts.access === 'write' };
}

/** A refusal from a writer: hidden is 404 as on the page; the rest say why, nothing written. */
function refused(outcome: Extract<WriteOutcome, { ok: false }>, values: Record<string, string>) {
	if (outcome.status === 404) error(404, outcome.message);
	return formProblem(outcome.status, outcome.message, {
		values,
		errors: outcome.field === 'date' ? { date: outcome.message } : {}
	});
}

export function itemActions(kind: ItemKind) {
	return {
		decide: async (event: ItemEvent) => {
			const user = requireRole(event, 'survey.decide');
			const ref = refOf(event, kind);
			await requireLadderItem(user, ref, 'write');
			const form = await parseForm(event.request, decisionFormSchema, [
				'decision',
				'date',
				'who',
				'reason',
				'comment'
			]);
			if (!form.ok) return form.failure;
			const outcome = await recordDecision(db, user, ref, form.data);
			if (!outcome.ok) return refused(outcome, form.fields);
			return { action: 'decide', done: `Saved: ${DECISION_LABELS[form.data.decision]}.` };
		},
		comment: async (event: ItemEvent) => {
			const user = requireRole(event, 'survey.decide');
			const ref = refOf(event, kind);
			await requireLadderItem(user, ref, 'write');
			const form = await parseForm(event.request, commentFormSchema, ['body']);
			if (!form.ok) return form.failure;
			const outcome = await addComment(db, user, ref, form.data.body);
			if (!outcome.ok) return refused(outcome, form.fields);
			return { action: 'comment', done: 'Your comment is sent to your consultant.' };
		}
	};
}
