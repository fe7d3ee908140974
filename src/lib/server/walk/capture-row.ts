/**
 * A stored finding row as the device's capture: the one way the server hands a finding back
 * to a phone (snapshot now, sync pull later), so both say the same thing about it.
 */
import { findingCaptureSchema, type FindingCapture } from '../../schemas/capture';
import type { FindingRow } from '../db/schema';

/** The columns of `findings` a capture is read from (plus the asset's tag). */
export type CaptureColumns = Pick<
	FindingRow,
	| 'id'
	| 'surveyId'
	| 'kind'
	| 'headerId'
	| 'areaId'
	| 'location'
	| 'notes'
	| 'inputs'
	| 'photoIds'
	| 'recordedAt'
	| 'capturedAt'
	| 'createdAt'
	| 'updatedAt'
> & { assetTag: string | null };

/**
 * The capture of a stored finding, validated with the shared schema (a row that fails it is
 * a server fault and throws). Times are the device's (recorded_at, captured_at) where stored,
 * else the row's own; the last change is never before the recording, as the schema demands.
 */
export function captureFromRow(row: CaptureColumns): FindingCapture {
	const createdAt = row.recordedAt ?? row.createdAt;
	const changed = row.capturedAt ?? row.updatedAt;
	const updatedAt = changed < createdAt ? createdAt : changed;
	return findingCaptureSchema.parse({
		id: row.id,
		surveyId: row.surveyId,
		kind: row.kind,
		inputs: row.inputs,
		...(row.headerId ? { headerId: row.headerId } : {}),
		...(row.areaId ? { areaId: row.areaId } : {}),
		...(row.assetTag ? { assetTag: row.assetTag } : {}),
		location: row.location ?? '',
		notes: row.notes ?? '',
		photoIds: row.photoIds ?? [],
		createdAt: createdAt.toISOString(),
		updatedAt: updatedAt.toISOString()
	});
}

/**
 * The other way: the `findings` columns a capture is stored in (the sync push and the demo seed
 * write a capture the same way, so captureFromRow reads back exactly what was sent).
 */
export function captureColumns(c: FindingCapture, assetId: string | null) {
	return {
		kind: c.kind,
		assetId,
		headerId: c.headerId ?? null,
		areaId: c.areaId ?? null,
		location: c.location,
		notes: c.notes,
		photoIds: c.photoIds,
		inputs: c.inputs as Record<string, unknown>,
		condition: conditionOf(c),
		recordedAt: new Date(c.createdAt),
		capturedAt: new Date(c.updatedAt)
	};
}

/** What the Desk filters a finding's condition by: a trap's condition, a leak's size class. */
export function conditionOf(c: FindingCapture): string | null {
	if (c.kind === 'trap') return c.inputs.condition;
	if (c.kind === 'leak') return c.inputs.sizeClass ?? null;
	return null;
}
