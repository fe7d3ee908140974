/**
 * The Walk in Debian's Chromium, measured as an auditor meets it (run by bench-walk.sh):
 * 1. JavaScript sent for the Walk's first load, gzipped (target ≤ 150 kB);
 * 2. navigation to a usable capture form offline, CPU throttled 4× through the DevTools
 *    protocol (target ≤ 1.5 s);
 * 3. saving a finding with a photo once the photo is compressed (target ≤ 100 ms);
 * 4. filtering 3,000 findings on the device, per keystroke (target ≤ 50 ms).
 * Figures are printed; nothing is asserted.
 */
import { spawn } from 'node:child_process';
import { waitForApp } from './bench-app';
import { readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { chromium, type Page } from '@playwright/test';
import { demoPassword, demoSurveys } from '../src/lib/server/seed/demo';
import { chromiumLaunchOptions } from '../tests/e2e/support/chromium';
import { waitForActiveWorker } from '../tests/e2e/support/worker';
import { benchFindings } from './bench-walk-findings';

const PORT = Number(process.env.STEAMWISP_BENCH_PORT ?? 4183);
const ORIGIN = `http://127.0.0.1:${PORT}`;
const SURVEY = demoSurveys[0].id;
const AUDITOR = 'auditor@cinderbrook.example';
const PHOTO = new URL('../tests/fixtures/trap-photo.jpg', import.meta.url);
const ROUNDS = 5;

const app = spawn('node', ['server'], {
	env: { ...process.env, HOST: '127.0.0.1', PORT: String(PORT), ORIGIN },
	stdio: ['ignore', 'ignore', 'inherit']
});

const browser = await (async () => {
	await waitForApp(ORIGIN);
	return chromium.launch(chromiumLaunchOptions);
})();

async function signIn(page: Page) {
	await page.goto(`${ORIGIN}/signin?next=/walk`);
	await page.getByLabel('E-mail address').fill(AUDITOR);
	await page.getByLabel('Password').fill(demoPassword);
	await page.getByRole('button', { name: 'Sign in' }).click();
	await page.waitForURL(`${ORIGIN}/walk`);
}

/** 1. Scripts of the first load of /walk (no worker, empty cache), each gzipped as served. */
async function firstLoadJs(): Promise<number> {
	const context = await browser.newContext({ serviceWorkers: 'block' });
	const page = await context.newPage();
	await signIn(page);
	const bodies: Promise<Buffer>[] = [];
	const fresh = await context.newPage();
	fresh.on('response', (r) => {
		if (r.request().resourceType() === 'script') bodies.push(r.body());
	});
	await fresh.goto(`${ORIGIN}/walk`, { waitUntil: 'networkidle' });
	await fresh.getByRole('heading', { name: 'Your surveys' }).waitFor();
	const bytes = (await Promise.all(bodies)).reduce((n, b) => n + gzipSync(b).length, 0);
	await context.close();
	return bytes;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function offlineRound() {
	const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
	const page = await context.newPage();
	await signIn(page);
	await waitForActiveWorker(page);
	await page
		.locator(`[data-survey="${SURVEY}"]`)
		.getByRole('button', { name: 'Take offline' })
		.click();
	await page.locator(`[data-survey="${SURVEY}"]`).getByText('On this device since').waitFor();
	await context.setOffline(true);
	const cdp = await context.newCDPSession(page);
	await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });

	// 2. Cold navigation to a capture form, until its figures show (the form is usable).
	const formTimes: number[] = [];
	for (let i = 0; i < ROUNDS; i++) {
		await page.goto(`${ORIGIN}/walk/surveys/${SURVEY}/record/leak`);
		const ms = await page.waitForFunction(
			() => document.querySelector('[data-testid="estimate"]') && performance.now(),
			undefined,
			{ polling: 'raf', timeout: 30_000 }
		);
		formTimes.push((await ms.jsonValue()) as number);
		await page.evaluate(() => indexedDB.databases()); // settle
	}
	await cdp.send('Emulation.setCPUThrottlingRate', { rate: 1 });

	// 3. Save with a photo: from the tap on Save to the device having it, photo already compressed.
	const saveTimes: number[] = [];
	for (let i = 0; i < ROUNDS; i++) {
		await page.goto(`${ORIGIN}/walk/surveys/${SURVEY}/record/leak`);
		await page.getByLabel('Location').fill(`Bench leak ${i}`);
		await page.getByLabel('Header', { exact: true }).selectOption({ index: 1 });
		await page.getByText(/^Medium:/).click();
		await page.getByLabel('Add photo').setInputFiles({
			name: 'leak.jpg',
			mimeType: 'image/jpeg',
			buffer: readFileSync(PHOTO)
		});
		await page.getByTestId('photo-thumb').first().waitFor({ timeout: 30_000 });
		const ms = await page.evaluate(async () => {
			performance.clearMarks('steamwisp:finding-saved');
			const t0 = performance.now();
			const save = [...document.querySelectorAll('button')].find(
				(b) => b.textContent?.trim() === 'Save'
			);
			save?.click();
			// A refused save never marks: give up after 10 s rather than wait for ever.
			while (performance.now() - t0 < 10_000) {
				const [mark] = performance.getEntriesByName('steamwisp:finding-saved');
				if (mark) return mark.startTime - t0;
				await new Promise((r) => setTimeout(r, 1));
			}
			throw new Error('The bench finding was not saved: the form refused it');
		});
		saveTimes.push(ms);
	}

	// 4. 3,000 findings on the device, filtered keystroke by keystroke.
	const person = await page.evaluate(() =>
		JSON.parse(localStorage.getItem('steamwisp.walk.person') ?? 'null')
	);
	await page.evaluate(
		async ({ name, rows }) => {
			const db = await new Promise<IDBDatabase>((ok, fail) => {
				const r = indexedDB.open(name);
				r.onsuccess = () => ok(r.result);
				r.onerror = () => fail(r.error);
			});
			const tx = db.transaction('findings', 'readwrite');
			for (const row of rows) tx.objectStore('findings').put(row);
			await new Promise((ok) => (tx.oncomplete = ok));
			db.close();
		},
		{ name: `steamwisp-user-${person?.id}`, rows: benchFindings(SURVEY, 3000) }
	);
	await page.goto(`${ORIGIN}/walk/surveys/${SURVEY}`);
	await page.getByRole('button', { name: /^Recorded/ }).click();
	const keyTimes = await page.evaluate(async () => {
		const input = document.querySelector('input[type="search"]') as HTMLInputElement;
		const times: number[] = [];
		for (const text of [
			's',
			'st',
			'ste',
			'stea',
			'steam',
			'steam h',
			'steam ha',
			'steam hal',
			'steam hall',
			'dry',
			'valve'
		]) {
			const t0 = performance.now();
			input.value = text;
			input.dispatchEvent(new Event('input', { bubbles: true }));
			await new Promise((r) => requestAnimationFrame(() => setTimeout(r)));
			times.push(performance.now() - t0);
		}
		return times;
	});
	await context.close();
	return { formTimes, saveTimes, keyTimes };
}

