/**
 * `POST /api/sync/push` after validation: authorize every survey the batch names (any one
 * hidden from this person → 404 for the whole batch, nothing written), then apply the
 * mutations one by one, in order, each in its own transaction.
 */
import { and, eq, inArray } from 'drizzle-orm';
import type { PushRequest, PushResponse } from '../../schemas/sync';
import { surveys } from '../db/schema';
import type { Db } from '../db/types';
import { applyMutation, surveyOf } from './apply';
import type { PushContext, PushSurvey } from './context';

/** The batch's surveys with their stage, as far as they are in the person's firm. */
export async function pushSurveys(
	db: Db,
	firmId: string,
	request: PushRequest
): Promise<Map<string, PushSurvey>> {
	const ids = [...new Set(request.mutations.map(surveyOf))];
	const rows = await db
		.select({
			id: surveys.id,
			firmId: surveys.firmId,
			siteId: surveys.siteId,
			stage: surveys.status
		})
		.from(surveys)
		.where(and(inArray(surveys.id, ids), eq(surveys.firmId, firmId)));
	return new Map(rows.map((r) => [r.id, r]));
}

export async function applyPush(
	db: Db,
	ctx: Omit<PushContext, 'deviceId' | 'sites'>,
	request: PushRequest
): Promise<PushResponse> {
	const full: PushContext = { ...ctx, deviceId: request.deviceId, sites: new Map() };
	const results = [];
	for (const m of request.mutations) results.push(await applyMutation(db, full, m));
	return { results };
}
