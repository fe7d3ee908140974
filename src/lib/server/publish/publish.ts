/**
 * Publishing a survey to its client company and opening a correction (docs/publishing.md).
 *
 * `publishSurvey`: one transaction that locks the survey row, checks it may be published
 * (readiness.ts), freezes its cost basis, writes the revision with its totals and the snapshot
 * of every live finding (INSERT … SELECT), sets the survey `published` with a new version and
 * change_seq (devices pull that it no longer records; the firm's counter moves, so kept views
 * refresh) and writes the audit row. The client's users are told by e-mail after the commit: a
 * message that fails to send never undoes the publication, it is counted on the revision and
 * said on the page.
 *
 * `openCorrection`: a published survey goes back to `in-review` as the next revision in
 * progress; the client keeps seeing the last published revision's frozen figures until the
 * correction is published with its note.
 */
import { and, count, eq, isNull, max, sql } from 'drizzle-orm';
import { recordChange } from '../audit';
import { db as appDb } from '../db';
import { findingConflicts, findings, surveyRevisions, surveys } from '../db/schema';
import type { Db, Tx } from '../db/types';
import { surveyPricing } from '../desk/findings-query';
import { freezeSurveyBasis } from '../pricing/cost-basis';
import { bumpSurvey, lockSurvey } from '../survey-row';
import { notifyClient, type Notified } from './notify';
import { publishProblem, type Problem } from './readiness';
import { writeRevision } from './revision-write';

export interface Actor {
	id: string;
	firmId: string;
}

export type PublishOutcome =
	{ ok: true; revision: number; findings: number; mail: Notified } | ({ ok: false } & Problem);

export type CorrectionOutcome =
	{ ok: true; revision: number } | { ok: false; message: string; field: 'form' };

class Refused extends Error {
	constructor(readonly problem: Problem) {
		super(problem.message);
	}
}

async function lastRevision(tx: Tx, surveyId: string): Promise<number> {
	const [r] = await tx
		.select({ n: max(surveyRevisions.number) })
		.from(surveyRevisions)
		.where(eq(surveyRevisions.surveyId, surveyId));
	return Number(r?.n ?? 0);
}

async function readiness(tx: Tx, surveyId: string) {
	const [[f], [c]] = await Promise.all([
		tx
			.select({
				all: count(),
				unreviewed: sql<string | number | null>`SUM(${findings.reviewedAt} IS NULL)`
			})
			.from(findings)
			.where(and(eq(findings.surveyId, surveyId), isNull(findings.deletedAt))),
		tx
			.select({ n: count() })
			.from(findingConflicts)
			.where(and(eq(findingConflicts.surveyId, surveyId), isNull(findingConflicts.resolvedAt)))
	]);
	return {
		findings: Number(f?.all ?? 0),
		unreviewed: Number(f?.unreviewed ?? 0),
		conflicts: Number(c?.n ?? 0)
	};
}

/** Publishes the survey (revision n + 1) and tells the client's users; see the module note. */
export async function publishSurvey(
	actor: Actor,
	surveyId: string,
	input: { note: string; origin: string | null },
	db: Db = appDb
): Promise<PublishOutcome> {
	let done: { revision: number; revisionId: string; findings: number; siteId: string };
	try {
		done = await db.transaction(async (tx) => {
			const row = await lockSurvey(tx, actor.firmId, surveyId);
			if (!row) throw new Refused({ message: 'Not found.', field: 'form' });
			const nextRevision = (await lastRevision(tx, row.id)) + 1;
			const pricing = await surveyPricing(tx, row.id);
			const note = input.note.trim();
			const problem = publishProblem({
				stage: row.status,
				...(await readiness(tx, row.id)),
				basisId: pricing?.basisId ?? null,
				nextRevision,
				note
			});
			if (problem) throw new Refused(problem);
			const basisId = (await freezeSurveyBasis(tx, row.id))!;
			const now = new Date();
			const { revisionId, totals, copied } = await writeRevision(tx, {
				surveyId: row.id,
				number: nextRevision,
				basisId,
				currency: pricing!.currency,
				actorId: actor.id,
				note: note === '' ? null : note,
				at: now
			});
			await tx
				.update(surveys)
				.set({
					status: 'published',
					publishedAt: now,
					...(await bumpSurvey(tx, actor.firmId))
				})
				.where(eq(surveys.id, row.id));
			await recordChange(tx, {
				firmId: actor.firmId,
				actorId: actor.id,
				entity: 'survey',
				entityId: row.id,
				action: 'publish',
				before: { stage: row.status, publishedAt: row.publishedAt, costBasisId: row.costBasisId },
				after: {
					stage: 'published',
					revision: nextRevision,
					revisionId,
					note: note === '' ? null : note,
					costBasisId: basisId,
					findings: copied,
					costMinor: totals.costMinor
				}
			});
			return { revision: nextRevision, revisionId, findings: copied, siteId: row.siteId };
		});
	} catch (e) {
		if (e instanceof Refused) return { ok: false, ...e.problem };
		throw e;
	}
	const mail = await notifyClient(db, {
		firmId: actor.firmId,
		surveyId,
		revisionId: done.revisionId,
		revision: done.revision,
		origin: input.origin
	});
	return { ok: true, revision: done.revision, findings: done.findings, mail };
}

/** Opens a correction of a published survey: back to review as revision n + 1 in progress. */
export async function openCorrection(
	actor: Actor,
	surveyId: string,
	db: Db = appDb
): Promise<CorrectionOutcome> {
	return db.transaction(async (tx) => {
		const row = await lockSurvey(tx, actor.firmId, surveyId);
		if (!row) return { ok: false as const, message: 'Not found.', field: 'form' as const };
		if (row.status !== 'published') {
			return {
				ok: false as const,
				field: 'form' as const,
				message:
					row.status === 'closed'
						? 'This survey is closed: a closed survey takes no corrections.'
						: 'Only a published survey takes a correction; this one is not published now.'
			};
		}
		const published = await lastRevision(tx, row.id);
		await tx
			.update(surveys)
			.set({
				status: 'in-review',
				...(await bumpSurvey(tx, actor.firmId))
			})
			.where(eq(surveys.id, row.id));
		await recordChange(tx, {
			firmId: actor.firmId,
			actorId: actor.id,
			entity: 'survey',
			entityId: row.id,
			action: 'open-correction',
			before: { stage: row.status, revision: published },
			after: { stage: 'in-review', revisionInProgress: published + 1 }
		});
		return { ok: true as const, revision: published + 1 };
	});
}
