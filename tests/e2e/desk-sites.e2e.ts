/**
 * The Desk's site pages in Chromium: a consultant raises the demo creamery's gas price, saves a
 * new cost basis version and reads it in the history (the spring survey keeps version 1); bad
 * input on each form (boiler efficiency 150 %, a header colder than saturation, a duplicate
 * area, an unknown currency, an e-mail that is none) is named next to its field, keeps what was
 * typed and saves nothing.
 */
import { expect, test, type Locator, type Page } from '@playwright/test';
import { demoPassword, demoSites } from '../../src/lib/server/seed/demo';
import { publishedSurveyId } from '../../src/lib/server/seed/spring';
import { openTestDb, rows, type Db } from './support/db';
import { signInHere } from './support/worker';

const creamery = demoSites[0];
const consultant = 'consultant@cinderbrook.example';
let db: Db;

test.beforeAll(() => {
	db = openTestDb();
});
test.afterAll(async () => {
	await db?.end();
});

const one = async <T>(query: string, params: unknown[] = []) =>
	(await rows<T>(db, query, params))[0];
const counted = async (query: string, params: unknown[] = []) =>
	Number((await one<{ n: number }>(query, params)).n);

/** The error line an input names in aria-describedby. */
async function errorOf(input: Locator, page: Page): Promise<Locator> {
	const ids = (await input.getAttribute('aria-describedby')) ?? '';
	const id = ids.split(' ').find((i) => i.endsWith('-error'));
	expect(id, 'the field names its error line').toBeTruthy();
	return page.locator(`[id="${id}"]`);
}

async function expectRefused(page: Page, input: Locator, typed: string, message: RegExp) {
	await expect(input).toHaveAttribute('aria-invalid', 'true');
	await expect(input).toHaveValue(typed);
	await expect(await errorOf(input, page)).toContainText(message);
}

test('a consultant raises the gas price and the site moves to the next version', async ({
	page
}) => {
	const site = await one<{ basis: string; number: number }>(
		`SELECT b.id AS basis, b.number FROM sites s JOIN cost_bases b ON b.id = s.cost_basis_id
		 WHERE s.id = ?`,
		[creamery.id]
	);
	const live = await counted(
		`SELECT COUNT(*) AS n FROM findings f JOIN surveys v ON v.id = f.survey_id
		 WHERE v.site_id = ? AND v.cost_basis_id IS NULL AND f.deleted_at IS NULL AND f.flows IS NOT NULL`,
		[creamery.id]
	);
	const springBefore = await rows<{ id: string; cost: number; basis: string }>(
		db,
		`SELECT id, cost_minor AS cost, priced_basis_id AS basis FROM findings WHERE survey_id = ?
		 ORDER BY id`,
		[publishedSurveyId]
	);

	await signInHere(page, consultant, demoPassword, `/desk/sites/${creamery.id}/cost-basis`);
	await expect(page.getByRole('heading', { level: 1 })).toContainText('cost basis');
	const price = page.getByLabel('Price', { exact: true });
	const was = Number(await price.inputValue());
	expect(was).toBeGreaterThan(0);
	const raised = (was + 2.5).toFixed(2);
	await price.fill(raised);
	await page.getByLabel('Why it changed').fill('New gas contract (browser test)');
	await page.getByRole('button', { name: 'Save as a new version' }).click();

	const next = site.number + 1;
	await expect(
		page.getByText(`Saved as version ${next} — figures of ${live} findings re-priced`)
	).toBeVisible();
	const history = page.getByRole('region', { name: 'Every version' });
	const newest = history.getByRole('listitem').filter({ hasText: `Version ${next} (current)` });
	await expect(newest).toContainText('New gas contract (browser test)');
	await expect(newest).toContainText(`at ${raised} EUR per GJ`);
	const first = history.getByRole('listitem').filter({ hasText: /^Version 1\b/ });
	await expect(first).toContainText('Kept by: Larkspindle Creamery — spring steam survey');
	await expect(history).toContainText('keeps the version it was priced on');
	// The form shows the saved price again, as the new current basis.
	await expect(price).toHaveValue(raised);

	const now = await one<{ basis: string; number: number }>(
		`SELECT b.id AS basis, b.number FROM sites s JOIN cost_bases b ON b.id = s.cost_basis_id
		 WHERE s.id = ?`,
		[creamery.id]
	);
	expect(now.number).toBe(next);
	expect(
		await counted(
			`SELECT COUNT(*) AS n FROM findings f JOIN surveys v ON v.id = f.survey_id
			 WHERE v.site_id = ? AND v.cost_basis_id IS NULL AND f.priced_basis_id = ?`,
			[creamery.id, now.basis]
		)
	).toBe(live);
	// The spring survey is with the client: its figures stay on the basis it was priced on.
	const springAfter = await rows<{ id: string; cost: number; basis: string }>(
		db,
		`SELECT id, cost_minor AS cost, priced_basis_id AS basis FROM findings WHERE survey_id = ?
		 ORDER BY id`,
		[publishedSurveyId]
	);
	expect(springAfter).toEqual(springBefore);
});

