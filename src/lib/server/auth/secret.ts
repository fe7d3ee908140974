/**
 * The server's signing key. STEAMWISP_SECRET (at least 32 characters) when set — the choice for
 * production, since then a copy of the database alone cannot sign anything; otherwise a key
 * made at random once and kept in the database (table server_keys), so every app process
 * behind a load balancer agrees without any setup. Each use derives its own key by name.
 */
import { createHmac, randomBytes } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { env } from '$env/dynamic/private';
import { db } from '../db';
import { serverKeys } from '../db/schema';

export const SECRET_MIN_LENGTH = 32;

const cache = new Map<string, Promise<Buffer>>();

/** The key for one purpose (e.g. 'device-cookie'): never the same bytes for two purposes. */
export function signingKey(purpose: string): Promise<Buffer> {
	let key = cache.get(purpose);
	if (!key) {
		key = root().then((r) => createHmac('sha256', r).update(`steamwisp:${purpose}`).digest());
		// A failure (database down) is not remembered: the next request tries again.
		key.catch(() => cache.delete(purpose));
		cache.set(purpose, key);
	}
	return key;
}

async function root(): Promise<Buffer> {
	const configured = env.STEAMWISP_SECRET ?? '';
	if (configured) {
		if (configured.length < SECRET_MIN_LENGTH) {
			throw new Error(
				`STEAMWISP_SECRET must be at least ${SECRET_MIN_LENGTH} characters (e.g. openssl rand -hex 32)`
			);
		}
		return Buffer.from(configured, 'utf8');
	}
	// Two processes starting at once both insert; the first wins and both read its key.
	await db
		.insert(serverKeys)
		.ignore()
		.values({ name: 'root', secret: randomBytes(32).toString('hex') });
	const [row] = await db.select().from(serverKeys).where(eq(serverKeys.name, 'root'));
	return Buffer.from(row.secret, 'hex');
}
