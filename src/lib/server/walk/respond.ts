import { json } from '@sveltejs/kit';

/** A JSON answer about one person's data: never kept by a shared cache or the browser's. */
export function privateJson(body: unknown): Response {
	return json(body, { headers: { 'cache-control': 'private, no-store' } });
}
