/**
 * What a mutation leaves besides the finding: an audit row (who, when, what, which device) and,
 * for an edit the server could not apply, the conflict record that keeps it whole.
 */
import { randomUUID } from 'node:crypto';
import type { FindingCapture } from '../../schemas/capture';
import type { Mutation, MutationResult } from '../../schemas/sync';
import { auditLog, findingConflicts } from '../db/schema';
import type { Tx } from '../db/types';
import type { PushContext } from './context';
import { touchFirm } from './counter';

export async function auditFinding(
	tx: Tx,
	ctx: PushContext,
	findingId: string,
	action: 'create' | 'update' | 'delete' | 'conflict',
	before: FindingCapture | null,
	after: unknown
): Promise<void> {
	await tx.insert(auditLog).values({
		firmId: ctx.user.firmId,
		actorId: ctx.user.id,
		entity: 'finding',
		entityId: findingId,
		action,
		before,
		after: after ?? null,
		address: ctx.address?.slice(0, 64) ?? null,
		deviceId: ctx.deviceId
	});
}

/** Keeps the device's edit as a conflict record and answers `conflict` with the server's version. */
export async function keepConflict(
	tx: Tx,
	ctx: PushContext,
	m: Mutation,
	surveyId: string,
	serverVersion: number,
	reason: string
): Promise<MutationResult> {
	const data = m.op === 'upsert' ? m.data : null;
	await tx.insert(findingConflicts).values({
		id: randomUUID(),
		firmId: ctx.user.firmId,
		surveyId,
		findingId: m.id,
		userId: ctx.user.id,
		deviceId: ctx.deviceId,
		mutationId: m.mutationId,
		baseVersion: m.baseVersion,
		serverVersion,
		data
	});
	// The finding's row now shows a conflict waiting: the Desk's kept views must expire.
	await touchFirm(tx, ctx.user.firmId);
	await auditFinding(tx, ctx, m.id, 'conflict', null, {
		op: m.op,
		baseVersion: m.baseVersion,
		serverVersion,
		mutationId: m.mutationId
	});
	return { mutationId: m.mutationId, status: 'conflict', version: serverVersion, reason };
}
