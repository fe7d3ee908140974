/**
 * Writing a client's decision and the comments on a finding or measure (docs/decisions.md).
 * Each runs in one READ COMMITTED transaction that share-locks the survey row first (so no
 * publication or correction moves what the client is shown meanwhile), decides with the policy
 * on the facts it then reads, and writes the decision (superseding the current one), its
 * comment, the digest's outbox row and an audit row — or nothing at all, with the reason in
 * words. A decision or comment never touches a finding's or measure's figures.
 */
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import {
	DECISION_LABELS,
	decisionDateProblem,
	readerToday,
	type DecisionInput,
	type ItemRef
} from '../../schemas/decisions';
import type { Role } from '../../schemas/roles';
import { recordChange } from '../audit';
import { comments, decisionDigestOutbox, decisions } from '../db/schema';
import type { Db, Tx } from '../db/types';
import { ladderItemAccess, surveyAccess } from '../policy/decide';
import { withRetry } from '../sync/retry';
import { itemFacts, type ItemFacts } from './facts';

export interface DecisionActor {
	id: string;
	firmId: string;
	role: Role;
	clientCompanyId: string | null;
}

export type WriteOutcome =
	| { ok: true; id: string }
	/** 404: not theirs to see; 409: theirs, but not in the report they are shown; 400: input. */
	| { ok: false; status: 400 | 403 | 404 | 409; message: string; field?: 'date' | 'form' };

class Refused extends Error {
	constructor(readonly outcome: Extract<WriteOutcome, { ok: false }>) {
		super(outcome.message);
	}
}
const refuse = (outcome: Extract<WriteOutcome, { ok: false }>): never => {
	throw new Refused(outcome);
};

const what = (ref: ItemRef) => (ref.kind === 'finding' ? 'finding' : 'measure');

/** The client's view of the item, or the refusal: hidden, not published, not in the revision. */
function clientRefusal(actor: DecisionActor, f: ItemFacts | null, ref: ItemRef) {
	if (!f) return refuse({ ok: false, status: 404, message: 'Not found.' });
	const survey = {
		firmId: f.firmId,
		clientCompanyId: f.clientCompanyId,
		published: f.published,
		actorAssigned: false
	};
	if (ladderItemAccess(actor, { ...survey, shown: f.shown }) === 'write') return;
	if (actor.role === 'client' && surveyAccess(actor, survey) === 'read') {
		return refuse({
			ok: false,
			status: 409,
			message: `This ${what(ref)} is not in the report published to you, so it takes no decision or comment yet.`
		});
	}
	return refuse({ ok: false, status: 404, message: 'Not found.' });
}

async function run(db: Db, work: (tx: Tx) => Promise<string>): Promise<WriteOutcome> {
	try {
		const id = await withRetry(() => db.transaction(work, { isolationLevel: 'read committed' }));
		return { ok: true, id };
	} catch (e) {
		if (e instanceof Refused) return e.outcome;
		throw e;
	}
}

/** The digest's outbox row of a new decision or comment (./digest.ts), in its transaction. */
function queueForDigest(
	tx: Tx,
	f: ItemFacts,
	actor: DecisionActor,
	event: { decisionId: string } | { commentId: string },
	now: Date
) {
	return tx.insert(decisionDigestOutbox).values({
		firmId: f.firmId,
		surveyId: f.surveyId,
		...event,
		actorId: actor.id,
		createdAt: now
	});
}

const itemColumns = (ref: ItemRef) =>
	ref.kind === 'finding' ? { findingId: ref.id } : { measureId: ref.id };

/** What a decision says, for the audit row and the digest. */
export function decisionFields(input: DecisionInput) {
	return {
		decision: input.decision,
		scheduledFor: input.decision === 'scheduled' ? input.date : null,
		assignee: input.decision === 'scheduled' ? input.who : null,
		repairedOn: input.decision === 'repaired' ? input.date : null,
		reason: input.decision === 'declined' ? input.reason : null
	};
}

/**
 * A client's decision on a finding or measure they are shown; it becomes the item's current
 * decision and the one before stays in its history.
 */
export async function recordDecision(
	db: Db,
	actor: DecisionActor,
	ref: ItemRef,
	input: DecisionInput,
	now = new Date()
): Promise<WriteOutcome> {
	return run(db, async (tx) => {
		const facts = await itemFacts(tx, actor.firmId, ref, { lock: true });
		clientRefusal(actor, facts, ref);
		const f = facts!;
		const today = readerToday(input.today, now);
		const problem = decisionDateProblem(input, { today, publishedOn: f.publishedOn });
		if (problem) refuse({ ok: false, status: 400, message: problem, field: 'date' });

		const [before] = await tx
			.select()
			.from(decisions)
			.where(eq(decisions.currentItem, ref.id))
			.for('update');
		if (before) {
			await tx.update(decisions).set({ supersededAt: now }).where(eq(decisions.id, before.id));
		}
		const id = randomUUID();
		const fields = decisionFields(input);
		await tx.insert(decisions).values({
			id,
			surveyId: f.surveyId,
			...itemColumns(ref),
			...fields,
			decidedBy: actor.id,
			createdAt: now
		});
		if (input.comment !== null) {
			await tx.insert(comments).values({
				id: randomUUID(),
				surveyId: f.surveyId,
				...itemColumns(ref),
				decisionId: id,
				authorId: actor.id,
				body: input.comment,
				createdAt: now
			});
		}
		await queueForDigest(tx, f, actor, { decisionId: id }, now);
		await recordChange(tx, {
			firmId: f.firmId,
			actorId: actor.id,
			entity: ref.kind,
			entityId: ref.id,
			action: 'decide',
			before: before ? { decision: before.decision, decisionId: before.id } : null,
			after: {
				decisionId: id,
				...fields,
				words: DECISION_LABELS[input.decision],
				comment: input.comment !== null,
				revision: f.revision?.number ?? null
			}
		});
		return id;
	});
}

/**
 * A comment on a finding or measure: a client's on one they are shown; a consultant's or
 * admin's answer on any item of the firm's survey (the Desk's decisions page).
 */
export async function addComment(
	db: Db,
	actor: DecisionActor,
	ref: ItemRef,
	body: string,
	/** `surveyId`: the survey the Desk's page is about (an item of another survey: 404). */
	{ surveyId, now = new Date() }: { surveyId?: string; now?: Date } = {}
): Promise<WriteOutcome> {
	return run(db, async (tx) => {
		const facts = await itemFacts(tx, actor.firmId, ref, { lock: true });
		if (facts && surveyId !== undefined && facts.surveyId !== surveyId) {
			refuse({ ok: false, status: 404, message: 'Not found.' });
		}
		if (actor.role === 'client') clientRefusal(actor, facts, ref);
		else if (actor.role !== 'admin' && actor.role !== 'consultant') {
			refuse({ ok: false, status: 403, message: 'Your role does not allow this.' });
		} else if (!facts) refuse({ ok: false, status: 404, message: 'Not found.' });
		const f = facts!;
		const id = randomUUID();
		await tx.insert(comments).values({
			id,
			surveyId: f.surveyId,
			...itemColumns(ref),
			authorId: actor.id,
			body,
			createdAt: now
		});
		await queueForDigest(tx, f, actor, { commentId: id }, now);
		await recordChange(tx, {
			firmId: f.firmId,
			actorId: actor.id,
			entity: ref.kind,
			entityId: ref.id,
			action: 'comment',
			after: { commentId: id, characters: body.length }
		});
		return id;
	});
}
