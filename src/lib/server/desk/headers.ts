/**
 * A site's header list at the Desk. Headers are retired, never deleted: findings keep the
 * header they were recorded on. Names are unique per site, retired ones included, compared
 * without regard to case (so a finding's header name never means two things). A change of
 * pressure, temperature or hours recomputes that header's findings after the commit.
 */
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import type { HeaderInput } from '../../schemas/desk-headers';
import { recordChange } from '../audit';
import { listChange, sameName as siteListName } from './site-lists';
import { db } from '../db';
import { headers } from '../db/schema';
import type { Tx } from '../db/types';
import { recomputeSite } from '../pricing/refresh';
import { nextChangeSeq } from '../sync/counter';

export interface HeaderRow {
	id: string;
	name: string;
	pressure: number;
	designTemperature: number | null;
	operatingHours: number | null;
	retiredAt: Date | null;
}

/** Every header of the site, in the site's order (retired ones too; the page shows them apart). */
export function siteHeaders(siteId: string): Promise<HeaderRow[]> {
	return db
		.select({
			id: headers.id,
			name: headers.name,
			pressure: headers.pressure,
			designTemperature: headers.designTemperature,
			operatingHours: headers.operatingHours,
			retiredAt: headers.retiredAt
		})
		.from(headers)
		.where(eq(headers.siteId, siteId))
		.orderBy(asc(headers.sortOrder), asc(headers.name));
}

export type HeaderChange =
	| { kind: 'done'; id: string; recomputed: number | null }
	| { kind: 'duplicate'; retired: boolean }
	| { kind: 'missing' };

const sameName = (tx: Tx, siteId: string, name: string, except?: string) =>
	siteListName(tx, headers, siteId, name, except);
const audit = listChange('header');

export async function addHeader(
	user: SessionUser,
	siteId: string,
	input: HeaderInput
): Promise<HeaderChange> {
	return db.transaction(async (tx) => {
		const clash = await sameName(tx, siteId, input.name);
		if (clash) return { kind: 'duplicate' as const, retired: clash.retiredAt !== null };
		const [{ last }] = await tx
			.select({ last: sql<number>`COALESCE(MAX(${headers.sortOrder}), 0)` })
			.from(headers)
			.where(eq(headers.siteId, siteId));
		const id = crypto.randomUUID();
		const changeSeq = await nextChangeSeq(tx, user.firmId);
		const values = { ...input, sortOrder: Number(last) + 1 };
		await tx.insert(headers).values({ id, siteId, ...values, changeSeq });
		await recordChange(tx, audit(user, id, 'create', null, { siteId, ...values }));
		return { kind: 'done' as const, id, recomputed: null };
	});
}

export async function updateHeader(
	user: SessionUser,
	siteId: string,
	headerId: string,
	input: HeaderInput
): Promise<HeaderChange> {
	const outcome = await db.transaction(async (tx) => {
		const where = and(eq(headers.id, headerId), eq(headers.siteId, siteId));
		const [before] = await tx
			.select({
				name: headers.name,
				pressure: headers.pressure,
				designTemperature: headers.designTemperature,
				operatingHours: headers.operatingHours
			})
			.from(headers)
			.where(where)
			.for('update');
		if (!before) return { kind: 'missing' as const };
		const clash = await sameName(tx, siteId, input.name, headerId);
		if (clash) return { kind: 'duplicate' as const, retired: clash.retiredAt !== null };
		const physics =
			before.pressure !== input.pressure ||
			before.designTemperature !== input.designTemperature ||
			before.operatingHours !== input.operatingHours;
		if (!physics && before.name === input.name) return { kind: 'same' as const };
		const changeSeq = await nextChangeSeq(tx, user.firmId);
		await tx
			.update(headers)
			.set({ ...input, version: sql`${headers.version} + 1`, changeSeq })
			.where(where);
		await recordChange(tx, audit(user, headerId, 'update', before, input));
		return { kind: 'changed' as const, physics };
	});
	if (outcome.kind === 'missing' || outcome.kind === 'duplicate') return outcome;
	const recomputed =
		outcome.kind === 'changed' && outcome.physics
			? await recomputeSite(db, siteId, { headerId })
			: null;
	return { kind: 'done', id: headerId, recomputed };
}

/** Retires a header (kept for the findings on it); false when there is no such active header. */
export async function retireHeader(user: SessionUser, siteId: string, headerId: string) {
	return db.transaction(async (tx) => {
		const where = and(
			eq(headers.id, headerId),
			eq(headers.siteId, siteId),
			isNull(headers.retiredAt)
		);
		const [row] = await tx.select({ name: headers.name }).from(headers).where(where).for('update');
		if (!row) return false;
		const retiredAt = new Date();
		const changeSeq = await nextChangeSeq(tx, user.firmId);
		await tx
			.update(headers)
			.set({ retiredAt, version: sql`${headers.version} + 1`, changeSeq })
			.where(where);
		await recordChange(tx, audit(user, headerId, 'retire', { retiredAt: null }, { retiredAt }));
		return true;
	});
}
