import { expect, test } from '@playwright/test';
import { demoPassword, demoUsers } from '../../src/lib/server/seed/demo';
import { openTestDb, rows, type Db } from './support/db';
import { signInHere } from './support/worker';

/**
 * The Desk's savings page and publishing in the browser: a consultant opens the Brackenford
 * survey's savings (seeded as reviewed), switches the ranking, reads the Pareto chart and its
 * text table; then publishes it, the client's e-mail arrives with a link that opens for the
 * client after signing in; then a correction is opened and published as revision 2.
 */
const brackenford = '5e7a0006-0000-4000-8000-000000000004';
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
	await expect(page.getByRole('heading', { name: 'Ranked by payback' })).toBeVisible();
	expect(await shown()).toEqual(await expected('payback'));
	await page.getByRole('link', { name: 'CO2 avoided' }).click();
	await expect(page).toHaveURL(/\?rank=co2$/);
	await expect(page.getByRole('heading', { name: 'Ranked by CO2 avoided' })).toBeVisible();
	expect(await shown()).toEqual(await expected('co2'));

	// A rank the page cannot read is a clear 400, not a guess.
	const bad = await page.goto(`${savings}?rank=cheapest`);
	expect(bad?.status()).toBe(400);
	await expect(page.getByText(/rank must be one of: savings, payback, co2/)).toBeVisible();
});
