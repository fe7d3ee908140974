import libURL from 'browser-image-compression/dist/browser-image-compression.js?url';
import type { DeviceDatabase, DevicePhoto } from './db';

/**
 * Photos of findings: compressed on the phone before they are stored (a plant round can take
 * hundreds), kept in the device database until uploaded.
 */

// ---- Preparing a photo (browser only: canvas, workers, createImageBitmap) ----------------

/** Long side of a stored photo and of its thumbnail, px. */
export const PHOTO_MAX_SIDE = 1920;
export const THUMBNAIL_MAX_SIDE = 320;
/** Size targets in the library's MB (2^20 bytes): a photo at most 400 kB (400,000 bytes). */
export const PHOTO_MAX_MB = 400_000 / 2 ** 20;
export const THUMBNAIL_MAX_MB = 0.04;

export interface PreparedPhoto {
	blob: Blob;
	thumbnail: Blob;
	/** Of `blob`, px, after the camera's orientation was applied. */
	width: number;
	height: number;
	contentType: string;
}

/**
 * Compresses a camera photo to a JPEG of at most 1920 px and 400 KiB, upright, with its EXIF
 * (and so any location) left out, plus a 320 px thumbnail. The work runs in a Web Worker
 * whose script is the library's own file served by this app: without `libURL` the library
 * fetches it from a public CDN, and offline it would quietly fall back to the main thread.
 */
export async function preparePhoto(file: File | Blob): Promise<PreparedPhoto> {
	const { default: compress } = await import('browser-image-compression');
	// The worker is made from a blob: URL, where a relative path would not resolve.
	const workerScript = new URL(libURL, self.location.href).href;
	const common = {
		useWebWorker: true,
		libURL: workerScript,
		preserveExif: false,
		fileType: 'image/jpeg'
	};
	const input = file instanceof File ? file : new File([file], 'photo.jpg', { type: file.type });
	const blob = await compress(input, {
		...common,
		maxWidthOrHeight: PHOTO_MAX_SIDE,
		maxSizeMB: PHOTO_MAX_MB
	});
	// From the compressed photo: already upright, already small, so the second pass is quick.
	const thumbnail = await compress(blob, {
		...common,
		maxWidthOrHeight: THUMBNAIL_MAX_SIDE,
		maxSizeMB: THUMBNAIL_MAX_MB
	});
	const bitmap = await createImageBitmap(blob);
	const size = { width: bitmap.width, height: bitmap.height };
	bitmap.close();
	return { blob, thumbnail, ...size, contentType: 'image/jpeg' };
}

// ---- The photo store (testable anywhere IndexedDB is) -----------------------------------

export interface NewPhoto {
	findingId: string;
	surveyId: string;
	prepared: PreparedPhoto;
}

let lastTaken = 0;

/** Now, in UTC, never the same instant twice here, so photos sort in the order taken. */
function takenAt(): string {
	lastTaken = Math.max(Date.now(), lastTaken + 1);
	return new Date(lastTaken).toISOString();
}

/** Stores a prepared photo for a finding, not yet uploaded. */
export async function addPhoto(db: DeviceDatabase, photo: NewPhoto): Promise<DevicePhoto> {
	const { blob, thumbnail, width, height, contentType } = photo.prepared;
	const record: DevicePhoto = {
		id: crypto.randomUUID(),
		findingId: photo.findingId,
		surveyId: photo.surveyId,
		blob,
		thumbnail,
		contentType,
		width,
		height,
		bytes: blob.size,
		uploaded: 0,
		createdAt: takenAt()
	};
	await db.photos.add(record);
	return record;
}

export async function removePhoto(db: DeviceDatabase, id: string): Promise<void> {
	await db.photos.delete(id);
}

/** A finding's photos in the order taken. */
export async function findingPhotos(db: DeviceDatabase, findingId: string): Promise<DevicePhoto[]> {
	const photos = await db.photos.where('findingId').equals(findingId).toArray();
	// createdAt is made here with toISOString (UTC), so the strings sort by time.
	return photos.sort((a, b) =>
		a.createdAt < b.createdAt ? -1 : a.createdAt > b.createdAt ? 1 : 0
	);
}
