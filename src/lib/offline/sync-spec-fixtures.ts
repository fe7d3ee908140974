/**
 * A device and the fake server (tests/support/fake-sync-server.ts) set up alike for the sync
 * specs: the server knows the survey, the device holds its snapshot at the server's counter.
 * Invented records only. Not imported by app code.
 */
import type { FindingCapture } from '$lib/schemas/capture';
import { FakeSyncServer } from '../../../tests/support/fake-sync-server';
import type { DeviceDatabase } from './db';
import { addPhoto } from './photos';
import { storeSnapshot } from './snapshot';
import { snapshot, SURVEY_ID, testDb } from './spec-fixtures';

export const OTHER_SURVEY_ID = '5e1f0000-0000-4000-8000-0000000000b2';

const opened: DeviceDatabase[] = [];

/** Deletes every database made by `device` (call in afterEach). */
export async function dropDevices(): Promise<void> {
	for (const db of opened.splice(0)) await db.delete();
}

export function server(surveyIds: string[] = [SURVEY_ID]): FakeSyncServer {
	const s = new FakeSyncServer();
	for (const id of surveyIds) s.addSurvey({ ...snapshot().survey, id, name: `Survey ${id}` });
	return s;
}

/** A device holding a snapshot of each survey, taken now from `srv` (with its findings). */
export async function device(
	srv: FakeSyncServer,
	surveyIds: string[] = [SURVEY_ID]
): Promise<DeviceDatabase> {
	const db = testDb();
	opened.push(db);
	for (const id of surveyIds) {
		const findings = [...srv.findings.values()]
			.filter((f) => f.capture.surveyId === id && !f.deleted)
			.map((f) => ({ capture: f.capture, version: f.version }));
		const snap = snapshot(findings, { cursor: srv.counter });
		await storeSnapshot(db, { ...snap, survey: srv.surveys.get(id)!.summary });
	}
	return db;
}

/** Bytes that start like a PNG (all the fake's type check reads). */
export function pngBytes(fill = 1): Uint8Array {
	const b = new Uint8Array(64).fill(fill);
	b.set([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
	return b;
}

export async function photoOf(
	db: DeviceDatabase,
	capture: FindingCapture,
	bytes: Uint8Array = pngBytes(),
	contentType = 'image/png'
) {
	const blob = new Blob([bytes as BlobPart], { type: contentType });
	return addPhoto(db, {
		findingId: capture.id,
		surveyId: capture.surveyId,
		prepared: { blob, thumbnail: blob, width: 8, height: 8, contentType }
	});
}
