import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { expect, test, type BrowserContext, type Page } from '@playwright/test';
import { prepareZXingModule, writeBarcode } from 'zxing-wasm/writer';
import { demoPassword, demoSurveys } from '../../src/lib/server/seed/demo';
import { demoFindings } from '../../src/lib/server/seed/findings';
import { appOrigin } from './support/servers';
import { anonymous, formHeaders, signedIn } from './support/sessions';
import { signInHere, waitForActiveWorker } from './support/worker';

/**
 * What the browser keeps and what every answer says about itself (issue 14, items 1, 6, 7):
 * after sign-out nothing private opens offline and the device's caches hold only the app
 * shell; sign-out refuses other sites; every kind of answer carries the Content-Security-Policy
 * and the other security headers; and using the product trips no policy.
 */

const survey = demoSurveys[0];
const finding = demoFindings.find((f) => f.surveyId === survey.id)!;

/** Every entry of the origin's Cache Storage, by cache. */
async function cachedEntries(page: Page) {
	return page.evaluate(async () => {
		const entries: { cache: string; url: string }[] = [];
		for (const name of await caches.keys()) {
			const cache = await caches.open(name);
			for (const request of await cache.keys()) entries.push({ cache: name, url: request.url });
		}
		return entries;
	});
}

/** What the app shell may keep: the Walk shell, the offline page and the app's own files. */
function isShellFile(url: string): boolean {
	const { pathname } = new URL(url);
	return (
		pathname === '/walk' ||
		pathname === '/offline' ||
		pathname.startsWith('/_app/') ||
		/^\/[\w.-]+(\/[\w.-]+)*\.(js|css|svg|png|ico|webp|woff2?|wasm|webmanifest|json)$/.test(pathname)
	);
}

test.describe('what the browser keeps after sign-out', () => {
	test('nothing private opens offline, and the caches keep only the app shell', async ({
		browser
	}) => {
		test.setTimeout(90_000);
		// A live reset link for the admin, which only the firm's development mailbox shows.
		const nobody = await anonymous();
		const asked = await nobody.post('/password/forgot', {
			form: { email: 'admin@cinderbrook.example' },
			headers: formHeaders(),
			maxRedirects: 0
		});
		expect(asked.status()).toBeLessThan(400);
		await nobody.dispose();

		// One shared computer: the consultant, then the admin, each signs out.
		const context = await browser.newContext();
		const page = await context.newPage();
		const privatePages: { path: string; shows: string }[] = [];

		await signInHere(page, 'consultant@cinderbrook.example', demoPassword, '/desk');
		await waitForActiveWorker(page);
		await page.goto('/desk/people');
		await expect(page.getByRole('heading', { name: 'People', exact: true })).toBeVisible();
		await expect(page.getByText('auditor@cinderbrook.example').first()).toBeVisible();
		privatePages.push({ path: '/desk/people', shows: 'auditor@cinderbrook.example' });
		const findingPage = `/desk/surveys/${survey.id}/findings/${finding.id}`;
		await page.goto(findingPage);
		await expect(page.getByText(survey.name).first()).toBeVisible();
		privatePages.push({ path: findingPage, shows: survey.name });
		// What a worker of an earlier version kept: signed-in pages in a page cache of its own.
		await page.evaluate(
			async (paths) => {
				const old = await caches.open('steamwisp-pages');
				for (const path of paths) await old.add(path);
			},
			['/desk/people', findingPage]
		);
		expect((await cachedEntries(page)).some((e) => e.cache === 'steamwisp-pages')).toBe(true);
		await signOutHere(page);

		await signInHere(page, 'admin@cinderbrook.example', demoPassword, '/desk');
		await page.goto('/desk/mailbox');
		await page.getByRole('link', { name: 'Choose a new Steamwisp password' }).first().click();
		await expect(
			page.getByRole('heading', { name: 'Choose a new Steamwisp password' })
		).toBeVisible();
		await expect(page.getByText('/password/reset/').first()).toBeVisible();
		const message = new URL(page.url()).pathname;
		privatePages.push({ path: message, shows: '/password/reset/' });
		privatePages.push({ path: '/desk/mailbox', shows: 'Choose a new Steamwisp password' });
		await signOutHere(page);

		// Offline, as the next person at this computer: no private page opens.
		await context.setOffline(true);
		for (const { path, shows } of privatePages) {
			await page.goto(path).catch(() => undefined);
			await expect(page.getByRole('heading', { name: 'No signal here' })).toBeVisible();
			await expect(page.getByText(shows)).toHaveCount(0);
		}

		const entries = await cachedEntries(page);
		expect(entries.filter((e) => !isShellFile(e.url))).toEqual([]);
		expect(new Set(entries.map((e) => e.cache)).size).toBe(1);
		expect(entries[0].cache).toMatch(/^workbox-precache/);
		// The app shell itself stays: the Walk still opens without signal.
		expect(entries.map((e) => new URL(e.url).pathname)).toEqual(
			expect.arrayContaining(['/walk', '/offline'])
		);
		await page.goto('/walk');
		await expect(page.getByRole('heading', { name: 'Sign in to record' })).toBeVisible();
		await context.close();
	});

	test('an auditor who signed out is not opened offline by the Walk for the next person', async ({
		page,
		context
	}) => {
		await signInHere(page, 'auditor@cinderbrook.example', demoPassword);
		await waitForActiveWorker(page);
		await expect(page.getByRole('heading', { name: 'Your surveys' })).toBeVisible();
		await signOutHere(page);

		await context.setOffline(true);
		await page.goto('/walk');
		await expect(page.getByRole('heading', { name: 'Sign in to record' })).toBeVisible();
		await expect(page.getByRole('heading', { name: 'Your surveys' })).toHaveCount(0);
		await expect(page.getByText(survey.name)).toHaveCount(0);
		await context.setOffline(false);
	});
});

