/** A finding row locked for the rest of the mutation's transaction, with its trap's tag. */
import { eq } from 'drizzle-orm';
import { assets, findings, type FindingRow } from '../db/schema';
import type { Tx } from '../db/types';
import { captureFromRow } from '../walk/capture-row';
import type { FindingCapture } from '../../schemas/capture';

export interface LockedFinding {
	row: FindingRow;
	/** The row as a capture (for the audit log and for comparing edits). */
	capture: FindingCapture;
}

export async function lockFinding(tx: Tx, id: string): Promise<LockedFinding | null> {
	const [row] = await tx.select().from(findings).where(eq(findings.id, id)).limit(1).for('update');
	if (!row) return null;
	const [asset] = row.assetId
		? await tx.select({ tag: assets.tag }).from(assets).where(eq(assets.id, row.assetId)).limit(1)
		: [];
	return { row, capture: captureFromRow({ ...row, assetTag: asset?.tag ?? null }) };
}
