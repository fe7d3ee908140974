/**
 * What a site's header list and its areas share: a name unique per site (case ignored, retired
 * ones included, checked under lock for a clear message) and the audit row of each change.
 */
import { and, eq, ne, sql } from 'drizzle-orm';
import type { Change } from '../audit';
import { areas, headers } from '../db/schema';
import type { Tx } from '../db/types';

/** Another row of the site's list with this name, locked; undefined when the name is free. */
export async function sameName(
	tx: Tx,
	list: typeof areas | typeof headers,
	siteId: string,
	name: string,
	except?: string
): Promise<{ id: string; retiredAt: Date | null } | undefined> {
	const [hit] = await tx
		.select({ id: list.id, retiredAt: list.retiredAt })
		.from(list)
		.where(
			and(
				eq(list.siteId, siteId),
				sql`LOWER(${list.name}) = LOWER(${name})`,
				except ? ne(list.id, except) : undefined
			)
		)
		.limit(1)
		.for('update');
	return hit;
}

/** The audit row of a change to one header or area. */
export const listChange =
	(entity: 'area' | 'header') =>
	(
		user: Pick<SessionUser, 'firmId' | 'id'>,
		id: string,
		action: string,
		before: unknown,
		after: unknown
	): Change => ({
		firmId: user.firmId,
		actorId: user.id,
		entity,
		entityId: id,
		action,
		before,
		after
	});
