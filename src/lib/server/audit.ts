/**
 * One audit row per change made at the Desk (clients, sites, cost bases, headers, areas,
 * surveys, findings, conflicts): who, what, before and after, in the caller's transaction so
 * the row exists exactly when the change does.
 */
import { auditLog } from './db/schema';
import type { Executor } from './db/types';

export interface Change {
	firmId: string;
	actorId: string;
	/** e.g. client, site, cost-basis, header, area, survey, finding, finding-conflict */
	entity: string;
	entityId: string;
	/** e.g. create, update, retire, assign, unassign, stage, review, resolve */
	action: string;
	before?: unknown;
	after?: unknown;
}

/** JSON-safe (dates as ISO strings, no undefined) so the row reads back as it was written. */
const plain = (v: unknown) => (v === undefined ? null : JSON.parse(JSON.stringify(v)));

export async function recordChange(tx: Executor, change: Change): Promise<void> {
	await tx.insert(auditLog).values({
		firmId: change.firmId,
		actorId: change.actorId,
		entity: change.entity,
		entityId: change.entityId,
		action: change.action,
		before: plain(change.before),
		after: plain(change.after)
	});
}
