import { error } from '@sveltejs/kit';
import { db } from '$lib/server/db';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { privateJson } from '$lib/server/walk/respond';
import { loadSurveySnapshot } from '$lib/server/walk/snapshot';
import type { RequestHandler } from './$types';

/** Everything one survey needs offline (surveySnapshotSchema); 404 when hidden from this person. */
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.record');
	const survey = await requireSurveyAccess(user, event.params.id, 'write');
	const snapshot = await loadSurveySnapshot(db, user, survey.id);
	if (!snapshot) error(404, 'Not found.');
	return privateJson(snapshot);
};
