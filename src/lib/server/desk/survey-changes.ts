/**
 * The Desk's changes to a survey: create it, its details, its stage, who records on it, and
 * whether every finding was checked. Each runs in one transaction that locks the survey row,
 * checks everything before writing, writes one audit row, and — when a device shows the change
 * (name, dates, stage, assignment) — gives the survey a new version and change_seq so the
 * auditors' devices pull it. Callers have passed requireRole('survey.manage') and
 * requireSurveyAccess; every query here still filters by firm.
 */
import { error } from '@sveltejs/kit';
import { and, eq, inArray, isNull, sql } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import type { NewSurvey, SurveyDetails } from '../../schemas/desk-surveys';
import { SURVEY_STAGE_LABELS, type SurveyStage } from '../../schemas/survey';
import { recordChange } from '../audit';
import { db } from '../db';
import { findings, sites, surveyAuditors, surveys } from '../db/schema';
import type { Tx } from '../db/types';
import { DESK_LOCKED_MESSAGE, lockedStage } from '../publish/lock';
import { bumpSurvey, lockSurvey as lockedSurvey } from '../survey-row';
import { nextChangeSeq, unassignAuditor } from '../sync/counter';
import { assignablePeople } from './surveys';
import { stageMoveProblem } from './survey-stage';

/** What a change came to: done with a sentence to show, or refused with one (and its field). */
export type Outcome =
	{ ok: true; message: string; id?: string } | { ok: false; message: string; field?: string };

const refuse = (message: string, field?: string): Outcome => ({ ok: false, message, field });

async function lockSurvey(tx: Tx, firmId: string, surveyId: string) {
	const row = await lockedSurvey(tx, firmId, surveyId);
	if (!row) error(404, 'Not found.');
	return row;
}

/** Every id one of the firm's active auditors or consultants, else the refusal to show. */
async function checkPeople(tx: Tx, firmId: string, ids: string[]): Promise<Outcome | null> {
	if (ids.length === 0) return null;
	const found = await assignablePeople(firmId, ids, tx);
	if (found.length === ids.length) return null;
	return refuse(
		'Choose people of your firm who record: active auditors or consultants.',
		'auditorIds'
	);
}

export function createSurvey(actor: SessionUser, input: NewSurvey): Promise<Outcome> {
	return db.transaction(async (tx) => {
		const [site] = await tx
			.select({ id: sites.id })
			.from(sites)
			.where(and(eq(sites.id, input.siteId), eq(sites.firmId, actor.firmId)));
		if (!site) return refuse('Choose one of your firm’s sites.', 'siteId');
		const people = await checkPeople(tx, actor.firmId, input.auditorIds);
		if (people) return people;
		const id = randomUUID();
		const row = {
			id,
			firmId: actor.firmId,
			siteId: site.id,
			name: input.name,
			startsOn: input.startsOn,
			endsOn: input.endsOn,
			status: 'planned',
			createdBy: actor.id,
			changeSeq: await nextChangeSeq(tx, actor.firmId)
		};
		await tx.insert(surveys).values(row);
		if (input.auditorIds.length > 0) {
			await tx
				.insert(surveyAuditors)
				.values(input.auditorIds.map((userId) => ({ surveyId: id, userId })));
		}
		await recordChange(tx, {
			firmId: actor.firmId,
			actorId: actor.id,
			entity: 'survey',
			entityId: id,
			action: 'create',
			after: { ...row, auditorIds: input.auditorIds }
		});
		return { ok: true, id, message: 'Survey created.' };
	});
}

export function saveDetails(
	actor: SessionUser,
	surveyId: string,
	input: SurveyDetails
): Promise<Outcome> {
	return db.transaction(async (tx) => {
		const row = await lockSurvey(tx, actor.firmId, surveyId);
		const before = { name: row.name, startsOn: row.startsOn, endsOn: row.endsOn };
		if (JSON.stringify(before) === JSON.stringify(input)) {
			return { ok: true, message: 'Nothing to save: the details were already so.' };
		}
		await tx
			.update(surveys)
			.set({ ...input, ...(await bumpSurvey(tx, actor.firmId)) })
			.where(eq(surveys.id, row.id));
		await recordChange(tx, {
			firmId: actor.firmId,
			actorId: actor.id,
			entity: 'survey',
			entityId: row.id,
			action: 'update',
			before,
			after: input
		});
		return { ok: true, message: 'Details saved.' };
	});
}

async function countFindings(tx: Tx, surveyId: string) {
	const [r] = await tx
		.select({
			all: sql<number>`COUNT(*)`,
			unchecked: sql<number>`SUM(${findings.reviewedAt} IS NULL)`
		})
		.from(findings)
		.where(and(eq(findings.surveyId, surveyId), isNull(findings.deletedAt)));
	return { all: Number(r?.all ?? 0), unchecked: Number(r?.unchecked ?? 0) };
}

