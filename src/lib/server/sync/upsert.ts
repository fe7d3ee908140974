/**
 * An upsert of one finding inside its mutation's transaction (docs/sync.md): insert a new
 * finding at version 1, update one whose version the device had, keep anything else as a
 * conflict. The server maps the trap's tag to the site's asset and prices the capture itself.
 */
import { eq } from 'drizzle-orm';
import type { MutationResult, UpsertMutation } from '../../schemas/sync';
import { assetForCapture } from '../assets';
import { assets, findings } from '../db/schema';
import type { Tx } from '../db/types';
import { captureColumns } from '../walk/capture-row';
import { lockFinding } from './lock';
import { captureKey } from './canonical';
import type { PushContext, PushSurvey } from './context';
import { nextChangeSeq } from './counter';
import { auditFinding, keepConflict } from './journal';
import { misplaced, priceCapture, siteFactsOnce } from './price';

const EDITED_ELSEWHERE =
	'Someone changed this finding on the server after this device last had it: the server kept ' +
	'their version and holds this edit for the desk to settle';
const DELETED_ELSEWHERE =
	'This finding was deleted on the server after this device last had it: this edit is kept ' +
	'for the desk to settle';

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
	const site = await siteFactsOnce(tx, ctx.sites, survey.siteId);
	const wrongPlace = misplaced(site, c);
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
	const priced = priceCapture(site, c, row?.repairCost ?? null);
	const changeSeq = await nextChangeSeq(tx, ctx.user.firmId);
	if (asset && (asset.created || asset.updated)) {
		await tx.update(assets).set({ changeSeq }).where(eq(assets.id, asset.id));
	}
	const values = {
		...captureColumns(c, asset?.id ?? null),
		...priced,
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
