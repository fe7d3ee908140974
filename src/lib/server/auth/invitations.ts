/**
 * Invitations: an admin or consultant invites an address with a role (and a client company for
 * client users); the invitee opens the e-mailed link, chooses a name and password, and the
 * account exists from then on. The link is single-use, expires, and is stored hashed.
 */
import { randomUUID } from 'node:crypto';
import { error } from '@sveltejs/kit';
import { TransactionRollbackError, and, eq, gt, isNull, sql, type SQL } from 'drizzle-orm';
import type { Invite } from '$lib/schemas/people';
import { roleSchema, type Role } from '$lib/schemas/roles';
import { db } from '../db';
import { clientCompanies, firms, tokens, users } from '../db/schema';
import { mailOn, sendMail } from '../mail/send';
import { alreadyRegisteredMessage, invitationMessage } from '../mail/templates/messages';
import { invitableRoles } from '../policy';
import { auditAuth } from './audit';
import { hashPassword } from './password';
import {
	expiresIn,
	lookUpToken,
	newToken,
	spendToken,
	tokenLifetimeMs,
	type TokenLookup,
	type TokenRow
} from './tokens';

export type InviteOutcome =
	| { kind: 'sent' }
	| { kind: 'member'; name: string }
	| { kind: 'no-such-client' }
	| { kind: 'limited'; limit: InviteLimit; waitMs: number }
	| { kind: 'mail-off' }
	| { kind: 'not-sent' };

interface Context {
	/** Where links in the message point (see mail/config.ts linkOrigin). */
	origin: string;
	address: string | null;
}

/**
 * How many invitations may go out (every invitation counts, answered or not, withdrawn or not):
 * per person an hour, per firm a day, and to one address from one firm a day. Enough to bring a
 * whole crew in; not enough to turn the form into a way of flooding someone's inbox.
 */
export const inviteLimits = {
	person: { max: 20, windowMs: 3600_000 },
	firm: { max: 100, windowMs: 24 * 3600_000 },
	address: { max: 3, windowMs: 24 * 3600_000 }
} as const;
export type InviteLimit = keyof typeof inviteLimits;

/**
 * Invites an address. The inviter sees the same answer and the same pending invitation whether
 * the address is new to Steamwisp or already belongs to another firm's person (telling them
 * apart would reveal another tenant's people); only the message differs, and it goes to the
 * address's owner alone: the owner of an existing account is told their account is unchanged,
 * with no link, and the message is filed under their own firm, not the inviter's.
 */
export async function invite(
	actor: SessionUser,
	input: Invite,
	ctx: Context
): Promise<InviteOutcome> {
	if (!invitableRoles[actor.role].includes(input.role)) {
		error(403, `As ${actor.role} you cannot invite a person as ${input.role}.`);
	}
	let clientName: string | null = null;
	if (input.clientCompanyId) {
		const [client] = await db
			.select({ name: clientCompanies.name })
			.from(clientCompanies)
			.where(
				and(eq(clientCompanies.id, input.clientCompanyId), eq(clientCompanies.firmId, actor.firmId))
			);
		if (!client) return { kind: 'no-such-client' };
		clientName = client.name;
	}
	const [existing] = await db
		.select({ firmId: users.firmId, name: users.name })
		.from(users)
		.where(eq(users.email, input.email))
		.limit(1);
	if (existing?.firmId === actor.firmId) return { kind: 'member', name: existing.name };
	if (!mailOn()) return { kind: 'mail-off' };

	const { token, hash } = newToken();
	const id = randomUUID();
	const opened = await db.transaction(async (tx) => {
		// One firm's invitations one at a time, so parallel posts cannot outrun the limits.
		const [firm] = await tx
			.select({ name: firms.name })
			.from(firms)
			.where(eq(firms.id, actor.firmId))
			.for('update');
		const limited = await overLimit(tx, actor, input.email);
		if (limited) return limited;
		// Only the newest invitation to an address works.
		await tx
			.update(tokens)
			.set({ revoked: true })
			.where(
				and(
					eq(tokens.firmId, actor.firmId),
					eq(tokens.purpose, 'invite'),
					eq(tokens.email, input.email),
					isNull(tokens.usedAt)
				)
			);
		await tx.insert(tokens).values({
			id,
			firmId: actor.firmId,
			purpose: 'invite',
			tokenHash: hash,
			email: input.email,
			role: input.role,
			clientCompanyId: input.clientCompanyId,
			createdBy: actor.id,
			expiresAt: expiresIn('invite')
		});
		await auditAuth(
			{
				action: 'invite',
				firmId: actor.firmId,
				actorId: actor.id,
				subjectId: id,
				entity: 'invitation',
				after: { role: input.role, clientCompanyId: input.clientCompanyId },
				address: ctx.address
			},
			tx
		);
		return { kind: 'open' as const, firmName: firm.name };
	});
	if (opened.kind === 'limited') return opened;
	const sent = existing
		? await trySend(
				input.email,
				existing.firmId,
				alreadyRegisteredMessage({ firmName: opened.firmName, inviterName: actor.name })
			)
		: await trySend(
				input.email,
				actor.firmId,
				invitationMessage({
					firmName: opened.firmName,
					inviterName: actor.name,
					role: input.role,
					clientName,
					url: `${ctx.origin}/invitation/${token}`,
					days: tokenLifetimeMs.invite / (24 * 3600_000)
				})
			);
	if (sent) return { kind: 'sent' };
	// An invitation nobody received should not stay open.
	await db.update(tokens).set({ revoked: true }).where(eq(tokens.id, id));
	return { kind: 'not-sent' };
}

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0];

