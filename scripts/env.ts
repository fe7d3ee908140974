/**
 * Configuration for the scripts and drizzle.config.ts, read from the environment with the
 * defaults the README documents (the app reads the same names through $env).
 */
import { connectionUri } from '../src/lib/server/db/url.ts';

export function databaseUrl(): string {
	return connectionUri(process.env);
}
