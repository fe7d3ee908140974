/**
 * When each device of each person last exchanged with the server (`sync_devices`), for the
 * Desk's sync state. A push is recorded once its answer is ready (every mutation was taken,
 * as applied, duplicate, conflict or rejected); a pull when the device names itself with
 * `?device=` (docs/sync.md). Recording is best effort: the exchange itself has already been
 * committed, so a failure here is logged and never turns the device's answer into an error.
 */
import { and, eq, inArray, sql } from 'drizzle-orm';
import { syncDevices } from '../db/schema';
import type { Executor } from '../db/types';

type Side = 'push' | 'pull';

/** Upserts the device's row with the time of this exchange (the database's clock). */
export async function recordExchange(
	db: Executor,
	user: Pick<SessionUser, 'id' | 'firmId'>,
	deviceId: string,
	side: Side
): Promise<void> {
	const now = sql`CURRENT_TIMESTAMP(3)`;
	const column = side === 'push' ? { lastPushAt: now } : { lastPullAt: now };
	await db
		.insert(syncDevices)
		.values({ userId: user.id, deviceId, firmId: user.firmId, ...column })
		.onDuplicateKeyUpdate({ set: column });
}

/** recordExchange that never throws: the device already has its answer's effects committed. */
export async function noteExchange(
	db: Executor,
	user: Pick<SessionUser, 'id' | 'firmId'>,
	deviceId: string,
	side: Side
): Promise<void> {
	try {
		await recordExchange(db, user, deviceId, side);
	} catch (e) {
		console.error(`sync_devices: could not record a ${side}`, e);
	}
}

export interface DeviceState {
	userId: string;
	deviceId: string;
	lastPushAt: Date | null;
	lastPullAt: Date | null;
}

/** The devices of these people of the firm, most recently heard from first. */
export async function devicesOf(
	db: Executor,
	firmId: string,
	userIds: string[]
): Promise<DeviceState[]> {
	if (userIds.length === 0) return [];
	return db
		.select({
			userId: syncDevices.userId,
			deviceId: syncDevices.deviceId,
			lastPushAt: syncDevices.lastPushAt,
			lastPullAt: syncDevices.lastPullAt
		})
		.from(syncDevices)
		.where(and(eq(syncDevices.firmId, firmId), inArray(syncDevices.userId, userIds)))
		.orderBy(
			sql`GREATEST(COALESCE(${syncDevices.lastPushAt}, 0), COALESCE(${syncDevices.lastPullAt}, 0)) DESC`
		);
}
