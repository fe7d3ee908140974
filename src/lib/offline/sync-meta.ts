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

/** Where the pull starts: the kept cursor, else the oldest snapshot on the device, else 0. */
export async function pullCursor(db: DeviceDatabase): Promise<number> {
	return db.transaction('r', [db.meta, db.surveys], async () => {
		const kept = await getMeta<number>(db, 'cursor');
		if (typeof kept === 'number') return kept;
		const surveys = await db.surveys.toArray();
		return surveys.length === 0 ? 0 : Math.min(...surveys.map((s) => s.cursor));
	});
}
