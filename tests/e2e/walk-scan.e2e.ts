import { expect, test } from '@playwright/test';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { prepareZXingModule, writeBarcode } from 'zxing-wasm/writer';
import { demoPassword, demoSurveys } from '../../src/lib/server/seed/demo';
import { signInHere, waitForActiveWorker } from './support/worker';

/**
 * Scanning a trap's tag with the camera, with no signal: the reader and its WebAssembly come
 * from the app's own precache, and nothing is asked of any host but ours. The camera is a
 * canvas showing a QR code printed by ZXing's writer.
 */
test.use({ viewport: { width: 390, height: 844 } });

const require = createRequire(import.meta.url);
const survey = demoSurveys[0];

async function qrDataUrl(text: string): Promise<string> {
	const wasm = new Uint8Array(readFileSync(require.resolve('zxing-wasm/writer/zxing_writer.wasm')));
	await prepareZXingModule({ overrides: { wasmBinary: wasm.buffer }, fireImmediately: true });
	const out = await writeBarcode(text, { format: 'QRCode', scale: 6 });
	if (!out.image) throw new Error(`no QR code: ${out.error}`);
	return `data:image/png;base64,${Buffer.from(await out.image.arrayBuffer()).toString('base64')}`;
}

test('a tag scanned offline fills the trap test from the tag’s record', async ({
	page,
	context
}) => {
	test.setTimeout(90_000);
	const elsewhere: string[] = [];
	context.on('request', (r) => {
		if (new URL(r.url()).hostname !== '127.0.0.1' && !r.url().startsWith('data:')) {
			elsewhere.push(r.url());
		}
	});
	// The rear camera: a canvas stream showing whatever code the test puts up.
	await context.addInitScript(() => {
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

	await signInHere(page, 'auditor@cinderbrook.example', demoPassword);
	await waitForActiveWorker(page);
	const card = page.locator(`[data-survey="${survey.id}"]`);
	await card.getByRole('button', { name: 'Take offline' }).click();
	await expect(card.getByText('On this device since')).toBeVisible();
	await context.setOffline(true);
	await card.getByRole('link', { name: 'Open the round' }).click();
	const tag = (await page.locator('[data-tag]').first().getAttribute('data-tag'))!;

	const code = await qrDataUrl(`https://maintenance.example/asset?tag=${tag.toLowerCase()}`);
	await page.goto(`/walk/surveys/${survey.id}/record/trap`);
	await page.evaluate((c) => ((window as unknown as { __code: string }).__code = c), code);
	await page.getByRole('button', { name: 'Scan' }).click();
	await expect(page.getByLabel('Tag', { exact: true })).toHaveValue(tag, { timeout: 20_000 });
	await expect(page.getByRole('heading', { name: 'Scan the tag' })).toHaveCount(0);
	await expect(page.getByText(/Last tested/)).toBeVisible();
	expect(elsewhere).toEqual([]);
	await context.setOffline(false);
});
