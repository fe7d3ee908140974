/**
 * The Ladder, measured (part of `npm run bench`), on a fresh database of its own
 * (steamwisp_bench_ladder) with the demo scenario and, for the demo dairy's company, ten more
 * sites each with a published survey of 2,000 findings (20,000 published findings over ten
 * surveys, each published as revision 1 by the app's own publishing code):
 * 1. the Ladder's first load for the dairy's plant manager (`GET /ladder`, server-rendered HTML):
 *    autocannon, 20 connections — p50/p95/p99 and requests per second (target p95 ≤ 150 ms);
 *    then the first request of a view nobody asked for yet (each order with each kind filter);
 * 2. the JavaScript the page sends: every module the page loads, gzipped as a server would
 *    send them, added up.
 * Figures are printed; nothing is asserted.
 */
import { existsSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import autocannon from 'autocannon';
import { eq } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '../src/lib/server/db/schema';
import { surveyPricing } from '../src/lib/server/desk/findings-query';
import { freezeSurveyBasis } from '../src/lib/server/pricing/cost-basis';
import { writeRevision } from '../src/lib/server/publish/revision-write';
import { demoFirms, demoPassword, demoSites, demoUsers } from '../src/lib/server/seed/demo';
import {
	benchSignIn,
	freshBenchDatabase,
	percentile,
	run,
	startBenchApp,
	waitForApp
} from './bench-app';
import { insertBenchSite } from './bench-desk-rows';
import { databaseUrl } from './env';

const DB_NAME = process.env.STEAMWISP_BENCH_LADDER_DB_NAME ?? 'steamwisp_bench_ladder';
const PORT = Number(process.env.STEAMWISP_BENCH_LADDER_PORT ?? 4187);
const ORIGIN = `http://127.0.0.1:${PORT}`;
const SURVEYS = 10;
const PER_SURVEY = 2_000;
const SECONDS = 5;
const CLIENT = 'plant.manager@larkspindle-dairy.example';
const firmId = demoFirms[0].id;
const company = demoSites[0].clientCompanyId;
const consultant = demoUsers.find((u) => u.email === 'consultant@cinderbrook.example')!;
const uuid = (kind: number, n: number) =>
	`be1a0000-${String(kind).padStart(4, '0')}-4000-8000-${String(n).padStart(12, '0')}`;

const database = freshBenchDatabase(DB_NAME);
if (!existsSync('build/index.js')) run('node_modules/.bin/vite', ['build', '--logLevel', 'error']);

const pool = mysql.createPool({ uri: databaseUrl(), connectionLimit: 4, timezone: 'Z' });
const db = drizzle(pool, { schema, mode: 'default' });

async function fixtures() {
	const t0 = performance.now();
	for (let k = 1; k <= SURVEYS; k++) {
		const siteId = uuid(1, k);
		const surveyId = uuid(2, k);
		await insertBenchSite(
			db,
			{
				firmId,
				clientCompanyId: company,
				actorId: consultant.id,
				siteId,
				surveyId,
				headerIds: [uuid(3, k * 2), uuid(3, k * 2 + 1)],
				siteName: `Benchmark dairy site ${String(k).padStart(2, '0')}`,
				prefix: `L${k}`
			},
			PER_SURVEY
		);
		const at = new Date(Date.UTC(2026, 9, k));
		await db.transaction(async (tx) => {
			const basisId = (await freezeSurveyBasis(tx, surveyId))!;
			const pricing = (await surveyPricing(tx, surveyId))!;
			await writeRevision(tx, {
				surveyId,
				number: 1,
				basisId,
				currency: pricing.currency,
				actorId: consultant.id,
				note: null,
				at
			});
			await tx
				.update(schema.surveys)
				.set({ status: 'published', publishedAt: at })
				.where(eq(schema.surveys.id, surveyId));
		});
	}
	return performance.now() - t0;
}

const signIn = () => benchSignIn(ORIGIN, CLIENT, demoPassword);

const ms = (v: number) => `${v.toFixed(1).padStart(6)} ms`;

async function load(cookie: string, path: string) {
	const times: number[] = [];
	const result = await new Promise<autocannon.Result>((resolve, reject) => {
		const instance = autocannon(
			{ url: `${ORIGIN}${path}`, connections: 20, duration: SECONDS, headers: { cookie } },
			(err, res) => (err ? reject(err) : resolve(res))
		);
		instance.on('response', (_client, _status, _bytes, took) => times.push(took));
	});
	times.sort((a, b) => a - b);
	return {
		p50: percentile(times, 50),
		p95: percentile(times, 95),
		p99: percentile(times, 99),
		rps: result.requests.average,
		failed: result.non2xx + result.errors
	};
}

/** Every script the page loads: its modulepreload links and imports, followed to the end. */
async function javascriptSent(cookie: string, path: string) {
	const html = await (await fetch(`${ORIGIN}${path}`, { headers: { cookie } })).text();
	const found = new Set<string>();
	const queue = [...html.matchAll(/(?:href|src)="([^"]+\.js)"/g)].map((m) => m[1]);
	for (const m of html.matchAll(/import\("([^"]+\.js)"\)/g)) queue.push(m[1]);
	let raw = 0;
	let gzipped = 0;
	while (queue.length > 0) {
		const url = new URL(queue.shift()!, `${ORIGIN}${path}`);
		if (found.has(url.pathname)) continue;
		found.add(url.pathname);
		const code = Buffer.from(await (await fetch(url)).arrayBuffer());
		raw += code.length;
		gzipped += gzipSync(code, { level: 9 }).length;
		const text = code.toString('utf8');
		for (const m of text.matchAll(/(?:from|import)\s*["']([^"']+\.js)["']/g)) {
			queue.push(new URL(m[1], url).href);
		}
	}
	return { files: found.size, raw, gzipped };
}

const app = startBenchApp('ladder', PORT);

try {
	const setup = await fixtures();
	await waitForApp(ORIGIN);
	const cookie = await signIn();
	const first = await fetch(`${ORIGIN}/ladder`, { headers: { cookie } });
	const html = await first.text();
	if (!first.ok || !html.includes('Benchmark dairy site')) {
		throw new Error(`/ladder answered ${first.status} without the benchmark sites`);
	}
	const published = await pool.query(
		`SELECT COUNT(*) AS n FROM survey_revision_findings f JOIN survey_revisions r ON r.id = f.revision_id
		 JOIN surveys s ON s.id = r.survey_id JOIN sites t ON t.id = s.site_id WHERE t.client_company_id = ?`,
		[company]
	);
	const n = Number((published[0] as { n: number }[])[0].n);
	console.log(
		`\nThe Ladder of a company with ${n.toLocaleString('en-GB')} published findings over ${SURVEYS + 1} surveys (set up in ${(setup / 1000).toFixed(1)} s); 20 connections, ${SECONDS} s a view`
	);
	console.log(
		`  view                          p50        p95        p99     req/s   target p95 ≤ 150 ms`
	);
	const row = (name: string, r: Awaited<ReturnType<typeof load>>) =>
		console.log(
			`  ${name.padEnd(28)} ${ms(r.p50)} ${ms(r.p95)} ${ms(r.p99)} ${r.rps.toFixed(0).padStart(8)}${r.failed ? `   (${r.failed} failed)` : ''}`
		);
	row('first load (/ladder)', await load(cookie, '/ladder'));
	row('by payback, traps only', await load(cookie, '/ladder?rank=payback&kind=trap'));
	const cold: number[] = [];
	for (const rank of ['savings', 'payback', 'co2']) {
		for (const kind of ['', 'trap', 'leak', 'insulation']) {
			const t0 = performance.now();
			const res = await fetch(`${ORIGIN}/ladder?rank=${rank}&kind=${kind}&page=2`, {
				headers: { cookie }
			});
			await res.arrayBuffer();
			cold.push(performance.now() - t0);
		}
	}
	cold.sort((a, b) => a - b);
	console.log(
		`  a view nobody asked for yet, one at a time (${cold.length}): p50 ${ms(percentile(cold, 50))}, worst ${ms(cold.at(-1)!)}`
	);
	const js = await javascriptSent(cookie, '/ladder');
	console.log(
		`  JavaScript the page loads: ${js.files} files, ${(js.raw / 1024).toFixed(1)} kB, ${(js.gzipped / 1024).toFixed(1)} kB gzipped`
	);
} finally {
	app.kill();
	await pool.end();
	database.done();
}
