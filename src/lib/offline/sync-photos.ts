import { PHOTO_HEADERS } from '$lib/schemas/sync';
import type { DeviceDatabase, DevicePhoto } from './db';
import type { SyncProblem } from './sync-problem';
import { problemFromStatus } from './sync-problem';

/** Photos in flight at once: loopback and phone links are both better used with a few. */
export const PHOTO_UPLOADS_AT_ONCE = 3;

/** Lower-case hex SHA-256 of the bytes (the server checks it, docs/sync.md). */
export async function sha256Hex(blob: Blob): Promise<string> {
	const digest = await crypto.subtle.digest('SHA-256', await blob.arrayBuffer());
	return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

type Outcome = { sent: boolean; problem?: SyncProblem; stop?: boolean };

async function uploadOne(
	db: DeviceDatabase,
	fetchFn: typeof fetch,
	photo: DevicePhoto
): Promise<Outcome> {
	let response: Response;
	try {
		response = await fetchFn(`/api/photos/${photo.id}`, {
			method: 'PUT',
			headers: {
				'content-type': photo.contentType,
				[PHOTO_HEADERS.finding]: photo.findingId,
				[PHOTO_HEADERS.survey]: photo.surveyId,
				[PHOTO_HEADERS.sha256]: await sha256Hex(photo.blob)
			},
			body: photo.blob
		});
	} catch {
		return { sent: false, problem: problemFromStatus(0), stop: true };
	}
	if (response.status === 200 || response.status === 201) {
		await db.photos.update(photo.id, { uploaded: 1 });
		return { sent: true };
	}
	if (response.status === 401) return { sent: false, problem: problemFromStatus(401), stop: true };
	if (response.status === 409) {
		// Other bytes under this id on the server: never overwritten; a person must look.
		const message = 'The server holds a different photo under the same name; this one is kept here';
		await db.photos.update(photo.id, { lastError: message });
		return { sent: false, problem: { kind: 'photo', retryable: false, message } };
	}
	if (response.status >= 400 && response.status < 500 && response.status !== 429) {
		const body = (await response.json().catch(() => ({}))) as { message?: unknown };
		await db.photos.update(photo.id, {
			lastError:
				typeof body.message === 'string'
					? body.message
					: `Refused by the server (${response.status})`
		});
		return { sent: false };
	}
	return { sent: false, problem: problemFromStatus(response.status), stop: true };
}

/**
 * Uploads waiting photos, a few at a time, oldest first, only of findings the server has
 * (version > 0). Each photo is read from the device database when its turn comes, so a day's
 * photos are never all in memory. A photo the server refused (lastError) is skipped; a network
 * error or server trouble stops the round for later, with what was sent kept.
 */
export async function uploadPhotos(
	db: DeviceDatabase,
	fetchFn: typeof fetch
): Promise<{ sent: number; problem?: SyncProblem }> {
	const keys = await db.photos.where('uploaded').equals(0).primaryKeys();
	const queue: { id: string; createdAt: string }[] = [];
	for (const id of keys) {
		const p = await db.photos.get(id);
		if (p && p.lastError === undefined) queue.push({ id, createdAt: p.createdAt });
	}
	queue.sort((a, b) => (a.createdAt < b.createdAt ? -1 : 1));
	let sent = 0;
	let problem: SyncProblem | undefined;
	let stopped = false;
	const worker = async () => {
		while (!stopped && queue.length > 0) {
			const next = queue.shift()!;
			const photo = await db.photos.get(next.id);
			if (!photo || photo.uploaded === 1 || photo.lastError !== undefined) continue;
			const finding = await db.findings.get(photo.findingId);
			if (!finding || finding.version === 0 || finding.deleted === 1) continue;
			const outcome = await uploadOne(db, fetchFn, photo);
			if (outcome.sent) sent++;
			if (outcome.problem && (outcome.stop || !problem)) problem = outcome.problem;
			if (outcome.stop) stopped = true;
		}
	};
	await Promise.all(Array.from({ length: PHOTO_UPLOADS_AT_ONCE }, worker));
	return { sent, ...(problem ? { problem } : {}) };
}