try {
	const js = await firstLoadJs();
	const { formTimes, saveTimes, keyTimes } = await offlineRound();
	const row = (what: string, value: string, target: string, met: boolean) =>
		`| ${what.padEnd(56)} | ${value.padStart(10)} | ${target.padEnd(8)} | ${met ? 'met' : 'NOT met'} |`;
	console.log('\nThe Walk in Debian Chromium (phone viewport 390×844; medians of runs)\n');
	console.log(`| ${'measure'.padEnd(56)} | ${'value'.padStart(10)} | target   | result |`);
	console.log(`| ${'-'.repeat(56)} | ${'-'.repeat(10)} | -------- | ------ |`);
	console.log(
		row(
			'JavaScript for the first load of /walk, gzipped',
			`${(js / 1024).toFixed(1)} kB`,
			'≤ 150 kB',
			js <= 150 * 1024
		)
	);
	const form = median(formTimes);
	console.log(
		row(
			`usable capture form offline, CPU 4× slower (${ROUNDS} runs)`,
			`${form.toFixed(0)} ms`,
			'≤ 1.5 s',
			form <= 1500
		)
	);
	const save = median(saveTimes);
	console.log(
		row(
			`save a finding with a compressed photo (${ROUNDS} runs)`,
			`${save.toFixed(1)} ms`,
			'≤ 100 ms',
			save <= 100
		)
	);
	const key = median(keyTimes);
	const worst = Math.max(...keyTimes);
	console.log(
		row(
			`filter 3,000 findings, per keystroke (worst ${worst.toFixed(1)} ms)`,
			`${key.toFixed(1)} ms`,
			'≤ 50 ms',
			key <= 50
		)
	);
} finally {
	await browser.close();
	app.kill();
}
