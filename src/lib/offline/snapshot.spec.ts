import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import { atmosphericPressureAtElevation, STANDARD_ATMOSPHERE_MPA } from '$lib/units';
import type { CostBasis } from '$lib/schemas/site';
import type { DeviceDatabase } from './db';
import { saveFinding } from './findings';
import { addPhoto } from './photos';
import { siteAtmosphere, storeSnapshot, surveyBundle } from './snapshot';
import {
	COST_BASIS,
	leakCapture,
	SITE_ID,
	snapshot,
	SURVEY_ID,
	testDb,
	trapCapture
} from './spec-fixtures';

let db: DeviceDatabase;
afterEach(async () => {
	await db.delete();
});

const tiny = () => new Blob([new Uint8Array(8)], { type: 'image/jpeg' });
const prepared = () => ({
	blob: tiny(),
	thumbnail: tiny(),
	width: 4,
	height: 2,
	contentType: 'image/jpeg'
});

describe('storeSnapshot', () => {
	it('writes the survey, site, areas, assets and findings', async () => {
		db = testDb();
		const leak = leakCapture();
		const result = await storeSnapshot(db, snapshot([{ capture: leak, version: 3 }]));
		expect(result).toEqual({ surveyId: SURVEY_ID, findings: 1, keptLocal: 0, assets: 1 });
		expect(await db.surveys.get(SURVEY_ID)).toMatchObject({
			name: 'Spring walk 2025',
			cursor: 42,
			takenAt: '2025-03-04T08:00:00.000Z'
		});
		const site = await db.sites.get(SITE_ID);
		expect(site).toMatchObject({
			unitSystem: 'SI',
			costBasis: null,
			headers: [{ name: 'HP main' }]
		});
		// No cost basis: the site's own elevation (1500 m) sets the atmosphere.
		expect(site?.atmosphericPressure).toBe(atmosphericPressureAtElevation(1500));
		expect(await db.areas.count()).toBe(2);
		expect(await db.findings.get(leak.id)).toMatchObject({
			version: 3,
			status: 'draft',
			pending: 0,
			deleted: 0,
			capture: leak
		});
	});

	it('refuses an invalid snapshot in plain words and changes nothing', async () => {
		db = testDb();
		await storeSnapshot(db, snapshot());
		const broken = { ...snapshot(), cursor: -1, survey: { ...snapshot().survey, name: 'Changed' } };
		await expect(storeSnapshot(db, broken)).rejects.toThrow(
			/could not be read, so nothing was changed on this device \(cursor: /
		);
		await expect(storeSnapshot(db, 'not a snapshot')).rejects.toThrow('nothing was changed');
		expect((await db.surveys.get(SURVEY_ID))?.name).toBe('Spring walk 2025');
	});

	it('keeps its previous copy whole when the new one cannot be stored (two traps, one tag)', async () => {
		db = testDb();
		await storeSnapshot(db, snapshot());
		const [trap] = snapshot().assets;
		const twin = { ...trap, id: '5e1f0000-0000-4000-8000-0000000000a3' };
		const renamed = { ...snapshot().survey, name: 'Renamed' };
		await expect(
			storeSnapshot(db, snapshot([], { assets: [trap, twin], survey: renamed }))
		).rejects.toThrow('This device could not store the survey, so it keeps the copy it had');
		expect((await db.surveys.get(SURVEY_ID))?.name).toBe('Spring walk 2025');
		expect(await db.assets.count()).toBe(1);
		expect(await db.areas.count()).toBe(2);
	});

	it('never overwrites a pending local edit, and replaces what is not pending', async () => {
		db = testDb();
		const mine = leakCapture({ location: 'server wording' });
		const theirs = leakCapture({ location: 'on the server' });
		await storeSnapshot(
			db,
			snapshot([
				{ capture: mine, version: 1 },
				{ capture: theirs, version: 1 }
			])
		);
		const edited = {
			...mine,
			location: 'changed on the phone',
			updatedAt: '2025-03-04T11:00:00.000Z'
		};
		await saveFinding(db, edited);

		const later = { ...theirs, notes: 'seen again by the desk' };
		const result = await storeSnapshot(
			db,
			snapshot([
				{ capture: { ...mine, location: 'changed at the desk' }, version: 2 },
				{ capture: later, version: 2 }
			])
		);
		expect(result.keptLocal).toBe(1);
		expect(await db.findings.get(mine.id)).toMatchObject({
			pending: 1,
			version: 1,
			capture: { location: 'changed on the phone' }
		});
		expect(await db.findings.get(theirs.id)).toMatchObject({
			pending: 0,
			version: 2,
			capture: later
		});
		expect(await db.outbox.count()).toBe(1);
	});

	it('lets go of a finding the server no longer lists unless it is pending, keeping unsent photos', async () => {
		db = testDb();
		const gone = leakCapture();
		const sent = leakCapture();
		await storeSnapshot(
			db,
			snapshot([
				{ capture: gone, version: 1 },
				{ capture: sent, version: 1 }
			])
		);
		const unsentPhoto = await addPhoto(db, {
			findingId: gone.id,
			surveyId: SURVEY_ID,
			prepared: prepared()
		});
		const local = trapCapture();
		await saveFinding(db, local);

		await storeSnapshot(db, snapshot([{ capture: sent, version: 1 }]));
		expect(await db.findings.get(gone.id)).toBeUndefined();
		expect(await db.findings.get(local.id)).toMatchObject({ pending: 1, version: 0 });
		expect(await db.photos.get(unsentPhoto.id)).toBeDefined();
	});

	it('replaces a device-made asset once the server lists its tag', async () => {
		db = testDb();
		await storeSnapshot(db, snapshot());
		await saveFinding(db, trapCapture({ assetTag: 'ST-205' }));
		const made = await db.assets.where('[siteId+tag]').equals([SITE_ID, 'ST-205']).first();
		expect(made).toMatchObject({ local: 1, details: { trapType: 'thermodynamic', dn: 15 } });

		// A snapshot without the tag keeps it (its capture may not have been sent yet).
		await storeSnapshot(db, snapshot());
		expect(await db.assets.get(made!.id)).toBeDefined();

		const serverAsset = {
			...snapshot().assets[0],
			id: '5e1f0000-0000-4000-8000-0000000000a2',
			tag: 'ST-205'
		};
		await storeSnapshot(db, snapshot([], { assets: [snapshot().assets[0], serverAsset] }));
		expect(await db.assets.get(made!.id)).toBeUndefined();
		const now = await db.assets.where('[siteId+tag]').equals([SITE_ID, 'ST-205']).first();
		expect(now?.id).toBe(serverAsset.id);
		expect(now?.local).toBeUndefined();
	});
});

describe('siteAtmosphere', () => {
	const site = snapshot().site;
	it('takes the cost basis pressure first, then its elevation, then the site’s, then standard', () => {
		const basis = (over: Partial<CostBasis>) => ({ ...COST_BASIS, ...over });
		const both = basis({ atmosphericPressure: 0.095, elevation: 300 });
		expect(siteAtmosphere({ site, costBasis: both })).toBe(0.095);
		expect(siteAtmosphere({ site, costBasis: basis({ elevation: 300 }) })).toBe(
			atmosphericPressureAtElevation(300)
		);
		expect(siteAtmosphere({ site, costBasis: COST_BASIS })).toBe(
			atmosphericPressureAtElevation(1500)
		);
		expect(siteAtmosphere({ site: { ...site, elevation: null }, costBasis: null })).toBe(
			STANDARD_ATMOSPHERE_MPA
		);
	});

	it('is what storeSnapshot keeps for the site', async () => {
		db = testDb();
		const costBasis = { ...COST_BASIS, atmosphericPressure: 0.0987 };
		await storeSnapshot(db, snapshot([], { costBasis }));
		expect(await db.sites.get(SITE_ID)).toMatchObject({ costBasis, atmosphericPressure: 0.0987 });
	});
});

describe('surveyBundle', () => {
	it('is null for a survey not on the device', async () => {
		db = testDb();
		expect(await surveyBundle(db, SURVEY_ID)).toBeNull();
	});

	it('gives areas in site order, findings newest first without deleted ones, and photo counts', async () => {
		db = testDb();
		const older = leakCapture({ updatedAt: '2025-03-04T10:00:00.000Z' });
		const newer = leakCapture({ updatedAt: '2025-03-04T12:00:00+01:00' });
		const removed = leakCapture();
		await storeSnapshot(
			db,
			snapshot(
				[
					{ capture: older, version: 1 },
					{ capture: newer, version: 1 },
					{ capture: removed, version: 1 }
				],
				{ areas: [...snapshot().areas].reverse() }
			)
		);
		await db.findings.update(removed.id, { deleted: 1 });
		await addPhoto(db, { findingId: newer.id, surveyId: SURVEY_ID, prepared: prepared() });
		await addPhoto(db, { findingId: newer.id, surveyId: SURVEY_ID, prepared: prepared() });

		const bundle = await surveyBundle(db, SURVEY_ID);
		expect(bundle?.areas.map((a) => a.name)).toEqual(['Boiler house', 'Dryer hall']);
		// 12:00+01:00 is 11:00 UTC: newer than 10:00 UTC.
		expect(bundle?.findings.map((f) => f.id)).toEqual([newer.id, older.id]);
		expect(bundle?.photoCounts.get(newer.id)).toBe(2);
		expect(bundle?.photoCounts.has(older.id)).toBe(false);
		expect(bundle?.assets).toHaveLength(1);
	});
});
