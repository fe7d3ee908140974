/**
 * What "loss-free" means after a chaos run, checked in MariaDB: every finding the devices hold
 * is on the server as they hold it (or, where another edit won, kept whole as a conflict
 * record); every deletion reached the server unless a conflict kept the finding; no change was
 * applied twice (a finding's version equals the changes written to its audit trail); every
 * outbox is empty; every photo of a live finding is stored byte-identical by hash.
 */
import { createHash } from 'node:crypto';
import { and, count, eq, inArray } from 'drizzle-orm';
import { expect } from 'vitest';
import type { DeviceDatabase } from '../../../src/lib/offline/db';
import * as schema from '../../../src/lib/server/db/schema';
import { captureKey } from '../../../src/lib/server/sync/canonical';
import { captureFromRow } from '../../../src/lib/server/walk/capture-row';
import type { testDatabase } from '../db';
import type { Fetch } from './faulty-fetch';
import type { Intent } from './scenario';

type Db = ReturnType<typeof testDatabase>['db'];
export const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

export interface DeviceUnderTest {
	db: DeviceDatabase;
	intent: Intent;
	/** Fault-free fetch as this device's person, for reading photos back. */
	fetch: Fetch;
}

export async function checkLossFree(db: Db, devices: DeviceUnderTest[], say: string) {
	const ids = [...new Set(devices.flatMap((d) => [...d.intent.created]))];
	if (ids.length === 0) return;
	const rows = new Map(
		(await db.select().from(schema.findings).where(inArray(schema.findings.id, ids))).map((r) => [
			r.id,
			r
		])
	);
	const conflicts = await db
		.select()
		.from(schema.findingConflicts)
		.where(inArray(schema.findingConflicts.findingId, ids));
	const held = new Map(conflicts.map((c) => [c.mutationId, c]));

	for (const device of devices) {
		expect(await device.db.outbox.count(), `${say}: outbox drained`).toBe(0);
		const deviceConflicts = await device.db.conflicts.toArray();
		for (const c of deviceConflicts) {
			expect(held.has(c.mutationId), `${say}: device conflict ${c.mutationId} on server`).toBe(
				true
			);
		}
		for (const id of device.intent.created) {
			const row = rows.get(id);
			const local = await device.db.findings.get(id);
			if (device.intent.deleted.has(id)) {
				const keptByConflict = conflicts.some((c) => c.findingId === id && c.data === null);
				if (!keptByConflict)
					expect(row?.deletedAt ?? 'gone', `${say}: ${id} deleted`).not.toBeNull();
				continue;
			}
			expect(
				local,
				`${say}: ${id} still on the device (server: ${JSON.stringify(row ? { v: row.version, del: row.deletedAt } : null)})`
			).toBeDefined();
			expect(row, `${say}: ${id} on the server`).toBeDefined();
			if (local!.conflict === 1) {
				// The server kept another edit; this device's is held whole for the desk.
				const mine = conflicts.filter(
					(c) =>
						c.findingId === id &&
						c.data &&
						captureKey(c.data as never) === captureKey(local!.capture)
				);
				expect(mine.length, `${say}: ${id} edit kept as conflict`).toBeGreaterThan(0);
				continue;
			}
			const server = captureFromRow({ ...row!, assetTag: local!.capture.assetTag ?? null });
			expect(captureKey(server), `${say}: ${id} as the device has it`).toBe(
				captureKey(local!.capture)
			);
			expect(local!.version, `${say}: ${id} version`).toBe(row!.version);
			expect(local!.pending, `${say}: ${id} not pending`).toBe(0);
		}
	}

	// Nothing applied twice: each version step is one audited change.
	for (const [id, row] of rows) {
		const [{ n }] = await db
			.select({ n: count() })
			.from(schema.auditLog)
			.where(
				and(
					eq(schema.auditLog.entityId, id),
					inArray(schema.auditLog.action, ['create', 'update', 'delete'])
				)
			);
		expect(n, `${say}: ${id} changes counted once`).toBe(row.version);
	}

	// Photos of live findings: uploaded, stored once, byte-identical.
	for (const device of devices) {
		const photos = await device.db.photos.toArray();
		for (const p of photos) {
			const finding = rows.get(p.findingId);
			if (!finding || finding.deletedAt || device.intent.deleted.has(p.findingId)) continue;
			expect(p.uploaded, `${say}: photo ${p.id} sent`).toBe(1);
			const want = sha(new Uint8Array(await p.blob.arrayBuffer()));
			const stored = await db.select().from(schema.photos).where(eq(schema.photos.id, p.id));
			expect(
				stored.map((s) => s.sha256),
				`${say}: photo ${p.id} row`
			).toEqual([want]);
			const back = await device.fetch(`http://127.0.0.1/api/photos/${p.id}`);
			expect(back.status, `${say}: photo ${p.id} readable`).toBe(200);
			expect(sha(new Uint8Array(await back.arrayBuffer())), `${say}: photo ${p.id} bytes`).toBe(
				want
			);
		}
	}
}
