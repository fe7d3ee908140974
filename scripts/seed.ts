/**
 * Seeds the demo scenario into the configured database (safe to run again).
 * `--print-sign-ins` prints the demo accounts instead.
 */
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '../src/lib/server/db/schema.ts';
import { demoFirms, demoPassword, demoUsers } from '../src/lib/server/seed/demo.ts';
import { seedDemo } from '../src/lib/server/seed/index.ts';
import { databaseUrl } from './env.ts';

if (process.argv.includes('--print-sign-ins')) {
	console.log(`\nDemo sign-ins (password for all: ${demoPassword})`);
	for (const firm of demoFirms) {
		console.log(`  ${firm.name}`);
		for (const u of demoUsers.filter((u) => u.firmId === firm.id)) {
			console.log(`    ${u.role.padEnd(11)} ${u.email.padEnd(38)} ${u.name}`);
		}
	}
	console.log('');
} else {
	const connection = await mysql.createConnection({ uri: databaseUrl() });
	try {
		await seedDemo(drizzle(connection, { schema, mode: 'default' }));
		console.log('steamwisp: demo scenario seeded');
	} finally {
		await connection.end();
	}
}
