/**
 * The sign-in page's data: the account an address names and the note that it signed in.
 * Throttling, password checks and sessions are the page's steps; these are only the reads and
 * writes of the `users` row.
 */
import { eq } from 'drizzle-orm';
import { db } from '../db';
import { users } from '../db/schema';

/** What signing in needs of the account with this (normalised) address, or undefined. */
export async function accountForSignIn(email: string) {
	const [account] = await db
		.select({
			id: users.id,
			firmId: users.firmId,
			role: users.role,
			passwordHash: users.passwordHash,
			disabledAt: users.disabledAt
		})
		.from(users)
		.where(eq(users.email, email))
		.limit(1);
	return account;
}

/** Records when the person last signed in (shown on the Desk's people page). */
export async function noteSignIn(userId: string, at = new Date()) {
	await db.update(users).set({ lastSignInAt: at }).where(eq(users.id, userId));
}
