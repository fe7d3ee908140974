/**
 * The Desk's page of a survey's decisions (docs/decisions.md): every finding and measure the
 * client decided on or commented on, latest activity first, each with its current decision,
 * its history and its comment thread, and whether the client's last word waits for an answer;
 * with the count of current decisions of each kind. The caller has checked the survey is the
 * firm's (requireSurveyAccess).
 */
import { and, desc, eq, inArray } from 'drizzle-orm';
import { DECISIONS, type Decision, type ItemKind, type ItemRef } from '../../schemas/decisions';
import {
	assets,
	findings,
	measures,
	surveyRevisionFindings as S,
	surveyRevisionMeasures,
	surveyRevisions
} from '../db/schema';
import { db as appDb } from '../db';
import type { Executor } from '../db/types';
import { conditionWords, kindWords } from '../finding-words';
import { surveyNames } from '../publish/revisions';
import { surveyActivity, type CommentEntry, type DecisionEntry } from './read';
import { addComment, type DecisionActor } from './write';

export interface DeskItem {
	kind: ItemKind;
	id: string;
	/** The finding or measure in words ("Trap test DF-01 · Failed open · Dryer hall"). */
	title: string;
	detail: string | null;
	current: DecisionEntry | null;
	history: DecisionEntry[];
	comments: CommentEntry[];
	/** The last comment is the client's: it waits for an answer. */
	awaitingAnswer: boolean;
	lastActivity: Date;
}

interface Words {
	kind: ItemKind;
	title: string;
	detail: string | null;
}

/** Words for the items: from the last revision's snapshot, else the live rows. */
export async function itemWords(db: Executor, surveyId: string, ids: string[]) {
	const words = new Map<string, Words>();
	if (ids.length === 0) return words;
	const [revision] = await db
		.select({ id: surveyRevisions.id })
		.from(surveyRevisions)
		.where(eq(surveyRevisions.surveyId, surveyId))
		.orderBy(desc(surveyRevisions.number))
		.limit(1);
	const finding = (r: {
		id: string;
		kind: string;
		tag: string | null;
		condition: string | null;
		location: string | null;
	}) =>
		words.set(r.id, {
			kind: 'finding',
			title: [kindWords(r.kind), r.tag].filter(Boolean).join(' '),
			detail: [conditionWords(r.condition), r.location].filter(Boolean).join(' · ') || null
		});
	if (revision) {
		const [found, jobs] = await Promise.all([
			db
				.select({
					id: S.findingId,
					kind: S.kind,
					tag: S.tag,
					condition: S.condition,
					location: S.location
				})
				.from(S)
				.where(and(eq(S.revisionId, revision.id), inArray(S.findingId, ids))),
			db
				.select({ id: surveyRevisionMeasures.measureId, name: surveyRevisionMeasures.name })
				.from(surveyRevisionMeasures)
				.where(
					and(
						eq(surveyRevisionMeasures.revisionId, revision.id),
						inArray(surveyRevisionMeasures.measureId, ids)
					)
				)
		]);
		found.forEach(finding);
		for (const j of jobs) words.set(j.id, { kind: 'measure', title: j.name, detail: 'A job' });
	}
	const missing = ids.filter((id) => !words.has(id));
	if (missing.length > 0) {
		const [found, jobs] = await Promise.all([
			db
				.select({
					id: findings.id,
					kind: findings.kind,
					tag: assets.tag,
					condition: findings.condition,
					location: findings.location
				})
				.from(findings)
				.leftJoin(assets, eq(assets.id, findings.assetId))
				.where(and(eq(findings.surveyId, surveyId), inArray(findings.id, missing))),
			db
				.select({ id: measures.id, name: measures.name })
				.from(measures)
				.where(and(eq(measures.surveyId, surveyId), inArray(measures.id, missing)))
		]);
		found.forEach(finding);
		for (const j of jobs) words.set(j.id, { kind: 'measure', title: j.name, detail: 'A job' });
	}
	return words;
}

export async function deskDecisionsPage(surveyId: string, db: Executor = appDb) {
	const [survey, activity] = await Promise.all([
		surveyNames(db, surveyId),
		surveyActivity(db, surveyId)
	]);
	if (!survey) return null;
	const ids = [...new Set([...activity.history.keys(), ...activity.comments.keys()])];
	const words = await itemWords(db, surveyId, ids);
	const counts = Object.fromEntries(DECISIONS.map((d) => [d, 0])) as Record<Decision, number>;
	const items: DeskItem[] = ids.flatMap((id) => {
		const w = words.get(id);
		if (!w) return [];
		const history = activity.history.get(id) ?? [];
		const thread = activity.comments.get(id) ?? [];
		const current = history.find((d) => d.current) ?? null;
		if (current) counts[current.decision]++;
		const last = thread.at(-1);
		const times = [...history.map((d) => d.at.getTime()), ...thread.map((c) => c.at.getTime())];
		return [
			{
				...w,
				id,
				current,
				history,
				comments: thread,
				awaitingAnswer: last !== undefined && !last.fromFirm,
				lastActivity: new Date(Math.max(...times))
			}
		];
	});
	items.sort(
		(a, b) => b.lastActivity.getTime() - a.lastActivity.getTime() || (a.id < b.id ? -1 : 1)
	);
	return { survey, items, counts, awaiting: items.filter((i) => i.awaitingAnswer).length };
}

/** A consultant's or admin's answer, on an item of this survey only (else 404, nothing written). */
export function answerComment(actor: DecisionActor, surveyId: string, ref: ItemRef, body: string) {
	return addComment(appDb, actor, ref, body, { surveyId });
}
