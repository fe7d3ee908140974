/**
 * The policy helpers against the real database: which surveys and sites each demo person can
 * list and open, and that everything else answers 404 (or 403 where they may look but not
 * change). Uses the seeded demo firms plus a second client company of Cinderbrook made here.
 */
import { isHttpError } from '@sveltejs/kit';
import { and, eq, inArray, isNotNull } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as schema from '../../src/lib/server/db/schema';
import {
	requirePerson,
	requireSiteAccess,
	requireSurveyAccess,
	siteScope,
	surveyScope
} from '../../src/lib/server/policy';
import { demoSites, demoSurveys } from '../../src/lib/server/seed/demo';
import { publishedSurveyId } from '../../src/lib/server/seed/findings';
import { testDatabase } from './db';
import { adminA, consultantA, auditorA, clientA, adminB, clientB } from './demo-people';

const { pool, db } = testDatabase();

const inFieldA = demoSurveys[0].id;
const surveyB = demoSurveys[1].id;
const creamery = demoSites[0].id;
const millB = demoSites[1].id;
// A second client of Cinderbrook with a published survey its people must not see.
const brewery = {
	client: 'b2e70001-0000-4000-8000-000000000001',
	site: 'b2e70002-0000-4000-8000-000000000001',
	survey: 'b2e70003-0000-4000-8000-000000000001'
};

beforeAll(async () => {
	const firmId = adminA.firmId;
	await db
		.insert(schema.clientCompanies)
		.values({ id: brewery.client, firmId, name: 'Policy Test Brewery' });
	await db.insert(schema.sites).values({
		id: brewery.site,
		firmId,
		clientCompanyId: brewery.client,
		name: 'Policy Test Brewhouse'
	});
	await db.insert(schema.surveys).values({
		id: brewery.survey,
		firmId,
		siteId: brewery.site,
		name: 'Policy test brewhouse survey',
		status: 'published',
		publishedAt: new Date()
	});
});

afterAll(async () => {
	await db.delete(schema.surveys).where(eq(schema.surveys.id, brewery.survey));
	await db.delete(schema.sites).where(eq(schema.sites.id, brewery.site));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, brewery.client));
	await pool.end();
});

async function status(p: Promise<unknown>): Promise<number> {
	try {
		await p;
		return 200;
	} catch (e) {
		if (isHttpError(e)) return e.status;
		throw e;
	}
}

const visibleSurveys = async (user: SessionUser) =>
	(await db.select({ id: schema.surveys.id }).from(schema.surveys).where(surveyScope(user)))
		.map((r) => r.id)
		.sort();
const visibleSites = async (user: SessionUser) =>
	(await db.select({ id: schema.sites.id }).from(schema.sites).where(siteScope(user)))
		.map((r) => r.id)
		.sort();

describe('survey lists', () => {
	it("give consultants and admins their whole firm's surveys and nothing else", async () => {
		const firmA = (
			await db
				.select({ id: schema.surveys.id })
				.from(schema.surveys)
				.where(eq(schema.surveys.firmId, adminA.firmId))
		)
			.map((r) => r.id)
			.sort();
		expect(firmA).toEqual(expect.arrayContaining([inFieldA, publishedSurveyId, brewery.survey]));
		expect(await visibleSurveys(consultantA)).toEqual(firmA);
		expect(await visibleSurveys(adminA)).toEqual(firmA);
		expect(await visibleSurveys(adminA)).not.toContain(surveyB);
	});

	it('give an auditor only the surveys they are assigned to', async () => {
		expect(await visibleSurveys(auditorA)).toEqual([inFieldA]);
	});

	it("give a client user only published surveys of their own company's sites", async () => {
		// Worked out here with a join, independently of the scope's subquery.
		const expected = async (user: SessionUser) =>
			(
				await db
					.select({ id: schema.surveys.id })
					.from(schema.surveys)
					.innerJoin(schema.sites, eq(schema.sites.id, schema.surveys.siteId))
					.where(
						and(
							eq(schema.sites.clientCompanyId, user.clientCompanyId!),
							isNotNull(schema.surveys.publishedAt)
						)
					)
			)
				.map((r) => r.id)
				.sort();
		const a = await visibleSurveys(clientA);
		expect(a).toEqual(await expected(clientA));
		expect(a).toContain(publishedSurveyId);
		expect(a).not.toContain(inFieldA);
		expect(a).not.toContain(brewery.survey);
		expect(await visibleSurveys(clientB)).toEqual(await expected(clientB));
	});
});

