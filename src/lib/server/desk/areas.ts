/**
 * A site's areas (the plant's own names for where things are) at the Desk. Retired, never
 * deleted: findings and traps keep their area. Names are unique per site (areas_site_name_uq,
 * retired ones included; the collation ignores case), checked first for a clear message.
 */
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import { recordChange } from '../audit';
import { listChange, sameName as siteListName } from './site-lists';
import { db } from '../db';
import { areas } from '../db/schema';
import type { Tx } from '../db/types';
import { nextChangeSeq } from '../sync/counter';

export function siteAreas(siteId: string) {
	return db
		.select({ id: areas.id, name: areas.name, retiredAt: areas.retiredAt })
		.from(areas)
		.where(eq(areas.siteId, siteId))
		.orderBy(asc(areas.sortOrder), asc(areas.name));
}

export type AreaChange =
	{ kind: 'done'; id: string } | { kind: 'duplicate'; retired: boolean } | { kind: 'missing' };

const sameName = (tx: Tx, siteId: string, name: string, except?: string) =>
	siteListName(tx, areas, siteId, name, except);
const audit = listChange('area');

export async function addArea(
	user: SessionUser,
	siteId: string,
	name: string
): Promise<AreaChange> {
	return db.transaction(async (tx) => {
		const clash = await sameName(tx, siteId, name);
		if (clash) return { kind: 'duplicate' as const, retired: clash.retiredAt !== null };
		const [{ last }] = await tx
			.select({ last: sql<number>`COALESCE(MAX(${areas.sortOrder}), 0)` })
			.from(areas)
			.where(eq(areas.siteId, siteId));
		const id = crypto.randomUUID();
		const changeSeq = await nextChangeSeq(tx, user.firmId);
		await tx.insert(areas).values({ id, siteId, name, sortOrder: Number(last) + 1, changeSeq });
		await recordChange(tx, audit(user, id, 'create', null, { siteId, name }));
		return { kind: 'done' as const, id };
	});
}

export async function renameArea(
	user: SessionUser,
	siteId: string,
	areaId: string,
	name: string
): Promise<AreaChange> {
	return db.transaction(async (tx) => {
		const where = and(eq(areas.id, areaId), eq(areas.siteId, siteId));
		const [before] = await tx.select({ name: areas.name }).from(areas).where(where).for('update');
		if (!before) return { kind: 'missing' as const };
		if (before.name === name) return { kind: 'done' as const, id: areaId };
		const clash = await sameName(tx, siteId, name, areaId);
		if (clash) return { kind: 'duplicate' as const, retired: clash.retiredAt !== null };
		const changeSeq = await nextChangeSeq(tx, user.firmId);
		await tx
			.update(areas)
			.set({ name, version: sql`${areas.version} + 1`, changeSeq })
			.where(where);
		await recordChange(tx, audit(user, areaId, 'rename', before, { name }));
		return { kind: 'done' as const, id: areaId };
	});
}

export async function retireArea(user: SessionUser, siteId: string, areaId: string) {
	return db.transaction(async (tx) => {
		const where = and(eq(areas.id, areaId), eq(areas.siteId, siteId), isNull(areas.retiredAt));
		const [row] = await tx.select({ name: areas.name }).from(areas).where(where).for('update');
		if (!row) return false;
		const retiredAt = new Date();
		const changeSeq = await nextChangeSeq(tx, user.firmId);
		await tx
			.update(areas)
			.set({ retiredAt, version: sql`${areas.version} + 1`, changeSeq })
			.where(where);
		await recordChange(tx, audit(user, areaId, 'retire', { retiredAt: null }, { retiredAt }));
		return true;
	});
}
