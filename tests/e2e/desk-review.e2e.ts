import { expect, test, type Page } from '@playwright/test';
import { demoPassword, demoSurveys } from '../../src/lib/server/seed/demo';
import { findingId } from '../../src/lib/server/seed/demo-finding';
import { openTestDb, rows, type Db } from './support/db';
import { signInHere } from './support/worker';

/**
 * The Desk's review table in the browser: a consultant sorts the field survey's findings by
 * cost, filters by kind and text, opens the same address in a new page and sees the same view,
 * marks two findings checked in bulk; a tampered id of another survey changes nothing.
 */
const survey = demoSurveys[0];
const table = `/desk/surveys/${survey.id}/findings`;
/** A finding of the published spring survey: not one of this survey's. */
const otherSurveyFinding = findingId(4);

let db: Db;
test.beforeAll(() => {
	db = openTestDb();
});
test.afterAll(async () => {
	await db?.end();
});

const shownIds = (page: Page) =>
	page
		.locator('[data-testid="findings-table"] tbody tr[data-finding]')
		.evaluateAll((trs) => trs.map((tr) => tr.getAttribute('data-finding')));

/** The order the API gives for the page's own query string. */
async function apiIds(page: Page): Promise<string[]> {
	const res = await page.request.get(
		`/api/surveys/${survey.id}/findings${new URL(page.url()).search}`
	);
	expect(res.status()).toBe(200);
	return ((await res.json()) as { items: { id: string }[] }).items.map((i) => i.id);
}

const reviewedAt = async (ids: string[]) =>
	(
		await rows<{ id: string; reviewed_at: Date | null; status: string }>(
			db,
			'SELECT id, reviewed_at, status FROM findings WHERE id IN (?) ORDER BY id',
			[ids]
		)
	).map((r) => ({ id: r.id, reviewed: r.reviewed_at !== null, status: r.status }));

test('sort, filter, share the address, and mark two findings checked', async ({
	page,
	context
}) => {
	await signInHere(page, 'consultant@cinderbrook.example', demoPassword, '/desk');
	await page.goto(table);
	await expect(page.getByRole('heading', { name: 'Findings' })).toBeVisible();
	await expect(page.locator('tbody tr[data-finding]').first()).toBeVisible();

	await page.getByRole('button', { name: /^Cost/ }).click();
	await expect(page).toHaveURL(/\?sort=cost$/);
	const costHeader = page.getByRole('columnheader', { name: /^Cost/ });
	await expect(costHeader).toHaveAttribute('aria-sort', 'descending');
	await expect.poll(() => shownIds(page)).toEqual(await apiIds(page));

	await page.locator('[data-filter="kind"] summary').click();
	await page
		.locator('[data-filter="kind"]')
		.getByLabel(/Trap test/)
		.check();
	await expect(page).toHaveURL(/kind=trap/);
	await page.getByLabel('Search location, notes or tag').fill('boiler');
	await expect(page).toHaveURL(/q=boiler/);
	const ids = await apiIds(page);
	expect(ids.length).toBeGreaterThan(1);
	await expect.poll(() => shownIds(page)).toEqual(ids);
	for (const row of await page.locator('tbody tr[data-finding]').all()) {
		await expect(row).toContainText('Trap test');
		await expect(row).toContainText(/boiler/i);
	}

	const shared = page.url();
	const second = await context.newPage();
	await second.goto(shared);
	await expect.poll(() => shownIds(second)).toEqual(ids);
	await expect(second.getByRole('columnheader', { name: /^Cost/ })).toHaveAttribute(
		'aria-sort',
		'descending'
	);
	await expect(second.getByLabel('Search location, notes or tag')).toHaveValue('boiler');
	await expect(second.locator('[data-filter="kind"] summary')).toContainText('Trap test');
	await second.close();

	const two = ids.slice(0, 2);
	const before = await reviewedAt(two);
	for (const id of two) {
		await page.locator(`tr[data-finding="${id}"] input[type="checkbox"]`).check();
	}
	await expect(page.getByText('2 selected')).toBeVisible();
	await page.getByRole('button', { name: 'Mark checked' }).click();
	const wasChecked = before.filter((b) => b.reviewed).length;
	await expect(page.getByRole('status').filter({ hasText: 'marked checked' })).toContainText(
		`${2 - wasChecked} finding`
	);
	for (const r of await reviewedAt(two)) {
		expect(r.reviewed).toBe(true);
		expect(r.status).not.toBe('draft');
	}
	await expect(page.getByText('0 selected')).toBeVisible();

	// Put them back, so a second run checks the same thing.
	for (const id of two) {
		await page.locator(`tr[data-finding="${id}"] input[type="checkbox"]`).check();
	}
	await page.getByRole('button', { name: 'Mark not checked' }).click();
	await expect(page.getByRole('status').filter({ hasText: 'marked not checked' })).toBeVisible();
	expect((await reviewedAt(two)).every((r) => !r.reviewed)).toBe(true);
});

test('a tampered id of another survey is refused and nothing changes', async ({ page }) => {
	await signInHere(page, 'consultant@cinderbrook.example', demoPassword, '/desk');
	await page.goto(table);
	const first = page.locator('tbody tr[data-finding]').first();
	await expect(first).toBeVisible();
	const mine = (await first.getAttribute('data-finding'))!;
	const before = await reviewedAt([mine, otherSurveyFinding]);
	const audits = async () =>
		(
			await rows<{ n: number }>(db, 'SELECT COUNT(*) AS n FROM audit_log WHERE entity_id IN (?)', [
				[mine, otherSurveyFinding]
			])
		)[0].n;
	const auditsBefore = Number(await audits());

	await first.locator('input[type="checkbox"]').check();
	await page
		.locator('#review-form input[name="findingIds"]')
		.first()
		.waitFor({ state: 'attached' });
	// A second id slipped into the form: a finding of the spring survey.
	await page.evaluate((id) => {
		const input = document.createElement('input');
		input.type = 'hidden';
		input.name = 'findingIds';
		input.value = id;
		document.getElementById('review-form')!.append(input);
	}, otherSurveyFinding);
	await page.getByRole('button', { name: 'Mark checked' }).click();
	await expect(page.getByRole('alert')).toContainText('not in this survey');
	await expect(page.getByRole('alert')).toContainText('Nothing was changed');
	expect(await reviewedAt([mine, otherSurveyFinding])).toEqual(before);
	expect(Number(await audits())).toBe(auditsBefore);
});
