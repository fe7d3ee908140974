/**
 * Where photo bytes live: one interface, local disk by default, S3-compatible object storage
 * when configured (README: Configuration). Keys are our own (`photos/<2 hex>/<uuid>`), never a
 * name a client chose. A `put` is all-or-nothing: a reader never sees half a photo.
 */
export interface StoredObject {
	bytes: number;
	contentType: string;
	body: ReadableStream<Uint8Array>;
}

export interface PhotoStore {
	/** Which kind of store this is, for logs and the health of a deployment. */
	readonly kind: 'disk' | 's3';
	has(key: string): Promise<boolean>;
	put(key: string, bytes: Uint8Array, contentType: string): Promise<void>;
	/** null when there is no such object. */
	get(key: string): Promise<StoredObject | null>;
	delete(key: string): Promise<void>;
}

const KEY = /^photos\/[0-9a-f]{2}\/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

/** The storage key of a photo id (a UUID, checked by the caller). */
export function photoKey(photoId: string): string {
	const id = photoId.toLowerCase();
	return `photos/${id.slice(0, 2)}/${id}`;
}

/** Refuses any key not made by photoKey (no traversal, no foreign names). */
export function assertKey(key: string): void {
	if (!KEY.test(key)) throw new Error(`Not a photo storage key: ${key}`);
}
