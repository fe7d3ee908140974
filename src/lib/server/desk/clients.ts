/**
 * The firm's client companies at the Desk: the list with each one's number of sites, one client
 * (404 for another firm's id), creating and editing one. Every change writes its audit row in
 * the same transaction. Callers have passed requireRole(event, 'survey.manage').
 */
import { error } from '@sveltejs/kit';
import { and, asc, count, eq } from 'drizzle-orm';
import { uuidSchema } from '../../schemas/common';
import type { ClientForm } from '../../schemas/desk-sites';
import { recordChange } from '../audit';
import { db } from '../db';
import { clientCompanies, sites } from '../db/schema';

export interface ClientRow {
	id: string;
	name: string;
	contactEmail: string | null;
	notes: string | null;
}

/** The firm's clients by name, with how many sites each has. */
export async function firmClientList(user: SessionUser) {
	const rows = await db
		.select({
			id: clientCompanies.id,
			name: clientCompanies.name,
			contactEmail: clientCompanies.contactEmail,
			sites: count(sites.id)
		})
		.from(clientCompanies)
		.leftJoin(sites, eq(sites.clientCompanyId, clientCompanies.id))
		.where(eq(clientCompanies.firmId, user.firmId))
		.groupBy(clientCompanies.id, clientCompanies.name, clientCompanies.contactEmail)
		.orderBy(asc(clientCompanies.name));
	return rows.map((r) => ({ ...r, sites: Number(r.sites) }));
}

/** One client of the person's firm; 404 for anything else (another firm's, or no such id). */
export async function requireClient(user: SessionUser, clientId: string): Promise<ClientRow> {
	if (!uuidSchema.safeParse(clientId).success) error(404, 'Not found.');
	const [row] = await db
		.select({
			id: clientCompanies.id,
			name: clientCompanies.name,
			contactEmail: clientCompanies.contactEmail,
			notes: clientCompanies.notes
		})
		.from(clientCompanies)
		.where(and(eq(clientCompanies.id, clientId), eq(clientCompanies.firmId, user.firmId)))
		.limit(1);
	if (!row) error(404, 'Not found.');
	return row;
}

export async function createClient(user: SessionUser, form: ClientForm): Promise<string> {
	const id = crypto.randomUUID();
	await db.transaction(async (tx) => {
		await tx.insert(clientCompanies).values({ id, firmId: user.firmId, ...form });
		await recordChange(tx, {
			firmId: user.firmId,
			actorId: user.id,
			entity: 'client',
			entityId: id,
			action: 'create',
			after: form
		});
	});
	return id;
}

/** Saves a client's details; false when nothing changed (no write, no audit row). */
export async function saveClient(
	user: SessionUser,
	clientId: string,
	form: ClientForm
): Promise<boolean> {
	return db.transaction(async (tx) => {
		const where = and(eq(clientCompanies.id, clientId), eq(clientCompanies.firmId, user.firmId));
		const [before] = await tx
			.select({
				name: clientCompanies.name,
				contactEmail: clientCompanies.contactEmail,
				notes: clientCompanies.notes
			})
			.from(clientCompanies)
			.where(where)
			.for('update');
		if (!before) error(404, 'Not found.');
		if (JSON.stringify(before) === JSON.stringify(form)) return false;
		await tx.update(clientCompanies).set(form).where(where);
		await recordChange(tx, {
			firmId: user.firmId,
			actorId: user.id,
			entity: 'client',
			entityId: clientId,
			action: 'update',
			before,
			after: form
		});
		return true;
	});
}
