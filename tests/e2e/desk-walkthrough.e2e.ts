/**
 * The Desk as a consultant uses it, end to end, without touching the database: the winter survey
 * comes in from the walk; the consultant raises the site's gas price and sees the findings
 * re-priced, sorts and filters the table, opens a trap test and corrects it, settles the two
 * conflicts the auditor's phone left, moves the survey to the desk, checks every finding in bulk
 * and marks the survey checked. (Runs after the other Desk files: it leaves the survey checked.)
 */
import { expect, test, type Page } from '@playwright/test';
import { demoPassword, demoSites, demoSurveys } from '../../src/lib/server/seed/demo';
import { findingId } from '../../src/lib/server/seed/demo-finding';
import { signInHere } from './support/worker';

const survey = demoSurveys[0];
const site = demoSites[0];
const table = `/desk/surveys/${survey.id}/findings`;
/** ST-BH-14, failed open on the winter walk. */
const trap = findingId(12);

test.use({ viewport: { width: 1280, height: 900 } });

const row = (page: Page, id: string) => page.locator(`tbody tr[data-finding="${id}"]`);

test('a consultant takes the winter survey from the walk to checked', async ({ page }) => {
	test.setTimeout(120_000);
	await signInHere(page, 'consultant@cinderbrook.example', demoPassword, '/desk');
	await page.getByRole('link', { name: survey.name }).click();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText(survey.name);
	await expect(page.getByText('Out on the walk').first()).toBeVisible();

	// The figures before: the trap's row in the table, sorted by cost.
	await page.goto(`${table}?sort=cost`);
	await expect(row(page, trap)).toBeVisible();
	const before = await row(page, trap).innerText();

	// A dearer gas contract: a new cost basis version for the site.
	await page.goto(`/desk/surveys/${survey.id}`);
	await page.getByRole('link', { name: site.name }).click();
	await page.getByRole('link', { name: 'Cost basis' }).first().click();
	const price = page.getByLabel('Price', { exact: true });
	const old = Number(await price.inputValue());
	await price.fill((old * 1.5).toFixed(2));
	await page.getByLabel('Why it changed').fill('Gas contract renewed for the winter (walkthrough)');
	await page.getByRole('button', { name: 'Save as a new version' }).click();
	await expect(
		page.getByText(/Saved as version \d+ — figures of \d+ findings?\s+re-priced/)
	).toBeVisible();

	// The table shows the trap re-priced, and holds a sorted, filtered view in its address.
	await page.goto(`${table}?sort=cost`);
	await expect(row(page, trap)).not.toHaveText(before);
	await page.locator('[data-filter="kind"] summary').click();
	await page
		.locator('[data-filter="kind"]')
		.getByLabel(/Trap test/)
		.check();
	await expect(page).toHaveURL(/kind=trap/);
	await page.keyboard.press('Escape');
	await page.getByLabel('Search location, notes or tag').fill('ST-BH');
	await expect(page).toHaveURL(/q=ST-BH/);
	await expect(row(page, trap)).toBeVisible();

	// The trap test, corrected at the desk: its loss is recomputed.
	await row(page, trap).getByRole('link').first().click();
	await expect(page.getByRole('note', { name: 'Safety cautions' })).toBeVisible();
	const loss = page.getByTestId('loss');
	const lossBefore = await loss.innerText();
	await page.getByRole('radio', { name: 'Leaking' }).check();
	await page.getByRole('button', { name: 'Save the correction' }).click();
	await expect(
		page.getByText(/Saved as version \d+\. The figures below are recomputed/)
	).toBeVisible();
	await expect(loss).not.toHaveText(lossBefore);

	// The two edits from the auditor's phone that met a newer version on the server.
	await page.goto(`/desk/surveys/${survey.id}/conflicts`);
	await expect(page.getByRole('heading', { name: /Waiting \(2\)/ })).toBeVisible();
	await page.getByRole('link', { name: /PRV station inlet drip/ }).click();
	await page.getByRole('button', { name: 'Keep the device’s edit' }).click();
	await expect(page.getByText(/Settled/).first()).toBeVisible();
	await page.goto(`/desk/surveys/${survey.id}/conflicts`);
	await expect(page.getByRole('heading', { name: /Waiting \(1\)/ })).toBeVisible();
	await page.getByRole('link', { name: /Evaporator 2 gallery/ }).click();
	await page.getByRole('button', { name: 'Keep the server’s finding' }).click();
	await expect(page.getByText(/Settled/).first()).toBeVisible();
	await page.goto(`/desk/surveys/${survey.id}/conflicts`);
	await expect(page.getByRole('heading', { name: /Waiting \(0\)/ })).toBeVisible();

	// To the desk, every finding checked, the survey marked checked.
	await page.goto(`/desk/surveys/${survey.id}`);
	await page.getByRole('button', { name: /Move on to “Being checked at the desk”/ }).click();
	await expect(page.getByText('Moved to “Being checked at the desk”.')).toBeVisible();
	await page.goto(table);
	await expect(page.locator('tbody tr[data-finding]').first()).toBeVisible();
	await page.getByRole('checkbox', { name: 'Select all on this page' }).check();
	await page.getByRole('button', { name: 'Mark checked' }).click();
	await expect(page.getByRole('status').filter({ hasText: 'marked checked' })).toBeVisible();
	await page.goto(`/desk/surveys/${survey.id}`);
	await page.getByRole('button', { name: 'Mark every finding checked' }).click();
	await expect(page.getByRole('button', { name: 'Reopen checking' })).toBeVisible();
});
