/**
 * Configuration read from the environment, with the defaults the README documents.
 * Shared by drizzle.config.ts and the scripts (the app reads the same names via $env).
 */
export const env = {
	dbHost: process.env.STEAMWISP_DB_HOST ?? '127.0.0.1',
	dbPort: Number(process.env.STEAMWISP_DB_PORT ?? 3407),
	dbName: process.env.STEAMWISP_DB_NAME ?? 'steamwisp',
	dbUser: process.env.STEAMWISP_DB_USER ?? 'steamwisp',
	dbPassword: process.env.STEAMWISP_DB_PASSWORD ?? 'steamwisp-local'
};

/** DATABASE_URL wins when set; otherwise the project's own loopback MariaDB. */
export function databaseUrl(): string {
	if (process.env.DATABASE_URL) return process.env.DATABASE_URL;
	const { dbUser, dbPassword, dbHost, dbPort, dbName } = env;
	return `mysql://${encodeURIComponent(dbUser)}:${encodeURIComponent(dbPassword)}@${dbHost}:${dbPort}/${dbName}`;
}
