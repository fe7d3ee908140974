import { expect, test } from '@playwright/test';
import { demoPassword, demoUsers } from '../../src/lib/server/seed/demo';
import { formatSignificant } from '../../src/lib/units';
import { openTestDb, rows, type Db } from './support/db';
import { signInHere } from './support/worker';

/**
 * Repair costs in the browser (docs/costs.md): a consultant edits an entry of the firm's cost
 * library (a bad amount first: refused beside the field, nothing saved), prices the Brackenford
 * survey's findings from the library, sees where a finding's cost came from (a quote without its
 * reference refused), ticks findings in the table and groups them into a measure, gives it a
 * scaffold cost (a bad one first) and reads its payback. The seed's library values are invented.
 */
const brackenford = '5e7a0006-0000-4000-8000-000000000004';
const consultant = demoUsers.find(
	(u) => u.role === 'consultant' && u.email.includes('cinderbrook')
)!;
const entryKey = 'fitting-cover:flange-pair:150';

let db: Db;
/** The findings the test groups, with the measure each was in before. */
let moved: { id: string; measure_id: string | null }[] = [];
/** The library entry as seeded, put back afterwards. */
let seeded: { version: number; unit_cost_minor: number; demo: number } | undefined;
test.beforeAll(() => {
	db = openTestDb();
});
test.afterAll(async () => {
	// Back to the seeded grouping for the files after this one (the counter moves so kept
	// views are read again).
	const [made] = await rows<{ measure_id: string }>(
		db,
		`SELECT measure_id FROM findings WHERE id = ?`,
		[moved[0]?.id ?? '']
	);
	for (const f of moved) {
		await rows(db, 'UPDATE findings SET measure_id = ? WHERE id = ?', [f.measure_id, f.id]);
	}
	if (made?.measure_id) {
		await rows(db, 'UPDATE findings SET measure_id = NULL WHERE measure_id = ?', [made.measure_id]);
		await rows(db, 'DELETE FROM measures WHERE id = ? AND name = ?', [
			made.measure_id,
			'Dryer drip legs'
		]);
	}
	if (seeded) {
		await rows(
			db,
			'UPDATE cost_entries SET unit_cost_minor = ?, demo = 1 WHERE entry_key = ? AND firm_id = ?',
			[seeded.unit_cost_minor, entryKey, consultant.firmId]
		);
	}
	await rows(
		db,
		'UPDATE change_counters SET value = value + 1 WHERE firm_id = (SELECT firm_id FROM surveys WHERE id = ?)',
		[brackenford]
	);
	await db?.end();
});

const entryRow = async () =>
	(
		await rows<{ version: number; unit_cost_minor: number; demo: number }>(
			db,
			'SELECT version, unit_cost_minor, demo FROM cost_entries WHERE entry_key = ? AND firm_id = ?',
			[entryKey, consultant.firmId]
		)
	)[0];

