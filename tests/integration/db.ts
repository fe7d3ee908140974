/** A Drizzle client on the test database for integration tests (npm test creates it fresh). */
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '../../src/lib/server/db/schema';
import { databaseUrl } from '../../scripts/env';

export function testDatabase(uri = databaseUrl()) {
	const pool = mysql.createPool({ uri, connectionLimit: 4, connectTimeout: 2000 });
	return { pool, db: drizzle(pool, { schema, mode: 'planetscale' }) };
}
