import { reportHandler } from '$lib/server/reports/handler';
import type { RequestHandler } from './$types';

/**
 * The survey's PDF report (docs/reports.md): cover, summary with charts, the ranked table, a
 * page per finding with its photos and calculation, and the safety cautions; streamed.
 */
export const GET: RequestHandler = reportHandler('pdf');
