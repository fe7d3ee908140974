/** Seeds the demo scenario into the configured database (safe to run again). */
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '../src/lib/server/db/schema.ts';
import { seedDemo } from '../src/lib/server/seed/index.ts';
import { databaseUrl } from './env.ts';

const connection = await mysql.createConnection({ uri: databaseUrl() });
try {
	await seedDemo(drizzle(connection, { schema, mode: 'default' }));
	console.log('steamwisp: demo scenario seeded');
} finally {
	await connection.end();
}
