import { readFile } from 'node:fs/promises';
import { expect, test } from '@playwright/test';
import { demoPassword, demoUsers } from '../../src/lib/server/seed/demo';
import { maltingsClientUser } from '../../src/lib/server/seed/maltings';
import { pdfPages } from '../support/pdf-text';
import { openTestDb, rows, type Db } from './support/db';
import { linkIn, waitForMail } from './support/mailbox';
import { brackenford, unpublishBrackenford } from './support/brackenford';
import { signInHere } from './support/worker';

/**
 * What the client pays for, end to end in the browser (issue: savings and reports): the
 * consultant prices the Brackenford survey's repairs from the cost library, groups two findings
 * into a measure with its own access cost, reads it on the savings page and publishes; the
 * client's e-mail arrives in the SMTP fake with a link, which opens for the client after signing
 * in; the client downloads the PDF report from there, and it opens as revision 1 with the
 * measure's page in it. Afterwards the survey goes back to its seeded state.
 */
const consultant = demoUsers.find(
	(u) => u.role === 'consultant' && u.email.includes('cinderbrook')
)!;
const MEASURE = 'Kiln 1 drip legs';
const shots = '.data/test-results/savings-flow';

let db: Db;
/** The findings grouped, with the measure each was in before. */
let moved: { id: string; measure_id: string | null }[] = [];
test.beforeAll(() => {
	db = openTestDb();
});
test.afterAll(async () => {
	for (const f of moved) {
		await rows(db, 'UPDATE findings SET measure_id = ? WHERE id = ?', [f.measure_id, f.id]);
	}
	await rows(db, 'DELETE FROM measures WHERE survey_id = ? AND name = ?', [brackenford, MEASURE]);
	await unpublishBrackenford(db);
	await db?.end();
});

test('priced from the library, grouped, published; the client’s e-mail link opens and the PDF with it', async ({
	page,
	browser
}) => {
	test.setTimeout(120_000);
	const since = new Date();
	await signInHere(page, consultant.email, demoPassword, `/desk/surveys/${brackenford}/measures`);

	// 1. Price every repair the library knows.
	await page.getByRole('button', { name: 'Price repairs from the library' }).click();
	await expect(page.getByText(/\d+ findings priced from the library\./)).toBeVisible();

	// 2. Group the two biggest savers (out of the seeded measures) with an access cost of their own.
	const pair = await rows<{ id: string; measure_id: string | null }>(
		db,
		`SELECT id, measure_id FROM findings WHERE survey_id = ? AND deleted_at IS NULL
		 AND cost_minor > 0 AND repair_cost_minor IS NOT NULL
		 ORDER BY cost_minor DESC, id LIMIT 2`,
		[brackenford]
	);
	expect(pair).toHaveLength(2);
	moved = pair;
	await page.goto(`/desk/surveys/${brackenford}/findings?sort=cost&dir=desc&size=100`);
	for (const f of pair) await page.locator(`tbody input[type="checkbox"][value="${f.id}"]`).check();
	await page.getByLabel('Measure name').fill(MEASURE);
	await page.getByRole('button', { name: 'Group into a measure' }).click();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText(MEASURE);
	await page.getByLabel('Access').fill('800');
	await page.getByRole('button', { name: 'Save the measure' }).click();
	await expect(page.getByText('Measure saved.')).toBeVisible();

	// 3. The savings page ranks the measure with its own cost, and says the figures are a draft.
	await page.goto(`/desk/surveys/${brackenford}/savings`);
	await expect(page.getByTestId('figures-shown')).toContainText('DRAFT');
	const measureRow = page.getByTestId('savings-measures').locator('tr', { hasText: MEASURE });
	await expect(measureRow).toContainText('incl. €800 of its own costs');
	await expect(page.getByTestId('savings-totals')).toContainText('Investment in all');
	await page.screenshot({ path: `${shots}/savings.png`, fullPage: true });

	// 4. Publish.
	await page.goto(`/desk/surveys/${brackenford}/publish`);
	await page.getByRole('button', { name: 'Publish to the client' }).click();
	await expect(page.getByText(/Revision 1 is published\./)).toBeVisible();

	// 5. The client's e-mail and its link, opened in the client's own browser.
	const mail = await waitForMail(maltingsClientUser.email, /report is ready: Brackenford/, since);
	const link = linkIn(mail.message.text, '/ladder/surveys/');
	const client = await browser.newContext({ acceptDownloads: true });
	const reader = await client.newPage();
	await reader.goto(link);
	await expect(reader).toHaveURL(/\/signin\?next=/);
	await signInHere(reader, maltingsClientUser.email, demoPassword, new URL(link).pathname);
	await expect(reader.getByRole('heading', { level: 1 })).toContainText('Brackenford Maltings');
	await reader.screenshot({ path: `${shots}/ladder.png`, fullPage: true });

	// 6. The PDF downloads from the client's page and opens: revision 1, the measure's own page.
	const [file] = await Promise.all([
		reader.waitForEvent('download'),
		reader.getByTestId('report-links').getByRole('link', { name: 'PDF report' }).click()
	]);
	expect(file.suggestedFilename()).toBe('brackenford-maltings-autumn-steam-survey-report.pdf');
	const bytes = await readFile((await file.path())!);
	expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
	const pages = await pdfPages(new Uint8Array(bytes));
	expect(pages[0]).toContain('Revision 1, as published to the client.');
	expect(pages[0]).not.toContain('DRAFT');
	const measurePage = pages.find((p) => p.includes(`Measure: ${MEASURE}`));
	expect(measurePage, 'the measure has a page').toBeDefined();
	expect(measurePage).toContain('Access €800');

	// The client's ranked list is the frozen revision, with the measure in it.
	const answer = await reader.request.get(`/api/surveys/${brackenford}/savings?rank=payback`);
	expect(answer.status()).toBe(200);
	const list = await answer.json();
	expect(list.figures.revision.number).toBe(1);
	expect(list.measures.map((m: { name: string }) => m.name)).toContain(MEASURE);
	await client.close();
});
