/**
 * Photos on local disk under the data directory (never under static/): written to a temporary
 * file in the same directory, flushed, then renamed into place, so a cut upload or a crash
 * leaves either the whole photo or nothing under its name.
 */
import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdir, open, rename, rm, stat } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { Readable } from 'node:stream';
import { assertKey, type PhotoStore, type StoredObject } from './store';

/** The rename itself survives a power cut only once its directory is flushed too (POSIX). */
async function syncDirectory(path: string): Promise<void> {
	const dir = await open(path, 'r');
	try {
		await dir.sync();
	} finally {
		await dir.close();
	}
}

export class LocalDiskStore implements PhotoStore {
	readonly kind = 'disk';
	constructor(readonly root: string) {}

	private path(key: string): string {
		assertKey(key);
		return join(this.root, key);
	}

	async has(key: string): Promise<boolean> {
		return stat(this.path(key)).then(
			(s) => s.isFile(),
			() => false
		);
	}

	async put(key: string, bytes: Uint8Array, contentType: string): Promise<void> {
		void contentType; // the database row keeps the type; the disk keeps bytes only
		const target = this.path(key);
		await mkdir(dirname(target), { recursive: true });
		const temp = `${target}.${randomUUID()}.part`;
		const file = await open(temp, 'wx');
		try {
			await file.writeFile(bytes);
			await file.sync();
		} catch (e) {
			await file.close();
			await rm(temp, { force: true });
			throw e;
		}
		await file.close();
		await rename(temp, target);
		await syncDirectory(dirname(target));
	}

	async get(key: string): Promise<StoredObject | null> {
		const path = this.path(key);
		const info = await stat(path).catch(() => null);
		if (!info?.isFile()) return null;
		const body = Readable.toWeb(createReadStream(path)) as ReadableStream<Uint8Array>;
		return { bytes: info.size, contentType: 'application/octet-stream', body };
	}

	async delete(key: string): Promise<void> {
		await rm(this.path(key), { force: true });
	}
}
