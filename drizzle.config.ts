import { defineConfig } from 'drizzle-kit';
import { databaseUrl } from './scripts/env.ts';

export default defineConfig({
	schema: './src/lib/server/db/schema.ts',
	out: './drizzle',
	dialect: 'mysql',
	dbCredentials: { url: databaseUrl() },
	strict: true,
	verbose: true
});
