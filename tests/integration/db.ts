/**
 * A Drizzle client on a test database for integration tests (npm test creates steamwisp_test
 * fresh). The tests insert and delete rows, so they refuse to run unless a database was chosen
 * on purpose, and never on the development database that `npm start` uses.
 */
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '../../src/lib/server/db/schema';
import { databaseUrl } from '../../scripts/env';

/** The database npm start and npm run dev use when nothing else is set. */
const DEVELOPMENT_DATABASE = 'steamwisp';

/** Why integration tests must not run on this configuration, or null when they may. */
export function refusal(env: Record<string, string | undefined>, uri: string): string | null {
	const name = decodeURIComponent(new URL(uri).pathname.replace(/^\//, ''));
	if (!env.DATABASE_URL && !env.STEAMWISP_DB_NAME) {
		return (
			'Integration tests write to the database, so they need a test database named on purpose. ' +
			'Run them through `npm test`, or set STEAMWISP_DB_NAME=steamwisp_test (see DEVELOPERS.md).'
		);
	}
	if (name === DEVELOPMENT_DATABASE) {
		return (
			`Integration tests will not run on "${name}": it is the development database, with your ` +
			'demo data. Set STEAMWISP_DB_NAME to a test database, e.g. steamwisp_test.'
		);
	}
	return null;
}

export function testDatabase(uri = databaseUrl()) {
	const refused = refusal(process.env, uri);
	if (refused) throw new Error(refused);
	const pool = mysql.createPool({ uri, connectionLimit: 4, connectTimeout: 2000 });
	return { pool, db: drizzle(pool, { schema, mode: 'planetscale' }) };
}
