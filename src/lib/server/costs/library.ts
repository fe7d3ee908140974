/**
 * The firm's cost library (docs/costs.md): listing, saving and retiring entries. Every change
 * bumps the entry's version and writes an audit row with the figures before and after, so a
 * finding priced from version 3 of an entry can be traced to exactly what it was then.
 */
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import type { CostEntryForm } from '../../schemas/costs';
import { recordChange } from '../audit';
import { costEntries, type CostEntryRow } from '../db/schema';
import type { Db, Executor, Tx } from '../db/types';

/** The firm's live entries, grouped by kind in the order the page shows them. */
export async function listCostEntries(db: Executor, firmId: string): Promise<CostEntryRow[]> {
	return db
		.select()
		.from(costEntries)
		.where(and(eq(costEntries.firmId, firmId), isNull(costEntries.deletedAt)))
		.orderBy(asc(costEntries.kind), asc(costEntries.entryKey));
}

const figures = (row: Pick<CostEntryRow, 'currency' | 'unitCost' | 'labourHours' | 'note'>) => ({
	currency: row.currency,
	unitCost: row.unitCost,
	labourHours: row.labourHours,
	note: row.note
});

export type SaveOutcome =
	| { kind: 'saved'; id: string; version: number }
	/** Another live entry of the firm already prices this type and size. */
	| { kind: 'duplicate' }
	/** The entry changed since the form was opened (or is gone). */
	| { kind: 'moved' }
	| { kind: 'missing' };

const identityColumns = (form: CostEntryForm) => {
	const i = form.identity as Record<string, unknown>;
	return {
		kind: form.identity.kind,
		entryKey: form.key,
		trapType: (i.trapType as string | undefined) ?? null,
		dn: (i.dn as number | undefined) ?? null,
		thicknessMm: (i.thicknessMm as number | undefined) ?? null,
		fittingKind: (i.fittingKind as string | undefined) ?? null,
		sizeClass: (i.sizeClass as string | undefined) ?? null
	};
};

/** A live entry of the firm, locked for the caller's transaction (undefined: none). */
async function lockLiveEntry(tx: Tx, firmId: string, entryId: string) {
	const [row] = await tx
		.select()
		.from(costEntries)
		.where(
			and(
				eq(costEntries.id, entryId),
				eq(costEntries.firmId, firmId),
				isNull(costEntries.deletedAt)
			)
		)
		.for('update');
	return row as CostEntryRow | undefined;
}

/**
 * Creates an entry (`target` null) or writes the next version of one. A retired entry with the
 * same key is brought back as the next version, so its history stays one row's.
 */
export async function saveCostEntry(
	db: Db,
	firmId: string,
	actorId: string,
	form: CostEntryForm,
	target: { entryId: string; version: number } | null
): Promise<SaveOutcome> {
	return db.transaction(async (tx) => {
		const [clash] = await tx
			.select()
			.from(costEntries)
			.where(and(eq(costEntries.firmId, firmId), eq(costEntries.entryKey, form.key)))
			.for('update');
		let current: CostEntryRow | undefined;
		if (target) {
			current = await lockLiveEntry(tx, firmId, target.entryId);
			if (!current) return { kind: 'missing' as const };
			if (current.version !== target.version) return { kind: 'moved' as const };
			if (clash && clash.id !== current.id) return { kind: 'duplicate' as const };
		} else if (clash) {
			if (clash.deletedAt === null) return { kind: 'duplicate' as const };
			current = clash;
		}
		const values = {
			...identityColumns(form),
			currency: form.currency,
			unitCost: form.unitCost,
			labourHours: form.labourHours,
			note: form.note,
			// A person's figure is no longer the seed's invented one.
			demo: false,
			updatedBy: actorId,
			deletedAt: null
		};
		if (current) {
			const version = current.version + 1;
			await tx
				.update(costEntries)
				.set({ ...values, version })
				.where(eq(costEntries.id, current.id));
			await recordChange(tx, {
				firmId,
				actorId,
				entity: 'cost-entry',
				entityId: current.id,
				action: current.deletedAt ? 'restore' : 'update',
				before: { key: current.entryKey, version: current.version, ...figures(current) },
				after: { key: form.key, version, ...figures(values) }
			});
			return { kind: 'saved' as const, id: current.id, version };
		}
		const id = randomUUID();
		await tx.insert(costEntries).values({ id, firmId, ...values });
		await recordChange(tx, {
			firmId,
			actorId,
			entity: 'cost-entry',
			entityId: id,
			action: 'create',
			after: { key: form.key, version: 1, ...figures(values) }
		});
		return { kind: 'saved' as const, id, version: 1 };
	});
}

/** Retires an entry (findings priced from it keep their figure and its id). */
export async function retireCostEntry(
	db: Db,
	firmId: string,
	actorId: string,
	target: { entryId: string; version: number }
): Promise<'retired' | 'moved' | 'missing'> {
	return db.transaction(async (tx) => {
		const row = await lockLiveEntry(tx, firmId, target.entryId);
		if (!row) return 'missing' as const;
		if (row.version !== target.version) return 'moved' as const;
		await tx
			.update(costEntries)
			.set({ deletedAt: new Date(), version: row.version + 1, updatedBy: actorId })
			.where(eq(costEntries.id, row.id));
		await recordChange(tx, {
			firmId,
			actorId,
			entity: 'cost-entry',
			entityId: row.id,
			action: 'retire',
			before: { key: row.entryKey, version: row.version, ...figures(row) }
		});
		return 'retired' as const;
	});
}

/** Whether the firm has any live entry (the survey pages say so when it has none). */
export async function firmHasLibrary(db: Executor, firmId: string): Promise<boolean> {
	const [row] = await db
		.select({ n: sql<number>`COUNT(*)` })
		.from(costEntries)
		.where(and(eq(costEntries.firmId, firmId), isNull(costEntries.deletedAt)));
	return Number(row?.n ?? 0) > 0;
}
