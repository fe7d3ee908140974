import { sql } from 'drizzle-orm';
import type { Role } from '$lib/schemas/roles';
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

export type HealthAnswer =
	| { status: 'ok' | 'degraded' }
	| { status: 'ok' | 'degraded'; version: string; database: DatabaseHealth };

/**
 * What /api/health tells whom: anyone (a load balancer, a monitor) learns up or down, and
 * nothing an attacker could match against a list of known flaws; a signed-in admin also gets
 * the version and the database's round trip and migration count.
 */
export function healthAnswer(
	database: DatabaseHealth,
	version: string,
	viewer: { role: Role } | null
): HealthAnswer {
	const status = database.up ? 'ok' : 'degraded';
	return viewer?.role === 'admin' ? { status, version, database } : { status };
}
