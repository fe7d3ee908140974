import { readFile } from 'node:fs/promises';
import ExcelJS from 'exceljs';
import { expect, test, type Page } from '@playwright/test';
import { demoPassword, demoUsers } from '../../src/lib/server/seed/demo';
import { pdfPages } from '../support/pdf-text';
import { openTestDb, rows, type Db } from './support/db';
import { signInHere } from './support/worker';

/**
 * A consultant downloads the Brackenford survey's reports from its savings page at the Desk
 * (seeded in review, so a draft): the PDF opens and says what it is, the XLSX and the CSV read
 * back with the survey's saving findings and units in their headers (docs/reports.md).
 */
const brackenford = '5e7a0006-0000-4000-8000-000000000004';
const savings = `/desk/surveys/${brackenford}/savings`;
const consultant = demoUsers.find(
	(u) => u.role === 'consultant' && u.email.includes('cinderbrook')
)!;

let db: Db;
test.beforeAll(() => {
	db = openTestDb();
});
test.afterAll(async () => {
	await db?.end();
});

async function download(page: Page, link: string) {
	const [file] = await Promise.all([
		page.waitForEvent('download'),
		page.getByTestId('report-links').getByRole('link', { name: link }).click()
	]);
	return { name: file.suggestedFilename(), bytes: await readFile((await file.path())!) };
}

test('the consultant downloads the PDF report and the findings exports from the Desk', async ({
	page
}) => {
	test.setTimeout(90_000);
	await signInHere(page, consultant.email, demoPassword, savings);
	const [{ n, total }] = await rows<{ n: number; total: string }>(
		db,
		`SELECT COUNT(*) AS n, SUM(cost_minor) AS total FROM findings
		 WHERE survey_id = ? AND deleted_at IS NULL AND cost_minor > 0`,
		[brackenford]
	);
	expect(Number(n)).toBeGreaterThan(1);

	const pdf = await download(page, 'PDF report');
	expect(pdf.name).toBe('brackenford-maltings-autumn-steam-survey-report.pdf');
	expect(pdf.bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
	const pages = await pdfPages(new Uint8Array(pdf.bytes));
	expect(pages[0]).toContain('Brackenford Maltings');
	expect(pages[0]).toContain('DRAFT — not yet published to the client');
	const whole = Math.round(Number(total) / 100).toLocaleString('en-US');
	expect(pages.join('\n')).toContain(`Cost saved €${whole} per year`);

	const xlsx = await download(page, 'Findings (XLSX)');
	expect(xlsx.name).toBe('brackenford-maltings-autumn-steam-survey-findings.xlsx');
	const book = new ExcelJS.Workbook();
	await book.xlsx.load(xlsx.bytes as never);
	const sheet = book.getWorksheet('Findings')!;
	expect(sheet.getRow(1).values).toContain('Cost (EUR/yr)');
	expect(sheet.actualRowCount).toBe(Number(n) + 1);

	const csv = await download(page, 'Findings (CSV)');
	expect(csv.name).toBe('brackenford-maltings-autumn-steam-survey-findings.csv');
	const text = csv.bytes.toString('utf8');
	expect(text.startsWith('\uFEFFRank,Finding,Kind')).toBe(true);
	expect(text).toContain('Water (m³/yr)');
	expect(text.trimEnd().split('\r\n')).toHaveLength(Number(n) + 1);
});
