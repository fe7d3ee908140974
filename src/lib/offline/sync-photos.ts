import { PHOTO_HEADERS } from '$lib/schemas/sync';
import type { DeviceDatabase } from './db';
import type { SyncProblem } from './sync-problem';
import { problemFromStatus } from './sync-problem';

/** Lower-case hex SHA-256 of the bytes (the server checks it, docs/sync.md). */
export async function sha256Hex(blob: Blob): Promise<string> {
	const digest = await crypto.subtle.digest('SHA-256', await blob.arrayBuffer());
	return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

/**
 * Uploads waiting photos one by one, only of findings the server has (version > 0). A photo
 * the server refused (lastError) is skipped; a network error stops the round for later.
 */
export async function uploadPhotos(
	db: DeviceDatabase,
	fetchFn: typeof fetch
): Promise<{ sent: number; problem?: SyncProblem }> {
	const waiting = await db.photos.where('uploaded').equals(0).toArray();
	let sent = 0;
	let problem: SyncProblem | undefined;
	for (const photo of waiting.sort((a, b) => (a.createdAt < b.createdAt ? -1 : 1))) {
		if (photo.lastError !== undefined) continue;
		const finding = await db.findings.get(photo.findingId);
		if (!finding || finding.version === 0 || finding.deleted === 1) continue;
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
			return { sent, problem: problemFromStatus(0) };
		}
		if (response.status === 200 || response.status === 201) {
			await db.photos.update(photo.id, { uploaded: 1 });
			sent++;
		} else if (response.status === 409) {
			// Other bytes under this id on the server: never overwritten; a person must look.
			problem = {
				kind: 'photo',
				retryable: false,
				message: 'The server holds a different photo under the same name; this one is kept here'
			};
			await db.photos.update(photo.id, { lastError: problem.message });
		} else if (response.status === 401) {
			return { sent, problem: problemFromStatus(401) };
		} else if (response.status >= 400 && response.status < 500) {
			const body = (await response.json().catch(() => ({}))) as { message?: unknown };
			await db.photos.update(photo.id, {
				lastError:
					typeof body.message === 'string'
						? body.message
						: `Refused by the server (${response.status})`
			});
		} else {
			return { sent, problem: problemFromStatus(response.status) };
		}
	}
	return { sent, ...(problem ? { problem } : {}) };
}
