/**
 * The survey reports against the real MariaDB (docs/reports.md): the XLSX read back with
 * exceljs, the CSV parsed, the PDF's text extracted with pdfjs-dist; the totals in each equal
 * the ranked savings list's (rankedSavings), units stand in the headers; a client gets the
 * frozen figures of the last published revision after a correction has changed the live ones;
 * bad parameters are refused in words; and only those who may read the survey get a report.
 * Findings are priced by the engine (the Desk benchmark's mix, scripts/bench-desk-rows.ts) on
 * this file's own invented site.
 */
import ExcelJS from 'exceljs';
import { eq, inArray, sql } from 'drizzle-orm';
import { isHttpError } from '@sveltejs/kit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CostBasis } from '../../src/lib/schemas/site';
import { moneyText } from '../../src/lib/components/savings/money';
import * as schema from '../../src/lib/server/db/schema';
import { openCorrection, publishSurvey } from '../../src/lib/server/publish/publish';
import { reportContent } from '../../src/lib/server/reports/content';
import { reportRows } from '../../src/lib/server/reports/rows';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { touchFirm } from '../../src/lib/server/sync/counter';
import { GET as csvRoute } from '../../src/routes/api/surveys/[id]/findings.csv/+server';
import { GET as xlsxRoute } from '../../src/routes/api/surveys/[id]/findings.xlsx/+server';
import { GET as pdfRoute } from '../../src/routes/api/surveys/[id]/report.pdf/+server';
import { insertBenchFindings } from '../../scripts/bench-desk-rows';
import { pdfPages } from '../support/pdf-text';
import { testDatabase } from './db';
import { liveSavings } from './live-savings';
import { auditorA, clientA, clientB, consultantA, consultantB } from './demo-people';
import { routeEvent, type Handler } from './walk-api';

const { pool, db } = testDatabase();
const firmId = demoFirms[0].id;
const id = (kind: number, n: number) =>
	`5e90a700-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;
const site = id(1, 1);
const basisId = id(2, 1);
const headerIds = [id(3, 1), id(3, 2)];
const areaIds = [id(4, 1), id(4, 2), id(4, 3)];
const survey = id(5, 1);
const otherClient = id(6, 1);
const otherClientUser = {
	id: id(7, 1),
	firmId,
	email: 'reports.spec@other-client.example',
	name: 'Other client user',
	role: 'client',
	clientCompanyId: otherClient
} as SessionUser;
const N = 60;

const basis: CostBasis = {
	fuel: { kind: 'natural-gas', price: '11.50', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.82,
	feedwaterTemperature: 378.15,
	condensateReturnFraction: 0.6,
	makeupWaterPrice: '2.10',
	waterTreatmentPrice: '0.90',
	operatingHours: 7600,
	discountRate: 0.07,
	lifeYears: 8
};

async function cleanUp() {
	await db.execute(
		sql`DELETE srf FROM survey_revision_findings srf JOIN survey_revisions r ON r.id = srf.revision_id WHERE r.survey_id = ${survey}`
	);
	await db.delete(schema.surveyRevisions).where(eq(schema.surveyRevisions.surveyId, survey));
	await db
		.delete(schema.auditLog)
		.where(eq(schema.auditLog.entityId, survey))
		.catch(() => {});
	await db.delete(schema.findings).where(eq(schema.findings.surveyId, survey));
	await db.delete(schema.surveys).where(eq(schema.surveys.id, survey));
	await db.update(schema.sites).set({ costBasisId: null }).where(eq(schema.sites.id, site));
	await db.delete(schema.costBases).where(eq(schema.costBases.siteId, site));
	await db.delete(schema.assets).where(eq(schema.assets.siteId, site));
	await db.delete(schema.areas).where(eq(schema.areas.siteId, site));
	await db.delete(schema.headers).where(eq(schema.headers.siteId, site));
	await db.delete(schema.sites).where(eq(schema.sites.id, site));
	await db.delete(schema.users).where(eq(schema.users.id, otherClientUser.id));
	await db.delete(schema.clientCompanies).where(eq(schema.clientCompanies.id, otherClient));
}

beforeAll(async () => {
	await cleanUp();
	await db
		.insert(schema.clientCompanies)
		.values({ id: otherClient, firmId, name: 'Reports Spec Other Client' });
	await db.insert(schema.users).values({ ...otherClientUser, clientCompanyId: otherClient });
	await db.insert(schema.sites).values({
		id: site,
		firmId,
		clientCompanyId: clientA.clientCompanyId!,
		name: 'Reports spec creamery',
		currency: 'EUR'
	});
	await db.insert(schema.costBases).values({ id: basisId, siteId: site, number: 1, basis });
	await db.update(schema.sites).set({ costBasisId: basisId }).where(eq(schema.sites.id, site));
	await db.insert(schema.headers).values([
		{ id: headerIds[0], siteId: site, name: 'Main 10 bar', pressure: 1.1 },
		{ id: headerIds[1], siteId: site, name: 'Process 4 bar', pressure: 0.5 }
	]);
	await db
		.insert(schema.areas)
		.values(
			areaIds.map((a, i) => ({ id: a, siteId: site, name: ['Evaporator', 'CIP', 'Dryer'][i] }))
		);
	await db.insert(schema.surveys).values({
		id: survey,
		firmId,
		siteId: site,
		name: 'Reports spec: winter survey',
		status: 'in-review'
	});
	await insertBenchFindings(
		db,
		{ siteId: site, surveyId: survey, headerIds, areaIds, tags: true, prefix: 'RS' },
		N
	);
	await touchFirm(db, firmId);
});

afterAll(async () => {
	await cleanUp();
	await touchFirm(db, firmId);
	await pool.end();
});

const ROUTES = {
	pdf: { handler: pdfRoute, id: '/api/surveys/[id]/report.pdf', file: 'report.pdf' },
	xlsx: { handler: xlsxRoute, id: '/api/surveys/[id]/findings.xlsx', file: 'findings.xlsx' },
	csv: { handler: csvRoute, id: '/api/surveys/[id]/findings.csv', file: 'findings.csv' }
} as const;
type Format = keyof typeof ROUTES;

async function get(format: Format, user: SessionUser | null, query = '', surveyId = survey) {
	const r = ROUTES[format];
	const request = new Request(`http://127.0.0.1/api/surveys/${surveyId}/${r.file}${query}`);
	const event = routeEvent(user, r.id, request, { id: surveyId });
	try {
		const res = await (r.handler as Handler)(event as never);
		return {
			status: res.status,
			headers: res.headers,
			bytes: new Uint8Array(await res.arrayBuffer()),
			message: ''
		};
	} catch (e) {
		if (isHttpError(e))
			return {
				status: e.status,
				headers: new Headers(),
				bytes: new Uint8Array(),
				message: e.body.message
			};
		throw e;
	}
}

