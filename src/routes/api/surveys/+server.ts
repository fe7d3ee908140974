import { db } from '$lib/server/db';
import { requireRole } from '$lib/server/policy';
import { privateJson } from '$lib/server/walk/respond';
import { recordableSurveys } from '$lib/server/walk/surveys';
import type { RequestHandler } from './$types';

/** The surveys this person may record on (surveyListSchema). */
export const GET: RequestHandler = async (event) =>
	privateJson(await recordableSurveys(db, requireRole(event, 'survey.record')));