/** The first limit this invitation would break, with how long until it would not. */
async function overLimit(
	tx: Tx,
	actor: SessionUser,
	email: string
): Promise<{ kind: 'limited'; limit: InviteLimit; waitMs: number } | null> {
	const scopes: Record<InviteLimit, SQL> = {
		person: eq(tokens.createdBy, actor.id),
		firm: sql`TRUE`,
		address: eq(tokens.email, email)
	};
	for (const limit of Object.keys(scopes) as InviteLimit[]) {
		const { max, windowMs } = inviteLimits[limit];
		const seconds = Math.round(windowMs / 1000);
		const [row] = await tx
			.select({
				n: sql<number>`COUNT(*)`,
				// Milliseconds until the oldest counted invitation leaves the window.
				waitMs: sql<number>`TIMESTAMPDIFF(MICROSECOND, NOW(3), MIN(${tokens.createdAt}) + INTERVAL ${seconds} SECOND) DIV 1000`
			})
			.from(tokens)
			.where(
				and(
					eq(tokens.firmId, actor.firmId),
					eq(tokens.purpose, 'invite'),
					gt(tokens.createdAt, sql`NOW(3) - INTERVAL ${seconds} SECOND`),
					scopes[limit]
				)
			);
		if (Number(row.n) >= max) {
			return { kind: 'limited', limit, waitMs: Math.max(1, Number(row.waitMs)) };
		}
	}
	return null;
}

/** "You have sent 20 invitations in the past hour…": what the inviter reads when limited. */
export function inviteLimitMessage(limit: InviteLimit, waitMs: number): string {
	const minutes = Math.max(1, Math.ceil(waitMs / 60_000));
	const wait =
		minutes < 120
			? `${minutes} minute${minutes === 1 ? '' : 's'}`
			: `${Math.ceil(minutes / 60)} hours`;
	const { max } = inviteLimits[limit];
	const what = {
		person: `You have sent ${max} invitations in the past hour, the most one person may send.`,
		firm: `Your firm has sent ${max} invitations in the past day, the most one firm may send.`,
		address: `This address was invited ${max} times in the past day, the most one address may be.`
	}[limit];
	return `${what} Nothing was sent; try again in ${wait}.`;
}

async function trySend(
	to: string,
	firmId: string,
	message: Parameters<typeof sendMail>[0]['message']
) {
	try {
		await sendMail({ to, firmId, message });
		return true;
	} catch (e) {
		console.error(`steamwisp: could not send "${message.subject}": ${(e as Error).message}`);
		return false;
	}
}

/**
 * An invitation lives only as long as its sender may still send it: once they are disabled (or
 * no longer in a role that may invite this one) it is withdrawn. Disabling revokes a person's
 * open invitations at once (people.ts); this check covers anything that slipped past, e.g. a
 * role change. An invitation without a recorded sender is judged by itself.
 */
async function senderGone(executor: Pick<typeof db, 'select'>, row: TokenRow): Promise<boolean> {
	if (!row.createdBy) return false;
	const [sender] = await executor
		.select({ role: users.role, firmId: users.firmId, disabledAt: users.disabledAt })
		.from(users)
		.where(eq(users.id, row.createdBy));
	if (!sender || sender.disabledAt || sender.firmId !== row.firmId) return true;
	const role = roleSchema.safeParse(row.role);
	return !role.success || !invitableRoles[roleSchema.parse(sender.role)].includes(role.data);
}

/** Looks a link up as lookUpToken does, and calls it withdrawn once its sender is gone. */
async function lookUpInvitation(token: string): Promise<TokenLookup> {
	const found = await lookUpToken(token, 'invite');
	if (found.state === 'valid' && (await senderGone(db, found.row))) {
		await db.update(tokens).set({ revoked: true }).where(eq(tokens.id, found.row.id));
		return { state: 'revoked' };
	}
	return found;
}

