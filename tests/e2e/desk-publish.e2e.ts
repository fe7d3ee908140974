import { expect, test } from '@playwright/test';
import { demoPassword, demoUsers } from '../../src/lib/server/seed/demo';
import { maltingsClientUser } from '../../src/lib/server/seed/maltings';
import { brackenford, unpublishBrackenford } from './support/brackenford';
import { openTestDb, rows, type Db } from './support/db';
import { linkIn, waitForMail } from './support/mailbox';
import { signInHere } from './support/worker';

/**
 * The Desk's savings page and publishing in the browser: a consultant opens the Brackenford
 * survey's savings (seeded as reviewed), switches the ranking, reads the Pareto chart and its
 * text table; then publishes it, the client's e-mail arrives with a link that opens for the
 * client after signing in; then a correction is opened and published as revision 2.
 */
const savings = `/desk/surveys/${brackenford}/savings`;
const consultant = demoUsers.find(
	(u) => u.role === 'consultant' && u.email.includes('cinderbrook')
)!;
const shots = '.data/test-results/desk-publish';

let db: Db;
test.beforeAll(() => {
	db = openTestDb();
});
test.afterAll(async () => {
	await unpublishBrackenford(db);
	await db?.end();
});

test('the savings page ranks three ways, with the chart and its numbers as text', async ({
	page
}) => {
	await signInHere(page, consultant.email, demoPassword, savings);
	await expect(page.getByRole('heading', { level: 1 })).toContainText('Savings: Brackenford');
	const [{ n }] = await rows<{ n: number }>(
		db,
		'SELECT COUNT(*) AS n FROM findings WHERE survey_id = ? AND deleted_at IS NULL AND cost_minor > 0',
		[brackenford]
	);
	expect(Number(n)).toBeGreaterThan(1);
	const list = page.getByTestId('savings-list');
	await expect(list.locator('tbody tr')).toHaveCount(Number(n));
	await expect(page.getByTestId('savings-totals')).toContainText('Payback of the whole');
	await expect(page.getByRole('link', { name: 'Annual saving' })).toHaveAttribute(
		'aria-current',
		'page'
	);

	// The chart is an image with its words, and the same numbers as a table.
	const chart = page.getByRole('img', { name: /Cumulative saving against repair cost/ });
	await expect(chart).toBeVisible();
	await expect(chart.locator('path')).toHaveCount(1);
	await page.getByText("The chart's numbers as a table").click();
	const table = page.getByTestId('pareto-table');
	await expect(table.locator('tbody tr')).toHaveCount(Math.min(12, Number(n)));
	// The chart's summary says the whole list's saving, the same sum as the totals'.
	const [{ total }] = await rows<{ total: string }>(
		db,
		'SELECT SUM(cost_minor) AS total FROM findings WHERE survey_id = ? AND deleted_at IS NULL AND cost_minor > 0',
		[brackenford]
	);
	const major = Math.round(Number(total) / 100).toLocaleString('en-US');
	await expect(page.getByText(new RegExp(`together they save \\D+${major} a year`))).toBeVisible();
	await expect(page.getByRole('heading', { name: 'By kind' })).toBeVisible();
	await expect(page.getByRole('heading', { name: 'By area' })).toBeVisible();

	// Pictures of the charts in both themes and in print, to look at (not compared).
	const charts = page.getByTestId('savings-charts');
	await charts.screenshot({ path: `${shots}/savings-light.png` });
	const theme = await page.evaluate(() => document.documentElement.dataset.theme ?? '');
	await page.evaluate(() => (document.documentElement.dataset.theme = 'plant-room'));
	await charts.screenshot({ path: `${shots}/savings-dark.png` });
	await page.evaluate((t) => (document.documentElement.dataset.theme = t), theme);
	await page.emulateMedia({ media: 'print' });
	await charts.screenshot({ path: `${shots}/savings-print.png` });
	await page.emulateMedia({ media: 'screen' });

	// Each order as the database gives it: the first row and the order of every row.
	const order = {
		savings: 'cost_minor DESC, id',
		payback: 'payback_years IS NULL, payback_years, id',
		co2: 'co2_kg IS NULL, co2_kg DESC, id'
	};
	const expected = async (by: keyof typeof order) =>
		(
			await rows<{ id: string }>(
				db,
				`SELECT id FROM findings WHERE survey_id = ? AND deleted_at IS NULL AND cost_minor > 0
				 ORDER BY ${order[by]}`,
				[brackenford]
			)
		).map((r) => r.id);
	const shown = () =>
		list.locator('tbody tr').evaluateAll((trs) => trs.map((tr) => tr.getAttribute('data-finding')));
	expect(await shown()).toEqual(await expected('savings'));
	await page.getByRole('link', { name: 'Payback' }).click();
	await expect(page).toHaveURL(/\?rank=payback$/);
	await expect(page.getByRole('link', { name: 'Payback' })).toHaveAttribute('aria-current', 'page');
	await expect(page.getByRole('heading', { name: 'Findings, ranked by payback' })).toBeVisible();
	expect(await shown()).toEqual(await expected('payback'));
	await page.getByRole('link', { name: 'CO2 avoided' }).click();
	await expect(page).toHaveURL(/\?rank=co2$/);
	await expect(
		page.getByRole('heading', { name: 'Findings, ranked by CO2 avoided' })
	).toBeVisible();
	expect(await shown()).toEqual(await expected('co2'));

	// A rank the page cannot read is a clear 400, not a guess.
	const bad = await page.goto(`${savings}?rank=cheapest`);
	expect(bad?.status()).toBe(400);
	await expect(page.getByText(/rank must be one of: savings, payback, co2/)).toBeVisible();
});

