/** Applies the committed SQL migrations in drizzle/ to the configured database. */
import { drizzle } from 'drizzle-orm/mysql2';
import { migrate } from 'drizzle-orm/mysql2/migrator';
import mysql from 'mysql2/promise';
import { databaseUrl } from './env.ts';
import * as schema from '../src/lib/server/db/schema.ts';
import { refreshStaleFigures } from '../src/lib/server/pricing/refresh.ts';

const connection = await mysql.createConnection({ uri: databaseUrl(), multipleStatements: true });
try {
	await migrate(drizzle(connection), {
		migrationsFolder: new URL('../drizzle', import.meta.url).pathname
	});
	const [rows] = await connection.query('SELECT COUNT(*) AS n FROM __drizzle_migrations');
	console.log(
		`steamwisp: database migrated (${(rows as { n: number }[])[0].n} migrations applied)`
	);
	// Figures made by an older engine, or never made (rows from before they were stored).
	const refreshed = await refreshStaleFigures(drizzle(connection, { schema, mode: 'default' }));
	if (refreshed.recomputed + refreshed.repriced > 0) {
		console.log(
			`steamwisp: figures brought up to date (${refreshed.recomputed} recomputed, ${refreshed.repriced} re-priced)`
		);
	}
} finally {
	await connection.end();
}
