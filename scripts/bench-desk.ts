/**
 * The Desk, measured (part of `npm run bench`, after bench-walk.sh has built the app), on a
 * fresh database of its own (steamwisp_bench_desk) with the demo scenario:
 * 1. the review table's API at 10,000 findings in one survey: autocannon, 20 connections, a
 *    consultant's session, four views (default, cost biggest first, kind + text search, page
 *    100) — p50/p95/p99 latency and requests per second (target p95 ≤ 100 ms); a walk in which
 *    every request asks for a page not asked for before (each order both ways, page by page:
 *    the page's rows read from the database, not kept); then each view's
 *    first request, one at a time, after the firm's change counter moved (the view's kept ids
 *    and totals expired: what a consultant waits for after a change, docs/desk.md "Kept views");
 * 2. re-pricing a site of 100,000 findings after a cost-basis change (saveCostBasis, money from
 *    stored flows; target ≤ 5 s);
 * 3. the ranked savings list and totals of those 100,000 (GET /api/surveys/[id]/savings, each
 *    rank under load and its first request after a change; target p95 ≤ 150 ms);
 * 4. recomputing the same 100,000 from their inputs (recomputeSite).
 * Figures are printed; nothing is asserted.
 */
import { existsSync } from 'node:fs';
import autocannon from 'autocannon';
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import { FINDING_SORT_KEYS } from '../src/lib/schemas/desk-findings';
import { SAVINGS_RANKS } from '../src/lib/schemas/savings';
import * as schema from '../src/lib/server/db/schema';
import { saveCostBasis } from '../src/lib/server/pricing/cost-basis';
import { recomputeSite } from '../src/lib/server/pricing/refresh';
import { touchFirm } from '../src/lib/server/sync/counter';
import { creameryAreas } from '../src/lib/server/seed/areas';
import { demoFirms, demoPassword, demoSites, demoUsers } from '../src/lib/server/seed/demo';
import { creameryCostBasis } from '../src/lib/server/seed/findings';
import {
	benchSignIn,
	freshBenchDatabase,
	percentile,
	run,
	startBenchApp,
	waitForApp
} from './bench-app';
import { insertBenchFindings, insertBenchSite } from './bench-desk-rows';
import { databaseUrl } from './env';

const DB_NAME = process.env.STEAMWISP_BENCH_DESK_DB_NAME ?? 'steamwisp_bench_desk';
const PORT = Number(process.env.STEAMWISP_BENCH_DESK_PORT ?? 4185);
const ORIGIN = `http://127.0.0.1:${PORT}`;
const TABLE_FINDINGS = 10_000;
const SITE_FINDINGS = 100_000;
const SECONDS_PER_VIEW = 5;
const CONSULTANT = 'consultant@cinderbrook.example';
const firmId = demoFirms[0].id;
const actorId = demoUsers.find((u) => u.email === CONSULTANT)!.id;
const tableSurvey = 'be4c0000-0000-4000-8000-000000000001';
const bigSite = 'be4c0000-0000-4000-8000-000000000002';
const bigSurvey = 'be4c0000-0000-4000-8000-000000000003';
const bigHeaders = ['be4c0000-0000-4000-8000-000000000004', 'be4c0000-0000-4000-8000-000000000005'];

const database = freshBenchDatabase(DB_NAME);
if (!existsSync('build/index.js')) run('node_modules/.bin/vite', ['build', '--logLevel', 'error']);

const pool = mysql.createPool({ uri: databaseUrl(), connectionLimit: 4, timezone: 'Z' });
const db = drizzle(pool, { schema, mode: 'default' });

async function tableFixtures() {
	const site = demoSites[0];
	await db.insert(schema.surveys).values({
		id: tableSurvey,
		firmId,
		siteId: site.id,
		name: 'Larkspindle Creamery — benchmark survey of 10,000 findings',
		status: 'in-review'
	});
	const t0 = performance.now();
	await insertBenchFindings(
		db,
		{
			siteId: site.id,
			surveyId: tableSurvey,
			headerIds: site.headers.map((h) => h.id),
			areaIds: Object.values(creameryAreas).map((a) => a.id),
			tags: true,
			prefix: 'BT'
		},
		TABLE_FINDINGS
	);
	return performance.now() - t0;
}

