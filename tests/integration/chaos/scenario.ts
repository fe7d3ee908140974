/**
 * One chaos scenario, drawn from a seed: what an auditor does on the device (new trap tests
 * with photos, edits, deletions) interleaved with sync attempts through a faulty network, and
 * sometimes a second device (a consultant's) editing the same findings offline.
 */
import { readFileSync } from 'node:fs';
import type { FindingCapture } from '../../../src/lib/schemas/capture';
import type { DeviceDatabase } from '../../../src/lib/offline/db';
import { deleteFinding, saveFinding } from '../../../src/lib/offline/findings';
import { addPhoto } from '../../../src/lib/offline/photos';
import { trapCapture } from '../sync-api';
import type { Rng } from './prng';

export const JPEG = new Uint8Array(readFileSync('tests/fixtures/trap-photo.jpg'));

/** What the test remembers the person meant, to compare with the server afterwards. */
export interface Intent {
	/** Every finding id this device created. */
	created: Set<string>;
	/** Ids the person deleted. */
	deleted: Set<string>;
}

export const newIntent = (): Intent => ({ created: new Set(), deleted: new Set() });

let clock = Date.parse('2026-11-20T08:00:00.000Z');
/** Capture times that always move forward (updatedAt is never before createdAt). */
const tick = () => new Date((clock += 1000)).toISOString();

/** A new trap test with 0–2 photos (the fixture's bytes, made unique by nothing: same bytes). */
export async function recordNew(db: DeviceDatabase, rng: Rng, tag: string, intent: Intent) {
	const at = tick();
	// Ids are fresh each run (a replayed seed must not meet its last run's rows); rng only
	// decides what happens.
	const capture: FindingCapture = trapCapture(tag, at);
	const photoIds: string[] = [];
	for (let i = rng.int(0, 2); i > 0; i--) {
		const blob = new Blob([JPEG], { type: 'image/jpeg' });
		const photo = await addPhoto(db, {
			findingId: capture.id,
			surveyId: capture.surveyId,
			prepared: { blob, thumbnail: blob, width: 2400, height: 1800, contentType: 'image/jpeg' }
		});
		photoIds.push(photo.id);
	}
	await saveFinding(db, { ...capture, photoIds });
	intent.created.add(capture.id);
}

/** Edits the notes of one of this scenario's live findings on the device (if any). */
export async function editOne(db: DeviceDatabase, rng: Rng, intent: Intent, note: string) {
	const live = await db.findings
		.filter((f) => f.deleted === 0 && intent.created.has(f.id))
		.toArray();
	if (live.length === 0) return null;
	const f = rng.pick(live.sort((a, b) => (a.id < b.id ? -1 : 1)));
	await saveFinding(db, { ...f.capture, notes: note, updatedAt: tick() });
	return f.id;
}

export async function deleteOne(db: DeviceDatabase, rng: Rng, intent: Intent) {
	const live = await db.findings
		.filter((f) => f.deleted === 0 && intent.created.has(f.id))
		.toArray();
	if (live.length === 0) return;
	const f = rng.pick(live.sort((a, b) => (a.id < b.id ? -1 : 1)));
	await deleteFinding(db, f.id);
	intent.deleted.add(f.id);
}
