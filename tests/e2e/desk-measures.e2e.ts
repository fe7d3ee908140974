import { expect, test } from '@playwright/test';
import { demoPassword, demoUsers } from '../../src/lib/server/seed/demo';
import { openTestDb, rows, type Db } from './support/db';
import { signInHere } from './support/worker';

/**
 * An existing measure in the browser (docs/costs.md): a consultant ticks two findings in the
 * Brackenford survey's table, each in another of the seeded measures, and adds them to a third
 * ("Add to measure"): the page says how many moved from which measure and links the measure;
 * no measure chosen is refused beside the choice with nothing written. On the measure's page,
 * a save made after someone else's (a second tab) is refused and what was typed stays.
 */
const brackenford = '5e7a0006-0000-4000-8000-000000000004';
const consultant = demoUsers.find(
	(u) => u.role === 'consultant' && u.email.includes('cinderbrook')
)!;
const TARGET = 'Replace the failed traps';
const FIRST_FROM = 'Re-lag the bare pipe runs';
const SECOND_FROM = 'Leak and trap-kit round in the autumn stop';

interface MeasureRow {
	id: string;
	name: string;
	description: string | null;
	version: number;
}
let db: Db;
let measures: Record<string, MeasureRow> = {};
/** The two ticked findings with the measure each was in as seeded, put back afterwards. */
let ticked: { id: string; measure_id: string | null }[] = [];

const bump = () =>
	rows(
		db,
		'UPDATE change_counters SET value = value + 1 WHERE firm_id = (SELECT firm_id FROM surveys WHERE id = ?)',
		[brackenford]
	);
const grouping = async (ids: string[]) =>
	(
		await rows<{ id: string; measure_id: string | null }>(
			db,
			'SELECT id, measure_id FROM findings WHERE id IN (?) ORDER BY id',
			[ids]
		)
	).map((r) => ({ ...r }));

test.beforeAll(async () => {
	db = openTestDb();
	const found = await rows<MeasureRow>(
		db,
		'SELECT id, name, description, version FROM measures WHERE survey_id = ? AND deleted_at IS NULL',
		[brackenford]
	);
	measures = Object.fromEntries(found.map((m) => [m.name, { ...m }]));
	for (const name of [TARGET, FIRST_FROM, SECOND_FROM]) {
		if (!measures[name]) throw new Error(`The seed has no measure "${name}" on Brackenford`);
	}
});
test.afterAll(async () => {
	// Back to the seeded grouping and the seeded measure for the files after this one.
	for (const f of ticked) {
		await rows(db, 'UPDATE findings SET measure_id = ? WHERE id = ?', [f.measure_id, f.id]);
	}
	const target = measures[TARGET];
	if (target) {
		await rows(db, 'UPDATE measures SET description = ?, version = ? WHERE id = ?', [
			target.description,
			target.version,
			target.id
		]);
	}
	await bump();
	await db?.end();
});

test('a consultant adds ticked findings to an existing measure; a stale measure form is refused', async ({
	page
}) => {
	const table = `/desk/surveys/${brackenford}/findings`;
	await signInHere(page, consultant.email, demoPassword, table);
	const ticks = page.locator('tbody input[type="checkbox"]');
	await expect(ticks.first()).toBeVisible();
	const ids = [
		(await ticks.nth(0).getAttribute('value'))!,
		(await ticks.nth(1).getAttribute('value'))!
	];
	ticked = await grouping(ids);
	// Each in another measure than the one they go to, so both moves are told.
	await rows(db, 'UPDATE findings SET measure_id = ? WHERE id = ?', [
		measures[FIRST_FROM].id,
		ids[0]
	]);
	await rows(db, 'UPDATE findings SET measure_id = ? WHERE id = ?', [
		measures[SECOND_FROM].id,
		ids[1]
	]);
	await bump();
	const before = await grouping(ids);

	// Nothing chosen: refused beside the choice, nothing written, the ticks kept.
	await ticks.nth(0).check();
	await ticks.nth(1).check();
	const choice = page.getByLabel('Existing measure');
	await page.getByRole('button', { name: 'Add to measure' }).click();
	await expect(choice).toHaveAccessibleDescription('✖ Choose the measure to add the findings to');
	await expect(page.getByRole('alert')).toContainText(
		'Choose the measure to add the findings to. Nothing was changed.'
	);
	expect(await grouping(ids)).toEqual(before);
	await expect(page.getByText('2 selected')).toBeVisible();

	await choice.selectOption({ label: TARGET });
	await page.getByRole('button', { name: 'Add to measure' }).click();
	const done = page.getByRole('status').filter({ hasText: 'added to' });
	await expect(done).toContainText(
		`2 findings added to ${TARGET} (1 moved from ${SECOND_FROM}, 1 from ${FIRST_FROM}).`
	);
	await expect(page.getByText('0 selected')).toBeVisible();
	expect((await grouping(ids)).map((r) => r.measure_id)).toEqual([
		measures[TARGET].id,
		measures[TARGET].id
	]);

	// The link opens the measure; a second tab saves first, this tab's save is then refused.
	await done.getByRole('link', { name: TARGET }).click();
	await expect(page.getByRole('heading', { level: 1 })).toHaveText(TARGET);
	const other = await page.context().newPage();
	await other.goto(page.url());
	await other.getByLabel('Description').fill('Written in the second tab');
	await other.getByRole('button', { name: 'Save the measure' }).click();
	await expect(other.getByText('Measure saved.')).toBeVisible();
	await other.close();

	await page.getByLabel('Description').fill('Written in the first tab');
	await page.getByRole('button', { name: 'Save the measure' }).click();
	await expect(page.getByRole('alert')).toContainText(
		'Someone changed this measure after you opened it: nothing was saved.'
	);
	await expect(page.getByLabel('Description')).toHaveValue('Written in the first tab');
	const [stored] = await rows<{ description: string; version: number }>(
		db,
		'SELECT description, version FROM measures WHERE id = ?',
		[measures[TARGET].id]
	);
	expect(stored).toEqual({
		description: 'Written in the second tab',
		version: measures[TARGET].version + 1
	});
});
