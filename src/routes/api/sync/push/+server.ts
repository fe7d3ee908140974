import { error } from '@sveltejs/kit';
import { db } from '$lib/server/db';
import { requireRole, requireSurveyAccess } from '$lib/server/policy';
import { readJsonBody } from '$lib/server/sync/body';
import { surveyOf } from '$lib/server/sync/apply';
import { noteExchange } from '$lib/server/sync/devices';
import { applyPush, pushSurveys } from '$lib/server/sync/push';
import { privateJson } from '$lib/server/walk/respond';
import { MAX_PUSH_BYTES, pushRequestSchema } from '$lib/schemas/sync';
import type { RequestHandler } from './$types';

/** A device's changes (docs/sync.md): 200 with one answer per mutation, in order. */
export const POST: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.record');
	const body = await readJsonBody(event.request, MAX_PUSH_BYTES);
	const parsed = pushRequestSchema.safeParse(body);
	if (!parsed.success) {
		const issues = parsed.error.issues.slice(0, 20).map((i) => ({
			path: i.path.join('.'),
			message: i.message
		}));
		const first = issues[0];
		error(400, {
			message: `These changes could not be read, nothing was changed: ${first.path ? `${first.path}: ` : ''}${first.message}`,
			issues
		});
	}
	const request = parsed.data;
	const surveys = await pushSurveys(db, user.firmId, request);
	for (const id of new Set(request.mutations.map(surveyOf))) {
		if (!surveys.has(id)) error(404, 'Not found.');
		await requireSurveyAccess(user, id, 'write');
	}
	const answer = await applyPush(db, { user, address: safeAddress(event), surveys }, request);
	// The Desk's sync state: this device was heard from (docs/sync.md).
	await noteExchange(db, user, request.deviceId, 'push');
	return privateJson(answer);
};

function safeAddress(event: { getClientAddress: () => string }): string | null {
	try {
		return event.getClientAddress();
	} catch {
		return null;
	}
}