export function moveStage(actor: SessionUser, surveyId: string, to: SurveyStage): Promise<Outcome> {
	return db.transaction(async (tx) => {
		const row = await lockSurvey(tx, actor.firmId, surveyId);
		const from = row.status as SurveyStage;
		const counted = await countFindings(tx, row.id);
		const problem = stageMoveProblem(
			{ from, findings: counted.all, published: row.publishedAt !== null },
			to
		);
		if (problem) return refuse(problem, 'stage');
		// Back to the walk: findings may still come, so "every finding checked" no longer holds.
		const unreview = (to === 'in-field' || to === 'planned') && row.reviewedAt !== null;
		await tx
			.update(surveys)
			.set({
				status: to,
				...(unreview ? { reviewedAt: null, reviewedBy: null } : {}),
				...(await bumpSurvey(tx, actor.firmId))
			})
			.where(eq(surveys.id, row.id));
		await recordChange(tx, {
			firmId: actor.firmId,
			actorId: actor.id,
			entity: 'survey',
			entityId: row.id,
			action: 'stage',
			before: { stage: from, reviewedAt: row.reviewedAt },
			after: { stage: to, reviewedAt: unreview ? null : row.reviewedAt }
		});
		return { ok: true, message: `Moved to “${SURVEY_STAGE_LABELS[to]}”.` };
	});
}

export function assign(actor: SessionUser, surveyId: string, ids: string[]): Promise<Outcome> {
	return db.transaction(async (tx) => {
		const row = await lockSurvey(tx, actor.firmId, surveyId);
		if (row.status === 'closed') {
			return refuse('This survey is closed: reopen it before assigning anyone.', 'auditorIds');
		}
		const people = await checkPeople(tx, actor.firmId, ids);
		if (people) return people;
		const already = await tx
			.select({ userId: surveyAuditors.userId })
			.from(surveyAuditors)
			.where(and(eq(surveyAuditors.surveyId, row.id), inArray(surveyAuditors.userId, ids)));
		const known = new Set(already.map((a) => a.userId));
		const fresh = ids.filter((id) => !known.has(id));
		if (fresh.length === 0) {
			return { ok: true, message: 'Everyone chosen was already on this survey.' };
		}
		await tx.insert(surveyAuditors).values(fresh.map((userId) => ({ surveyId: row.id, userId })));
		await tx
			.update(surveys)
			.set(await bumpSurvey(tx, actor.firmId))
			.where(eq(surveys.id, row.id));
		await recordChange(tx, {
			firmId: actor.firmId,
			actorId: actor.id,
			entity: 'survey',
			entityId: row.id,
			action: 'assign',
			after: { userIds: fresh }
		});
		const n = fresh.length === 1 ? '1 person' : `${fresh.length} people`;
		return { ok: true, message: `Assigned ${n}. Their devices get the survey on their next sync.` };
	});
}

export function unassign(actor: SessionUser, surveyId: string, userId: string): Promise<Outcome> {
	return db.transaction(async (tx) => {
		const row = await lockSurvey(tx, actor.firmId, surveyId);
		// The tombstone it leaves takes the survey off that person's devices (docs/sync.md).
		if (!(await unassignAuditor(tx, actor.firmId, row.id, userId))) {
			return refuse('That person is not on this survey.', 'userId');
		}
		await recordChange(tx, {
			firmId: actor.firmId,
			actorId: actor.id,
			entity: 'survey',
			entityId: row.id,
			action: 'unassign',
			before: { userId }
		});
		return {
			ok: true,
			message: 'Taken off the survey. It leaves their devices on their next sync.'
		};
	});
}

export function markReviewed(
	actor: SessionUser,
	surveyId: string,
	mark: 'reviewed' | 'reopen'
): Promise<Outcome> {
	return db.transaction(async (tx) => {
		const row = await lockSurvey(tx, actor.firmId, surveyId);
		if (lockedStage(row.status, row.publishedAt !== null))
			return refuse(DESK_LOCKED_MESSAGE, 'mark');
		if (mark === 'reopen') {
			if (row.reviewedAt === null) return refuse('Checking was not marked finished.', 'mark');
		} else {
			if (row.reviewedAt !== null) return { ok: true, message: 'Already marked as checked.' };
			const counted = await countFindings(tx, row.id);
			if (counted.all === 0) return refuse('Nothing is recorded on this survey yet.', 'mark');
			if (counted.unchecked > 0) {
				const left = counted.unchecked === 1 ? '1 finding is' : `${counted.unchecked} findings are`;
				return refuse(`${left} still to check.`, 'mark');
			}
		}
		const after =
			mark === 'reviewed'
				? { reviewedAt: new Date(), reviewedBy: actor.id }
				: { reviewedAt: null, reviewedBy: null };
		await tx
			.update(surveys)
			.set({ ...after, version: sql`${surveys.version} + 1` })
			.where(and(eq(surveys.id, row.id), eq(surveys.firmId, actor.firmId)));
		await recordChange(tx, {
			firmId: actor.firmId,
			actorId: actor.id,
			entity: 'survey',
			entityId: row.id,
			action: mark === 'reviewed' ? 'review' : 'reopen-review',
			before: { reviewedAt: row.reviewedAt, reviewedBy: row.reviewedBy },
			after
		});
		return {
			ok: true,
			message: mark === 'reviewed' ? 'Marked as checked.' : 'Checking reopened.'
		};
	});
}
