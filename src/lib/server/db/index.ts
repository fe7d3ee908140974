import { env } from '$env/dynamic/private';
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from './schema';
import { connectionUri } from './url';

/**
 * One connection pool per app process. Relational queries need `mode: 'planetscale'`
 * because MariaDB has no LEFT JOIN LATERAL (DEVELOPERS.md, "The database").
 */
export const pool = mysql.createPool({
	uri: connectionUri(env),
	connectionLimit: Number(env.STEAMWISP_DB_POOL ?? 10),
	timezone: 'Z',
	dateStrings: false,
	// Fail fast when the database is down, so /api/health can answer 503 promptly.
	connectTimeout: 3000
});

export const db = drizzle(pool, { schema, mode: 'planetscale' });
export type Database = typeof db;
export { schema };
