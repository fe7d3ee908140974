/**
 * A firm of its own for the cost-library and measures specs (invented: "Quillmoor Steam
 * Services", its creamery site and one survey), so their library entries never meet the demo
 * firm's seeded ones. Findings carry the inputs the library is matched on and invented figures.
 */
import { eq, inArray } from 'drizzle-orm';
import * as schema from '../../src/lib/server/db/schema';
import type { Db } from '../../src/lib/server/db/types';

export const cid = (kind: number, n: number) =>
	`c0570000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;

export const firm = cid(1, 1);
export const otherFirm = cid(1, 2);
export const actor = cid(2, 1);
export const client = cid(3, 1);
export const site = cid(4, 1);
export const basis = cid(5, 1);
export const survey = cid(6, 1);
export const otherSurvey = cid(6, 2);
export const header = cid(7, 1);

/** Findings by what they are: trap leaking, trap failed open, trap working, pipe run, leak… */
export const F = {
	leakingTrap: cid(9, 1),
	failedTrap: cid(9, 2),
	workingTrap: cid(9, 3),
	pipe: cid(9, 4),
	valves: cid(9, 5),
	leak: cid(9, 6),
	surface: cid(9, 7),
	editedTrap: cid(9, 8),
	quotedTrap: cid(9, 9),
	otherSurveys: cid(9, 10)
} as const;

const trap = (condition: string) => ({
	trapType: 'thermodynamic',
	dn: 15,
	condition,
	discharge: 'atmosphere'
});
const layers = [{ thickness: 0.05, material: 'mineral-wool' }];

type Row = typeof schema.findings.$inferInsert;
const finding = (
	id: string,
	kind: string,
	inputs: Record<string, unknown>,
	cost: number | null,
	extra: Partial<Row> = {}
): Row => ({
	id,
	surveyId: survey,
	kind,
	headerId: header,
	location: 'Dryer hall',
	inputs,
	cost,
	steamLoss: cost === null ? null : cost / 1000,
	fuelEnergy: cost === null ? null : cost / 500,
	co2: cost === null ? null : cost / 10,
	water: cost === null ? null : cost / 2000,
	...extra
});

export const rows: Row[] = [
	finding(F.leakingTrap, 'trap', trap('leaking'), 40_000),
	finding(F.failedTrap, 'trap', trap('failed-open'), 120_000),
	finding(F.workingTrap, 'trap', trap('working'), 0),
	finding(F.pipe, 'insulation', { item: 'pipe', dn: 50, length: 12, layers }, 90_000),
	finding(F.valves, 'insulation', { item: 'valve', dn: 50, count: 3, layers }, 30_000),
	finding(F.leak, 'leak', { sizeClass: 'medium' }, 60_000),
	finding(F.surface, 'insulation', { item: 'surface', area: 4, layers }, 20_000),
	finding(F.editedTrap, 'trap', trap('failed-open'), 100_000, {
		repairCost: 77_700,
		repairCostSource: 'edited'
	}),
	finding(F.quotedTrap, 'trap', trap('failed-open'), 100_000, {
		repairCost: 55_500,
		repairCostSource: 'quote',
		repairCostNote: 'Valvewright quote 2211'
	}),
	finding(F.otherSurveys, 'trap', trap('leaking'), 40_000, { surveyId: otherSurvey })
];

export async function cleanUp(db: Db) {
	const surveys = [survey, otherSurvey];
	await db.delete(schema.findings).where(inArray(schema.findings.surveyId, surveys));
	await db.delete(schema.measures).where(inArray(schema.measures.surveyId, surveys));
	await db.delete(schema.surveys).where(inArray(schema.surveys.id, surveys));
	await db.update(schema.sites).set({ costBasisId: null }).where(eq(schema.sites.id, site));
	await db.delete(schema.costBases).where(eq(schema.costBases.siteId, site));
	await db.delete(schema.headers).where(eq(schema.headers.siteId, site));
	await db.delete(schema.sites).where(eq(schema.sites.id, site));
	await db.delete(schema.costEntries).where(inArray(schema.costEntries.firmId, [firm, otherFirm]));
	await db.delete(schema.auditLog).where(inArray(schema.auditLog.firmId, [firm, otherFirm]));
	await db
		.delete(schema.changeCounters)
		.where(inArray(schema.changeCounters.firmId, [firm, otherFirm]));
	await db.delete(schema.users).where(eq(schema.users.id, actor));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, client));
	await db.delete(schema.firms).where(inArray(schema.firms.id, [firm, otherFirm]));
}

export async function setUp(db: Db) {
	await cleanUp(db);
	await db.insert(schema.firms).values([
		{ id: firm, name: 'Quillmoor Steam Services' },
		{ id: otherFirm, name: 'Brackenfold Energy' }
	]);
	await db.insert(schema.users).values({
		id: actor,
		firmId: firm,
		email: 'costs.spec@quillmoor.example',
		name: 'Costs spec consultant',
		role: 'consultant'
	});
	await db
		.insert(schema.clientCompanies)
		.values({ id: client, firmId: firm, name: 'Quillmoor Creamery' });
	await db
		.insert(schema.sites)
		.values({ id: site, firmId: firm, clientCompanyId: client, name: 'Creamery' });
	await db.insert(schema.costBases).values({
		id: basis,
		siteId: site,
		number: 1,
		basis: {
			fuel: { kind: 'natural-gas', price: '10.00', unit: 'GJ' },
			currency: 'EUR',
			boilerEfficiency: 0.8,
			feedwaterTemperature: 373.15,
			condensateReturnFraction: 0.5,
			makeupWaterPrice: '2.00',
			waterTreatmentPrice: '1.00',
			operatingHours: 8000,
			discountRate: 0.08,
			lifeYears: 10
		} as never
	});
	await db.update(schema.sites).set({ costBasisId: basis }).where(eq(schema.sites.id, site));
	await db.insert(schema.headers).values({ id: header, siteId: site, name: 'Main', pressure: 1.1 });
	await db.insert(schema.surveys).values([
		{ id: survey, firmId: firm, siteId: site, name: 'Creamery winter', status: 'in-review' },
		{ id: otherSurvey, firmId: firm, siteId: site, name: 'Creamery spring', status: 'in-review' }
	]);
	await db.insert(schema.findings).values(rows);
}
