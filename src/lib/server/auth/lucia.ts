import { DrizzleMySQLAdapter } from '@lucia-auth/adapter-drizzle';
import { Lucia, TimeSpan } from 'lucia';
import { dev } from '$app/environment';
import { env } from '$env/dynamic/private';
import { db } from '../db';
import { sessions, users } from '../db/schema';
import type { Role } from '$lib/schemas/roles';

const adapter = new DrizzleMySQLAdapter(db, sessions, users);

/**
 * Sessions: 12-hour lifetime, extended on use (lucia refreshes a session in its second half);
 * cookie HttpOnly, SameSite=Lax, and Secure unless the app is served over plain HTTP
 * (ORIGIN=http://…, as on a developer's loopback). The cookie carries a random token; the
 * sessions table keeps only its SHA-256 as the session id (./sessions.ts), so a copy of the
 * table signs nobody in.
 */
const plainHttp = dev || /^http:\/\//.test(env.ORIGIN ?? '');
/** Whether the app's cookies (the session's, the device cookie) carry `Secure`. */
export const secureCookies = !plainHttp;

export const lucia = new Lucia(adapter, {
	sessionExpiresIn: new TimeSpan(12, 'h'),
	sessionCookie: {
		name: 'steamwisp_session',
		attributes: { secure: secureCookies, sameSite: 'lax' }
	},
	getUserAttributes: (row) => ({
		firmId: row.firmId,
		email: row.email,
		name: row.name,
		role: row.role as Role,
		clientCompanyId: row.clientCompanyId,
		disabledAt: row.disabledAt
	})
});

declare module 'lucia' {
	interface Register {
		Lucia: typeof lucia;
		/** Column properties as the Drizzle adapter returns them (camelCase). */
		DatabaseUserAttributes: {
			firmId: string;
			email: string;
			name: string;
			role: string;
			clientCompanyId: string | null;
			disabledAt: Date | null;
		};
		DatabaseSessionAttributes: { userAgent: string | null };
	}
}
