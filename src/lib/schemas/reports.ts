/**
 * The query string of a survey's reports — `GET /api/surveys/[id]/report.pdf`,
 * `/findings.xlsx` and `/findings.csv` (docs/reports.md): an optional `revision`, the number of
 * a published revision to report instead of the one the reader gets by default.
 */
import { z } from 'zod';
import { readQueryString } from './query-string';

/** `?revision=N`: a published revision's number (the savings list takes it too). */
export const revisionParam = z
	.string()
	.regex(/^[1-9][0-9]{0,5}$/, {
		error: 'revision must be the number of a published revision: a whole number from 1'
	})
	.transform(Number)
	.optional();

export const reportQuerySchema = z.strictObject(
	{ revision: revisionParam },
	{
		error: (issue) =>
			issue.code === 'unrecognized_keys'
				? `Unknown parameter ${issue.keys.join(', ')}: a report takes only revision`
				: undefined
	}
);
export type ReportQuery = z.output<typeof reportQuerySchema>;

/** The query string as the schema reads it; a parameter given twice is refused. */
export const readReportQuery = (params: URLSearchParams) =>
	readQueryString(params, reportQuerySchema);
