import { error } from '@sveltejs/kit';
import { z } from 'zod';
import { db } from '$lib/server/db';
import { requireRole } from '$lib/server/policy';
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
		.default(DEFAULT_PULL_LIMIT)
});

/** What changed after `since` for this person (docs/sync.md), one page. */
export const GET: RequestHandler = async (event) => {
	const user = requireRole(event, 'survey.record');
	const query = querySchema.safeParse({
		since: event.url.searchParams.get('since') ?? undefined,
		limit: event.url.searchParams.get('limit') ?? undefined
	});
	if (!query.success) {
		const issue = query.error.issues[0];
		error(400, `This pull could not be read: ${issue.message}`);
	}
	return privateJson(await pullChanges(db, user, query.data.since, query.data.limit));
};
