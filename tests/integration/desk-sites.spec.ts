/**
 * The Desk's clients, sites, cost basis and headers through their form actions, against the real
 * MariaDB: every change writes its audit row, bad input writes nothing, a new cost basis is the
 * next version and re-prices that site's findings (never another site's, never a published
 * survey's), and a header's new pressure recomputes that header's findings only. Runs on the demo
 * creamery (its published spring survey is frozen on basis 1 by the seed) plus this file's own
 * invented second site (fixed ids, removed afterwards).
 */
import { and, count, desc, eq, inArray, isNull, like, ne } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CostBasis } from '../../src/lib/schemas/site';
import * as schema from '../../src/lib/server/db/schema';
import { saveCostBasis } from '../../src/lib/server/pricing/cost-basis';
import { pricingContext } from '../../src/lib/server/pricing/context';
import { recomputeSite } from '../../src/lib/server/pricing/refresh';
import { figureColumns } from '../../src/lib/server/pricing/figures';
import { demoFirms, demoSites } from '../../src/lib/server/seed/demo';
import { publishedSurveyId } from '../../src/lib/server/seed/spring';
import { actions as clientsActions } from '../../src/routes/(desk)/desk/clients/+page.server';
import { actions as clientActions } from '../../src/routes/(desk)/desk/clients/[clientId]/+page.server';
import { actions as siteActions } from '../../src/routes/(desk)/desk/sites/[siteId]/+page.server';
import { actions as basisActions } from '../../src/routes/(desk)/desk/sites/[siteId]/cost-basis/+page.server';
import { actions as headerActions } from '../../src/routes/(desk)/desk/sites/[siteId]/headers/+page.server';
import { testDatabase } from './db';
import { consultantA, consultantB } from './demo-people';
import { postForm } from './walk-api';

const { pool, db } = testDatabase();
const firmId = demoFirms[0].id;
const creamery = demoSites[0].id;
const processHeader = demoSites[0].headers[1].id;
const cipHeader = demoSites[0].headers[2].id;

