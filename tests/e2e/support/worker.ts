import { expect, type Page } from '@playwright/test';

/**
 * Waits until the service worker has finished precaching and controls this page. An
 * 'activated' state alone can be seen before the precache is visible, and Chromium may route
 * the very next navigation to the network for a moment after the worker claims the page: so
 * reload until a navigation has actually gone through the worker.
 */
export async function waitForActiveWorker(page: Page): Promise<void> {
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

/** Signs a demo person in through the sign-in page of this browser context. */
export async function signInHere(page: Page, email: string, password: string, next = '/walk') {
	await page.goto(`/signin?next=${encodeURIComponent(next)}`);
	// The page can hydrate between the fills and the click and put its own empty values back
	// (the browser then refuses the empty form and nothing is sent): fill and send again until
	// the sign-in goes through.
	await expect(async () => {
		if (new URL(page.url()).pathname === next) return;
		await page.getByLabel('E-mail address').fill(email);
		await page.getByLabel('Password').fill(password);
		await page.getByRole('button', { name: 'Sign in' }).click();
		await page.waitForURL((url) => url.pathname === next, { timeout: 5_000 });
	}).toPass({ timeout: 25_000 });
}
