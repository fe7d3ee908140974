/**
 * Tagged assets (steam traps) by the plant's tag. A capture names a trap by its tag; the
 * asset is what carries that trap from survey to survey (its details, its last result).
 */
import { randomUUID } from 'node:crypto';
import { and, eq, sql } from 'drizzle-orm';
import type { FindingCapture, TrapCapture } from '../schemas/capture';
import { trapAssetDetailsSchema, type TrapAssetDetails } from '../schemas/snapshot';
import { assets } from './db/schema';
import type { Executor } from './db/types';

/** What a trap keeps from its latest capture (type, size, orifice, where it discharges). */
export function trapDetails(capture: TrapCapture): TrapAssetDetails {
	const { trapType, dn, orificeDiameter, discharge, backPressure } = capture.inputs;
	return trapAssetDetailsSchema.parse({ trapType, dn, orificeDiameter, discharge, backPressure });
}

/** Stable text of a details object, so key order or a missing key never counts as a change. */
function detailsKey(details: unknown): string {
	const parsed = trapAssetDetailsSchema.safeParse(details);
	if (!parsed.success) return 'invalid';
	const d = parsed.data;
	return JSON.stringify([
		d.trapType,
		d.dn,
		d.orificeDiameter ?? null,
		d.discharge ?? null,
		d.backPressure ?? null
	]);
}

export interface AssetMatch {
	id: string;
	created: boolean;
	/** The details (or a missing location, area or header) were changed by this capture. */
	updated: boolean;
}

const selectByTag = (tx: Executor, siteId: string, tag: string) =>
	tx
		.select()
		.from(assets)
		.where(and(eq(assets.siteId, siteId), eq(assets.tag, tag)))
		.limit(1)
		.for('update');

/**
 * The site's asset for a capture's tag, inside the caller's transaction. A trap capture with a
 * new tag creates the asset (kind trap, details from its inputs, location, area and header from
 * the capture); a known tag gets the capture's details when they differ, and the capture's
 * location, area and header where the asset has none yet. A retired asset that is tested again
 * is back in service. Captures of other kinds only find an existing asset; untagged ones none.
 * Version goes up with every change; change_seq is left to the sync route, which owns the feed.
 *
 * `newAssetId` fixes the id of an asset this call creates (demo seed); otherwise a UUID.
 */
export async function assetForCapture(
	tx: Executor,
	siteId: string,
	capture: FindingCapture,
	newAssetId?: string
): Promise<AssetMatch | null> {
	const tag = capture.assetTag?.trim();
	if (!tag) return null;
	let [row] = await selectByTag(tx, siteId, tag);
	if (capture.kind !== 'trap') return row ? { id: row.id, created: false, updated: false } : null;

	const details = trapDetails(capture);
	if (!row) {
		const id = newAssetId ?? randomUUID();
		// Two pushes may bring one new tag at once: the unique (site, tag) index lets one
		// insert win and the other find the winner's row below.
		await tx
			.insert(assets)
			.values({
				id,
				siteId,
				kind: 'trap',
				tag,
				location: capture.location || null,
				areaId: capture.areaId ?? null,
				headerId: capture.headerId ?? null,
				details
			})
			.onDuplicateKeyUpdate({ set: { id: sql`id` } });
		[row] = await selectByTag(tx, siteId, tag);
		if (!row) throw new Error(`Asset id ${id} is taken by another tag than ${tag}`);
		if (row.id === id) return { id, created: true, updated: false };
	}

	const change: Partial<typeof assets.$inferInsert> = {};
	if (detailsKey(row.details) !== detailsKey(details)) change.details = details;
	if (!row.location && capture.location) change.location = capture.location;
	if (!row.areaId && capture.areaId) change.areaId = capture.areaId;
	if (!row.headerId && capture.headerId) change.headerId = capture.headerId;
	if (row.retiredAt) change.retiredAt = null;
	if (Object.keys(change).length === 0) return { id: row.id, created: false, updated: false };
	await tx
		.update(assets)
		.set({ ...change, version: sql`${assets.version} + 1` })
		.where(eq(assets.id, row.id));
	return { id: row.id, created: false, updated: true };
}
