/**
 * A survey's reports as the routes serve them (docs/reports.md): the content for the person
 * asking (which figures: publish/choose.ts), then a streamed body — the PDF, the XLSX or the CSV — read
 * from the database a page of rows at a time while the download runs.
 */
import { MAX_SAVINGS_ITEMS } from '../../schemas/savings';
import type { Executor } from '../db/types';
import { reportContent, fileSlug, type ReportContent } from './content';
import { findingSections, REPORT_FINDING_PAGES } from './finding-sections';
import { findingsCsv, writeFindingsXlsx } from './findings-export';
import type { ParetoPoint } from './pdf/charts';
import { renderReportPdf } from './pdf/render';
import { reportRows } from './rows';
import { nodeBody, pullStream } from './streams';
import type { PhotoStore } from '../storage';

/** Rows of the PDF's ranked table at most (the savings list's own cut). */
export const REPORT_TABLE_ROWS = MAX_SAVINGS_ITEMS;
/** Points of the Pareto curve at most. */
const PARETO_POINTS = 400;

export type ReportFormat = 'pdf' | 'xlsx' | 'csv';

export const REPORT_TYPES: Record<ReportFormat, { type: string; name: (slug: string) => string }> =
	{
		pdf: { type: 'application/pdf', name: (s) => `${s}-report.pdf` },
		xlsx: {
			type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
			name: (s) => `${s}-findings.xlsx`
		},
		csv: { type: 'text/csv; charset=utf-8; header=present', name: (s) => `${s}-findings.csv` }
	};

/** The content for this reader; a message when there is none to give (the route says 404). */
export async function surveyReport(
	db: Executor,
	user: { role: string },
	surveyId: string,
	revision: number | undefined
) {
	return reportContent(db, surveyId, user.role === 'client' ? 'client' : 'staff', revision);
}

/** The Pareto curve's points: every row up to PARETO_POINTS rows, else evenly spaced and the last. */
export async function* paretoPoints(
	db: Executor,
	content: ReportContent
): AsyncGenerator<ParetoPoint> {
	const stride = Math.max(1, Math.ceil(content.totals.count / PARETO_POINTS));
	for await (const r of reportRows(db, content)) {
		if (r.rank % stride === 0 || r.rank === content.totals.count) {
			yield { rank: r.rank, saving: r.cumulativeSavingMinor, repair: r.cumulativeRepairCostMinor };
		}
	}
}

export function reportBody(
	format: ReportFormat,
	content: ReportContent,
	{ db, store }: { db: Executor; store?: PhotoStore }
): ReadableStream<Uint8Array> {
	switch (format) {
		case 'csv':
			return pullStream(findingsCsv(db, content));
		case 'xlsx':
			return nodeBody((out) => writeFindingsXlsx(db, content, out));
		case 'pdf':
			return nodeBody((out) =>
				renderReportPdf(
					content,
					{
						rows: () => reportRows(db, content, { limit: REPORT_TABLE_ROWS }),
						pareto: () => paretoPoints(db, content),
						findings: () => findingSections(db, content, store ? { store } : {}),
						measureRows: (measureId) => reportRows(db, content, { measureId }),
						tableRows: REPORT_TABLE_ROWS,
						findingPages: REPORT_FINDING_PAGES
					},
					out
				)
			);
	}
}

/** The answer's headers: its type, a file name after the survey, never kept by any cache. */
export function reportHeaders(
	format: ReportFormat,
	content: ReportContent
): Record<string, string> {
	const { type, name } = REPORT_TYPES[format];
	return {
		'content-type': type,
		'content-disposition': `attachment; filename="${name(fileSlug(content.survey.name))}"`,
		'cache-control': 'private, no-store',
		'x-content-type-options': 'nosniff'
	};
}
