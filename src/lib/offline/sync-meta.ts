import type { DeviceDatabase, MetaKey } from './db';

/** Reading and writing the device's `meta` store (call inside a transaction that has it). */

export async function getMeta<T>(db: DeviceDatabase, key: MetaKey): Promise<T | undefined> {
	return (await db.meta.get(key))?.value as T | undefined;
}

export async function setMeta(db: DeviceDatabase, key: MetaKey, value: unknown): Promise<void> {
	await db.meta.put({ key, value });
}

/** This device's id, made once and kept (the server records which device sent each change). */
export async function deviceId(db: DeviceDatabase): Promise<string> {
	return db.transaction('rw', db.meta, async () => {
		const known = await getMeta<string>(db, 'deviceId');
		if (known) return known;
		const made = crypto.randomUUID();
		await setMeta(db, 'deviceId', made);
		return made;
	});
}

/**
 * Where the pull starts. One pull covers all of this person's surveys, so it starts from the
 * survey pulled least far: each survey's cursor is its snapshot's, moved on by every pull page
 * (sync-pull.ts). A snapshot stored later at an older cursor thus makes the next pull fetch
 * what it lacks; what is fetched twice is harmless (same versions, pending findings kept).
 * With no survey on the device, the kept device cursor, else 0.
 */
export async function pullCursor(db: DeviceDatabase): Promise<number> {
	return db.transaction('r', [db.meta, db.surveys], async () => {
		const surveys = await db.surveys.toArray();
		if (surveys.length > 0) return Math.min(...surveys.map((s) => s.cursor));
		const kept = await getMeta<number>(db, 'cursor');
		return typeof kept === 'number' ? kept : 0;
	});
}
