import { error } from '@sveltejs/kit';
import { z } from 'zod';
import { db } from '$lib/server/db';
import { requireRole } from '$lib/server/policy';
import { noteExchange } from '$lib/server/sync/devices';
import { pullChanges } from '$lib/server/sync/pull';
import { privateJson } from '$lib/server/walk/respond';
import { DEFAULT_PULL_LIMIT, MAX_PULL_LIMIT } from '$lib/schemas/sync';
import type { RequestHandler } from './$types';

const querySchema = z.object({
	since: z.coerce
		.number({ error: 'since must be a whole number (the cursor of the last pull)' })
		.int({ error: 'since must be a whole number (the cursor of the last pull)' })
		.nonnegative({ error: 'since cannot be negative' }),
	limit: z.coerce
		.number({ error: 'limit must be a whole number' })
		.int({ error: 'limit must be a whole number' })
		.min(1, { error: 'limit must be at least 1' })
		.max(MAX_PULL_LIMIT, { error: `limit can be at most ${MAX_PULL_LIMIT}` })
		.default(DEFAULT_PULL_LIMIT),
	// Which device asks, for the Desk's sync state; absent, nothing is recorded.
	device: z.uuid({ error: 'device must be the device’s id (a UUID)' }).optional()
});

/** What changed after `since` for this person (docs/sync.md), one page. */
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.record');
	const query = querySchema.safeParse({
		since: event.url.searchParams.get('since') ?? undefined,
		limit: event.url.searchParams.get('limit') ?? undefined,
		device: event.url.searchParams.get('device') ?? undefined
	});
	if (!query.success) {
		const issue = query.error.issues[0];
		error(400, `This pull could not be read: ${issue.message}`);
	}
	const page = await pullChanges(db, user, query.data.since, query.data.limit);
	if (query.data.device) await noteExchange(db, user, query.data.device, 'pull');
	return privateJson(page);
};