/** Signs out with the page's own button; the answer tells the browser to drop its cache. */
async function signOutHere(page: Page) {
	const answer = page.waitForResponse(
		(r) => r.url() === `${appOrigin}/signout` && r.request().method() === 'POST'
	);
	await page.getByRole('button', { name: 'Sign out' }).click();
	expect((await (await answer).allHeaders())['clear-site-data']).toBe('"cache"');
	await page.waitForURL((url) => url.pathname === '/');
}

test.describe('sign-out from another site', () => {
	for (const contentType of [null, 'text/plain']) {
		test(`is refused without ending the session (${contentType ?? 'no content type'})`, async () => {
			const consultant = await signedIn('consultant@cinderbrook.example');
			const refused = await consultant.post('/signout', {
				headers: {
					origin: 'http://evil.example',
					...(contentType ? { 'content-type': contentType } : {})
				},
				data: contentType ? 'x' : undefined,
				maxRedirects: 0
			});
			expect(refused.status()).toBe(403);
			expect(refused.headers()['set-cookie'] ?? '').not.toMatch(/auth_session=;|Max-Age=0/i);
			const still = await consultant.get('/desk/people', { maxRedirects: 0 });
			expect(still.status()).toBe(200);
			expect(await still.text()).toContain('auditor@cinderbrook.example');

			// The same person's own sign-out form still works.
			const out = await consultant.post('/signout', {
				form: {},
				headers: formHeaders(),
				maxRedirects: 0
			});
			expect(out.status()).toBe(303);
			expect(out.headers()['clear-site-data']).toBe('"cache"');
			const after = await consultant.get('/desk/people', { maxRedirects: 0 });
			expect(after.status()).toBeGreaterThanOrEqual(300);
			expect(after.status()).toBeLessThan(400);
			expect(after.headers()['location']).toContain('/signin');
			await consultant.dispose();
		});
	}

	test('a post claiming no origin but sent by another site is refused too', async () => {
		const consultant = await signedIn('consultant@cinderbrook.example');
		const refused = await consultant.post('/signout', {
			headers: { 'sec-fetch-site': 'cross-site' },
			maxRedirects: 0
		});
		expect(refused.status()).toBe(403);
		expect((await consultant.get('/desk', { maxRedirects: 0 })).status()).toBe(200);
		await consultant.dispose();
	});
});

