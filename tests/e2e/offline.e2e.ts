import { expect, test } from '@playwright/test';
import { demoPassword } from '../../src/lib/server/seed/demo';
import { signInHere, waitForActiveWorker } from './support/worker';

test.describe('offline', () => {
	test('the service worker registers and activates', async ({ page }) => {
		await page.goto('/');
		await waitForActiveWorker(page);
		const scope = await page.evaluate(
			async () => (await navigator.serviceWorker.getRegistration())?.scope
		);
		expect(scope).toMatch(/\/$/);
	});

	test('with the network cut after the first load, the Walk still opens', async ({
		page,
		context
	}) => {
		await signInHere(page, 'auditor@cinderbrook.example', demoPassword);
		await waitForActiveWorker(page);
		await expect(page.getByRole('heading', { name: 'Your surveys' })).toBeVisible();
		await expect(page.getByRole('status')).toContainText('Online');

		await context.setOffline(true);
		await page.reload();
		await expect(page.getByRole('heading', { name: 'Your surveys' })).toBeVisible();
		await expect(page.getByRole('status')).toContainText('No signal');
		// The font is precached too: the shell keeps its typeface offline.
		const family = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
		expect(family).toContain('Atkinson Hyperlegible');
		expect(await page.evaluate(() => document.fonts.check('16px "Atkinson Hyperlegible"'))).toBe(
			true
		);
		await context.setOffline(false);
	});

	test('a page never visited shows the offline page instead of a browser error', async ({
		page,
		context
	}) => {
		await page.goto('/walk');
		await waitForActiveWorker(page);
		await context.setOffline(true);
		await page.goto('/signin');
		await expect(page.getByRole('heading', { name: 'No signal here' })).toBeVisible();
		await context.setOffline(false);
	});
});
