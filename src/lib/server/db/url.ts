/** The database URL from the environment, with the same defaults as scripts/env.ts. */
export function connectionUri(env: Record<string, string | undefined>): string {
	if (env.DATABASE_URL) return env.DATABASE_URL;
	const user = encodeURIComponent(env.STEAMWISP_DB_USER ?? 'steamwisp');
	const password = encodeURIComponent(env.STEAMWISP_DB_PASSWORD ?? 'steamwisp-local');
	const host = env.STEAMWISP_DB_HOST ?? '127.0.0.1';
	const port = env.STEAMWISP_DB_PORT ?? '3407';
	const name = env.STEAMWISP_DB_NAME ?? 'steamwisp';
	return `mysql://${user}:${password}@${host}:${port}/${name}`;
}