/** What the invitation page shows before the invitee sets a password. */
export async function describeInvitation(token: string) {
	const found = await lookUpInvitation(token);
	if (found.state !== 'valid') return found;
	const [firm] = await db
		.select({ name: firms.name })
		.from(firms)
		.where(eq(firms.id, found.row.firmId));
	return {
		state: 'valid' as const,
		email: found.row.email,
		role: found.row.role as Role,
		firmName: firm?.name ?? ''
	};
}

export type AcceptOutcome =
	| { kind: 'done'; email: string }
	| { kind: 'dead'; state: Exclude<TokenLookup['state'], 'valid'> }
	| { kind: 'taken' };

/** Spends the invitation and creates the account, all in one transaction. */
export async function acceptInvitation(
	token: string,
	input: { name: string; password: string },
	address: string | null
): Promise<AcceptOutcome> {
	const found = await lookUpInvitation(token);
	if (found.state !== 'valid') return { kind: 'dead', state: found.state };
	const row = found.row;
	const role = roleSchema.parse(row.role);
	const passwordHash = await hashPassword(input.password);
	const userId = randomUUID();
	let withdrawn = false;
	try {
		return await db.transaction(async (tx) => {
			if (!(await spendToken(tx, row.id))) return { kind: 'dead', state: 'used' } as const;
			// Checked again inside the transaction: the sender may have been disabled meanwhile.
			if (await senderGone(tx, row)) {
				withdrawn = true;
				tx.rollback();
			}
			const [taken] = await tx
				.select({ id: users.id })
				.from(users)
				.where(eq(users.email, row.email));
			if (taken) tx.rollback();
			await tx.insert(users).values({
				id: userId,
				firmId: row.firmId,
				email: row.email,
				name: input.name,
				role,
				clientCompanyId: role === 'client' ? row.clientCompanyId : null,
				passwordHash
			});
			await tx.update(tokens).set({ userId }).where(eq(tokens.id, row.id));
			await auditAuth(
				{
					action: 'invite-accept',
					firmId: row.firmId,
					actorId: userId,
					subjectId: userId,
					after: { role, invitationId: row.id },
					address
				},
				tx
			);
			return { kind: 'done', email: row.email } as const;
		});
	} catch (e) {
		if (withdrawn) {
			await db.update(tokens).set({ revoked: true }).where(eq(tokens.id, row.id));
			return { kind: 'dead', state: 'revoked' };
		}
		// Someone took the address since the invitation was sent (or in a race with this one).
		if (e instanceof TransactionRollbackError || isDuplicate(e)) return { kind: 'taken' };
		throw e;
	}
}

function isDuplicate(e: unknown): boolean {
	const err = e as { code?: string; cause?: { code?: string } };
	return err.code === 'ER_DUP_ENTRY' || err.cause?.code === 'ER_DUP_ENTRY';
}

/** Invitations still open in a firm, newest first. */
export function openInvitations(firmId: string) {
	return db
		.select({
			id: tokens.id,
			email: tokens.email,
			role: tokens.role,
			client: clientCompanies.name,
			invitedBy: users.name,
			expiresAt: tokens.expiresAt,
			createdAt: tokens.createdAt
		})
		.from(tokens)
		.leftJoin(clientCompanies, eq(clientCompanies.id, tokens.clientCompanyId))
		.leftJoin(users, eq(users.id, tokens.createdBy))
		.where(
			and(
				eq(tokens.firmId, firmId),
				eq(tokens.purpose, 'invite'),
				isNull(tokens.usedAt),
				eq(tokens.revoked, false),
				gt(tokens.expiresAt, sql`NOW(3)`)
			)
		)
		.orderBy(sql`${tokens.createdAt} DESC`);
}

/** Withdraws an open invitation of the actor's firm; 404 for anything else. */
export async function revokeInvitation(
	actor: SessionUser,
	invitationId: string,
	address: string | null
) {
	const [row] = await db
		.select({ id: tokens.id, role: tokens.role, usedAt: tokens.usedAt })
		.from(tokens)
		.where(
			and(
				eq(tokens.id, invitationId),
				eq(tokens.firmId, actor.firmId),
				eq(tokens.purpose, 'invite')
			)
		);
	if (!row) error(404, 'Not found.');
	if (!invitableRoles[actor.role].includes(row.role as Role)) {
		error(403, 'Only a firm admin can withdraw this invitation.');
	}
	if (row.usedAt) return { kind: 'already-used' as const };
	await db.transaction(async (tx) => {
		await tx.update(tokens).set({ revoked: true }).where(eq(tokens.id, row.id));
		await auditAuth(
			{
				action: 'invite-revoke',
				firmId: actor.firmId,
				actorId: actor.id,
				subjectId: row.id,
				entity: 'invitation',
				address
			},
			tx
		);
	});
	return { kind: 'revoked' as const };
}