test.describe('security headers on every kind of answer', () => {
	/** Directives every policy must hold, whatever SvelteKit added to it. */
	function checkHeaders(what: string, headers: Record<string, string>) {
		const csp = headers['content-security-policy'];
		expect(csp, `${what}: Content-Security-Policy`).toBeTruthy();
		const directives = new Map(
			csp.split(';').map((d) => {
				const [name, ...sources] = d.trim().split(/\s+/);
				return [name, sources] as const;
			})
		);
		expect(directives.get('frame-ancestors'), what).toEqual(["'none'"]);
		expect(directives.get('object-src'), what).toEqual(["'none'"]);
		expect(directives.get('base-uri'), what).toEqual(["'self'"]);
		expect(directives.get('form-action'), what).toEqual(["'self'"]);
		expect(directives.get('connect-src'), what).toEqual(["'self'"]);
		expect(directives.get('default-src'), what).toEqual(["'self'"]);
		const scripts = directives.get('script-src') ?? [];
		expect(scripts, what).toContain("'self'");
		expect(scripts, what).not.toContain("'unsafe-inline'");
		expect(scripts, what).not.toContain("'unsafe-eval'");
		expect(
			scripts.some((s) => s === '*' || /^https?:$/.test(s)),
			what
		).toBe(false);
		expect(headers['x-frame-options'], what).toBe('DENY');
		expect(headers['x-content-type-options'], what).toBe('nosniff');
		expect(headers['referrer-policy'], what).toBe('strict-origin-when-cross-origin');
		expect(headers['cross-origin-opener-policy'], what).toBe('same-origin');
		expect(headers['permissions-policy'], what).toContain('camera=(self)');
		// Served over http here: HSTS only when ORIGIN is https (unit spec of server/headers.js).
		expect(headers['strict-transport-security'], what).toBeUndefined();
	}

	test('pages, the prerendered shell, the offline page, files, the worker, API and errors', async () => {
		const nobody = await anonymous();
		const consultant = await signedIn('consultant@cinderbrook.example');
		const shell = await nobody.get('/walk');
		const asset = /\/_app\/immutable\/[\w./-]+\.js/.exec(await shell.text())?.[0];
		expect(asset, 'a script of the Walk shell').toBeTruthy();
		const answers = [
			{ what: 'landing page', res: await nobody.get('/') },
			{ what: 'sign-in page', res: await nobody.get('/signin') },
			{ what: 'signed-in Desk page', res: await consultant.get('/desk/people') },
			{ what: 'prerendered Walk shell', res: shell },
			{ what: 'offline page', res: await nobody.get('/offline') },
			{ what: 'static asset', res: await nobody.get(asset!) },
			{ what: 'service worker', res: await nobody.get('/sw.js') },
			{ what: 'static file', res: await nobody.get('/favicon.svg') },
			{ what: 'API answer', res: await consultant.get('/api/me') },
			{ what: 'API refusal', res: await nobody.get('/api/me') },
			{ what: '404 page', res: await nobody.get('/no-such-page') },
			{
				what: 'redirect to sign-in',
				res: await nobody.get('/desk', { maxRedirects: 0 })
			}
		];
		expect(answers.find((a) => a.what === 'static asset')!.res.status()).toBe(200);
		expect(answers.find((a) => a.what === '404 page')!.res.status()).toBe(404);
		expect(answers.find((a) => a.what === 'API refusal')!.res.status()).toBe(401);
		for (const { what, res } of answers) checkHeaders(what, res.headers());
		// The prerendered pages' header allows the hashes of their own inline scripts.
		const meta = /http-equiv="content-security-policy" content="([^"]+)"/.exec(await shell.text());
		const hashes = meta?.[1].match(/'sha256-[^']+'/g) ?? [];
		expect(hashes.length).toBeGreaterThan(0);
		for (const hash of hashes) expect(shell.headers()['content-security-policy']).toContain(hash);
		await nobody.dispose();
		await consultant.dispose();
	});

	test('the Walk shell cannot be framed, not even by a page of this site', async ({ page }) => {
		await page.goto('/offline');
		const framed = await page.evaluate(
			() =>
				new Promise<string | null>((done) => {
					const frame = document.createElement('iframe');
					frame.onload = () => done(frame.contentDocument?.location.pathname ?? null);
					frame.src = '/walk';
					document.body.append(frame);
				})
		);
		// A refused frame holds the browser's error page, which this page cannot read.
		expect(framed).toBeNull();
	});
});

/** Collects Content-Security-Policy violations of every page of a context. */
async function watchPolicy(context: BrowserContext) {
	const violations: string[] = [];
	await context.exposeBinding('__policyViolation', (_source, text: string) => {
		violations.push(text);
	});
	await context.addInitScript(() => {
		document.addEventListener('securitypolicyviolation', (e) => {
			(window as unknown as { __policyViolation: (t: string) => void }).__policyViolation(
				`${e.violatedDirective} blocked ${e.blockedURI || 'inline'} on ${location.pathname}`
			);
		});
	});
	context.on('console', (m) => {
		if (/Content[- ]Security[- ]Policy/i.test(m.text())) violations.push(m.text());
	});
	return violations;
}

