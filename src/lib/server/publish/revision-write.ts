/**
 * Writing a revision (docs/publishing.md): its row with the savings list's totals and the
 * snapshot of the survey's live findings and measures. No app pool here, so the seed can use it.
 */
import { eq } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { surveyRevisions } from '../db/schema';
import type { Tx } from '../db/types';
import { savingsTotals } from '../savings/totals';
import { writeMeasuresSnapshot, writeSnapshot } from './snapshot';

/**
 * The revision row with the savings list's totals, and the snapshot of the survey's live
 * findings and measures (inside the caller's transaction, the survey row locked and its basis
 * frozen): the part of publishing that makes what the client sees.
 */
export async function writeRevision(
	tx: Tx,
	r: {
		surveyId: string;
		number: number;
		basisId: string;
		currency: string;
		actorId: string | null;
		note: string | null;
		at: Date;
	}
) {
	const { totals } = await savingsTotals(tx, {
		id: r.surveyId,
		basisId: r.basisId,
		currency: r.currency
	});
	const revisionId = randomUUID();
	await tx.insert(surveyRevisions).values({
		id: revisionId,
		surveyId: r.surveyId,
		number: r.number,
		publishedAt: r.at,
		publishedBy: r.actorId,
		costBasisId: r.basisId,
		note: r.note,
		totals,
		findingCount: 0
	});
	const copied = await writeSnapshot(tx, revisionId, r.surveyId, r.basisId);
	await writeMeasuresSnapshot(tx, revisionId, r.surveyId);
	await tx
		.update(surveyRevisions)
		.set({ findingCount: copied })
		.where(eq(surveyRevisions.id, revisionId));
	return { revisionId, totals, copied };
}
