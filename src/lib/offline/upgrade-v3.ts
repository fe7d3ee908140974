import type { Transaction } from 'dexie';
import type { DeviceFinding, OutboxEntry } from './db';

/**
 * Version 2 → 3 of the device database: adds `meta` and `conflicts` (empty) and an index on
 * the outbox. Every row is kept; queued entries learn their finding's survey, which a delete's
 * push must name (version 2 stored a delete with no payload).
 */
export async function upgradeToV3(tx: Transaction): Promise<void> {
	const findings = tx.table<DeviceFinding, string>('findings');
	const outbox = tx.table<OutboxEntry, number>('outbox');
	const surveyOf = new Map<string, string>();
	await findings.each((f) => surveyOf.set(f.id, f.surveyId));
	await outbox.toCollection().modify((entry) => {
		const surveyId = entry.payload?.surveyId ?? surveyOf.get(entry.recordId);
		if (surveyId !== undefined) entry.surveyId = surveyId;
	});
}
