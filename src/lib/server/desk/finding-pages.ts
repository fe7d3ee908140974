/**
 * What the finding and conflict pages do, one function per load or action, on the app's
 * database unless given another (the integration specs pass theirs). The routes have checked
 * the role and the survey (requireRole, requireSurveyAccess); every read here still names the
 * firm, so another firm's finding or conflict is `null` / `missing` (the route answers 404).
 */
import { openedVersionSchema, type FindingEditForm } from '../../schemas/desk-finding';
import { db as appDb } from '../db';
import type { Db } from '../db/types';
import { conflictDetail, resolveConflict, surveyConflicts, type ResolveInput } from './conflicts';
import { deskSurvey, editSite, findingDetail, findingOfSurvey } from './finding-detail';
import { editFinding, type WriteOutcome } from './finding-edit';
import { captureFromForm, formValuesOf } from './finding-form';
import { markReviewed } from './review';

export async function openFinding(
	user: SessionUser,
	surveyId: string,
	findingId: string,
	db: Db = appDb
) {
	const detail = await findingDetail(db, user, surveyId, findingId);
	if (!detail) return null;
	const { site, finding } = detail;
	return { ...detail, form: formValuesOf(finding.capture, finding.repairCost, site) };
}

export type EditOutcome = WriteOutcome | { kind: 'problems'; problems: Record<string, string> };

/** The edit form → the finding's next version, or why not (nothing written then). */
export async function saveFindingEdit(
	user: SessionUser,
	surveyId: string,
	findingId: string,
	form: FindingEditForm,
	db: Db = appDb
): Promise<EditOutcome> {
	const survey = await deskSurvey(db, user.firmId, surveyId);
	const found = survey && (await findingOfSurvey(db, surveyId, findingId));
	if (!survey || !found || found.row.deletedAt) return { kind: 'missing' };
	const version = openedVersionSchema.safeParse(form.version);
	if (!version.success) {
		return { kind: 'problems', problems: { form: version.error.issues[0].message } };
	}
	const site = await editSite(db, user.id, survey, {
		headerId: found.capture.headerId,
		areaId: found.capture.areaId
	});
	const built = captureFromForm(found.capture, form, site);
	if ('problems' in built) return { kind: 'problems', problems: built.problems };
	return editFinding(
		db,
		{
			firmId: user.firmId,
			actorId: user.id,
			surveyId,
			findingId,
			openedVersion: version.data
		},
		built.capture,
		built.repairCost
	);
}

/**
 * Marks one finding reviewed or not: `missing` when it is not a live finding of the survey,
 * `frozen` when the survey is published.
 */
export async function reviewFinding(
	user: SessionUser,
	surveyId: string,
	findingId: string,
	reviewed: boolean,
	db: Db = appDb
): Promise<'done' | 'missing' | 'frozen'> {
	if (!(await deskSurvey(db, user.firmId, surveyId))) return 'missing';
	const outcome = await markReviewed(db, {
		firmId: user.firmId,
		actorId: user.id,
		surveyId,
		findingIds: [findingId],
		reviewed
	});
	if (outcome.ok) return 'done';
	return outcome.frozen ? 'frozen' : 'missing';
}

export async function listConflicts(user: SessionUser, surveyId: string, db: Db = appDb) {
	const survey = await deskSurvey(db, user.firmId, surveyId);
	if (!survey) return null;
	return { survey, ...(await surveyConflicts(db, user.firmId, surveyId)) };
}

export function openConflict(
	user: SessionUser,
	surveyId: string,
	conflictId: string,
	db: Db = appDb
) {
	return conflictDetail(db, user, surveyId, conflictId);
}

export function settleConflict(
	user: SessionUser,
	input: Omit<ResolveInput, 'firmId' | 'actorId'>,
	db: Db = appDb
) {
	return resolveConflict(db, { ...input, firmId: user.firmId, actorId: user.id });
}
