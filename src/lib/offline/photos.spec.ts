import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import type { DeviceDatabase } from './db';
import { addPhoto, findingPhotos, removePhoto, type PreparedPhoto } from './photos';
import { SURVEY_ID, testDb } from './spec-fixtures';

// preparePhoto needs a browser (canvas, workers, createImageBitmap): the e2e suite covers it.

let db: DeviceDatabase;
afterEach(async () => {
	await db.delete();
});

function prepared(bytes: number): PreparedPhoto {
	const blob = new Blob([new Uint8Array(bytes).fill(7)], { type: 'image/jpeg' });
	const thumbnail = new Blob([new Uint8Array(2)], { type: 'image/jpeg' });
	return { blob, thumbnail, width: 1920, height: 1080, contentType: 'image/jpeg' };
}

describe('photo store', () => {
	it('stores a photo, not yet uploaded, with its size, and reads the blob back', async () => {
		db = testDb();
		const photo = await addPhoto(db, {
			findingId: 'f1',
			surveyId: SURVEY_ID,
			prepared: prepared(10)
		});
		expect(photo).toMatchObject({ findingId: 'f1', bytes: 10, uploaded: 0, width: 1920 });
		const stored = await db.photos.get(photo.id);
		expect(new Uint8Array(await stored!.blob.arrayBuffer())).toEqual(new Uint8Array(10).fill(7));
		expect(stored!.thumbnail.size).toBe(2);
	});

	it('lists a finding’s photos in the order taken and removes one', async () => {
		db = testDb();
		const ids: string[] = [];
		for (const n of [5, 6, 7]) {
			ids.push(
				(await addPhoto(db, { findingId: 'f1', surveyId: SURVEY_ID, prepared: prepared(n) })).id
			);
		}
		await addPhoto(db, { findingId: 'f2', surveyId: SURVEY_ID, prepared: prepared(1) });
		expect((await findingPhotos(db, 'f1')).map((p) => p.id)).toEqual(ids);
		await removePhoto(db, ids[1]);
		expect((await findingPhotos(db, 'f1')).map((p) => p.bytes)).toEqual([5, 7]);
		expect(await findingPhotos(db, 'f2')).toHaveLength(1);
	});
});
