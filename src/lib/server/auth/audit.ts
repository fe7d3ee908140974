import { createHash } from 'node:crypto';
import { db } from '../db';
import { auditLog } from '../db/schema';

/** Account events written to the audit log (entity "user", or "sign-in" for unknown addresses). */
export type AuthAction =
	| 'sign-in'
	| 'sign-in-failed'
	| 'sign-in-throttled'
	| 'sign-in-alert'
	| 'sign-out'
	| 'sign-out-everywhere'
	| 'password-change'
	| 'reset-request'
	| 'reset-throttled'
	| 'password-reset'
	| 'invite'
	| 'invite-revoke'
	| 'invite-accept'
	| 'role-change'
	| 'disable'
	| 'enable';

export interface AuthEvent {
	action: AuthAction;
	firmId: string | null;
	actorId: string | null;
	/** The account concerned: a user id, a token id, or null for an address with no account. */
	subjectId: string | null;
	entity?: 'user' | 'invitation' | 'sign-in';
	/** Never a password or a token; e-mail addresses of unknown accounts only as a hash. */
	before?: Record<string, unknown>;
	after?: Record<string, unknown>;
	address?: string | null;
}

type Writer = Pick<typeof db, 'insert'>;

/** Appends one row to audit_log (in the caller's transaction when given one). */
export async function auditAuth(event: AuthEvent, writer: Writer = db): Promise<void> {
	await writer.insert(auditLog).values({
		firmId: event.firmId,
		actorId: event.actorId,
		entity: event.entity ?? (event.subjectId ? 'user' : 'sign-in'),
		entityId: event.subjectId ?? 'unknown',
		action: event.action,
		before: event.before ?? null,
		after: event.after ?? null,
		address: event.address?.slice(0, 64) ?? null
	});
}

/** A stable, non-reversible reference to an e-mail address that matches no account. */
export function addressDigest(email: string): string {
	return createHash('sha256').update(email, 'utf8').digest('hex').slice(0, 16);
}
