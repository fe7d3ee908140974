import { json } from '@sveltejs/kit';
import { checkDatabase } from '$lib/server/health';
import { version } from '$app/environment';
import type { RequestHandler } from './$types';

/** Liveness and readiness for load balancers and people: 200 when the database answers, else 503. */
export const GET: RequestHandler = async () => {
	const database = await checkDatabase();
	return json(
		{ status: database.up ? 'ok' : 'degraded', version, database },
		{ status: database.up ? 200 : 503, headers: { 'cache-control': 'no-store' } }
	);
};