// This file's own second site of Cinderbrook, with one survey of a few findings.
const fx = (kind: number, n: number) =>
	`d35c0000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;
const other = { client: fx(1, 1), site: fx(2, 1), header: fx(3, 1), survey: fx(4, 1) };
const otherFindings = [1, 2, 3].map((n) => fx(9, n));
const otherBasis: CostBasis = {
	fuel: { kind: 'natural-gas', price: '9.00', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.8,
	feedwaterTemperature: 363.15,
	condensateReturnFraction: 0.5,
	makeupWaterPrice: '2.00',
	waterTreatmentPrice: '1.00',
	operatingHours: 8000
};

/** Posts a form to a page action (the consultant, unless someone else is given). */
const post = (
	action: (event: never) => unknown,
	routeId: string,
	path: string,
	params: Record<string, string>,
	form: Record<string, string>,
	user: SessionUser = consultantA
) => postForm(action, routeId, path, params, form, user);

const auditCount = async () => Number((await db.select({ n: count() }).from(schema.auditLog))[0].n);
const lastAudit = async () =>
	(await db.select().from(schema.auditLog).orderBy(desc(schema.auditLog.id)).limit(1))[0];

const surveyRows = (surveyIds: string[]) =>
	db
		.select({
			id: schema.findings.id,
			surveyId: schema.findings.surveyId,
			headerId: schema.findings.headerId,
			cost: schema.findings.cost,
			steam: schema.findings.steamLoss,
			basisId: schema.findings.pricedBasisId,
			pricedAt: schema.findings.pricedAt
		})
		.from(schema.findings)
		.where(and(inArray(schema.findings.surveyId, surveyIds), isNull(schema.findings.deletedAt)))
		.orderBy(schema.findings.id);

async function cleanUp() {
	await db.delete(schema.findings).where(inArray(schema.findings.id, otherFindings));
	await db.delete(schema.surveys).where(eq(schema.surveys.id, other.survey));
	await db.update(schema.sites).set({ costBasisId: null }).where(eq(schema.sites.id, other.site));
	await db.delete(schema.costBases).where(eq(schema.costBases.siteId, other.site));
	await db.delete(schema.headers).where(eq(schema.headers.siteId, other.site));
	await db.delete(schema.sites).where(eq(schema.sites.id, other.site));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, other.client));
	// The client and site the tests make through the forms.
	const made = await db
		.select({ id: schema.clientCompanies.id })
		.from(schema.clientCompanies)
		.where(like(schema.clientCompanies.name, 'Desk Sites Test Brewery%'));
	if (made.length > 0) {
		const ids = made.map((m) => m.id);
		await db.delete(schema.sites).where(inArray(schema.sites.clientCompanyId, ids));
		await db.delete(schema.clientCompanies).where(inArray(schema.clientCompanies.id, ids));
	}
}

beforeAll(async () => {
	await cleanUp();
	await db
		.insert(schema.clientCompanies)
		.values({ id: other.client, firmId, name: 'Desk Sites Test Maltings' });
	await db.insert(schema.sites).values({
		id: other.site,
		firmId,
		clientCompanyId: other.client,
		name: 'Maltings kiln house',
		elevation: 40
	});
	await db
		.insert(schema.headers)
		.values({ id: other.header, siteId: other.site, name: 'Kiln main', pressure: 0.9 });
	await saveCostBasis(db, {
		firmId,
		siteId: other.site,
		actorId: consultantA.id,
		basis: otherBasis
	});
	await db
		.insert(schema.surveys)
		.values({ id: other.survey, firmId, siteId: other.site, name: 'Maltings', status: 'in-field' });
	const ctx = await pricingContext(db, other.site);
	for (const [i, id] of otherFindings.entries()) {
		const input = {
			id,
			kind: 'leak' as const,
			headerId: other.header,
			inputs: { sizeClass: i % 2 ? 'small' : 'medium' },
			repairCost: 20_000
		};
		await db.insert(schema.findings).values({
			id,
			surveyId: other.survey,
			kind: 'leak',
			headerId: other.header,
			location: `Kiln line ${i + 1}`,
			inputs: input.inputs,
			repairCost: 20_000,
			...figureColumns(ctx, input as never)
		});
	}
});

let processPressure: number | null = null;

afterAll(async () => {
	// The process header back to its seeded pressure, so a rerun starts from the same place.
	if (processPressure !== null) {
		await db
			.update(schema.headers)
			.set({ pressure: processPressure })
			.where(eq(schema.headers.id, processHeader));
		await recomputeSite(db, creamery, { headerId: processHeader });
	}
	await cleanUp();
	await pool.end();
});

describe('clients and sites', () => {
	let clientId = '';
	let siteId = '';

	it('creating a client writes it and its audit row; bad input writes nothing', async () => {
		const before = await auditCount();
		const bad = await post(
			clientsActions.create,
			'/(desk)/desk/clients',
			'/desk/clients?/create',
			{},
			{ name: '  ', contactEmail: 'not-an-address', notes: 'kept' }
		);
		expect(bad.status).toBe(400);
		expect(bad.data.errors).toMatchObject({
			name: expect.any(String),
			contactEmail: expect.any(String)
		});
		expect(bad.data.values).toMatchObject({ contactEmail: 'not-an-address', notes: 'kept' });
		expect(await auditCount()).toBe(before);

		const made = await post(
			clientsActions.create,
			'/(desk)/desk/clients',
			'/desk/clients?/create',
			{},
			{ name: 'Desk Sites Test Brewery', contactEmail: 'plant@brewery.example', notes: '' }
		);
		expect(made.status).toBe(200);
		clientId = (made.data.created as { id: string }).id;
		const [row] = await db
			.select()
			.from(schema.clientCompanies)
			.where(eq(schema.clientCompanies.id, clientId));
		expect(row).toMatchObject({ firmId, name: 'Desk Sites Test Brewery', notes: null });
		expect(await lastAudit()).toMatchObject({
			entity: 'client',
			entityId: clientId,
			action: 'create',
			actorId: consultantA.id
		});
	});

	it('editing a client writes an audit row with before and after', async () => {
		const saved = await post(
			clientActions.save,
			'/(desk)/desk/clients/[clientId]',
			`/desk/clients/${clientId}?/save`,
			{ clientId },
			{ name: 'Desk Sites Test Brewery Ltd', contactEmail: '', notes: 'Two boilers' }
		);
		expect(saved.status).toBe(200);
		const audit = await lastAudit();
		expect(audit).toMatchObject({ entity: 'client', entityId: clientId, action: 'update' });
		expect(audit.before).toMatchObject({ name: 'Desk Sites Test Brewery' });
		expect(audit.after).toMatchObject({
			name: 'Desk Sites Test Brewery Ltd',
			notes: 'Two boilers'
		});
	});

	it("another firm's client is not found, and nothing is written", async () => {
		const before = await auditCount();
		await expect(
			post(
				clientActions.save,
				'/(desk)/desk/clients/[clientId]',
				`/desk/clients/${clientId}?/save`,
				{ clientId },
				{ name: 'Taken over' },
				consultantB
			)
		).rejects.toMatchObject({ status: 404 });
		expect(await auditCount()).toBe(before);
	});

	it('adding a site converts mbar to MPa and bumps the feed; an unknown currency writes nothing', async () => {
		const before = await auditCount();
		const sitesBefore = await db
			.select({ n: count() })
			.from(schema.sites)
			.where(eq(schema.sites.clientCompanyId, clientId));
		const bad = await post(
			clientActions.addSite,
			'/(desk)/desk/clients/[clientId]',
			`/desk/clients/${clientId}?/addSite`,
			{ clientId },
			{
				which: 'site',
				name: 'Brewhouse',
				atmosphericPressure: '990',
				unitSystem: 'SI',
				currency: 'XYZ'
			}
		);
		expect(bad.status).toBe(400);
		expect(bad.data.errors).toEqual({ currency: expect.stringContaining('ISO 4217') });
		expect(bad.data.values).toMatchObject({
			which: 'site',
			currency: 'XYZ',
			atmosphericPressure: '990'
		});
		expect(await auditCount()).toBe(before);

		const added = await post(
			clientActions.addSite,
			'/(desk)/desk/clients/[clientId]',
			`/desk/clients/${clientId}?/addSite`,
			{ clientId },
			{
				name: 'Brewhouse',
				address: 'Mash Lane 1',
				atmosphericPressure: '990',
				unitSystem: 'SI',
				currency: 'eur'
			}
		);
		expect(added.status).toBe(200);
		siteId = (added.data.siteAdded as { id: string }).id;
		const [site] = await db.select().from(schema.sites).where(eq(schema.sites.id, siteId));
		// 990 mbar = 99 000 Pa = 0.099 MPa (1 mbar = 100 Pa, NIST SP 811 B.8).
		expect(site.atmosphericPressure).toBeCloseTo(0.099, 12);
		expect(site).toMatchObject({ currency: 'EUR', elevation: null, version: 1 });
		expect(site.changeSeq).toBeGreaterThan(0);
		expect(await lastAudit()).toMatchObject({ entity: 'site', entityId: siteId, action: 'create' });
		const sitesAfter = await db
			.select({ n: count() })
			.from(schema.sites)
			.where(eq(schema.sites.clientCompanyId, clientId));
		expect(Number(sitesAfter[0].n)).toBe(Number(sitesBefore[0].n) + 1);
	});

	it('editing a site bumps version and change_seq and writes an audit row', async () => {
		const [before] = await db.select().from(schema.sites).where(eq(schema.sites.id, siteId));
		const saved = await post(
			siteActions.save,
			'/(desk)/desk/sites/[siteId]',
			`/desk/sites/${siteId}?/save`,
			{ siteId },
			{
				name: 'Brewhouse',
				address: 'Mash Lane 1',
				elevation: '120',
				unitSystem: 'SI',
				currency: 'GBP'
			}
		);
		expect(saved.status).toBe(200);
		// No cost basis yet: the currency may change; the atmosphere moved, so the site is recomputed.
		expect(saved.data.saved).toEqual({ changed: true, recomputed: 0 });
		const [after] = await db.select().from(schema.sites).where(eq(schema.sites.id, siteId));
		expect(after).toMatchObject({ currency: 'GBP', elevation: 120, atmosphericPressure: null });
		expect(after.version).toBe(before.version + 1);
		expect(after.changeSeq).toBeGreaterThan(before.changeSeq);
		expect(await lastAudit()).toMatchObject({ entity: 'site', entityId: siteId, action: 'update' });
	});

	it('refuses a change of currency while the site has a cost basis, writing nothing', async () => {
		const before = await auditCount();
		const [site] = await db.select().from(schema.sites).where(eq(schema.sites.id, creamery));
		const refused = await post(
			siteActions.save,
			'/(desk)/desk/sites/[siteId]',
			`/desk/sites/${creamery}?/save`,
			{ siteId: creamery },
			{
				name: site.name,
				address: site.address ?? '',
				elevation: String(site.elevation),
				unitSystem: 'SI',
				currency: 'GBP'
			}
		);
		expect(refused.status).toBe(400);
		expect(refused.data.errors).toEqual({ currency: expect.stringContaining('new cost basis') });
		const [after] = await db.select().from(schema.sites).where(eq(schema.sites.id, creamery));
		expect(after).toMatchObject({ currency: 'EUR', version: site.version });
		expect(await auditCount()).toBe(before);
	});
});

/** The creamery's basis as the form posts it (SI: %, °C, per m³), with one value changed. */
function creameryForm(basis: CostBasis, changes: Record<string, string>) {
	return {
		'fuel.kind': basis.fuel.kind,
		'fuel.price': basis.fuel.price,
		'fuel.unit': basis.fuel.unit,
		currency: basis.currency,
		boilerEfficiency: String(Math.round(basis.boilerEfficiency * 1000) / 10),
		feedwaterTemperature: String(Math.round((basis.feedwaterTemperature - 273.15) * 10) / 10),
		condensateReturnFraction: String(Math.round(basis.condensateReturnFraction * 1000) / 10),
		makeupWaterPrice: basis.makeupWaterPrice,
		waterTreatmentPrice: basis.waterTreatmentPrice,
		operatingHours: String(basis.operatingHours),
		discountRate: basis.discountRate === undefined ? '' : String(basis.discountRate * 100),
		lifeYears: basis.lifeYears === undefined ? '' : String(basis.lifeYears),
		note: 'Gas contract renewed',
		...changes
	};
}

describe('a cost basis saved at the Desk', () => {
	it('refuses a boiler efficiency of 150 % and writes nothing', async () => {
		const [site] = await db.select().from(schema.sites).where(eq(schema.sites.id, creamery));
		const [current] = await db
			.select()
			.from(schema.costBases)
			.where(eq(schema.costBases.id, site.costBasisId!));
		const versions = await db
			.select({ n: count() })
			.from(schema.costBases)
			.where(eq(schema.costBases.siteId, creamery));
		const refused = await post(
			basisActions.save,
			'/(desk)/desk/sites/[siteId]/cost-basis',
			`/desk/sites/${creamery}/cost-basis?/save`,
			{ siteId: creamery },
			creameryForm(current.basis, { boilerEfficiency: '150' })
		);
		expect(refused.status).toBe(400);
		expect(refused.data.errors).toEqual({
			boilerEfficiency: 'Boiler efficiency must be more than 0 % and up to 100 %'
		});
		expect(refused.data.values).toMatchObject({
			boilerEfficiency: '150',
			'fuel.price': current.basis.fuel.price
		});
		const after = await db
			.select({ n: count() })
			.from(schema.costBases)
			.where(eq(schema.costBases.siteId, creamery));
		expect(after[0].n).toBe(versions[0].n);
	});

	it('is version N+1, keeps version N, re-prices this site only and not the published survey', async () => {
		const [site] = await db.select().from(schema.sites).where(eq(schema.sites.id, creamery));
		const [current] = await db
			.select()
			.from(schema.costBases)
			.where(eq(schema.costBases.id, site.costBasisId!));
		const [published] = await db
			.select()
			.from(schema.surveys)
			.where(eq(schema.surveys.id, publishedSurveyId));
		const [basis1] = await db
			.select()
			.from(schema.costBases)
			.where(and(eq(schema.costBases.siteId, creamery), eq(schema.costBases.number, 1)));
		// The seed froze the spring survey on the creamery's first basis.
		expect(published.costBasisId).toBe(basis1.id);
		const creamerySurveys = (
			await db
				.select({ id: schema.surveys.id })
				.from(schema.surveys)
				.where(and(eq(schema.surveys.siteId, creamery), ne(schema.surveys.id, publishedSurveyId)))
		).map((s) => s.id);
		const before = {
			live: await surveyRows(creamerySurveys),
			published: await surveyRows([publishedSurveyId]),
			other: await surveyRows([other.survey])
		};
		expect(before.live.length).toBeGreaterThan(0);
		expect(before.published.length).toBeGreaterThan(0);
		expect(before.other.length).toBe(3);

		const dearer = (Number(current.basis.fuel.price) * 1.5).toFixed(2);
		const saved = await post(
			basisActions.save,
			'/(desk)/desk/sites/[siteId]/cost-basis',
			`/desk/sites/${creamery}/cost-basis?/save`,
			{ siteId: creamery },
			creameryForm(current.basis, { 'fuel.price': dearer })
		);
		expect(saved.status).toBe(200);
		const result = saved.data.savedBasis as {
			number: number;
			refreshed: number;
			recomputed: boolean;
		};
		expect(result.number).toBe(current.number + 1);
		expect(result.recomputed).toBe(false);
		expect(result.refreshed).toBe(before.live.length);

		const [siteAfter] = await db.select().from(schema.sites).where(eq(schema.sites.id, creamery));
		const [next] = await db
			.select()
			.from(schema.costBases)
			.where(eq(schema.costBases.id, siteAfter.costBasisId!));
		expect(next.number).toBe(current.number + 1);
		expect(next.basis.fuel.price).toBe(dearer);
		expect(next.note).toBe('Gas contract renewed');
		const [kept] = await db
			.select()
			.from(schema.costBases)
			.where(eq(schema.costBases.id, current.id));
		expect(kept).toEqual(current);
		expect(await lastAudit()).toMatchObject({
			entity: 'cost-basis',
			entityId: next.id,
			action: 'create'
		});

		const after = {
			live: await surveyRows(creamerySurveys),
			published: await surveyRows([publishedSurveyId]),
			other: await surveyRows([other.survey])
		};
		for (const [i, row] of after.live.entries()) {
			expect(row.basisId).toBe(next.id);
			// Fuel is most of a loss's cost: half as dear again raises every priced cost.
			if ((before.live[i].cost ?? 0) > 0) expect(row.cost!).toBeGreaterThan(before.live[i].cost!);
			expect(row.steam).toBe(before.live[i].steam);
		}
		expect(after.published).toEqual(before.published);
		expect(after.published.every((r) => r.basisId === basis1.id)).toBe(true);
		expect(after.other).toEqual(before.other);
	});
});

describe('headers', () => {
	it('a new pressure recomputes that header’s findings and no others', async () => {
		const all = (
			await db
				.select({ id: schema.surveys.id })
				.from(schema.surveys)
				.where(eq(schema.surveys.siteId, creamery))
		).map((s) => s.id);
		const before = await surveyRows(all);
		const onIt = before.filter(
			(r) => r.headerId === processHeader && r.surveyId !== publishedSurveyId && r.steam !== null
		);
		expect(onIt.length).toBeGreaterThan(0);
		const [header] = await db
			.select()
			.from(schema.headers)
			.where(eq(schema.headers.id, processHeader));
		processPressure = header.pressure;

		const saved = await post(
			headerActions.update,
			'/(desk)/desk/sites/[siteId]/headers',
			`/desk/sites/${creamery}/headers?/update`,
			{ siteId: creamery },
			{ headerId: processHeader, name: header.name, pressure: '9', steam: 'saturated' }
		);
		expect(saved.status).toBe(200);
		// A published survey keeps its figures as the client saw them: only the others move.
		const live = (r: { surveyId: string }) => r.surveyId !== publishedSurveyId;
		const count = before.filter((r) => r.headerId === processHeader && live(r)).length;
		expect(saved.data.headerSaved).toEqual({ name: header.name, recomputed: count });
		const [changed] = await db
			.select()
			.from(schema.headers)
			.where(eq(schema.headers.id, processHeader));
		expect(changed.pressure).toBeGreaterThan(header.pressure);
		expect(changed.version).toBe(header.version + 1);
		expect(changed.changeSeq).toBeGreaterThan(header.changeSeq);

		const after = await surveyRows(all);
		for (const [i, row] of after.entries()) {
			const was = before[i];
			if (row.headerId === processHeader && live(row) && was.steam !== null && was.steam > 0) {
				// 9 bar g rather than 7: more steam through the same openings.
				expect(row.steam!).toBeGreaterThan(was.steam);
			} else if (row.headerId !== processHeader || !live(row)) {
				expect(row).toEqual(was);
			}
		}
		expect(after.filter((r) => r.headerId === cipHeader)).toEqual(
			before.filter((r) => r.headerId === cipHeader)
		);
	});

	it('refuses a temperature below saturation, naming it, and writes nothing', async () => {
		const before = await auditCount();
		const refused = await post(
			headerActions.add,
			'/(desk)/desk/sites/[siteId]/headers',
			`/desk/sites/${creamery}/headers?/add`,
			{ siteId: creamery },
			{ name: 'Test superheat', pressure: '10', steam: 'temperature', temperature: '150' }
		);
		expect(refused.status).toBe(400);
		// Saturation at 10 bar g (about 11.1 bar a) is about 184 °C (IAPWS-IF97 region 4).
		expect(refused.data.errors).toEqual({ temperature: expect.stringMatching(/18[34]\.\d °C/) });
		expect(refused.data.values).toMatchObject({ temperature: '150', pressure: '10' });
		expect(await auditCount()).toBe(before);
	});

	it('refuses a second header of the same name, in any case', async () => {
		const refused = await post(
			headerActions.add,
			'/(desk)/desk/sites/[siteId]/headers',
			`/desk/sites/${creamery}/headers?/add`,
			{ siteId: creamery },
			{ name: demoSites[0].headers[0].name.toUpperCase(), pressure: '4', steam: 'saturated' }
		);
		expect(refused.status).toBe(400);
		expect(refused.data.errors).toEqual({ name: expect.stringContaining('already has a header') });
	});
});
