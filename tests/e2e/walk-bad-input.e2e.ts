import { expect, test, type Page } from '@playwright/test';
import { demoPassword, demoSurveys } from '../../src/lib/server/seed/demo';
import { signInHere, waitForActiveWorker } from './support/worker';

/**
 * Bad input on the Walk's forms: a clear message in the person's own units and words, nothing
 * wrong saved, and what was typed kept — through a failed save and through a reload.
 */
test.use({ viewport: { width: 390, height: 844 } });

const raw = /MPa|\bK\b|failed-open|must be one of/;

async function takeOffline(page: Page, email: string, surveyId: string) {
	await signInHere(page, email, demoPassword);
	await waitForActiveWorker(page);
	const card = page.locator(`[data-survey="${surveyId}"]`);
	await card.getByRole('button', { name: 'Take offline' }).click();
	await expect(card.getByText('On this device since')).toBeVisible();
	await card.getByRole('link', { name: 'Open the round' }).click();
	await page.getByRole('button', { name: /^Recorded/ }).click();
	return Number((await page.getByTestId('shown-count').innerText()).split(' ')[0]);
}

/** Saves, expects the refusal and the field's message, and that the value stays as typed. */
async function refused(page: Page, label: string, typed: string, message: RegExp) {
	await page.getByRole('button', { name: 'Save', exact: true }).click();
	await expect(page.getByText(/Not saved yet/)).toBeVisible();
	const field = page.getByLabel(label);
	await expect(field).toHaveValue(typed);
	const error = page.locator(`#${await field.getAttribute('id')}-error`);
	await expect(error).toHaveText(message);
	expect(await error.innerText()).not.toMatch(raw);
	await expect(page).not.toHaveURL(/\/surveys\/[^/]+$/);
}

test('each capture form refuses bad values in SI words and units, keeps them, and keeps them through a reload', async ({
	page
}) => {
	test.setTimeout(90_000);
	const survey = demoSurveys[0];
	const before = await takeOffline(page, 'auditor@cinderbrook.example', survey.id);
	const record = (kind: string) => page.goto(`/walk/surveys/${survey.id}/record/${kind}`);

	await record('trap');
	await page.getByRole('button', { name: 'Save', exact: true }).click();
	await expect(page.getByText('Choose the trap’s condition')).toBeVisible();
	await page.getByLabel('Discharge orifice').fill('80');
	await refused(page, 'Discharge orifice', '80', /mm/);

	await record('leak');
	await page.getByText('Measured or estimated hole').click();
	await page.getByLabel('Equivalent hole size').fill('250');
	await refused(page, 'Equivalent hole size', '250', /mm/);

	await record('insulation');
	await page.getByText('Pipe run', { exact: true }).click();
	await page.getByLabel('Bare length').fill('-3');
	await refused(page, 'Bare length', '-3', /\bm\b/);

	await record('header');
	await page.getByLabel('Header', { exact: true }).selectOption({ index: 1 });
	await page.getByLabel('Gauge pressure').fill('400');
	await refused(page, 'Gauge pressure', '400', /bar g/);

	// A reload keeps what was typed (the draft is on the device from the first keystroke).
	await page.reload();
	await expect(page.getByLabel('Gauge pressure')).toHaveValue('400');
	await expect(page.getByText('Restored what you typed earlier on this device.')).toBeVisible();
	// Only a confirmed Discard throws the draft away.
	await page.getByRole('button', { name: 'Discard…' }).click();
	await page.getByRole('button', { name: 'Discard', exact: true }).click();
	await expect(page.getByLabel('Gauge pressure')).toHaveValue('');
	await page.reload();
	await expect(page.getByLabel('Gauge pressure')).toHaveValue('');

	// Nothing wrong was saved.
	await page.goto(`/walk/surveys/${survey.id}`);
	await page.getByRole('button', { name: /^Recorded/ }).click();
	await expect(page.getByTestId('shown-count')).toHaveText(`${before} of ${before} findings`);
});

test('a US-customary auditor reads the limits in psig and inches', async ({ page }) => {
	test.setTimeout(60_000);
	const survey = demoSurveys[1];
	await takeOffline(page, 'auditor@northgale.example', survey.id);
	await page.goto(`/walk/surveys/${survey.id}/record/header`);
	await page.getByLabel('Header', { exact: true }).selectOption({ index: 1 });
	await page.getByLabel('Gauge pressure').fill('5000');
	await refused(page, 'Gauge pressure', '5000', /psig/);
	await page.goto(`/walk/surveys/${survey.id}/record/trap`);
	await page.getByLabel('Discharge orifice').fill('3');
	await refused(page, 'Discharge orifice', '3', /\bin\b/);
});
