/**
 * A firm's people, for Desk's admin pages: who is in, their role, and the admin's levers
 * (change role, disable, enable). Callers have already passed requireRole and requirePerson;
 * these functions still filter by firm so no query can reach another tenant.
 */
import { error } from '@sveltejs/kit';
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import type { Role } from '$lib/schemas/roles';
import { db } from '../db';
import { clientCompanies, tokens, users } from '../db/schema';
import { auditAuth } from './audit';
import { endAllSessions } from './sessions';

export function firmPeople(firmId: string) {
	return db
		.select({
			id: users.id,
			name: users.name,
			email: users.email,
			role: users.role,
			clientCompanyId: users.clientCompanyId,
			client: clientCompanies.name,
			disabledAt: users.disabledAt,
			lastSignInAt: users.lastSignInAt
		})
		.from(users)
		.leftJoin(clientCompanies, eq(clientCompanies.id, users.clientCompanyId))
		.where(eq(users.firmId, firmId))
		.orderBy(asc(users.name));
}

export function firmClients(firmId: string) {
	return db
		.select({ id: clientCompanies.id, name: clientCompanies.name })
		.from(clientCompanies)
		.where(eq(clientCompanies.firmId, firmId))
		.orderBy(asc(clientCompanies.name));
}

interface Person {
	id: string;
	firmId: string;
	role: Role;
	clientCompanyId: string | null;
	disabledAt: Date | null;
}

export async function changeRole(
	actor: SessionUser,
	person: Person,
	to: { role: Role; clientCompanyId: string | null },
	address: string | null
): Promise<void> {
	if (to.clientCompanyId) {
		const [client] = await db
			.select({ id: clientCompanies.id })
			.from(clientCompanies)
			.where(
				and(eq(clientCompanies.id, to.clientCompanyId), eq(clientCompanies.firmId, actor.firmId))
			);
		if (!client) error(400, 'Choose one of your firm’s client companies.');
	}
	if (person.role === to.role && person.clientCompanyId === to.clientCompanyId) return;
	await db.transaction(async (tx) => {
		await tx
			.update(users)
			.set({ role: to.role, clientCompanyId: to.clientCompanyId })
			.where(and(eq(users.id, person.id), eq(users.firmId, actor.firmId)));
		await auditAuth(
			{
				action: 'role-change',
				firmId: actor.firmId,
				actorId: actor.id,
				subjectId: person.id,
				before: { role: person.role, clientCompanyId: person.clientCompanyId },
				after: to,
				address
			},
			tx
		);
	});
	// Pages already open were rendered for the old role; make the person start afresh.
	await endAllSessions(person.id);
}

/**
 * Disables an account: it cannot sign in, every session ends, open reset links die, and so do
 * the invitations the person sent that nobody has accepted yet.
 */
export async function disablePerson(actor: SessionUser, person: Person, address: string | null) {
	if (person.disabledAt) return;
	await db.transaction(async (tx) => {
		await tx
			.update(users)
			.set({ disabledAt: sql`NOW(3)` })
			.where(and(eq(users.id, person.id), eq(users.firmId, actor.firmId)));
		await tx
			.update(tokens)
			.set({ revoked: true })
			.where(and(eq(tokens.userId, person.id), eq(tokens.purpose, 'password-reset')));
		await tx
			.update(tokens)
			.set({ revoked: true })
			.where(
				and(
					eq(tokens.createdBy, person.id),
					eq(tokens.purpose, 'invite'),
					eq(tokens.firmId, actor.firmId),
					isNull(tokens.usedAt)
				)
			);
		await auditAuth(
			{ action: 'disable', firmId: actor.firmId, actorId: actor.id, subjectId: person.id, address },
			tx
		);
	});
	await endAllSessions(person.id);
}

export async function enablePerson(actor: SessionUser, person: Person, address: string | null) {
	if (!person.disabledAt) return;
	await db.transaction(async (tx) => {
		await tx
			.update(users)
			.set({ disabledAt: null })
			.where(and(eq(users.id, person.id), eq(users.firmId, actor.firmId)));
		await auditAuth(
			{ action: 'enable', firmId: actor.firmId, actorId: actor.id, subjectId: person.id, address },
			tx
		);
	});
}
