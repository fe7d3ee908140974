/**
 * Writing a finding's next version from the Desk: a consultant's correction, or a conflict's
 * resolution. One transaction: the finding row locked (lockFinding), the version the page was
 * opened at checked, the capture placed on the site (header, area of this site; the trap's tag
 * to its asset), the figures priced by the engine on the survey's basis (figureColumns), the
 * version and the firm's change counter moved on — so the auditor's device pulls it, and a
 * device still editing the old version gets a conflict (docs/sync.md) — and one audit row.
 */
import { and, eq, sql } from 'drizzle-orm';
import type { FindingCapture } from '../../schemas/capture';
import { assetForCapture } from '../assets';
import { recordChange } from '../audit';
import { assets, findings, sites, surveys } from '../db/schema';
import type { Db, Tx } from '../db/types';
import { pricingContext } from '../pricing/context';
import { figureColumns } from '../pricing/figures';
import { findingsFrozen } from '../publish/lock';
import { misplaced } from '../sync/price';
import { nextChangeSeq } from '../sync/counter';
import { lockFinding, type LockedFinding } from '../sync/lock';
import { captureColumns } from '../walk/capture-row';

export const MOVED_MESSAGE =
	'Someone changed this finding after you opened it (an auditor’s device or another consultant): ' +
	'nothing was saved. Your values are still in the form — open the finding again to see theirs.';

/** What a Desk write does to the finding. */
export type NextVersion =
	| { op: 'write'; capture: FindingCapture; repairCost: number | null }
	/** Keep the finding as it is, as a new version (the device's edit set aside). */
	| { op: 'same' }
	/** Soft delete (a device's deletion kept). */
	| { op: 'delete' };

export type WriteOutcome =
	| { kind: 'written'; version: number; before: Record<string, unknown>; after: unknown }
	| { kind: 'moved'; version: number }
	| { kind: 'missing' }
	| { kind: 'misplaced'; message: string; field: 'headerId' | 'areaId' }
	/** The survey is published: its findings are frozen until a correction is opened. */
	| { kind: 'frozen' };

export interface WriteTarget {
	firmId: string;
	actorId: string;
	surveyId: string;
	findingId: string;
	/** The version the page was opened at. */
	openedVersion: number;
}

/** The site and the basis the survey is priced on (frozen when published, else the site's). */
export async function surveyPricing(tx: Tx | Db, firmId: string, surveyId: string) {
	const [row] = await tx
		.select({
			siteId: surveys.siteId,
			basisId: sql<string | null>`COALESCE(${surveys.costBasisId}, ${sites.costBasisId})`
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(and(eq(surveys.id, surveyId), eq(surveys.firmId, firmId)))
		.limit(1);
	return row ?? null;
}

function snapshot(found: LockedFinding) {
	return {
		capture: found.capture,
		repairCost: found.row.repairCost,
		version: found.row.version,
		deleted: found.row.deletedAt !== null
	};
}

/**
 * Writes the finding's next version inside the caller's transaction; `audit` adds to the
 * audit row's `after` (what a resolution chose). Nothing is written unless it returns written.
 */
export async function writeNextVersion(
	tx: Tx,
	target: WriteTarget,
	next: NextVersion,
	audit: { action: string; extra?: Record<string, unknown> } = { action: 'update' }
): Promise<WriteOutcome> {
	const survey = await surveyPricing(tx, target.firmId, target.surveyId);
	if (!survey) return { kind: 'missing' };
	if (await findingsFrozen(tx, target.surveyId)) return { kind: 'frozen' };
	const found = await lockFinding(tx, target.findingId);
	if (!found || found.row.surveyId !== target.surveyId) return { kind: 'missing' };
	const row = found.row;
	if (row.version !== target.openedVersion) return { kind: 'moved', version: row.version };
	const version = row.version + 1;
	const before = snapshot(found);
	let after: Record<string, unknown>;
	if (next.op === 'delete') {
		const changeSeq = await nextChangeSeq(tx, target.firmId);
		await tx
			.update(findings)
			.set({ deletedAt: row.deletedAt ?? new Date(), version, changeSeq })
			.where(eq(findings.id, row.id));
		after = { deleted: true, version };
	} else {
		const capture = next.op === 'write' ? next.capture : found.capture;
		const repairCost = next.op === 'write' ? next.repairCost : row.repairCost;
		const ctx = await pricingContext(tx, survey.siteId, survey.basisId);
		const wrong = misplaced(ctx, capture);
		if (wrong) {
			return {
				kind: 'misplaced',
				message: wrong,
				field: wrong.includes('header') ? 'headerId' : 'areaId'
			};
		}
		// Checked before anything is written, so a refusal leaves the finding as it was.
		const changeSeq = await nextChangeSeq(tx, target.firmId);
		const asset = await assetForCapture(tx, survey.siteId, capture);
		if (asset && (asset.created || asset.updated)) {
			await tx.update(assets).set({ changeSeq }).where(eq(assets.id, asset.id));
		}
		const figures = figureColumns(ctx, repairCost === null ? capture : { ...capture, repairCost });
		await tx
			.update(findings)
			.set({
				...captureColumns(capture, asset?.id ?? null),
				...figures,
				repairCost,
				// A figure typed in the edit form is the consultant's own (docs/costs.md).
				...(repairCost === row.repairCost
					? {}
					: {
							repairCostSource: repairCost === null ? null : 'edited',
							repairCostNote: null,
							costEntryId: null,
							costEntryVersion: null
						}),
				// A kept capture brings a deleted finding back.
				deletedAt: null,
				version,
				changeSeq
			})
			.where(eq(findings.id, row.id));
		after = { capture, repairCost, version, cost: figures.cost, pricingNote: figures.pricingNote };
	}
	await recordChange(tx, {
		firmId: target.firmId,
		actorId: target.actorId,
		entity: 'finding',
		entityId: row.id,
		action: audit.action,
		before,
		after: { ...after, ...audit.extra }
	});
	return { kind: 'written', version, before, after };
}

/** A consultant's correction of a finding (capture and repair cost) as its next version. */
export async function editFinding(
	db: Db,
	target: WriteTarget,
	capture: FindingCapture,
	repairCost: number | null
): Promise<WriteOutcome> {
	return db.transaction(async (tx) => {
		// The survey row before the finding's, in the order a publication takes them.
		if (await findingsFrozen(tx, target.surveyId)) return { kind: 'frozen' as const };
		const found = await lockFinding(tx, target.findingId);
		if (!found || found.row.deletedAt) return { kind: 'missing' as const };
		return writeNextVersion(tx, target, { op: 'write', capture, repairCost });
	});
}
