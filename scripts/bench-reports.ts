/**
 * The reports, measured (part of `npm run bench`, after the Desk's), on a fresh database of its
 * own (steamwisp_bench_reports) with the demo scenario, loopback only:
 * 1. the PDF report of a survey of 500 saving findings, each with a photo (the test fixture
 *    JPEG, 1800 × 2400, 350 kB) in a photo store on local disk — target ≤ 10 s;
 * 2. the XLSX and the CSV of a survey of 100,000 findings.
 * Each report runs in a process of its own (bench-reports-run.ts), so the peak memory printed
 * (maximum resident set size) is that report's. Figures are printed; nothing is asserted.
 */
import { createHash, randomUUID } from 'node:crypto';
import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { eq, gt, and } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '../src/lib/server/db/schema';
import { creameryAreas } from '../src/lib/server/seed/areas';
import { demoFirms, demoSites, demoUsers } from '../src/lib/server/seed/demo';
import { photoKey } from '../src/lib/server/storage';
import { touchFirm } from '../src/lib/server/sync/counter';
import { freshBenchDatabase } from './bench-app';
import { insertBenchFindings, insertBenchSite } from './bench-desk-rows';
import { databaseUrl } from './env';

const DB_NAME = process.env.STEAMWISP_BENCH_REPORTS_DB_NAME ?? 'steamwisp_bench_reports';
const PDF_FINDINGS = 500;
/** Saving findings wanted in the exports' survey; 0.6 of the Desk benchmark's mix save. */
const EXPORT_FINDINGS = 100_000;
const EXPORT_ROWS = Math.ceil(EXPORT_FINDINGS / 0.6);
const firmId = demoFirms[0].id;
const actorId = demoUsers.find((u) => u.email === 'consultant@cinderbrook.example')!.id;
const pdfSurvey = 'be4e0000-0000-4000-8000-000000000001';
const bigSite = 'be4e0000-0000-4000-8000-000000000002';
const bigSurvey = 'be4e0000-0000-4000-8000-000000000003';
const bigHeaders = ['be4e0000-0000-4000-8000-000000000004', 'be4e0000-0000-4000-8000-000000000005'];
const PHOTO = readFileSync('tests/fixtures/trap-photo.jpg');

const database = freshBenchDatabase(DB_NAME);

const pool = mysql.createPool({ uri: databaseUrl(), connectionLimit: 4, timezone: 'Z' });
const db = drizzle(pool, { schema, mode: 'default' });
const work = mkdtempSync(join(tmpdir(), 'steamwisp-bench-reports-'));
const photoDir = join(work, 'photos');

/** 500 findings that save (the Desk benchmark's mix, working traps dropped), a photo each. */
async function pdfFixtures() {
	const site = demoSites[0];
	await db.insert(schema.surveys).values({
		id: pdfSurvey,
		firmId,
		siteId: site.id,
		name: 'Larkspindle Creamery — benchmark survey of 500 findings',
		status: 'in-review'
	});
	await insertBenchFindings(
		db,
		{
			siteId: site.id,
			surveyId: pdfSurvey,
			headerIds: site.headers.map((h) => h.id),
			areaIds: Object.values(creameryAreas).map((a) => a.id),
			tags: true,
			prefix: 'BR'
		},
		PDF_FINDINGS * 2
	);
	const saving = await db
		.select({ id: schema.findings.id })
		.from(schema.findings)
		.where(and(eq(schema.findings.surveyId, pdfSurvey), gt(schema.findings.cost, 0)));
	const keep = new Set(saving.slice(0, PDF_FINDINGS).map((r) => r.id));
	const all = await db
		.select({ id: schema.findings.id })
		.from(schema.findings)
		.where(eq(schema.findings.surveyId, pdfSurvey));
	for (const f of all) {
		if (!keep.has(f.id)) {
			await db.delete(schema.findings).where(eq(schema.findings.id, f.id));
			continue;
		}
		const photoId = randomUUID();
		const key = photoKey(photoId);
		mkdirSync(dirname(join(photoDir, key)), { recursive: true });
		writeFileSync(join(photoDir, key), PHOTO);
		await db.insert(schema.photos).values({
			id: photoId,
			findingId: f.id,
			surveyId: pdfSurvey,
			firmId,
			storageKey: key,
			contentType: 'image/jpeg',
			bytes: PHOTO.byteLength,
			width: 1800,
			height: 2400,
			sha256: createHash('sha256').update(PHOTO).digest('hex'),
			caption: 'Trap and its discharge, seen from the walkway',
			takenAt: new Date('2026-11-20T09:00:00Z')
		});
		await db
			.update(schema.findings)
			.set({ photoIds: [photoId] })
			.where(eq(schema.findings.id, f.id));
	}
	return keep.size;
}

async function exportFixtures() {
	await insertBenchSite(
		db,
		{
			firmId,
			clientCompanyId: demoSites[0].clientCompanyId,
			actorId,
			siteId: bigSite,
			surveyId: bigSurvey,
			headerIds: [bigHeaders[0], bigHeaders[1]],
			siteName: 'Benchmark works (100,000 saving findings)',
			prefix: 'BX'
		},
		EXPORT_ROWS
	);
}

interface Measured {
	format: string;
	ms: number;
	peakRssMb: number;
	bytes: number;
	findings: number;
}

function measure(format: 'pdf' | 'xlsx' | 'csv', surveyId: string): Measured {
	const out = join(work, `report.${format}`);
	const r = spawnSync(
		'npx',
		['tsx', 'scripts/bench-reports-run.ts', format, surveyId, photoDir, out],
		{
			encoding: 'utf8',
			stdio: ['ignore', 'pipe', 'inherit']
		}
	);
	if (r.status !== 0) throw new Error(`${format} failed (${r.status})`);
	const measured = JSON.parse(r.stdout.trim().split('\n').at(-1)!) as Measured;
	if (format === 'pdf') {
		// STEAMWISP_BENCH_REPORTS_KEEP=<dir> keeps the PDF there, to render its pages and look at them.
		const keep = process.env.STEAMWISP_BENCH_REPORTS_KEEP;
		if (keep) copyFileSync(out, join(keep, 'bench-report.pdf'));
		const info = spawnSync('pdfinfo', [out], { encoding: 'utf8' });
		const pages = /Pages:\s+(\d+)/.exec(info.stdout ?? '')?.[1];
		if (pages) console.log(`  PDF pages: ${pages}`);
	}
	return measured;
}

try {
	const withPhotos = await pdfFixtures();
	await exportFixtures();
	await touchFirm(db, firmId);
	console.log(
		`\nReports (${withPhotos} findings with a photo each for the PDF; a survey of ${EXPORT_ROWS.toLocaleString('en-US')} findings for the exports, those that save listed)`
	);
	const rows = [measure('pdf', pdfSurvey), measure('xlsx', bigSurvey), measure('csv', bigSurvey)];
	console.log('| report | findings | time | peak RSS | file size |');
	console.log('| --- | ---: | ---: | ---: | ---: |');
	for (const m of rows) {
		console.log(
			`| ${m.format.toUpperCase()} | ${m.findings.toLocaleString('en-US')} | ${(m.ms / 1000).toFixed(2)} s | ${m.peakRssMb.toFixed(0)} MB | ${(m.bytes / 1024 / 1024).toFixed(1)} MB |`
		);
	}
	const pdf = rows[0];
	console.log(
		`PDF of ${pdf.findings} findings with photos: ${(pdf.ms / 1000).toFixed(2)} s (target ≤ 10 s)`
	);
} finally {
	await pool.end();
	rmSync(work, { recursive: true, force: true });
	database.done();
}
