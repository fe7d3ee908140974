import { expect, test } from '@playwright/test';
import { signedIn } from './support/sessions';

test.describe('app shell', () => {
	test('landing page says what the product does, in Atkinson Hyperlegible served by us', async ({
		page,
		baseURL
	}) => {
		const fontResponses: { url: string; status: number }[] = [];
		page.on('response', (r) => {
			if (/atkinson-hyperlegible.*\.woff2$/.test(r.url()))
				fontResponses.push({ url: r.url(), status: r.status() });
		});
		await page.goto('/');
		await expect(page.getByRole('heading', { level: 1 })).toContainText(
			'steam your plant is losing'
		);
		await page.evaluate(() => document.fonts.ready);

		const family = await page
			.getByRole('heading', { level: 1 })
			.evaluate((el) => getComputedStyle(el).fontFamily);
		expect(family.split(',')[0].replace(/["']/g, '').trim()).toBe('Atkinson Hyperlegible');
		// The face is actually loaded (not a fallback) …
		expect(
			await page.evaluate(() =>
				[...document.fonts].some(
					(f) => f.family.replace(/["']/g, '') === 'Atkinson Hyperlegible' && f.status === 'loaded'
				)
			)
		).toBe(true);
		// … and came from this app, not a font CDN.
		expect(fontResponses.length).toBeGreaterThan(0);
		for (const r of fontResponses) {
			expect(new URL(r.url).origin).toBe(new URL(baseURL!).origin);
			expect(r.status).toBe(200);
		}
	});

	test('the safety caution is on the landing page', async ({ page }) => {
		await page.goto('/');
		const note = page.getByRole('note', { name: 'Safety caution' });
		await expect(note).toContainText('invisible near the orifice');
		await expect(note).toContainText('permit-to-work');
	});

	test('theme switch moves between sunlight and plant room and is remembered', async ({ page }) => {
		await page.emulateMedia({ colorScheme: 'light' });
		await page.goto('/');
		await expect(page.locator('html')).toHaveAttribute('data-theme', 'sunlight');
		const before = await page.evaluate(
			() => getComputedStyle(document.documentElement).backgroundColor
		);
		await page.getByRole('button', { name: /plant-room/ }).click();
		await expect(page.locator('html')).toHaveAttribute('data-theme', 'plant-room');
		const after = await page.evaluate(
			() => getComputedStyle(document.documentElement).backgroundColor
		);
		expect(after).not.toBe(before);
		await page.reload();
		await expect(page.locator('html')).toHaveAttribute('data-theme', 'plant-room');
	});

	test('/api/health says up to anyone, and the details only to an admin', async ({ request }) => {
		const res = await request.get('/api/health');
		expect(res.status()).toBe(200);
		expect(await res.json()).toEqual({ status: 'ok' });
		const admin = await signedIn('admin@cinderbrook.example');
		const body = await (await admin.get('/api/health')).json();
		expect(body).toMatchObject({ status: 'ok', database: { up: true } });
		expect(body.database.migrations).toBeGreaterThan(0);
		expect(body.version).toMatch(/^\d+\.\d+\.\d+/);
		const consultant = await signedIn('consultant@cinderbrook.example');
		expect(await (await consultant.get('/api/health')).json()).toEqual({ status: 'ok' });
		await admin.dispose();
		await consultant.dispose();
	});

	test('the web app manifest and its icons are served', async ({ request }) => {
		const manifest = await (await request.get('/manifest.webmanifest')).json();
		expect(manifest.name).toContain('Steamwisp');
		for (const icon of manifest.icons as { src: string; type: string }[]) {
			const res = await request.get(icon.src);
			expect(res.status(), icon.src).toBe(200);
			expect(res.headers()['content-type']).toContain(icon.type.split('+')[0]);
		}
	});
});
