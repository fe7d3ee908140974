/**
 * Invitations: an admin or consultant invites an address with a role (and a client company for
 * client users); the invitee opens the e-mailed link, chooses a name and password, and the
 * account exists from then on. The link is single-use, expires, and is stored hashed.
 */
import { randomUUID } from 'node:crypto';
import { error } from '@sveltejs/kit';
import { TransactionRollbackError, and, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Invite } from '$lib/schemas/people';
import { roleSchema, type Role } from '$lib/schemas/roles';
import { db } from '../db';
import { clientCompanies, firms, tokens, users } from '../db/schema';
import { sendMail } from '../mail/send';
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
	type TokenLookup
} from './tokens';

export type InviteOutcome =
	| { kind: 'sent' }
	| { kind: 'member'; name: string }
	| { kind: 'no-such-client' }
	| { kind: 'not-sent' };

interface Context {
	/** Where links in the message point (see mail/config.ts linkOrigin). */
	origin: string;
	address: string | null;
}

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
	const [firm] = await db
		.select({ name: firms.name })
		.from(firms)
		.where(eq(firms.id, actor.firmId));
	const [existing] = await db
		.select({ firmId: users.firmId, name: users.name })
		.from(users)
		.where(eq(users.email, input.email))
		.limit(1);
	if (existing?.firmId === actor.firmId) return { kind: 'member', name: existing.name };
	if (existing) {
		// The address has an account with another firm. Telling the inviter so would reveal
		// another tenant's people; the owner of the address is told instead.
		await auditAuth({
			action: 'invite',
			firmId: actor.firmId,
			actorId: actor.id,
			subjectId: null,
			entity: 'invitation',
			after: { role: input.role, outcome: 'address-has-account' },
			address: ctx.address
		});
		return (await trySend(
			input.email,
			actor.firmId,
			alreadyRegisteredMessage({ firmName: firm.name, inviterName: actor.name })
		))
			? { kind: 'sent' }
			: { kind: 'not-sent' };
	}

	const { token, hash } = newToken();
	const id = randomUUID();
	await db.transaction(async (tx) => {
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
	});
	const message = invitationMessage({
		firmName: firm.name,
		inviterName: actor.name,
		role: input.role,
		clientName,
		url: `${ctx.origin}/invitation/${token}`,
		days: tokenLifetimeMs.invite / (24 * 3600_000)
	});
	if (await trySend(input.email, actor.firmId, message)) return { kind: 'sent' };
	// An invitation nobody received should not stay open.
	await db.update(tokens).set({ revoked: true }).where(eq(tokens.id, id));
	return { kind: 'not-sent' };
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

/** What the invitation page shows before the invitee sets a password. */
export async function describeInvitation(token: string) {
	const found = await lookUpToken(token, 'invite');
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
	const found = await lookUpToken(token, 'invite');
	if (found.state !== 'valid') return { kind: 'dead', state: found.state };
	const row = found.row;
	const role = roleSchema.parse(row.role);
	const passwordHash = await hashPassword(input.password);
	const userId = randomUUID();
	try {
		return await db.transaction(async (tx) => {
			if (!(await spendToken(tx, row.id))) return { kind: 'dead', state: 'used' } as const;
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
