import { createHash, randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { expect, test, type APIRequestContext } from '@playwright/test';
import { demoPassword, demoSurveys } from '../../src/lib/server/seed/demo';
import { captureOf, demoFindings } from '../../src/lib/server/seed/findings';
import { openTestDb, rows, type Db } from './support/db';
import { signedIn } from './support/sessions';
import { signInHere } from './support/worker';

/**
 * A consultant at the Desk with one finding of the survey in the field: its photo in the
 * viewer, the calculation read step by step, an input corrected and the loss recomputed, a
 * bad input refused beside its field with the typed value kept; then an auditor's stale edit
 * of the same finding, kept as a conflict, settled by merging field by field.
 */
const survey = demoSurveys[0];
const template = demoFindings.find(
	(f) => f.surveyId === survey.id && f.kind === 'trap' && f.inputs.condition === 'failed-open'
)!;
const run = Date.now().toString(36);
const findingId = randomUUID();
const photoId = randomUUID();
const missingPhotoId = randomUUID();
const at = '2026-11-20T10:00:00.000Z';
const capture = {
	...captureOf(template),
	id: findingId,
	assetTag: `E2E-DETAIL-${run}`,
	location: `Desk detail test line ${run}`,
	notes: 'Blowing through',
	photoIds: [photoId, missingPhotoId],
	createdAt: at,
	updatedAt: at
};
const page = `/desk/surveys/${survey.id}/findings/${findingId}`;

let db: Db;
let auditor: APIRequestContext;

async function push(data: object, baseVersion: number) {
	const res = await auditor.post('/api/sync/push', {
		data: {
			deviceId: randomUUID(),
			mutations: [
				{
					mutationId: randomUUID(),
					entity: 'finding',
					op: 'upsert',
					id: findingId,
					baseVersion,
					data
				}
			]
		}
	});
	expect(res.status()).toBe(200);
	return (await res.json()).results[0] as { status: string; version: number };
}

test.beforeAll(async () => {
	db = openTestDb();
	await db.query(`UPDATE surveys SET status = 'in-field' WHERE id = ?`, [survey.id]);
	auditor = await signedIn('auditor@cinderbrook.example');
	expect(await push(capture, 0)).toMatchObject({ status: 'applied', version: 1 });
	const bytes = readFileSync('tests/fixtures/trap-photo.jpg');
	const put = await auditor.put(`/api/photos/${photoId}`, {
		headers: {
			'x-steamwisp-finding': findingId,
			'x-steamwisp-survey': survey.id,
			'x-steamwisp-sha256': createHash('sha256').update(bytes).digest('hex'),
			'content-type': 'image/jpeg'
		},
		data: bytes
	});
	expect(put.status()).toBe(201);
});

test.afterAll(async () => {
	// This test's trap and tag leave the demo survey again: the Walk's tests expect the survey's
	// traps to be the register's, each with its last result.
	await db?.query('UPDATE findings SET deleted_at = NOW(3) WHERE id = ?', [findingId]);
	await db?.query('UPDATE assets SET retired_at = NOW(3) WHERE tag = ?', [capture.assetTag]);
	// Written past the app: move the firm's change counter so the Desk's kept table views of
	// the survey expire (docs/desk.md, "Review table"), as the app's own writes do.
	await db?.query(
		'UPDATE change_counters SET value = value + 1 WHERE firm_id = (SELECT firm_id FROM surveys WHERE id = ?)',
		[survey.id]
	);
	await auditor?.dispose();
	await db?.end();
});

test('a consultant reads a finding, its photo and calculation, corrects it and settles a conflict', async ({
	page: p
}) => {
	test.setTimeout(90_000);
	await signInHere(p, 'consultant@cinderbrook.example', demoPassword, '/desk');
	await p.goto(page);
	await expect(p.getByRole('heading', { level: 1 })).toContainText(`Desk detail test line ${run}`);
	await expect(p.getByRole('note', { name: 'Safety cautions' })).toContainText(
		'Keep clear of steam plumes'
	);

	// The photo opens in a dialog; Escape closes it and focus returns to the thumbnail.
	await expect(p.getByText('Photo 2: not uploaded yet')).toBeVisible();
	const thumb = p.getByRole('button', { name: /Open photo 1 of 2/ });
	await thumb.click();
	const viewer = p.getByRole('dialog', { name: 'Photo 1 of 2' });
	await expect(viewer).toBeVisible();
	await expect(viewer.getByRole('img')).toHaveJSProperty('complete', true);
	expect(
		await viewer.getByRole('img').evaluate((i: HTMLImageElement) => i.naturalWidth)
	).toBeGreaterThan(0);
	await p.keyboard.press('Escape');
	await expect(viewer).toBeHidden();
	await expect(thumb).toBeFocused();

	// The calculation, step by step, with its sources.
	const calc = p.getByRole('region', { name: 'The calculation, step by step' });
	await expect(calc.getByRole('heading', { name: /Step 1\. Steam at the header/ })).toBeVisible();
	await expect(calc.getByRole('heading', { name: /Heat the boiler replaces/ })).toBeVisible();
	await expect(calc.getByRole('cell', { name: 'IAPWS-IF97' }).first()).toBeVisible();

	// A correction: the trap is leaking, not failed open. The loss is recomputed.
	const steam = p.getByTestId('loss').locator('div', { hasText: 'Steam lost' }).locator('dd');
	const before = await steam.innerText();
	await p.getByRole('radio', { name: 'Leaking' }).check();
	await p.getByRole('button', { name: 'Save the correction' }).click();
	await expect(p.getByText('Saved as version 2')).toBeVisible();
	await expect(steam).not.toHaveText(before);
	const [saved] = await rows<{ version: number; condition: string }>(
		db,
		'SELECT version, `condition` FROM findings WHERE id = ?',
		[findingId]
	);
	expect(saved).toEqual({ version: 2, condition: 'leaking' });

	// A bad input: refused beside its field, the typed value kept, nothing saved.
	const orifice = p.getByLabel(/Discharge orifice/);
	await orifice.fill('-2');
	await p.getByRole('button', { name: 'Save the correction' }).click();
	await expect(p.getByText('Some fields need another look')).toBeVisible();
	await expect(orifice).toHaveValue('-2');
	await expect(orifice).toHaveAttribute('aria-invalid', 'true');
	const described = await orifice.getAttribute('aria-describedby');
	await expect(p.locator(`[id="${described!.split(' ').pop()}"]`)).toContainText(/orifice/i);
	const [still] = await rows<{ version: number }>(db, 'SELECT version FROM findings WHERE id = ?', [
		findingId
	]);
	expect(still.version).toBe(2);

	// The auditor's phone edits version 1 meanwhile: kept as a conflict.
	const stale = {
		...capture,
		notes: `Fitter says replace (${run})`,
		inputs: { ...capture.inputs, condition: 'failed-closed' },
		updatedAt: '2026-11-20T10:30:00.000Z'
	};
	expect(await push(stale, 1)).toMatchObject({ status: 'conflict', version: 2 });

	await p.goto(`/desk/surveys/${survey.id}/conflicts`);
	await p
		.getByRole('link', { name: new RegExp(`Desk detail test line ${run}`) })
		.first()
		.click();
	await expect(p.getByRole('heading', { level: 1 })).toContainText('Conflict');
	const notesRow = p.getByRole('row', { name: /Notes/ });
	await expect(notesRow).toContainText('Differs');
	// The device's notes, the server's condition.
	await p.getByRole('radio', { name: /Keep the device’s notes/ }).check();
	await p.getByRole('radio', { name: /Keep the server’s condition/ }).check();
	await p.getByRole('button', { name: 'Merge with these choices' }).click();
	await expect(p.getByText('Settled: the merged finding is its next version.')).toBeVisible();
	const [merged] = await rows<{ version: number; condition: string; notes: string }>(
		db,
		'SELECT version, `condition`, notes FROM findings WHERE id = ?',
		[findingId]
	);
	expect(merged).toEqual({
		version: 3,
		condition: 'leaking',
		notes: `Fitter says replace (${run})`
	});
	const [conflict] = await rows<{ resolution_kind: string; data: string | object }>(
		db,
		'SELECT resolution_kind, data FROM finding_conflicts WHERE finding_id = ?',
		[findingId]
	);
	expect(conflict.resolution_kind).toBe('merged');
	const kept = typeof conflict.data === 'string' ? JSON.parse(conflict.data) : conflict.data;
	expect(kept.inputs.condition).toBe('failed-closed');
});
