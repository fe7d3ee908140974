/**
 * The findings exports of a report: every ranked row (rows.ts, paged from SQL) as CSV
 * (csv.ts) or as an XLSX workbook written by exceljs's streaming WorkbookWriter — a "Summary"
 * sheet (survey, figures reported, totals with units) then a "Findings" sheet, each row
 * committed as it is written, so neither holds the survey in memory.
 */
import ExcelJS from 'exceljs';
import type { PassThrough } from 'node:stream';
import { minorUnitDigits } from '../../steam';
import type { Executor } from '../db/types';
import { choiceWords } from '../publish/choose';
import { exportColumns, type ExportColumn } from './columns';
import type { ReportContent } from './content';
import { CSV_BOM, csvNumber, csvRecord } from './csv';
import { reportRows, type ReportRow } from './rows';
import { pace } from './streams';
import { summaryLines } from './summary';

const valueOf = (c: ExportColumn, row: ReportRow, digits: number) => {
	const v = c.value(row);
	return typeof v === 'number' && c.unit !== null ? csvNumber(v, c.money, digits) : v;
};

/** The CSV, a record at a time: header with units, then one record per ranked finding. */
export async function* findingsCsv(db: Executor, content: ReportContent): AsyncGenerator<string> {
	const columns = exportColumns(content.survey.unitSystem, content.currency);
	const digits = minorUnitDigits(content.currency);
	yield CSV_BOM + csvRecord(columns.map((c) => c.title));
	let batch = '';
	let n = 0;
	for await (const row of reportRows(db, content)) {
		batch += csvRecord(columns.map((c) => valueOf(c, row, digits)));
		if (++n % 500 === 0) {
			yield batch;
			batch = '';
		}
	}
	if (batch) yield batch;
}

const moneyFormat = (digits: number) => (digits === 0 ? '#,##0' : `#,##0.${'0'.repeat(digits)}`);

/** The XLSX into `out` (ends it). */
export async function writeFindingsXlsx(
	db: Executor,
	content: ReportContent,
	out: PassThrough
): Promise<void> {
	const { survey } = content;
	const book = new ExcelJS.stream.xlsx.WorkbookWriter({
		stream: out,
		useStyles: true,
		useSharedStrings: false
	});
	book.creator = survey.firm;
	book.title = `${survey.name}: findings`;
	book.created = content.generatedAt;
	const digits = minorUnitDigits(content.currency);

	const summary = book.addWorksheet('Summary');
	summary.columns = [
		{ header: 'Item', key: 'item', width: 36 },
		{ header: 'Value', key: 'value', width: 24 },
		{ header: 'Unit', key: 'unit', width: 14 }
	];
	summary.getRow(1).font = { bold: true };
	const facts: [string, string | number | null, string][] = [
		['Survey', survey.name, ''],
		['Site', survey.site, ''],
		['Client', survey.client, ''],
		['Prepared by', survey.firm, ''],
		['Figures', choiceWords(content.choice), ''],
		['Unit system', survey.unitSystem, ''],
		['Currency', content.currency, ''],
		['Generated', content.generatedAt.toISOString(), 'UTC'],
		...summaryLines(content).map((l): [string, number | null, string] => [l.label, l.value, l.unit])
	];
	for (const [item, value, unit] of facts) summary.addRow({ item, value, unit }).commit();
	summary.commit();

	const sheet = book.addWorksheet('Findings', { views: [{ state: 'frozen', ySplit: 1 }] });
	const columns = exportColumns(survey.unitSystem, content.currency);
	sheet.columns = columns.map((c, i) => ({
		header: c.title,
		key: String(i),
		width: c.width,
		...(c.money ? { style: { numFmt: moneyFormat(digits) } } : {})
	}));
	const head = sheet.getRow(1);
	head.font = { bold: true };
	head.commit();
	let n = 0;
	for await (const row of reportRows(db, content)) {
		sheet.addRow(columns.map((c) => c.value(row))).commit();
		if (++n % 1000 === 0) await pace(out);
	}
	sheet.commit();
	await book.commit();
}
