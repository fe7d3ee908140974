import { expect, test, type Page } from '@playwright/test';

/**
 * Waits until the worker has finished precaching and controls this page. An 'activated'
 * state alone can be seen before the precache is visible (STACK.md gotcha 3).
 */
async function waitForActiveWorker(page: Page) {
	await page.waitForFunction(
		async () => {
			const reg = await navigator.serviceWorker.getRegistration();
			const precached = (await caches.keys()).some((k) => k.startsWith('workbox-precache'));
			return (
				reg?.active?.state === 'activated' && !!navigator.serviceWorker.controller && precached
			);
		},
		undefined,
		{ timeout: 20_000, polling: 250 }
	);
	// Chromium may still route the very next navigation to the network for a moment after
	// the worker claims the page: reload until a navigation has gone through the worker.
	await expect
		.poll(
			async () => {
				await page.reload();
				return page.evaluate(() => {
					const nav = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming;
					return nav.workerStart > 0;
				});
			},
			{ timeout: 20_000, intervals: [250, 500, 1000] }
		)
		.toBe(true);
}

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
		await page.goto('/walk');
		await waitForActiveWorker(page);
		await expect(page.getByRole('heading', { name: 'Your surveys' })).toBeVisible();

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