test('a consultant publishes, the client is told and reads it; a correction is revision 2', async ({
	page,
	browser
}) => {
	const since = new Date();
	const publish = `/desk/surveys/${brackenford}/publish`;
	await signInHere(page, consultant.email, demoPassword, `/desk/surveys/${brackenford}`);
	await page.getByRole('link', { name: 'Publish to the client →' }).click();
	await expect(page).toHaveURL(new RegExp(`${publish}$`));
	await expect(page.getByRole('heading', { level: 1 })).toContainText(
		'Publish to Brackenford Maltings Ltd'
	);
	await expect(page.getByTestId('publish-facts')).toContainText('Every finding is checked.');
	await expect(page.getByTestId('publish-recipients')).toContainText(maltingsClientUser.email);
	await expect(page.getByText('Not published yet.')).toBeVisible();
	await page.screenshot({ path: `${shots}/publish-ready.png`, fullPage: true });

	await page.getByRole('button', { name: 'Publish to the client' }).click();
	await expect(
		page.getByText(/Revision 1 is published\. 1 person was told by e-mail\./)
	).toBeVisible();
	const revision = page.locator('[data-revision="1"]');
	await expect(revision).toContainText('what the client sees');
	const [{ cost }] = await rows<{ cost: string }>(
		db,
		`SELECT JSON_VALUE(totals, '$.costMinor') AS cost FROM survey_revisions r
		 JOIN surveys s ON s.id = r.survey_id WHERE r.survey_id = ? AND r.number = 1
		 AND s.status = 'published' AND s.cost_basis_id = r.cost_basis_id`,
		[brackenford]
	);
	expect(Number(cost)).toBeGreaterThan(0);

	// The client's e-mail, its link, and the page behind it after signing in.
	const mail = await waitForMail(maltingsClientUser.email, /report is ready: Brackenford/, since);
	const link = linkIn(mail.message.text, '/ladder/surveys/');
	expect(new URL(link).pathname).toBe(`/ladder/surveys/${brackenford}`);
	const client = await browser.newContext();
	const reader = await client.newPage();
	await reader.goto(link);
	await expect(reader).toHaveURL(/\/signin\?next=/);
	expect(new URL(reader.url()).searchParams.get('next')).toBe(`/ladder/surveys/${brackenford}`);
	await signInHere(
		reader,
		maltingsClientUser.email,
		demoPassword,
		`/ladder/surveys/${brackenford}`
	);
	await expect(reader.getByRole('heading', { level: 1 })).toContainText('Brackenford Maltings');
	await expect(reader.getByTestId('ladder-revision')).toContainText('Published');
	// Shown to three significant figures, as every money figure of the list.
	const euros = new Intl.NumberFormat('en-US', {
		style: 'currency',
		currency: 'EUR',
		maximumSignificantDigits: 3
	}).format(Number(cost) / 100);
	await expect(reader.getByTestId('ladder-totals')).toContainText(euros);
	await expect(reader.getByRole('note', { name: 'Safety caution' })).toBeVisible();
	await expect(reader.getByText(/not guarantees of savings/)).toBeVisible();
	await reader.screenshot({ path: `${shots}/ladder-revision-1.png`, fullPage: true });

	// A published survey's findings are frozen at the Desk.
	const [first] = await rows<{ id: string }>(
		db,
		'SELECT id FROM findings WHERE survey_id = ? AND deleted_at IS NULL ORDER BY id LIMIT 1',
		[brackenford]
	);
	await page.goto(`/desk/surveys/${brackenford}/findings/${first.id}`);
	await page.getByRole('button', { name: 'Mark as not reviewed' }).click();
	await expect(page.getByText(/its findings are frozen: nothing was changed/)).toBeVisible();

	// A correction: revision 2 needs its note; the client keeps revision 1 until it goes.
	await page.goto(publish);
	await page.getByRole('button', { name: 'Open a correction (revision 2)' }).click();
	await expect(page.getByText(/A correction is open: revision 2 is in progress/)).toBeVisible();
	await reader.reload();
	await expect(reader.getByTestId('ladder-revision')).toContainText('Published');
	await page.getByRole('button', { name: 'Publish revision 2' }).click();
	const note = page.getByLabel('What changed since revision 1');
	await expect(note).toHaveAttribute('aria-invalid', 'true');
	await expect(page.getByText(/Say what changed since the revision before/)).toBeVisible();
	await note.fill('Kiln 2 trap repair costs updated from the contractor’s quote.');
	await page.getByRole('button', { name: 'Publish revision 2' }).click();
	await expect(page.getByText(/Revision 2 is published/)).toBeVisible();
	await expect(page.locator('[data-revision="2"]')).toContainText('Kiln 2 trap repair costs');
	await expect(page.locator('[data-revision="1"]')).toBeVisible();
	const second = await waitForMail(
		maltingsClientUser.email,
		/Revision 2 of your steam survey/,
		since
	);
	expect(second.message.text).toContain('What changed: Kiln 2 trap repair costs');
	await reader.reload();
	await expect(reader.getByTestId('ladder-revision')).toContainText('Revision 2, published');
	await expect(reader.getByText('What changed in revision 2')).toBeVisible();
	await client.close();
});
