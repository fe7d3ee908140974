import { expect, test } from '@playwright/test';
import { demoPassword, demoUsers } from '../../src/lib/server/seed/demo';
import { LADDER_PAGE_ITEMS } from '../../src/lib/server/savings/company';
import { openTestDb, rows, type Db } from './support/db';
import { signInHere } from './support/worker';

/**
 * The Ladder's ranked list in the browser (docs/ladder.md): the dairy's plant manager signs in
 * and sees their company's published survey only, its repairs biggest saving first with the
 * totals, the chart and the caution; reorders by payback and filters by kind, the address
 * keeping the view; on a phone's width the list still reads.
 */
const client = demoUsers.find((u) => u.email === 'plant.manager@larkspindle-dairy.example')!;
const spring = '5e7a0006-0000-4000-8000-000000000003';
const shots = '.data/test-results/ladder-list';

let db: Db;
test.beforeAll(() => {
	db = openTestDb();
});
test.afterAll(async () => {
	await db?.end();
});

test('a client reads their ranked repairs, reorders by payback and filters by kind', async ({
	page
}) => {
	await signInHere(page, client.email, demoPassword, '/ladder');
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('Savings from your surveys');
	await expect(page.getByTestId('ladder-scope')).toContainText('Larkspindle Creamery — spring');
	// The frozen revision's saving rows, biggest saving first.
	const frozen = await rows<{ id: string; cost: number }>(
		db,
		`SELECT f.finding_id AS id, f.cost_minor AS cost FROM survey_revision_findings f
		 JOIN survey_revisions r ON r.id = f.revision_id
		 WHERE r.survey_id = ? AND f.figures_current = 1 AND f.cost_minor > 0
		 ORDER BY f.cost_minor DESC, f.finding_id`,
		[spring]
	);
	expect(frozen.length).toBeGreaterThan(3);
	const shown = () =>
		page
			.getByTestId('ladder-list')
			.locator('li')
			.evaluateAll((li) => li.map((l) => l.dataset.finding));
	expect(await shown()).toEqual(frozen.slice(0, LADDER_PAGE_ITEMS).map((r) => r.id));
	const total = frozen.reduce((s, r) => s + Number(r.cost), 0);
	await expect(
		page.getByText(
			new RegExp(`together they save \\D+${Math.round(total / 100).toLocaleString('en-US')} a year`)
		)
	).toBeVisible();
	await expect(page.getByRole('note', { name: 'Safety caution' })).toBeVisible();
	await expect(page.getByText(/engineering estimates, not guarantees/).first()).toBeVisible();
	await page.screenshot({ path: `${shots}/ladder.png`, fullPage: false });

	await page.getByRole('link', { name: 'Payback' }).click();
	await expect(page).toHaveURL(/\/ladder\?rank=payback$/);
	const byPayback = await rows<{ id: string }>(
		db,
		`SELECT f.finding_id AS id FROM survey_revision_findings f
		 JOIN survey_revisions r ON r.id = f.revision_id
		 WHERE r.survey_id = ? AND f.figures_current = 1 AND f.cost_minor > 0
		 ORDER BY f.payback_years IS NULL, f.payback_years, f.finding_id`,
		[spring]
	);
	expect(await shown()).toEqual(byPayback.slice(0, LADDER_PAGE_ITEMS).map((r) => r.id));

	await page.getByTestId('ladder-filters').locator('select[name="kind"]').selectOption('trap');
	await page.getByTestId('ladder-filters').getByRole('button', { name: 'Show' }).click();
	await expect(page).toHaveURL(/rank=payback/);
	await expect(page).toHaveURL(/kind=trap/);
	const traps = await rows<{ n: number }>(
		db,
		`SELECT COUNT(*) AS n FROM survey_revision_findings f
		 JOIN survey_revisions r ON r.id = f.revision_id
		 WHERE r.survey_id = ? AND f.figures_current = 1 AND f.cost_minor > 0 AND f.kind = 'trap'`,
		[spring]
	);
	await expect(page.getByTestId('ladder-list').locator('li')).toHaveCount(
		Math.min(LADDER_PAGE_ITEMS, Number(traps[0].n))
	);
	await expect(page.getByTestId('ladder-list')).not.toContainText('Insulation gap');

	await page.setViewportSize({ width: 390, height: 844 });
	await page.screenshot({ path: `${shots}/ladder-phone.png`, fullPage: false });
	const overflow = await page.evaluate(
		() => document.documentElement.scrollWidth - window.innerWidth
	);
	expect(overflow).toBeLessThanOrEqual(0);

	// Each repair opens to its own page (photos, figures, the decision on it).
	await page.setViewportSize({ width: 1280, height: 800 });
	await page.goto('/ladder');
	await page.getByTestId('ladder-list').locator('li a').first().click();
	await expect(page).toHaveURL(new RegExp(`/ladder/findings/${frozen[0].id}$`));

	// A bad filter value is refused in words.
	const bad = await page.goto('/ladder?kind=boiler');
	expect(bad?.status()).toBe(400);
	await expect(page.getByText(/kind must be one of/)).toBeVisible();
});
