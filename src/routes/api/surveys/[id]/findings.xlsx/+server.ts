import { reportHandler } from '$lib/server/reports/handler';
import type { RequestHandler } from './$types';

/** The survey's ranked findings as an XLSX workbook, units in the headers (docs/reports.md); streamed. */
export const GET: RequestHandler = reportHandler('xlsx');