const require = createRequire(import.meta.url);

async function qrDataUrl(text: string): Promise<string> {
	const wasm = new Uint8Array(readFileSync(require.resolve('zxing-wasm/writer/zxing_writer.wasm')));
	await prepareZXingModule({ overrides: { wasmBinary: wasm.buffer }, fireImmediately: true });
	const out = await writeBarcode(text, { format: 'QRCode', scale: 6 });
	if (!out.image) throw new Error(`no QR code: ${out.error}`);
	return `data:image/png;base64,${Buffer.from(await out.image.arrayBuffer()).toString('base64')}`;
}

const photo = {
	name: 'trap-photo.jpg',
	mimeType: 'image/jpeg',
	buffer: readFileSync(new URL('../fixtures/trap-photo.jpg', import.meta.url))
};

test.describe('the policy lets the product work', () => {
	test('sign-in, Desk pages and the Walk (photo, scanner, offline) trip no policy', async ({
		browser
	}) => {
		test.setTimeout(120_000);
		const desk = await browser.newContext();
		const deskViolations = await watchPolicy(desk);
		const consultant = await desk.newPage();
		await signInHere(consultant, 'consultant@cinderbrook.example', demoPassword, '/desk');
		await waitForActiveWorker(consultant);
		for (const path of [
			'/desk/people',
			`/desk/surveys/${survey.id}`,
			`/desk/surveys/${survey.id}/findings`,
			`/desk/surveys/${survey.id}/findings/${finding.id}`
		]) {
			await consultant.goto(path);
			await expect(consultant.getByRole('heading').first()).toBeVisible();
		}
		await desk.close();

		const walk = await browser.newContext({ viewport: { width: 390, height: 844 } });
		const walkViolations = await watchPolicy(walk);
		// The rear camera: a canvas stream showing the code the test puts up (as walk-scan does).
		await walk.addInitScript(() => {
			const fake = async () => {
				const img = new Image();
				img.src = (window as unknown as { __code: string }).__code;
				await img.decode();
				const canvas = document.createElement('canvas');
				canvas.width = 640;
				canvas.height = 480;
				const g = canvas.getContext('2d')!;
				const draw = () => {
					g.fillStyle = '#fff';
					g.fillRect(0, 0, 640, 480);
					g.drawImage(img, 170, 90, 300, 300);
				};
				draw();
				setInterval(draw, 100);
				return canvas.captureStream(10);
			};
			Object.defineProperty(MediaDevices.prototype, 'getUserMedia', { value: fake });
		});
		const auditor = await walk.newPage();
		await signInHere(auditor, 'auditor@cinderbrook.example', demoPassword);
		await waitForActiveWorker(auditor);
		const card = auditor.locator(`[data-survey="${survey.id}"]`);
		await card.getByRole('button', { name: 'Take offline' }).click();
		await expect(card.getByText('On this device since')).toBeVisible();
		await card.getByRole('link', { name: 'Open the round' }).click();
		const tag = (await auditor.locator('[data-tag]').first().getAttribute('data-tag'))!;

		// A trap test, not saved: a photo compressed in its worker, and the tag scanned.
		await auditor.goto(`/walk/surveys/${survey.id}/record/trap`);
		await auditor.getByLabel('Add photo').setInputFiles(photo);
		await expect(auditor.getByTestId('photo-thumb')).toHaveCount(1, { timeout: 20_000 });
		const code = await qrDataUrl(`https://maintenance.example/asset?tag=${tag.toLowerCase()}`);
		await auditor.evaluate((c) => ((window as unknown as { __code: string }).__code = c), code);
		await auditor.getByRole('button', { name: 'Scan' }).click();
		await expect(auditor.getByLabel('Tag', { exact: true })).toHaveValue(tag, { timeout: 20_000 });

		// Without signal, from the worker's precache.
		await walk.setOffline(true);
		await auditor.goto(`/walk/surveys/${survey.id}`);
		await expect(auditor.locator('[data-tag]').first()).toBeVisible();
		await walk.setOffline(false);
		await walk.close();

		expect(deskViolations).toEqual([]);
		expect(walkViolations).toEqual([]);
	});
});
