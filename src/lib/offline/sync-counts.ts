/** What waits on the device, for the sync status (read inside a liveQuery). */
import type { DeviceDatabase } from './db';
import { getMeta } from './sync-meta';
import type { SyncState } from './sync-state';

export type SyncCounts = Pick<
	SyncState,
	'findingsWaiting' | 'photosWaiting' | 'refused' | 'conflicts' | 'lastExchangeAt'
>;

export async function syncCounts(db: DeviceDatabase): Promise<SyncCounts> {
	const outbox = await db.outbox.toArray();
	const photos = await db.photos.where('uploaded').equals(0).toArray();
	return {
		findingsWaiting: new Set(outbox.map((e) => e.recordId)).size,
		photosWaiting: photos.filter((p) => p.lastError === undefined).length,
		refused:
			outbox.filter((e) => e.lastError !== undefined).length +
			photos.filter((p) => p.lastError !== undefined).length,
		conflicts: await db.conflicts.count(),
		lastExchangeAt: (await getMeta<string>(db, 'lastExchangeAt')) ?? null
	};
}
