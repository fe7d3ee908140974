/**
 * The Desk's surveys in Chromium: a consultant creates a survey for the demo site, assigns the
 * demo auditor, sends it out on the walk, sees when the auditor's device last fetched, and
 * takes the auditor off again; bad input (end before start, no site, another firm's auditor
 * slipped into the form) shows its message beside the field and saves nothing.
 */
import { expect, test, type Page } from '@playwright/test';
import { randomUUID } from 'node:crypto';
import { demoPassword, demoSites, demoUsers } from '../../src/lib/server/seed/demo';
import { openTestDb, rows, type Db } from './support/db';
import { signedIn } from './support/sessions';
import { signInHere } from './support/worker';

const stamp = Date.now();
const name = `E2E desk survey ${stamp}`;
const site = demoSites[0];
const auditor = demoUsers.find((u) => u.email === 'auditor@cinderbrook.example')!;
const otherFirmsAuditor = demoUsers.find((u) => u.email === 'auditor@northgale.example')!;

let db: Db;

// The Desk shows moments in the reader's own clock zone (UTC only in the server's first render).
test.use({ timezoneId: 'Asia/Kolkata' });

test.beforeAll(() => {
	db = openTestDb();
});

test.afterAll(async () => {
	const ids = (
		await rows<{ id: string }>(db, 'SELECT id FROM surveys WHERE name LIKE ?', [`${name}%`])
	).map((r) => r.id);
	for (const id of ids) {
		await db.query('DELETE FROM audit_log WHERE entity_id = ?', [id]);
		await db.query('DELETE FROM sync_tombstones WHERE entity_id = ?', [id]);
		await db.query('DELETE FROM survey_auditors WHERE survey_id = ?', [id]);
		await db.query('DELETE FROM surveys WHERE id = ?', [id]);
	}
	await db?.end();
});

const ours = async () =>
	rows<{ id: string; status: string }>(db, 'SELECT id, status FROM surveys WHERE name LIKE ?', [
		`${name}%`
	]);

async function fillNew(page: Page, fields: { site?: boolean; start: string; end: string }) {
	await page.goto('/desk/surveys/new');
	if (fields.site !== false) {
		await page.getByLabel('Site').selectOption({ value: site.id });
	}
	await page.getByLabel('Survey name').fill(name);
	await page.getByLabel('First day').fill(fields.start);
	await page.getByLabel('Last day').fill(fields.end);
}

const create = (page: Page) => page.getByRole('button', { name: 'Create survey' }).click();

test('a consultant creates a survey, assigns the auditor, sends it out and sees their sync state', async ({
	page
}) => {
	await signInHere(page, 'consultant@cinderbrook.example', demoPassword, '/desk');
	await page.getByRole('link', { name: 'New survey' }).click();
	await expect(page.getByRole('heading', { name: 'New survey' })).toBeVisible();
	await fillNew(page, { start: '2026-12-07', end: '2026-12-09' });
	await page.getByRole('checkbox', { name: new RegExp(auditor.name) }).check();
	await create(page);

	await expect(page.getByRole('heading', { name })).toBeVisible();
	// A survey's page sits under Surveys in the Desk's navigation.
	const nav = page.getByRole('navigation', { name: 'Desk' });
	await expect(nav.getByRole('link', { name: 'Surveys', exact: true })).toHaveAttribute(
		'aria-current',
		'page'
	);
	await expect(nav.getByRole('link', { name: 'Clients', exact: true })).not.toHaveAttribute(
		'aria-current',
		'page'
	);
	await expect(page.getByText('Not started', { exact: true })).toBeVisible();
	// (Other tests' phones of this auditor may be listed already: sync state is the person's.)
	const row = page.locator(`[data-auditor="${auditor.name}"]`);
	await expect(row).toBeVisible();
	const [made] = await ours();
	expect(made.status).toBe('planned');

	await page.getByRole('button', { name: 'Move on to “Out on the walk”' }).click();
	await expect(page.getByText('Moved to “Out on the walk”.')).toBeVisible();
	expect((await ours())[0].status).toBe('in-field');

	// The auditor's phone fetches, naming itself: the Desk shows when.
	const phone = randomUUID();
	const auditorSession = await signedIn(auditor.email);
	const pull = await auditorSession.get(`/api/sync/pull?since=0&limit=1&device=${phone}`);
	expect(pull.status()).toBe(200);
	await auditorSession.dispose();
	await page.reload();
	const device = row.locator(`[data-device="${phone}"]`);
	await expect(device).toContainText('last sent never');
	// India's zone (UTC+5:30, no summer time), named as the browser's ICU names it.
	await expect(device).toContainText(
		/last fetched \d{1,2} \w{3} \d{4}, \d{2}:\d{2} (IST|GMT\+5:30)/
	);

	// The list shows it with its stage and who records.
	await page.getByRole('link', { name: '← All surveys' }).click();
	const listed = page.locator(`[data-survey="${made.id}"]`);
	await expect(listed).toContainText('Out on the walk');
	await expect(listed).toContainText(auditor.name);

	await listed.getByRole('link', { name }).click();
	await row.getByRole('button', { name: /Take off the survey/ }).click();
	await expect(page.getByText('Taken off the survey.')).toBeVisible();
	await expect(page.locator(`[data-auditor="${auditor.name}"]`)).toHaveCount(0);
	const left = await rows<{ n: number }>(
		db,
		'SELECT COUNT(*) AS n FROM survey_auditors WHERE survey_id = ?',
		[made.id]
	);
	expect(Number(left[0].n)).toBe(0);
	const tombstones = await rows<{ user_id: string }>(
		db,
		"SELECT user_id FROM sync_tombstones WHERE entity = 'survey' AND entity_id = ?",
		[made.id]
	);
	expect(tombstones.map((t) => t.user_id)).toEqual([auditor.id]);
	await db.query('DELETE FROM sync_devices WHERE device_id = ?', [phone]);
});

test('bad input shows its message beside the field and saves nothing', async ({ page }) => {
	await signInHere(page, 'consultant@cinderbrook.example', demoPassword, '/desk');
	const before = (await ours()).length;

	await fillNew(page, { start: '2026-12-07', end: '2026-12-01' });
	await create(page);
	const end = page.getByLabel('Last day');
	await expect(end).toHaveAttribute('aria-invalid', 'true');
	await expect(end).toHaveAccessibleDescription(/The end date cannot be before the start date/);
	// What was typed is still there.
	await expect(page.getByLabel('Survey name')).toHaveValue(name);

	await fillNew(page, { site: false, start: '2026-12-07', end: '2026-12-09' });
	await create(page);
	await expect(page.getByLabel('Site')).toHaveAccessibleDescription(/Choose a site/);

	// Someone edits the form: a checkbox now carries another firm's auditor.
	await fillNew(page, { start: '2026-12-07', end: '2026-12-09' });
	const box = page.getByRole('checkbox', { name: new RegExp(auditor.name) });
	await box.evaluate((el, id) => ((el as HTMLInputElement).value = id), otherFirmsAuditor.id);
	await box.check();
	await create(page);
	await expect(page.getByRole('group', { name: /Who records on it/ })).toHaveAccessibleDescription(
		/Choose people of your firm who record/
	);
	await expect(page.getByText(/Nothing was saved/)).toBeVisible();

	expect((await ours()).length).toBe(before);
});