test('a boiler efficiency of 150 % is refused beside the field and saves nothing', async ({
	page
}) => {
	const versions = `SELECT COUNT(*) AS n FROM cost_bases WHERE site_id = ?`;
	const before = await counted(versions, [creamery.id]);
	await signInHere(page, consultant, demoPassword, `/desk/sites/${creamery.id}/cost-basis`);
	const price = page.getByLabel('Price', { exact: true });
	const typedPrice = '99.99';
	await price.fill(typedPrice);
	const efficiency = page.getByLabel('Boiler efficiency');
	await efficiency.fill('150');
	await page.getByRole('button', { name: 'Save as a new version' }).click();
	await expectRefused(page, efficiency, '150', /more than 0 % and up to 100 %/);
	await expect(price).toHaveValue(typedPrice);
	expect(await counted(versions, [creamery.id])).toBe(before);
});

test('a header colder than saturation is refused with the saturation temperature', async ({
	page
}) => {
	const headers = `SELECT COUNT(*) AS n FROM headers WHERE site_id = ?`;
	const before = await counted(headers, [creamery.id]);
	await signInHere(page, consultant, demoPassword, `/desk/sites/${creamery.id}/headers`);
	const add = page.getByRole('region', { name: 'Add a header' });
	await add.getByLabel('Name').fill('Dryer superheat');
	await add.getByLabel('Gauge pressure').fill('10');
	await add.getByLabel('At a temperature of').check();
	const temperature = add.getByLabel('Steam temperature');
	await temperature.fill('150');
	await add.getByRole('button', { name: 'Add header' }).click();
	// Saturation at 10 bar g (about 11.1 bar a) is about 184 °C (IAPWS-IF97 region 4).
	await expectRefused(
		page,
		add.getByLabel('Steam temperature'),
		'150',
		/saturation temperature, 18[34]\.\d °C/
	);
	await expect(add.getByLabel('Name')).toHaveValue('Dryer superheat');
	expect(await counted(headers, [creamery.id])).toBe(before);
});

test('a second area of the same name is refused and nothing is added', async ({ page }) => {
	const areas = `SELECT COUNT(*) AS n FROM areas WHERE site_id = ?`;
	const before = await counted(areas, [creamery.id]);
	await signInHere(page, consultant, demoPassword, `/desk/sites/${creamery.id}/areas`);
	const add = page.getByRole('region', { name: 'Add an area' });
	await add.getByLabel('Name').fill('boiler HOUSE');
	await add.getByRole('button', { name: 'Add area' }).click();
	await expectRefused(page, add.getByLabel('Name'), 'boiler HOUSE', /already has an area called/);
	expect(await counted(areas, [creamery.id])).toBe(before);
});

test('an unknown currency on the site page is refused and the site is unchanged', async ({
	page
}) => {
	const read = () =>
		one<{ v: number; currency: string; name: string }>(
			'SELECT version AS v, currency, name FROM sites WHERE id = ?',
			[creamery.id]
		);
	const before = await read();
	await signInHere(page, consultant, demoPassword, `/desk/sites/${creamery.id}`);
	// A site is a client's: its pages sit under Clients in the Desk's navigation.
	await expect(
		page
			.getByRole('navigation', { name: 'Desk' })
			.getByRole('link', { name: 'Clients', exact: true })
	).toHaveAttribute('aria-current', 'page');
	await page.getByLabel('Site name').fill(`${before.name} (renamed)`);
	const currency = page.getByLabel('Currency');
	await currency.fill('XYZ');
	await page.getByRole('button', { name: 'Save site' }).click();
	await expectRefused(page, currency, 'XYZ', /not an ISO 4217 currency code/);
	await expect(page.getByLabel('Site name')).toHaveValue(`${before.name} (renamed)`);
	expect(await read()).toEqual(before);
});

test('a contact e-mail that is none is refused when adding a client', async ({ page }) => {
	const clients = 'SELECT COUNT(*) AS n FROM client_companies';
	const before = await counted(clients);
	await signInHere(page, consultant, demoPassword, '/desk/clients');
	await expect(page.getByRole('link', { name: 'Clients', exact: true })).toHaveAttribute(
		'aria-current',
		'page'
	);
	await page.getByLabel('Company name').fill('Browser Test Foundry');
	const email = page.getByLabel('Contact e-mail');
	await email.fill('foundry at example');
	await page.getByRole('button', { name: 'Add client' }).click();
	await expectRefused(page, email, 'foundry at example', /Enter an e-mail address/);
	await expect(page.getByLabel('Company name')).toHaveValue('Browser Test Foundry');
	expect(await counted(clients)).toBe(before);
});
