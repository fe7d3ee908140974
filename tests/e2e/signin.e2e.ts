import { expect, test } from '@playwright/test';
import { demoPassword } from '../../src/lib/server/seed/demo';

test.describe('sign-in to each surface', () => {
	test("a consultant lands on Desk and sees their firm's surveys only", async ({ page }) => {
		await page.goto('/signin');
		await page.getByLabel('E-mail address').fill('consultant@cinderbrook.example');
		await page.getByLabel('Password').fill(demoPassword);
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page).toHaveURL((url) => url.pathname === '/desk');
		await expect(page.getByText('Larkspindle Creamery — winter steam survey')).toBeVisible();
		await expect(page.getByText('No. 2 Mill')).toHaveCount(0);
	});

	test('a wrong password gets a clear message and no session', async ({ page }) => {
		await page.goto('/signin');
		await page.getByLabel('E-mail address').fill('consultant@cinderbrook.example');
		await page.getByLabel('Password').fill('not-the-password');
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page.getByRole('alert')).toContainText('do not match');
		await page.goto('/desk');
		await expect(page).toHaveURL(/\/signin\?next=%2Fdesk/);
	});

	test('a client lands on Ladder and may not open Desk', async ({ page }) => {
		await page.goto('/signin?next=/ladder');
		await page.getByLabel('E-mail address').fill('plant.manager@larkspindle-dairy.example');
		await page.getByLabel('Password').fill(demoPassword);
		await page.getByRole('button', { name: 'Sign in' }).click();
		await expect(page).toHaveURL((url) => url.pathname === '/ladder');
		const res = await page.goto('/desk');
		expect(res?.status()).toBe(403);
	});
});