describe('one survey', () => {
	it.each([
		['consultant, own firm', consultantA, inFieldA, 'write', 200],
		['auditor, assigned', auditorA, inFieldA, 'write', 200],
		['auditor, not assigned', auditorA, publishedSurveyId, 'read', 404],
		['client, published, own company', clientA, publishedSurveyId, 'read', 200],
		['client, published, may not change it', clientA, publishedSurveyId, 'write', 403],
		['client, still in the field', clientA, inFieldA, 'read', 404],
		['client, another company of the firm', clientA, brewery.survey, 'read', 404],
		['admin, another firm', adminB, inFieldA, 'read', 404],
		['client, another firm', clientB, publishedSurveyId, 'read', 404],
		['anyone, not an id', adminA, "1' OR '1'='1", 'read', 404],
		['anyone, no such survey', adminA, '00000000-0000-4000-8000-000000000000', 'read', 404]
	] as const)('%s → %i', async (_, user, id, need, expected) => {
		expect(await status(requireSurveyAccess(user, id, need))).toBe(expected);
	});

	it('says what access was granted', async () => {
		expect((await requireSurveyAccess(clientA, publishedSurveyId)).access).toBe('read');
		expect((await requireSurveyAccess(auditorA, inFieldA)).access).toBe('write');
	});
});

describe('sites', () => {
	it('list by role and tenant', async () => {
		const firmASites = [creamery, brewery.site].sort();
		expect(await visibleSites(consultantA)).toEqual(expect.arrayContaining(firmASites));
		expect(await visibleSites(consultantA)).not.toContain(millB);
		expect(await visibleSites(auditorA)).toEqual([creamery]);
		expect(await visibleSites(clientA)).toEqual([creamery]);
	});

	it.each([
		['consultant, own firm', consultantA, brewery.site, 'write', 200],
		['auditor, site of an assigned survey', auditorA, creamery, 'read', 200],
		['auditor, may not change it', auditorA, creamery, 'write', 403],
		['auditor, site without an assignment', auditorA, brewery.site, 'read', 404],
		['client, own company', clientA, creamery, 'read', 200],
		['client, another company', clientA, brewery.site, 'read', 404],
		['admin, another firm', adminB, creamery, 'read', 404]
	] as const)('%s → %i', async (_, user, id, need, expected) => {
		expect(await status(requireSiteAccess(user, id, need))).toBe(expected);
	});
});

describe('people', () => {
	it.each([
		['admin, someone of the firm', adminA, consultantA.id, 'write', 200],
		['admin, themselves', adminA, adminA.id, 'write', 403],
		['consultant, may look', consultantA, auditorA.id, 'read', 200],
		['consultant, may not change', consultantA, auditorA.id, 'write', 403],
		['auditor, nobody', auditorA, consultantA.id, 'read', 404],
		['admin, another firm', adminA, adminB.id, 'read', 404]
	] as const)('%s → %i', async (_, user, id, need, expected) => {
		expect(await status(requirePerson(user, id, need))).toBe(expected);
	});
});

it('never lists a survey of another firm for anyone', async () => {
	const all = [adminA, consultantA, auditorA, clientA];
	const firmB = (
		await db
			.select({ id: schema.surveys.id })
			.from(schema.surveys)
			.where(inArray(schema.surveys.firmId, [adminB.firmId]))
	).map((r) => r.id);
	expect(firmB.length).toBeGreaterThan(0);
	for (const user of all) {
		for (const id of await visibleSurveys(user)) expect(firmB).not.toContain(id);
	}
});
