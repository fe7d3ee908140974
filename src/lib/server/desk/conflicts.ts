/**
 * Sync conflicts at the Desk (docs/sync.md: an edit a device made on a version the server had
 * moved past, kept whole in finding_conflicts). A consultant settles one by keeping the
 * server's finding, the device's capture (a device's deletion deletes), or a field-by-field
 * merge. Nothing is lost: the conflict row keeps the device's data and gains who settled it,
 * when, how and what was written; the finding gets its next version (priced, version + 1, a
 * new change_seq so every device pulls the answer, and the device that conflicted is settled
 * by it) and an audit row — one transaction, refused if the finding moved since the page
 * was opened.
 */
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { findingCaptureSchema, type FindingCapture } from '../../schemas/capture';
import { recordChange } from '../audit';
import { findingConflicts, findings, users } from '../db/schema';
import type { Db, Executor } from '../db/types';
import { findingsFrozen } from '../publish/lock';
import { lockFinding } from '../sync/lock';
import { compareCaptures, mergeCaptures, type FieldRow } from './conflict-fields';
import { deskSurvey, editSite, findingOfSurvey } from './finding-detail';
import { formContext } from './finding-form';
import { MOVED_MESSAGE, writeNextVersion, type NextVersion } from './finding-edit';

export type ResolutionKind = 'kept-server' | 'kept-device' | 'merged';

export const RESOLUTION_WORDS: Record<ResolutionKind, string> = {
	'kept-server': 'Kept the server’s finding',
	'kept-device': 'Kept the device’s edit',
	merged: 'Merged field by field'
};

/** The device's capture, or null for a deletion (or data this server cannot read). */
function deviceCapture(data: unknown): FindingCapture | null {
	if (data === null || data === undefined) return null;
	const parsed = findingCaptureSchema.safeParse(data);
	return parsed.success ? parsed.data : null;
}

/** The survey's conflicts: waiting ones oldest first, settled ones newest first. */
export async function surveyConflicts(db: Executor, firmId: string, surveyId: string) {
	const rows = await db
		.select({
			id: findingConflicts.id,
			findingId: findingConflicts.findingId,
			who: users.name,
			deviceId: findingConflicts.deviceId,
			createdAt: findingConflicts.createdAt,
			baseVersion: findingConflicts.baseVersion,
			serverVersion: findingConflicts.serverVersion,
			deleted: sql<number>`(${findingConflicts.data} IS NULL)`,
			resolvedAt: findingConflicts.resolvedAt,
			resolutionKind: findingConflicts.resolutionKind,
			resolvedBy: findingConflicts.resolvedBy,
			location: findings.location,
			kind: findings.kind
		})
		.from(findingConflicts)
		.innerJoin(users, eq(users.id, findingConflicts.userId))
		.leftJoin(findings, eq(findings.id, findingConflicts.findingId))
		.where(and(eq(findingConflicts.firmId, firmId), eq(findingConflicts.surveyId, surveyId)))
		.orderBy(asc(findingConflicts.createdAt), asc(findingConflicts.id));
	const resolverIds = [...new Set(rows.map((r) => r.resolvedBy).filter((v): v is string => !!v))];
	const resolvers = resolverIds.length
		? await db
				.select({ id: users.id, name: users.name })
				.from(users)
				.where(and(eq(users.firmId, firmId), inArray(users.id, resolverIds)))
		: [];
	const list = rows.map((r) => ({
		...r,
		deleted: Boolean(r.deleted),
		createdAt: r.createdAt.toISOString(),
		resolvedAt: r.resolvedAt?.toISOString() ?? null,
		resolvedBy: resolvers.find((u) => u.id === r.resolvedBy)?.name ?? null,
		resolutionWords: r.resolutionKind ? RESOLUTION_WORDS[r.resolutionKind as ResolutionKind] : null
	}));
	return {
		waiting: list.filter((c) => c.resolvedAt === null),
		resolved: list.filter((c) => c.resolvedAt !== null).reverse()
	};
}

async function conflictRow(db: Executor, firmId: string, surveyId: string, conflictId: string) {
	const [row] = await db
		.select()
		.from(findingConflicts)
		.where(
			and(
				eq(findingConflicts.id, conflictId),
				eq(findingConflicts.firmId, firmId),
				eq(findingConflicts.surveyId, surveyId)
			)
		)
		.limit(1);
	return row ?? null;
}

/** One conflict side by side, or null (another firm's, another survey's, none). */
export async function conflictDetail(
	db: Db,
	user: SessionUser,
	surveyId: string,
	conflictId: string
) {
	const survey = await deskSurvey(db, user.firmId, surveyId);
	if (!survey) return null;
	const row = await conflictRow(db, user.firmId, surveyId, conflictId);
	if (!row) return null;
	const found = await findingOfSurvey(db, surveyId, row.findingId);
	if (!found) return null;
	const device = deviceCapture(row.data);
	const server = found.row.deletedAt ? null : found.capture;
	const site = await editSite(db, user.id, survey, {
		headerId: found.capture.headerId,
		areaId: found.capture.areaId
	});
	const ctx = formContext(site, found.capture);
	const [who] = await db
		.select({ name: users.name })
		.from(users)
		.where(eq(users.id, row.userId))
		.limit(1);
	const [resolver] = row.resolvedBy
		? await db.select({ name: users.name }).from(users).where(eq(users.id, row.resolvedBy))
		: [];
	return {
		survey,
		conflict: {
			id: row.id,
			findingId: row.findingId,
			who: who?.name ?? 'someone',
			deviceId: row.deviceId,
			createdAt: row.createdAt.toISOString(),
			baseVersion: row.baseVersion,
			serverVersion: row.serverVersion,
			deviceDeleted: row.data === null,
			deviceUnreadable: row.data !== null && device === null,
			resolvedAt: row.resolvedAt?.toISOString() ?? null,
			resolvedBy: resolver?.name ?? null,
			resolutionKind: row.resolutionKind as ResolutionKind | null
		},
		finding: {
			version: found.row.version,
			kind: found.row.kind,
			location: found.capture.location,
			deleted: found.row.deletedAt !== null
		},
		fields: compareCaptures(server ?? found.capture, device, ctx)
	};
}

