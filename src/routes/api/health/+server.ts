import { json } from '@sveltejs/kit';
import { version } from '$app/environment';
import { checkDatabase, healthAnswer } from '$lib/server/health';
import type { RequestHandler } from './$types';

/**
 * Liveness and readiness for load balancers and people: 200 when the database answers, else
 * 503. Details (version, migrations, latency) only for a signed-in admin.
 */
export const GET: RequestHandler = async ({ locals }) => {
	const database = await checkDatabase();
	return json(healthAnswer(database, version, locals.user), {
		status: database.up ? 200 : 503,
		headers: { 'cache-control': 'no-store' }
	});
};
