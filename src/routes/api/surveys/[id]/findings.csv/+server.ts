import { reportHandler } from '$lib/server/reports/handler';
import type { RequestHandler } from './$types';

/** The survey's ranked findings as CSV (RFC 4180, UTF-8 with BOM), units in the headers (docs/reports.md); streamed. */
export const GET: RequestHandler = reportHandler('csv');