export type ResolveOutcome =
	| { kind: 'resolved'; version: number }
	| { kind: 'missing' }
	| { kind: 'settled' }
	| { kind: 'moved' }
	/** The survey is published: its findings stay as they went to the client. */
	| { kind: 'frozen' }
	| { kind: 'refused'; message: string; errors: Record<string, string> };

export interface ResolveInput {
	firmId: string;
	actorId: string;
	surveyId: string;
	conflictId: string;
	openedVersion: number;
	how: ResolutionKind;
	/** For `merged`: per field, server or device. */
	choices?: Record<string, 'server' | 'device'>;
}

class Refusal extends Error {
	constructor(readonly outcome: ResolveOutcome) {
		super('refused');
	}
}

/** Settles a conflict as `how`, all in one transaction. */
export async function resolveConflict(db: Db, input: ResolveInput): Promise<ResolveOutcome> {
	try {
		return await db.transaction(async (tx) => {
			// The survey row before the finding's, in the order a publication takes them.
			if (await findingsFrozen(tx, input.surveyId)) return { kind: 'frozen' as const };
			const [row] = await tx
				.select()
				.from(findingConflicts)
				.where(
					and(
						eq(findingConflicts.id, input.conflictId),
						eq(findingConflicts.firmId, input.firmId),
						eq(findingConflicts.surveyId, input.surveyId)
					)
				)
				.for('update');
			if (!row) return { kind: 'missing' as const };
			if (row.resolvedAt) return { kind: 'settled' as const };
			const found = await lockFinding(tx, row.findingId);
			if (!found || found.row.surveyId !== input.surveyId) return { kind: 'missing' as const };
			if (found.row.version !== input.openedVersion) return { kind: 'moved' as const };
			const device = deviceCapture(row.data);
			if (row.data !== null && device === null && input.how !== 'kept-server') {
				return refuse('The device’s edit cannot be read as a finding: keep the server’s.');
			}
			const serverDeleted = found.row.deletedAt !== null;
			let next: NextVersion;
			let written: unknown;
			if (input.how === 'kept-server') {
				next = serverDeleted ? { op: 'delete' } : { op: 'same' };
				written = serverDeleted ? 'deleted' : found.capture;
			} else if (input.how === 'kept-device') {
				next = device
					? { op: 'write', capture: device, repairCost: found.row.repairCost }
					: { op: 'delete' };
				written = device ?? 'deleted';
			} else {
				if (!device) return refuse('The device deleted this finding: keep one side instead.');
				const survey = await deskSurvey(tx, input.firmId, input.surveyId);
				const site = await editSite(tx, input.actorId, survey!, {
					headerId: found.capture.headerId,
					areaId: found.capture.areaId
				});
				const rows: FieldRow[] = compareCaptures(
					found.capture,
					device,
					formContext(site, found.capture)
				);
				const merged = mergeCaptures(found.capture, device, input.choices ?? {}, rows);
				if ('problem' in merged) return refuse(merged.problem, merged.errors);
				next = { op: 'write', capture: merged.capture, repairCost: found.row.repairCost };
				written = merged.capture;
			}
			const resolution = {
				written,
				choices: input.how === 'merged' ? (input.choices ?? {}) : null,
				findingVersionBefore: found.row.version
			};
			const outcome = await writeNextVersion(tx, { ...input, findingId: row.findingId }, next, {
				action: next.op === 'delete' ? 'delete' : 'update',
				extra: { conflictId: row.id, resolutionKind: input.how }
			});
			if (outcome.kind === 'moved') return { kind: 'moved' as const };
			if (outcome.kind === 'frozen') return { kind: 'frozen' as const };
			if (outcome.kind === 'missing') return { kind: 'missing' as const };
			if (outcome.kind === 'misplaced') return refuse(outcome.message);
			await tx
				.update(findingConflicts)
				.set({
					resolvedAt: new Date(),
					resolvedBy: input.actorId,
					resolutionKind: input.how,
					resolution: { ...resolution, version: outcome.version }
				})
				.where(eq(findingConflicts.id, row.id));
			await recordChange(tx, {
				firmId: input.firmId,
				actorId: input.actorId,
				entity: 'finding-conflict',
				entityId: row.id,
				action: 'resolve',
				before: { data: row.data, baseVersion: row.baseVersion },
				after: { resolutionKind: input.how, ...resolution, version: outcome.version }
			});
			return { kind: 'resolved' as const, version: outcome.version };
		});
	} catch (e) {
		if (e instanceof Refusal) return e.outcome;
		throw e;
	}
}

/** Throws out of the transaction (nothing written) with the refusal to answer. */
function refuse(message: string, errors: Record<string, string> = {}): never {
	throw new Refusal({ kind: 'refused', message, errors });
}

export { MOVED_MESSAGE };