async function bigSiteFixtures() {
	// Timed with its site, headers, basis and survey (a few statements beside 100,000 rows).
	const t0 = performance.now();
	await insertBenchSite(
		db,
		{
			firmId,
			clientCompanyId: demoSites[0].clientCompanyId,
			actorId,
			siteId: bigSite,
			surveyId: bigSurvey,
			headerIds: [bigHeaders[0], bigHeaders[1]],
			siteName: 'Benchmark works (100,000 findings)',
			prefix: 'BW'
		},
		SITE_FINDINGS
	);
	return performance.now() - t0;
}

const signIn = () => benchSignIn(ORIGIN, CONSULTANT, demoPassword);

const tablePath = (query: string) => `/api/surveys/${tableSurvey}/findings${query}`;

/**
 * One view under load: latencies of every answer (autocannon's own table has no p95). With
 * `next`, each request asks for the path `next()` gives instead (a walk through pages).
 */
async function load(cookie: string, path: string, next?: () => string) {
	const url = `${ORIGIN}${path}`;
	const check = await fetch(url, { headers: { cookie } });
	const body = (await check.json()) as {
		total?: number;
		items: unknown[];
		totals?: { count: number };
	};
	if (!check.ok) throw new Error(`${path} answered ${check.status}`);
	const times: number[] = [];
	const result = await new Promise<autocannon.Result>((resolve, reject) => {
		const instance = autocannon(
			{
				url,
				connections: 20,
				duration: SECONDS_PER_VIEW,
				headers: { cookie },
				...(next && {
					requests: [{ setupRequest: (req) => ({ ...req, path: next() }) }]
				})
			},
			(err, res) => (err ? reject(err) : resolve(res))
		);
		instance.on('response', (_client, _status, _bytes, ms) => times.push(ms));
	});
	times.sort((a, b) => a - b);
	return {
		rows: `${body.items.length} of ${body.total ?? body.totals?.count}`,
		p50: percentile(times, 50),
		p95: percentile(times, 95),
		p99: percentile(times, 99),
		rps: result.requests.average,
		failed: result.non2xx + result.errors
	};
}

const COLD_ROUNDS = 20;

/** A view's first request after the firm's counter moved, timed alone (no other load). */
async function coldView(cookie: string, path: string) {
	const url = `${ORIGIN}${path}`;
	const times: number[] = [];
	for (let i = 0; i < COLD_ROUNDS; i++) {
		await touchFirm(db, firmId);
		const t0 = performance.now();
		const res = await fetch(url, { headers: { cookie } });
		await res.arrayBuffer();
		times.push(performance.now() - t0);
		if (!res.ok) throw new Error(`${path} answered ${res.status}`);
	}
	times.sort((a, b) => a - b);
	return { p50: percentile(times, 50), p95: percentile(times, 95) };
}

const ms = (v: number) => `${v.toFixed(1).padStart(6)} ms`;
const seconds = (v: number) => `${(v / 1000).toFixed(2)} s`;

const app = startBenchApp('desk', PORT);

