/** Direct access to the test database, for fixtures and for checking that nothing was written. */
import mysql from 'mysql2/promise';
import { connectionUri } from '../../../src/lib/server/db/url';
import { testDbName } from './servers';

export type Db = mysql.Pool;

export function openTestDb(): Db {
	return mysql.createPool({
		uri: connectionUri({ ...process.env, STEAMWISP_DB_NAME: testDbName }),
		connectionLimit: 2,
		timezone: 'Z'
	});
}

export async function rows<T>(db: Db, query: string, params: unknown[] = []): Promise<T[]> {
	const [result] = await db.query(query, params);
	return result as T[];
}

/** Row counts of the tables account forms write to: compared before and after bad input. */
export async function writeCounts(db: Db): Promise<Record<string, number>> {
	const tables = ['users', 'tokens', 'sessions', 'audit_log', 'attempt_counters'];
	const counts: Record<string, number> = {};
	for (const t of tables) {
		const [{ n }] = await rows<{ n: number }>(db, `SELECT COUNT(*) AS n FROM \`${t}\``);
		counts[t] = Number(n);
	}
	const [{ v }] = await rows<{ v: string | null }>(db, 'SELECT MAX(updated_at) AS v FROM users');
	counts.usersUpdated = v ? new Date(v).getTime() : 0;
	return counts;
}
