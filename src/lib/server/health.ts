import { sql } from 'drizzle-orm';
import { db as appDb, type Database } from './db';

export interface DatabaseHealth {
	up: boolean;
	latencyMs: number;
	migrations?: number;
	error?: string;
}

/** A real round trip: counts applied migrations (fails if the schema was never migrated). */
export async function checkDatabase(
	db: Database = appDb,
	timeoutMs = 2500
): Promise<DatabaseHealth> {
	const started = performance.now();
	try {
		const query = db.execute(sql`SELECT COUNT(*) AS n FROM __drizzle_migrations`);
		const timeout = new Promise<never>((_, reject) =>
			setTimeout(() => reject(new Error(`no answer within ${timeoutMs} ms`)), timeoutMs).unref()
		);
		const [rows] = (await Promise.race([query, timeout])) as unknown as [{ n: number }[]];
		return {
			up: true,
			latencyMs: Math.round(performance.now() - started),
			migrations: Number(rows[0].n)
		};
	} catch (e) {
		return { up: false, latencyMs: Math.round(performance.now() - started), error: describe(e) };
	}
}

function describe(e: unknown): string {
	const code = (e as { code?: string }).code;
	return code ? `database unavailable (${code})` : 'database unavailable';
}