try {
	const tableSetup = await tableFixtures();
	await waitForApp(ORIGIN);
	const cookie = await signIn();
	const views: [string, string][] = [
		['default (recorded, page 1)', ''],
		['cost, biggest first', '?sort=cost'],
		['traps + text "gallery 12"', '?kind=trap&q=gallery%2012'],
		['page 100 of 200', '?page=100']
	];
	console.log(
		`\nReview table API at ${TABLE_FINDINGS.toLocaleString('en-GB')} findings (inserted in ${seconds(tableSetup)}); 20 connections, ${SECONDS_PER_VIEW} s per view`
	);
	console.log(
		`  view                          rows        p50        p95        p99     req/s   target p95 ≤ 100 ms`
	);
	const row = (name: string, r: Awaited<ReturnType<typeof load>>) =>
		console.log(
			`  ${name.padEnd(28)} ${r.rows.padEnd(10)} ${ms(r.p50)} ${ms(r.p95)} ${ms(r.p99)} ${r.rps.toFixed(0).padStart(8)}${r.failed ? `   (${r.failed} failed)` : ''}`
		);
	for (const [name, query] of views) row(name, await load(cookie, tablePath(query)));
	// Every request a page nobody has asked for yet: each order both ways, pages 1→200 in turn
	// (a page's rows are read from the database; each order's ids once).
	const pages = Math.ceil(TABLE_FINDINGS / 50);
	const unseen = FINDING_SORT_KEYS.flatMap((sort) =>
		(['asc', 'desc'] as const).flatMap((dir) =>
			Array.from({ length: pages }, (_, i) => `?sort=${sort}&dir=${dir}&page=${i + 1}`)
		)
	);
	let walked = 0;
	const walk = await load(cookie, tablePath(unseen[walked++]), () =>
		tablePath(unseen[walked++ % unseen.length])
	);
	row('a page not asked for before', walk);
	if (walked > unseen.length) console.log(`  (the walk went round: ${walked} requests)`);
	console.log(
		`  first request of a view after a change (kept view expired), one at a time, ${COLD_ROUNDS} rounds:`
	);
	for (const [name, query] of views) {
		const r = await coldView(cookie, tablePath(query));
		console.log(`  ${name.padEnd(28)} ${''.padEnd(10)} ${ms(r.p50)} ${ms(r.p95)}`);
	}

	const siteSetup = await bigSiteFixtures();
	// Four saves: the first right after loading 100,000 rows (the database still merging and
	// flushing that load), then three as a consultant meets them on a running server (the
	// database's own flushing makes single saves vary by a second: the median is the figure).
	const reprices: { ms: number; refreshed: number }[] = [];
	for (const price of ['12.40', '13.10', '13.60', '12.90']) {
		const t0 = performance.now();
		const saved = await saveCostBasis(db, {
			firmId,
			siteId: bigSite,
			actorId,
			basis: { ...creameryCostBasis, fuel: { ...creameryCostBasis.fuel, price } },
			note: `bench: gas price to ${price}`
		});
		reprices.push({ ms: performance.now() - t0, refreshed: saved.refreshed });
	}
	console.log(
		`\nA site of ${SITE_FINDINGS.toLocaleString('en-GB')} findings (inserted in ${seconds(siteSetup)})`
	);
	const [first, ...steady] = reprices;
	console.log(
		`  re-priced, first save after the load: ${seconds(first.ms)}  (${first.refreshed.toLocaleString('en-GB')} findings; saveCostBasis)`
	);
	const middle = [...steady].sort((a, b) => a.ms - b.ms)[Math.floor(steady.length / 2)];
	console.log(
		`  re-priced, next ${steady.length} saves (steady state): ${steady.map((r) => seconds(r.ms)).join(', ')}; median ${seconds(middle.ms)}  (${middle.refreshed.toLocaleString('en-GB')} findings each)   target ≤ 5 s`
	);

	// The ranked savings list and its totals of the 100,000 (SQL window sums over the typed
	// columns; the list is cut at 5,000 items, the totals count all): kept between requests, and
	// each rank's first request after a change.
	console.log(
		`\nRanked savings list and totals of those ${SITE_FINDINGS.toLocaleString('en-GB')} findings; 20 connections, ${SECONDS_PER_VIEW} s per rank`
	);
	console.log(
		`  rank                          items       p50        p95        p99     req/s   target p95 ≤ 150 ms`
	);
	const savingsPath = (rank: string) => `/api/surveys/${bigSurvey}/savings?rank=${rank}`;
	for (const rank of SAVINGS_RANKS) row(rank, await load(cookie, savingsPath(rank)));
	console.log(`  first request of a rank after a change, one at a time, ${COLD_ROUNDS} rounds:`);
	for (const rank of SAVINGS_RANKS) {
		const r = await coldView(cookie, savingsPath(rank));
		console.log(`  ${rank.padEnd(28)} ${''.padEnd(10)} ${ms(r.p50)} ${ms(r.p95)}`);
	}

	const t1 = performance.now();
	const recomputed = await recomputeSite(db, bigSite);
	const recompute = performance.now() - t1;
	console.log(
		`  recomputed from their inputs:         ${seconds(recompute)}  (${Number(recomputed).toLocaleString('en-GB')} findings; recomputeSite)`
	);
} finally {
	app.kill();
	await pool.end();
	database.done();
}
