/**
 * An upsert of one finding inside its mutation's transaction (docs/sync.md): insert a new
 * finding at version 1, update one whose version the device had, keep anything else as a
 * conflict. The server maps the trap's tag to the site's asset and prices the capture itself.
 */
import { and, eq } from 'drizzle-orm';
import type { FindingCapture } from '../../schemas/capture';
import type { MutationResult, UpsertMutation } from '../../schemas/sync';
import { assetForCapture } from '../assets';
import { areas, assets, findings, headers } from '../db/schema';
import type { Tx } from '../db/types';
import { lockFinding } from './lock';
import { captureKey } from './canonical';
import type { PushContext, PushSurvey } from './context';
import { nextChangeSeq } from './counter';
import { auditFinding, keepConflict } from './journal';
import { priceCapture } from './price';

const EDITED_ELSEWHERE =
	'Someone changed this finding on the server after this device last had it: the server kept ' +
	'their version and holds this edit for the desk to settle';
const DELETED_ELSEWHERE =
	'This finding was deleted on the server after this device last had it: this edit is kept ' +
	'for the desk to settle';

/** A reason the capture cannot be stored on this survey's site, or null. */
async function misplaced(tx: Tx, siteId: string, c: FindingCapture): Promise<string | null> {
	if (c.headerId) {
		const [h] = await tx
			.select({ id: headers.id })
			.from(headers)
			.where(and(eq(headers.id, c.headerId), eq(headers.siteId, siteId)))
			.limit(1);
		if (!h) return 'The header this finding names is not one of this site’s headers';
	}
	if (c.areaId) {
		const [a] = await tx
			.select({ id: areas.id })
			.from(areas)
			.where(and(eq(areas.id, c.areaId), eq(areas.siteId, siteId)))
			.limit(1);
		if (!a) return 'The area this finding names is not one of this site’s areas';
	}
	return null;
}

export async function applyUpsert(
	tx: Tx,
	ctx: PushContext,
	survey: PushSurvey,
	m: UpsertMutation
): Promise<MutationResult> {
	const c = m.data;
	const rejected = (reason: string): MutationResult => ({
		mutationId: m.mutationId,
		status: 'rejected',
		reason
	});
	const wrongPlace = await misplaced(tx, survey.siteId, c);
	if (wrongPlace) return rejected(wrongPlace);

	const found = await lockFinding(tx, m.id);
	const row = found?.row;
	if (row && row.surveyId !== c.surveyId) {
		return rejected('This finding id is already used on another survey: nothing was changed');
	}
	if (row?.deletedAt) return keepConflict(tx, ctx, m, survey.id, row.version, DELETED_ELSEWHERE);
	const before = found?.capture ?? null;
	if (row && m.baseVersion !== row.version) {
		// A repeat of what the server already holds (a new mutation id for the same edit).
		if (m.baseVersion === 0 && before && captureKey(before) === captureKey(c)) {
			return { mutationId: m.mutationId, status: 'applied', version: row.version };
		}
		return keepConflict(tx, ctx, m, survey.id, row.version, EDITED_ELSEWHERE);
	}

	const asset = await assetForCapture(tx, survey.siteId, c);
	const priced = await priceCapture(tx, survey.siteId, c, row?.repairCost ?? null);
	const changeSeq = await nextChangeSeq(tx, ctx.user.firmId);
	if (asset && (asset.created || asset.updated)) {
		await tx.update(assets).set({ changeSeq }).where(eq(assets.id, asset.id));
	}
	const values = {
		kind: c.kind,
		assetId: asset?.id ?? null,
		headerId: c.headerId ?? null,
		areaId: c.areaId ?? null,
		location: c.location,
		notes: c.notes,
		photoIds: c.photoIds,
		inputs: c.inputs as Record<string, unknown>,
		results: priced.results,
		resultsEngine: priced.engine,
		recordedAt: new Date(c.createdAt),
		capturedAt: new Date(c.updatedAt),
		changeSeq
	};
	const version = (row?.version ?? 0) + 1;
	if (row) {
		await tx
			.update(findings)
			.set({ ...values, version })
			.where(eq(findings.id, m.id));
	} else {
		await tx.insert(findings).values({
			...values,
			id: m.id,
			surveyId: c.surveyId,
			recordedBy: ctx.user.id,
			version
		});
	}
	await auditFinding(tx, ctx, m.id, row ? 'update' : 'create', before, {
		capture: c,
		version,
		mutationId: m.mutationId
	});
	return { mutationId: m.mutationId, status: 'applied', version };
}
