/**
 * One measured report for bench-reports.ts, in a process of its own so its peak memory (the
 * process's maximum resident set size) is that report's alone: writes the body to a file and
 * prints one JSON line — time, peak RSS, bytes.
 *
 * Usage: tsx scripts/bench-reports-run.ts <pdf|xlsx|csv> <surveyId> <photoDir> <outFile>
 */
import { createWriteStream } from 'node:fs';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { drizzle } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from '../src/lib/server/db/schema';
import { reportBody, surveyReport, type ReportFormat } from '../src/lib/server/reports/report';
import { LocalDiskStore } from '../src/lib/server/storage';
import { databaseUrl } from './env';

const [format, surveyId, photoDir, outFile] = process.argv.slice(2) as [
	ReportFormat,
	string,
	string,
	string
];
const pool = mysql.createPool({ uri: databaseUrl(), connectionLimit: 4, timezone: 'Z' });
const db = drizzle(pool, { schema, mode: 'default' });

const t0 = performance.now();
const outcome = await surveyReport(db, { role: 'consultant' }, surveyId, undefined);
if (!outcome?.ok) throw new Error(`No report: ${JSON.stringify(outcome)}`);
const body = reportBody(format, outcome.content, { db, store: new LocalDiskStore(photoDir) });
const file = createWriteStream(outFile);
await pipeline(Readable.fromWeb(body as never), file);
const ms = performance.now() - t0;
await pool.end();
console.log(
	JSON.stringify({
		format,
		ms,
		peakRssMb: process.resourceUsage().maxRSS / 1024,
		bytes: file.bytesWritten,
		findings: outcome.content.totals.count
	})
);
