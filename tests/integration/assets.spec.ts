/**
 * assetForCapture against the real database: a new tag makes a trap asset from the capture,
 * a known tag takes changed details and nothing else, and it all happens in the caller's
 * transaction. Uses a site of its own (invented test data, removed afterwards).
 */
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FindingCapture, TrapCapture } from '../../src/lib/schemas/capture';
import { findingCaptureSchema } from '../../src/lib/schemas/capture';
import { assetForCapture } from '../../src/lib/server/assets';
import * as schema from '../../src/lib/server/db/schema';
import { demoClients, demoFirms } from '../../src/lib/server/seed/demo';
import { testDatabase } from './db';

const { pool, db } = testDatabase();
const ids = {
	site: 'a55e0001-0000-4000-8000-000000000001',
	header: 'a55e0002-0000-4000-8000-000000000001',
	area: 'a55e0003-0000-4000-8000-000000000001',
	survey: 'a55e0004-0000-4000-8000-000000000001'
};
let n = 0;

function trap(tag: string, inputs: Partial<TrapCapture['inputs']> = {}): FindingCapture {
	n += 1;
	return findingCaptureSchema.parse({
		id: `a55e0005-0000-4000-8000-${String(n).padStart(12, '0')}`,
		surveyId: ids.survey,
		kind: 'trap',
		headerId: ids.header,
		areaId: ids.area,
		assetTag: tag,
		location: 'Test bay, drip leg',
		notes: '',
		photoIds: [],
		createdAt: '2026-11-17T09:00:00Z',
		updatedAt: '2026-11-17T09:00:00Z',
		inputs: {
			trapType: 'thermodynamic',
			dn: 15,
			condition: 'working',
			discharge: 'atmosphere',
			testMethod: 'ultrasound',
			...inputs
		}
	});
}

const assetByTag = async (tag: string) =>
	(await db.select().from(schema.assets).where(eq(schema.assets.tag, tag))).find(
		(a) => a.siteId === ids.site
	);

beforeAll(async () => {
	await db.insert(schema.sites).values({
		id: ids.site,
		firmId: demoFirms[0].id,
		clientCompanyId: demoClients[0].id,
		name: 'Asset Spec Test Plant'
	});
	await db
		.insert(schema.headers)
		.values({ id: ids.header, siteId: ids.site, name: 'Test header', pressure: 0.9 });
	await db.insert(schema.areas).values({ id: ids.area, siteId: ids.site, name: 'Test bay' });
});

afterAll(async () => {
	await db.delete(schema.assets).where(eq(schema.assets.siteId, ids.site));
	await db.delete(schema.areas).where(eq(schema.areas.siteId, ids.site));
	await db.delete(schema.headers).where(eq(schema.headers.siteId, ids.site));
	await db.delete(schema.sites).where(eq(schema.sites.id, ids.site));
	await pool.end();
});

describe('assetForCapture', () => {
	it('creates a trap asset for a new tag from the capture', async () => {
		const match = await db.transaction((tx) =>
			assetForCapture(tx, ids.site, trap('AS-0001', { orificeDiameter: 0.0032 }))
		);
		expect(match).toMatchObject({ created: true, updated: false });
		const row = await assetByTag('AS-0001');
		expect(row).toMatchObject({
			id: match!.id,
			kind: 'trap',
			location: 'Test bay, drip leg',
			areaId: ids.area,
			headerId: ids.header,
			version: 1
		});
		expect(row!.details).toEqual({
			trapType: 'thermodynamic',
			dn: 15,
			orificeDiameter: 0.0032,
			discharge: 'atmosphere'
		});
	});

	it('finds a known tag and changes nothing when the details are the same', async () => {
		const first = await assetByTag('AS-0001');
		const again = await assetForCapture(db, ids.site, trap('AS-0001', { orificeDiameter: 0.0032 }));
		expect(again).toEqual({ id: first!.id, created: false, updated: false });
		expect((await assetByTag('AS-0001'))!.version).toBe(1);
	});

	it('takes changed details and keeps the asset', async () => {
		const before = await assetByTag('AS-0001');
		const match = await assetForCapture(
			db,
			ids.site,
			trap('AS-0001', {
				trapType: 'float-thermostatic',
				dn: 25,
				discharge: 'condensate-return',
				backPressure: 0.15,
				condition: 'leaking'
			})
		);
		expect(match).toEqual({ id: before!.id, created: false, updated: true });
		const after = await assetByTag('AS-0001');
		expect(after!.version).toBe(2);
		expect(after!.details).toEqual({
			trapType: 'float-thermostatic',
			dn: 25,
			discharge: 'condensate-return',
			backPressure: 0.15
		});
	});

	it('creates nothing when the caller rolls its transaction back', async () => {
		await expect(
			db.transaction(async (tx) => {
				await assetForCapture(tx, ids.site, trap('AS-0002'));
				throw new Error('the push failed after the asset');
			})
		).rejects.toThrow('the push failed');
		expect(await assetByTag('AS-0002')).toBeUndefined();
	});

	it('maps other kinds only onto a known tag, and untagged captures onto nothing', async () => {
		const leak = (tag?: string) =>
			findingCaptureSchema.parse({
				...trap('unused'),
				kind: 'leak',
				assetTag: tag,
				inputs: { sizeClass: 'small' }
			});
		const known = await assetByTag('AS-0001');
		expect(await assetForCapture(db, ids.site, leak('AS-0001'))).toEqual({
			id: known!.id,
			created: false,
			updated: false
		});
		expect(await assetForCapture(db, ids.site, leak('AS-0099'))).toBeNull();
		expect(await assetByTag('AS-0099')).toBeUndefined();
		expect(await assetForCapture(db, ids.site, leak())).toBeNull();
	});

	it('puts a retired trap back in service when it is tested again', async () => {
		const row = await assetByTag('AS-0001');
		await db
			.update(schema.assets)
			.set({ retiredAt: new Date() })
			.where(eq(schema.assets.id, row!.id));
		const match = await assetForCapture(
			db,
			ids.site,
			trap('AS-0001', {
				trapType: 'float-thermostatic',
				dn: 25,
				discharge: 'condensate-return',
				backPressure: 0.15
			})
		);
		expect(match?.updated).toBe(true);
		expect((await assetByTag('AS-0001'))!.retiredAt).toBeNull();
	});

	it('uses the id it is given for a new asset', async () => {
		const id = 'a55e0006-0000-4000-8000-000000000001';
		const match = await assetForCapture(db, ids.site, trap('AS-0003'), id);
		expect(match).toEqual({ id, created: true, updated: false });
	});
});