async function ok(format: Format, user: SessionUser, query = '') {
	const res = await get(format, user, query);
	expect(res.status, res.message).toBe(200);
	return res;
}

/** RFC 4180 records (quoted fields, doubled quotes, CRLF), for reading the export back. */
function parseCsv(text: string): string[][] {
	const rows: string[][] = [];
	let row: string[] = [];
	let field = '';
	let quoted = false;
	for (let i = 0; i < text.length; i++) {
		const c = text[i];
		if (quoted && c === '"' && text[i + 1] === '"') {
			field += '"';
			i++;
		} else if (c === '"') {
			quoted = !quoted;
		} else if (quoted) {
			field += c;
		} else if (c === ',') {
			row.push(field);
			field = '';
		} else if (c === '\r' && text[i + 1] === '\n') {
			row.push(field);
			rows.push(row);
			row = [];
			field = '';
			i++;
		} else {
			field += c;
		}
	}
	if (field || row.length) rows.push([...row, field]);
	return rows;
}

async function csvTable(user: SessionUser, query = '') {
	const res = await ok('csv', user, query);
	expect([...res.bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
	const [head, ...rows] = parseCsv(new TextDecoder().decode(res.bytes.slice(3)));
	const col = (title: string) => {
		const i = head.indexOf(title);
		expect(i, `${title} in ${head.join(' | ')}`).toBeGreaterThanOrEqual(0);
		return rows.map((r) => r[i]);
	};
	return { head, rows, col, res };
}

const toMinor = (major: string) => Math.round(Number(major) * 100);
const sumMinor = (values: (string | number | null)[]) =>
	values.reduce<number>(
		(s, v) => s + (v === null || v === '' ? 0 : Math.round(Number(v) * 100)),
		0
	);

async function liveList() {
	return liveSavings(db, survey);
}

async function xlsxSheet(user: SessionUser, query = '') {
	const res = await ok('xlsx', user, query);
	const book = new ExcelJS.Workbook();
	await book.xlsx.load(Buffer.from(res.bytes) as never);
	const sheet = book.getWorksheet('Findings')!;
	const head = (sheet.getRow(1).values as unknown[]).slice(1).map(String);
	const rows: unknown[][] = [];
	sheet.eachRow((r, n) => {
		if (n > 1) rows.push((r.values as unknown[]).slice(1));
	});
	return { head, rows, book, res };
}

describe('a draft survey, as the consultant reports it', () => {
	it('the CSV: BOM, units in the headers, every ranked finding, totals equal rankedSavings', async () => {
		const list = await liveList();
		expect(list.totals.count).toBeGreaterThan(20);
		const { head, rows, col, res } = await csvTable(consultantA);
		expect(res.headers.get('content-type')).toMatch(/^text\/csv; charset=utf-8/);
		expect(res.headers.get('content-disposition')).toBe(
			'attachment; filename="reports-spec-winter-survey-findings.csv"'
		);
		expect(res.headers.get('cache-control')).toBe('private, no-store');
		for (const t of [
			'Steam lost (kg/h)',
			'Heat lost (kW)',
			'Fuel (GJ/yr)',
			'Cost (EUR/yr)',
			'CO2 (kg/yr)',
			'Water (m³/yr)',
			'Repair (EUR)',
			'Payback (years)'
		]) {
			expect(head).toContain(t);
		}
		expect(rows).toHaveLength(list.totals.count);
		expect(col('Finding')).toEqual(list.items.map((i) => i.id));
		expect(sumMinor(col('Cost (EUR/yr)'))).toBe(list.totals.costMinor);
		expect(sumMinor(col('Repair (EUR)'))).toBe(list.totals.repairCostMinor);
		expect(toMinor(col('Cumulative saving (EUR/yr)').at(-1)!)).toBe(list.totals.costMinor);
		const co2 = col('CO2 (kg/yr)').reduce((s, v) => s + Number(v || 0), 0);
		expect(co2).toBeCloseTo(list.totals.co2KgYear, 3);
		const water = col('Water (m³/yr)').reduce((s, v) => s + Number(v || 0), 0);
		expect(water).toBeCloseTo(list.totals.waterM3Year, 3);
	});

	it('pages of any size give the savings list’s order and running sums, ties by id', async () => {
		const list = await liveList();
		const content = await reportContent(db, survey, 'staff');
		expect(content?.ok).toBe(true);
		if (!content?.ok) return;
		// The mix repeats its costs, so small pages end inside runs of equal cost.
		expect(new Set(list.items.map((i) => i.costMinor)).size).toBeLessThan(list.items.length);
		for (const pageRows of [1, 2, 7, 1000]) {
			const rows = [];
			for await (const r of reportRows(db, content.content, { pageRows })) rows.push(r);
			expect(
				rows.map((r) => [r.rank, r.id, r.cumulativeSavingMinor, r.cumulativeRepairCostMinor]),
				`pages of ${pageRows}`
			).toEqual(
				list.items.map((i) => [i.rank, i.id, i.cumulativeSavingMinor, i.cumulativeRepairCostMinor])
			);
		}
		const first = [];
		for await (const r of reportRows(db, content.content, { limit: 5, pageRows: 2 }))
			first.push(r.id);
		expect(first).toEqual(list.items.slice(0, 5).map((i) => i.id));
	});

	it('the XLSX read back with exceljs: the same rows and totals, units in the headers', async () => {
		const list = await liveList();
		const { head, rows, book, res } = await xlsxSheet(consultantA);
		expect(res.headers.get('content-type')).toBe(
			'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet'
		);
		expect(head).toContain('Cost (EUR/yr)');
		expect(head).toContain('Water (m³/yr)');
		expect(rows).toHaveLength(list.totals.count);
		const cost = head.indexOf('Cost (EUR/yr)');
		expect(sumMinor(rows.map((r) => r[cost] as number))).toBe(list.totals.costMinor);
		const steam = head.indexOf('Steam lost (kg/h)');
		const steamSum = rows.reduce<number>((s, r) => s + Number(r[steam] ?? 0), 0);
		expect(steamSum).toBeCloseTo(list.totals.steamKgH, 6);
		// The summary sheet carries the same totals and says the figures are a draft.
		const summary = book.getWorksheet('Summary')!;
		const lines = new Map<string, unknown>();
		summary.eachRow((r) => lines.set(String(r.getCell(1).value), r.getCell(2).value));
		expect(Math.round(Number(lines.get('Cost saved')) * 100)).toBe(list.totals.costMinor);
		expect(String(lines.get('Figures'))).toMatch(/^DRAFT — not yet published/);
	});

	it('the PDF: the draft marker on the cover, the totals and units, a page per finding', async () => {
		const list = await liveList();
		const res = await ok('pdf', consultantA);
		expect(res.headers.get('content-type')).toBe('application/pdf');
		expect(res.headers.get('content-disposition')).toBe(
			'attachment; filename="reports-spec-winter-survey-report.pdf"'
		);
		expect(new TextDecoder().decode(res.bytes.slice(0, 5))).toBe('%PDF-');
		const pages = await pdfPages(res.bytes);
		expect(pages[0]).toContain('DRAFT — not yet published to the client');
		const all = pages.join('\n');
		expect(all).toContain(`Cost saved ${moneyText(list.totals.costMinor, 'EUR')} per year`);
		expect(all).toContain('Cost (EUR/yr)');
		expect(all).toContain('Findings ranked by annual saving');
		expect(all).toContain('engineering estimates, not guarantees');
		// One finding page per saving finding, headed by its rank.
		for (const item of list.items) expect(all).toContain(`${item.rank}. ${item.kindWords}`);
		expect(pages.filter((p) => p.includes('How the figures are worked out')).length).toBe(
			list.totals.count
		);
	});
});

describe('a measure in the report', () => {
	const measureId = '5e9c0000-0007-4000-8000-000000000001';
	afterAll(async () => {
		await db
			.update(schema.findings)
			.set({ measureId: null })
			.where(eq(schema.findings.measureId, measureId));
		await db.delete(schema.measures).where(eq(schema.measures.id, measureId));
		await touchFirm(db, firmId);
	});

	it('the PDF gives it a page: its own costs, cost in all, saving, payback and its findings', async () => {
		const before = await liveList();
		const held = before.items.slice(0, 2);
		await db.insert(schema.measures).values({
			id: measureId,
			surveyId: survey,
			name: 'Reports spec: the two worst, one shutdown',
			scaffoldCost: 123_400,
			shutdownCost: 50_000
		});
		await db
			.update(schema.findings)
			.set({ measureId })
			.where(
				inArray(
					schema.findings.id,
					held.map((i) => i.id)
				)
			);
		await touchFirm(db, firmId);
		const list = await liveList();
		const [m] = list.measures;
		expect(m.cost).toBe(held.reduce((t, i) => t + (i.repairCostMinor ?? 0), 0) + 173_400);

		const pages = await pdfPages((await ok('pdf', consultantA)).bytes);
		const page = pages.find((p) => p.includes('Measure: Reports spec: the two worst'));
		expect(page, 'a page for the measure').toBeDefined();
		expect(page).toContain(`Scaffold ${moneyText(123_400, 'EUR')}`);
		expect(page).toContain(`Shutdown ${moneyText(50_000, 'EUR')}`);
		expect(page).toContain(`Cost in all (EUR) ${moneyText(m.cost!, 'EUR')}`);
		expect(page).toContain(`Annual saving (EUR/yr) ${moneyText(m.annualSaving, 'EUR')}`);
		expect(page).toContain('Simple payback');
		// Its findings, ranked among themselves, and no other.
		for (const item of held) expect(page).toContain(item.location);
		const others = list.items.filter((i) => !held.some((h) => h.id === i.id));
		for (const item of others) expect(page).not.toContain(`${item.tag ?? item.location}`);
		// The whole's investment counts the measure's own costs.
		expect(pages.join('\n')).toContain(`${moneyText(list.totals.extraCostMinor, 'EUR')}`);
		expect(list.totals.extraCostMinor).toBe(173_400);
	});
});

describe('published, then corrected: the client keeps the frozen revision', () => {
	let published: Awaited<ReturnType<typeof liveList>>;
	let changed: string;

	beforeAll(async () => {
		await db
			.update(schema.findings)
			.set({ reviewedAt: new Date(), status: 'reviewed' })
			.where(eq(schema.findings.surveyId, survey));
		await touchFirm(db, firmId);
		published = await liveList();
		const out = await publishSurvey(consultantA, survey, { note: '', origin: null }, db);
		expect(out.ok, JSON.stringify(out)).toBe(true);
		const corrected = await openCorrection(consultantA, survey, db);
		expect(corrected.ok).toBe(true);
		// The correction changes the live figures of the finding that saved most.
		changed = published.items[0].id;
		await db
			.update(schema.findings)
			.set({ cost: sql`${schema.findings.cost} * 3`, version: sql`${schema.findings.version} + 1` })
			.where(eq(schema.findings.id, changed));
		await touchFirm(db, firmId);
	});

	it('the live list moved, the client’s CSV and XLSX did not', async () => {
		const live = await liveList();
		expect(live.totals.costMinor).not.toBe(published.totals.costMinor);
		const { col } = await csvTable(clientA);
		expect(sumMinor(col('Cost (EUR/yr)'))).toBe(published.totals.costMinor);
		// The snapshot paged small, as the live list is above.
		const frozen = await reportContent(db, survey, 'client');
		if (!frozen?.ok) throw new Error('no revision');
		const ids = [];
		for await (const r of reportRows(db, frozen.content, { pageRows: 3 })) ids.push(r.id);
		expect(ids).toEqual(published.items.map((i) => i.id));
		expect(col('Finding')).toEqual(published.items.map((i) => i.id));
		const { head, rows } = await xlsxSheet(clientA);
		expect(sumMinor(rows.map((r) => r[head.indexOf('Cost (EUR/yr)')] as number))).toBe(
			published.totals.costMinor
		);
	});

	it('the client’s PDF is revision 1, and the corrected finding says so', async () => {
		const pages = await pdfPages((await ok('pdf', clientA)).bytes);
		expect(pages[0]).toContain('Revision 1, as published to the client.');
		expect(pages[0]).not.toContain('DRAFT');
		const all = pages.join('\n');
		expect(all).toContain(`Cost saved ${moneyText(published.totals.costMinor, 'EUR')} per year`);
		const page = pages.find(
			(p) =>
				p.includes(`1. ${published.items[0].kindWords}`) &&
				p.includes('Evidence corrected after this revision')
		);
		expect(page).toBeDefined();
		expect(pages.filter((p) => p.includes('Evidence corrected after this revision'))).toHaveLength(
			1
		);
	});

	it('the consultant’s PDF is the live correction, marked as such; ?revision=1 gives the published one', async () => {
		const pages = await pdfPages((await ok('pdf', consultantA)).bytes);
		expect(pages[0]).toContain('correction in progress, revision 2, not yet published');
		const live = await liveList();
		expect(pages.join('\n')).toContain(
			`Cost saved ${moneyText(live.totals.costMinor, 'EUR')} per year`
		);
		const { col } = await csvTable(consultantA, '?revision=1');
		expect(sumMinor(col('Cost (EUR/yr)'))).toBe(published.totals.costMinor);
	});

	it('refuses a revision that does not exist and parameters it cannot read, in words', async () => {
		const missing = await get('csv', clientA, '?revision=4');
		expect(missing).toMatchObject({
			status: 404,
			message: 'This survey has no published revision 4: its revisions are 1 to 1.'
		});
		for (const [query, message] of [
			[
				'?revision=abc',
				'revision must be the number of a published revision: a whole number from 1'
			],
			['?revision=0', 'revision must be the number of a published revision: a whole number from 1'],
			['?revision=1&revision=1', 'Give revision only once.'],
			['?rank=payback', 'Unknown parameter rank: a report takes only revision']
		] as const) {
			for (const format of ['pdf', 'xlsx', 'csv'] as const) {
				expect(await get(format, consultantA, query), `${format}${query}`).toMatchObject({
					status: 400,
					message
				});
			}
		}
	});
});

describe('who may download a report', () => {
	it('refuses nobody (401), auditors (403), another firm, another client company (404)', async () => {
		for (const format of ['pdf', 'xlsx', 'csv'] as const) {
			expect((await get(format, null)).status, format).toBe(401);
			expect((await get(format, auditorA)).status, format).toBe(403);
			expect((await get(format, consultantB)).status, format).toBe(404);
			expect((await get(format, clientB)).status, format).toBe(404);
			expect((await get(format, otherClientUser)).status, format).toBe(404);
			expect((await get(format, consultantA, '', id(5, 99))).status, format).toBe(404);
			expect((await get(format, consultantA, '', 'not-a-uuid')).status, format).toBe(404);
		}
	});

	it('a client never gets a survey that is not published', async () => {
		await db
			.update(schema.surveys)
			.set({ status: 'in-review', publishedAt: null })
			.where(eq(schema.surveys.id, survey));
		await touchFirm(db, firmId);
		try {
			for (const format of ['pdf', 'xlsx', 'csv'] as const) {
				expect((await get(format, clientA)).status, format).toBe(404);
			}
		} finally {
			await db
				.update(schema.surveys)
				.set({ publishedAt: new Date() })
				.where(eq(schema.surveys.id, survey));
		}
	});
});
