/** Applies the committed SQL migrations in drizzle/ to the configured database. */
import { drizzle } from 'drizzle-orm/mysql2';
import { migrate } from 'drizzle-orm/mysql2/migrator';
import mysql from 'mysql2/promise';
import { databaseUrl } from './env.ts';

const connection = await mysql.createConnection({ uri: databaseUrl(), multipleStatements: true });
try {
	await migrate(drizzle(connection), {
		migrationsFolder: new URL('../drizzle', import.meta.url).pathname
	});
	const [rows] = await connection.query('SELECT COUNT(*) AS n FROM __drizzle_migrations');
	console.log(
		`steamwisp: database migrated (${(rows as { n: number }[])[0].n} migrations applied)`
	);
} finally {
	await connection.end();
}
