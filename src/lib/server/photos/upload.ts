/**
 * Storing one uploaded photo (docs/sync.md, `PUT /api/photos/[id]`) once its bytes are read:
 * the hash checked, the type read from the bytes, then idempotent by id — the same bytes again
 * answer 200, other bytes 409. The row is inserted first inside a transaction and the bytes
 * written before it commits: a concurrent upload of the same id waits on that row and never
 * overwrites the stored bytes; a failed write leaves no row. (Should the commit itself fail
 * after the bytes were stored, they stay under their key without a row: never served, and
 * replaced whole by the retry.)
 */
import { createHash } from 'node:crypto';
import { error } from '@sveltejs/kit';
import { and, eq } from 'drizzle-orm';
import { auditLog, findings, photos } from '../db/schema';
import type { Db } from '../db/types';
import { photoKey, type PhotoStore } from '../storage';
import { nextChangeSeq } from '../sync/counter';
import { dimensions } from './dimensions';
import { sniffPhoto } from './sniff';

export interface PhotoUpload {
	id: string;
	findingId: string;
	surveyId: string;
	firmId: string;
	sha256: string;
	bytes: Uint8Array;
	/** The caller's address, for the audit log. */
	address?: string;
}

export interface PhotoAnswer {
	status: 200 | 201;
	body: { id: string; sha256: string; bytes: number; contentType: string };
}

type PhotoRow = typeof photos.$inferSelect;

function again(row: PhotoRow, upload: PhotoUpload): PhotoAnswer {
	if (row.firmId !== upload.firmId) error(404, 'Not found.');
	if (row.sha256 !== upload.sha256) {
		error(409, 'Another photo is already stored under this id; it was kept and this one was not');
	}
	return {
		status: 200,
		body: { id: row.id, sha256: row.sha256, bytes: row.bytes, contentType: row.contentType }
	};
}

const isDuplicateKey = (e: unknown) =>
	(e as { cause?: { errno?: number } }).cause?.errno === 1062 ||
	(e as { errno?: number }).errno === 1062;

/** Bytes into storage; a store that cannot take them is a 503 the device retries later. */
async function putBytes(store: PhotoStore, key: string, bytes: Uint8Array, type: string) {
	try {
		await store.put(key, bytes, type);
	} catch (e) {
		console.error(`Photo storage (${store.kind}) refused ${key}:`, e);
		error(503, 'The photo could not be stored just now; nothing was kept: send it again later');
	}
}

const byId = async (db: Db, id: string) =>
	(await db.select().from(photos).where(eq(photos.id, id)).limit(1))[0];

export async function storePhoto(
	db: Db,
	store: PhotoStore,
	user: Pick<SessionUser, 'id'>,
	upload: PhotoUpload
): Promise<PhotoAnswer> {
	const actual = createHash('sha256').update(upload.bytes).digest('hex');
	if (actual !== upload.sha256) {
		error(422, 'The photo’s bytes do not match the SHA-256 sent with it; nothing was stored');
	}
	const type = sniffPhoto(upload.bytes);
	if (!type) {
		error(415, 'Only whole JPEG, PNG or WebP photos are stored; this file is something else');
	}
	const known = await byId(db, upload.id);
	if (known) return again(known, upload);
	const [finding] = await db
		.select({ surveyId: findings.surveyId })
		.from(findings)
		.where(eq(findings.id, upload.findingId))
		.limit(1);
	if (finding && finding.surveyId !== upload.surveyId) {
		// 422, not 409: the device reads 409 as "other bytes under this id" and says so.
		error(422, 'This photo names a finding of another survey; nothing was stored');
	}
	const key = photoKey(upload.id);
	const size = dimensions(upload.bytes, type);
	try {
		await db.transaction(async (tx) => {
			// The row first: its primary key makes a concurrent upload of the same id wait here
			// until this one commits (then it answers 200 or 409), so it never overwrites the bytes.
			await tx.insert(photos).values({
				id: upload.id,
				findingId: upload.findingId,
				surveyId: upload.surveyId,
				firmId: upload.firmId,
				storageKey: key,
				contentType: type,
				bytes: upload.bytes.byteLength,
				width: size?.width ?? null,
				height: size?.height ?? null,
				sha256: actual,
				uploadedBy: user.id
			});
			// The bytes before the commit: a row is never seen without its bytes, and bytes that
			// fail to store roll the row back.
			await putBytes(store, key, upload.bytes, type);
			// The firm's counter last: its lock is held to the commit, and pushes of the firm wait
			// on it, so it is not taken while the bytes travel to storage.
			const changeSeq = await nextChangeSeq(tx, upload.firmId);
			await tx.update(photos).set({ changeSeq }).where(eq(photos.id, upload.id));
			await tx.insert(auditLog).values({
				firmId: upload.firmId,
				actorId: user.id,
				entity: 'photo',
				entityId: upload.id,
				action: 'upload',
				after: { findingId: upload.findingId, surveyId: upload.surveyId, sha256: actual, type },
				address: upload.address ?? null
			});
		});
	} catch (e) {
		// The same id inserted by a concurrent upload that committed first.
		if (isDuplicateKey(e)) {
			const row = await byId(db, upload.id);
			if (row) return again(row, upload);
		}
		throw e;
	}
	return {
		status: 201,
		body: { id: upload.id, sha256: actual, bytes: upload.bytes.byteLength, contentType: type }
	};
}

/** A stored photo's row, for `GET`: within the person's firm, its finding not deleted. */
export async function photoForReading(db: Db, firmId: string, id: string) {
	const [row] = await db
		.select({ photo: photos, deletedAt: findings.deletedAt })
		.from(photos)
		.leftJoin(findings, eq(findings.id, photos.findingId))
		.where(and(eq(photos.id, id), eq(photos.firmId, firmId)))
		.limit(1);
	if (!row || row.deletedAt || row.photo.deletedAt) return null;
	return row.photo;
}