test('a consultant edits the library, prices a survey, groups a measure and reads its payback', async ({
	page
}) => {
	await signInHere(page, consultant.email, demoPassword, '/desk/costs');
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('Repair costs');
	const entry = page.locator(`[data-entry="${entryKey}"]`);
	await expect(entry).toContainText('demo values');
	const before = await entryRow();
	seeded = before;

	// A bad amount: the message beside the field, nothing saved.
	await entry.getByLabel(/Parts and material/).fill('twelve');
	await entry.getByRole('button', { name: 'Save' }).click();
	await expect(entry.getByText('Enter the cost as a plain amount')).toBeVisible();
	expect(await entryRow()).toEqual(before);

	await entry.getByLabel(/Parts and material/).fill('210.50');
	await entry.getByRole('button', { name: 'Save' }).click();
	await expect(page.getByText('Entry saved.')).toBeVisible();
	await expect(entry).toContainText(`version ${before.version + 1}`);
	await expect(entry).not.toContainText('demo values');
	expect(await entryRow()).toMatchObject({ unit_cost_minor: 21_050, demo: 0 });

	// Price the survey's repairs from the library.
	await page.goto(`/desk/surveys/${brackenford}/measures`);
	await page.getByRole('button', { name: 'Price repairs from the library' }).click();
	const [{ priced }] = await rows<{ priced: number }>(
		db,
		`SELECT COUNT(*) AS priced FROM findings
		 WHERE survey_id = ? AND deleted_at IS NULL AND repair_cost_source = 'library'`,
		[brackenford]
	);
	await expect(page.getByText(`${priced} findings priced from the library.`)).toBeVisible();
	await expect(page.getByText(/not priced: each needs no repair/)).toBeVisible();

	// A finding shows its cost and where it came from; a quote needs its reference.
	const [trap] = await rows<{ id: string; repair_cost_minor: number }>(
		db,
		`SELECT id, repair_cost_minor FROM findings WHERE survey_id = ? AND kind = 'trap'
		 AND repair_cost_source = 'library' ORDER BY id LIMIT 1`,
		[brackenford]
	);
	await page.goto(`/desk/surveys/${brackenford}/findings/${trap.id}`);
	await expect(page.getByTestId('repair-cost-source')).toContainText(
		'from the firm’s cost library'
	);
	const costForm = page.locator('form[action="?/cost"]');
	await costForm.getByLabel('Where the figure comes from').selectOption('quote');
	await costForm.getByLabel('Amount').fill('999');
	await costForm.getByLabel('Quote reference or reason').fill('');
	await costForm.getByRole('button', { name: 'Save the repair cost' }).click();
	await expect(costForm.getByText('Give the quote’s reference')).toBeVisible();
	const [still] = await rows<{ repair_cost_minor: number; repair_cost_source: string }>(
		db,
		'SELECT repair_cost_minor, repair_cost_source FROM findings WHERE id = ?',
		[trap.id]
	);
	expect(still).toEqual({
		repair_cost_minor: trap.repair_cost_minor,
		repair_cost_source: 'library'
	});

	// Tick two findings in the table and group them into a measure.
	await page.goto(`/desk/surveys/${brackenford}/findings`);
	const ticks = page.locator('tbody input[type="checkbox"]');
	await expect(ticks.first()).toBeVisible();
	const ids = [await ticks.nth(0).getAttribute('value'), await ticks.nth(1).getAttribute('value')];
	moved = await rows<{ id: string; measure_id: string | null }>(
		db,
		'SELECT id, measure_id FROM findings WHERE id IN (?, ?)',
		ids
	);
	await ticks.nth(0).check();
	await ticks.nth(1).check();
	await page.getByLabel('Measure name').fill('Dryer drip legs');
	await page.getByRole('button', { name: 'Group into a measure' }).click();
	await expect(page).toHaveURL(/\/measures\/[0-9a-f-]{36}$/);
	await expect(page.getByRole('heading', { level: 1 })).toHaveText('Dryer drip legs');

	// A bad scaffold cost: beside the field, nothing saved; then a good one, and the payback.
	await page.getByLabel('Scaffold').fill('lots');
	await page.getByRole('button', { name: 'Save the measure' }).click();
	await expect(page.getByLabel('Scaffold')).toHaveAccessibleDescription(
		/Scaffold must be a plain amount/
	);
	const measureId = page.url().split('/').pop()!;
	const scaffold = async () =>
		(
			await rows<{ s: number }>(db, 'SELECT scaffold_cost_minor AS s FROM measures WHERE id = ?', [
				measureId
			])
		)[0].s;
	expect(Number(await scaffold())).toBe(0);
	await page.getByLabel('Scaffold').fill('1500');
	await page.getByRole('button', { name: 'Save the measure' }).click();
	await expect(page.getByText('Measure saved.')).toBeVisible();
	expect(Number(await scaffold())).toBe(150_000);

	const [sums] = await rows<{ repair: number; saving: number }>(
		db,
		`SELECT COALESCE(SUM(repair_cost_minor), 0) AS repair, COALESCE(SUM(cost_minor), 0) AS saving
		 FROM findings WHERE measure_id = ? AND deleted_at IS NULL`,
		[measureId]
	);
	const totals = page.getByTestId('measure-totals');
	await expect(totals).toContainText('€1,500');
	const payback = (Number(sums.repair) + 150_000) / Number(sums.saving);
	if (Number(sums.saving) > 0) {
		// Years, with a short payback also in months ("0.42 years (about 5 months)").
		await expect(page.getByTestId('measure-payback')).toHaveText(
			new RegExp(`^${formatSignificant(payback).replace('.', '\\.')} years?( \\(.*\\))?$`)
		);
	} else {
		await expect(page.getByTestId('measure-payback')).toHaveText('does not pay back');
	}
});
