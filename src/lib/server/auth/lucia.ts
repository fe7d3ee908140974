import { DrizzleMySQLAdapter } from '@lucia-auth/adapter-drizzle';
import { eq, sql } from 'drizzle-orm';
import { Lucia, TimeSpan, type DatabaseSession, type DatabaseUser } from 'lucia';
import { dev } from '$app/environment';
import { env } from '$env/dynamic/private';
import { db } from '../db';
import { sessions, users } from '../db/schema';
import { personColumns } from './person-columns';
import type { Role } from '$lib/schemas/roles';

/**
 * Drizzle's adapter, reading a session and its person with one statement prepared once and
 * only the columns the app uses (every signed-in request asks it; the stock query selects the
 * whole users row, password hash included, written again each time).
 */
class SessionAdapter extends DrizzleMySQLAdapter {
	private readonly sessionAndUser = db
		.select({
			session: {
				id: sessions.id,
				userId: sessions.userId,
				expiresAt: sessions.expiresAt,
				userAgent: sessions.userAgent
			},
			user: personColumns
		})
		.from(sessions)
		.innerJoin(users, eq(sessions.userId, users.id))
		.where(eq(sessions.id, sql.placeholder('id')))
		.prepare();

	override async getSessionAndUser(
		sessionId: string
	): Promise<[DatabaseSession, DatabaseUser] | [null, null]> {
		const rows = await this.sessionAndUser.execute({ id: sessionId });
		if (rows.length !== 1) return [null, null];
		const { id, userId, expiresAt, ...sessionAttributes } = rows[0].session;
		const { id: personId, ...userAttributes } = rows[0].user;
		return [
			{ id, userId, expiresAt, attributes: sessionAttributes },
			{ id: personId, attributes: userAttributes }
		];
	}
}

const adapter = new SessionAdapter(db, sessions, users);

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
