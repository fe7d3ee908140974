import { expect, test, type Locator, type Page } from '@playwright/test';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { demoPassword, demoSurveys, demoUsers } from '../../src/lib/server/seed/demo';
import { evaluateFinding } from '../../src/lib/steam/losses/evaluate';
import { openTestDb, rows as query } from './support/db';
import { signInHere, waitForActiveWorker } from './support/worker';

/**
 * The auditor's round as they would do it: take the demo survey offline, cut the network,
 * reload, record one finding of each kind with a photo, close the page and open it again; then
 * the signal returns and everything reaches the server (checked in MariaDB), priced by the server
 * exactly as the device estimated it.
 */
const survey = demoSurveys[0];
const auditor = demoUsers.find((u) => u.email === 'auditor@cinderbrook.example')!;
const round = `/walk/surveys/${survey.id}`;
const photo = {
	name: 'trap-photo.jpg',
	mimeType: 'image/jpeg',
	buffer: readFileSync(new URL('../fixtures/trap-photo.jpg', import.meta.url))
};

test.use({ viewport: { width: 390, height: 844 } });

/** The device database rows this test reads back (raw IndexedDB, as stored by Dexie). */
async function deviceRows(page: Page) {
	return page.evaluate(async (name) => {
		const db = await new Promise<IDBDatabase>((ok, fail) => {
			const r = indexedDB.open(name);
			r.onsuccess = () => ok(r.result);
			r.onerror = () => fail(r.error);
		});
		const all = (store: string) =>
			new Promise<unknown[]>((ok) => {
				const r = db.transaction(store).objectStore(store).getAll();
				r.onsuccess = () => ok(r.result);
			});
		const [findings, sites, photos, outbox] = await Promise.all(
			['findings', 'sites', 'photos', 'outbox'].map(all)
		);
		const photoFacts = await Promise.all(
			(
				photos as { id: string; findingId: string; blob: Blob; width: number; height: number }[]
			).map(async (p) => {
				const head = new Uint8Array(await p.blob.slice(0, 4096).arrayBuffer());
				const text = String.fromCharCode(...head);
				const digest = await crypto.subtle.digest('SHA-256', await p.blob.arrayBuffer());
				return {
					sha256: [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join(''),
					id: p.id,
					findingId: p.findingId,
					bytes: p.blob.size,
					type: p.blob.type,
					width: p.width,
					height: p.height,
					exif: text.includes('Exif')
				};
			})
		);
		db.close();
		return { findings, sites, photos: photoFacts, outbox } as {
			findings: { id: string; kind: string; pending: number; version: number; capture: never }[];
			sites: { costBasis: never; headers: never }[];
			photos: typeof photoFacts;
			outbox: { recordId: string; op: string; payload: unknown }[];
		};
	}, `steamwisp-user-${auditor.id}`);
}

async function addPhoto(page: Page) {
	await page.getByLabel('Add photo').setInputFiles(photo);
	await expect(page.getByTestId('photo-thumb')).toHaveCount(1, { timeout: 20_000 });
}

async function save(page: Page) {
	await page.getByRole('button', { name: 'Save', exact: true }).click();
	await expect(page).toHaveURL(round);
}

test('a whole round offline, kept through a closed page, then sent when the signal returns', async ({
	page,
	context
}) => {
	test.setTimeout(120_000);
	await signInHere(page, auditor.email, demoPassword);
	await waitForActiveWorker(page);
	const card = page.locator(`[data-survey="${survey.id}"]`);
	await card.getByRole('button', { name: 'Take offline' }).click();
	await expect(card.getByText('On this device since')).toBeVisible();

	await context.setOffline(true);
	await page.reload();
	await expect(page.getByRole('status')).toContainText('No signal');
	await card.getByRole('link', { name: 'Open the round' }).click();
	await expect(page.getByRole('heading', { name: survey.name })).toBeVisible();

	// A working trap test on a tag already on record: counted taps from the open survey.
	let taps = 0;
	const tap = async (target: Locator) => {
		taps++;
		await target.click();
	};
	const firstTag = page.locator('[data-tag]').first();
	const tag = (await firstTag.getAttribute('data-tag'))!;
	await tap(firstTag);
	await expect(page.getByLabel('Tag')).toHaveValue(tag);
	await expect(page.getByText(/Last tested/)).toBeVisible();
	await tap(page.getByText('Working', { exact: true }));
	await tap(page.getByRole('button', { name: 'Save', exact: true }));
	await expect(page).toHaveURL(round);
	expect(taps).toBeLessThanOrEqual(5);
	await expect(page.locator(`[data-tag="${tag}"]`)).toHaveCount(0);

	// A trap failed open, with a photo.
	await page.locator('[data-tag]').first().click();
	await page.getByText('Failed open', { exact: true }).click();
	await expect(page.getByTestId('estimate').locator('[data-figure="steam"]')).toBeVisible();
	await addPhoto(page);
	await save(page);

	// A leak judged by its plume.
	await page.locator('[data-record="leak"]').click();
	await page.getByLabel('Location').fill('Valve gallery, second isolating valve');
	await page.getByLabel('Leaking from').selectOption({ label: 'Valve stem or gland' });
	await page.getByLabel('Header', { exact: true }).selectOption({ index: 1 });
	await page.getByText('Judge it by the plume').click();
	await page.getByText(/^Medium:/).click();
	await expect(page.getByText(/invisible near the orifice/).first()).toBeVisible();
	await addPhoto(page);
	await save(page);

	// An insulation gap on a bare pipe run.
	await page.locator('[data-record="insulation"]').click();
	await page.getByLabel('Location').fill('Roof run to the evaporators');
	await page.getByText('Pipe run', { exact: true }).click();
	await page.getByLabel('Pipe size').selectOption({ label: 'DN 50' });
	await page.getByLabel('Bare length').fill('6');
	await page.getByText('From the header it carries').click();
	await page.getByLabel('Header', { exact: true }).selectOption({ index: 1 });
	await addPhoto(page);
	await save(page);

	// A header reading.
	await page.locator('[data-record="header"]').click();
	await page.getByLabel('Header', { exact: true }).selectOption({ index: 1 });
	await page.getByLabel('Gauge pressure').fill('9.6');
	await page.getByLabel('Temperature').fill('186');
	await expect(page.getByText(/saturat/i).first()).toBeVisible();
	await addPhoto(page);
	await save(page);

	// Close the page, open the Walk again without a network.
	await page.close();
	const again = await context.newPage();
	await again.goto(round);
	await again.getByRole('button', { name: /^Recorded/ }).click();
	const rows = await deviceRows(again);
	const mine = rows.findings.filter((f) => f.pending === 1);
	expect(mine.map((f) => f.kind).sort()).toEqual(['header', 'insulation', 'leak', 'trap', 'trap']);
	expect(rows.outbox.filter((e) => e.op === 'upsert').length).toBeGreaterThanOrEqual(5);

	// Photos: compressed on the device, location stripped, long side ≤ 1920 px, ≤ 400 kB.
	expect(rows.photos).toHaveLength(4);
	for (const p of rows.photos) {
		expect(Math.max(p.width, p.height)).toBeLessThanOrEqual(1920);
		expect(p.bytes).toBeLessThanOrEqual(400_000);
		expect(p.exif).toBe(false);
	}

	// Every finding is there with its estimate and its photo; the device's figure is the engine's.
	const site = rows.sites[0];
	for (const f of mine) {
		await again.goto(`${round}/findings/${f.id}`);
		const estimate = again.getByTestId('estimate');
		const engine = evaluateFinding(f.capture, { costBasis: site.costBasis, headers: site.headers });
		const figure = async (key: string) =>
			Number(await estimate.locator(`[data-figure="${key}"]`).getAttribute('data-value'));
		if (f.kind === 'header') {
			// A reading loses nothing: its figures are the state of the steam at the header.
			expect(await figure('saturation')).toBeCloseTo(engine.header!.saturationTemperature, 6);
			expect(await figure('superheat')).toBeCloseTo(engine.header!.superheat!, 6);
		} else {
			expect(await figure('heat')).toBeCloseTo(engine.heatLoss, 6);
			expect(await figure('cost')).toBeCloseTo(engine.cost.amount, 2);
			if (engine.steamLoss !== null) expect(await figure('steam')).toBeCloseTo(engine.steamLoss, 6);
		}
		const photos = rows.photos.filter((p) => p.findingId === f.id).length;
		await expect(again.getByTestId('photo-thumb')).toHaveCount(photos);
	}

	// A photo can be taken off a finding, and a finding off the survey, still without signal.
	const leak = mine.find((f) => f.kind === 'leak')!;
	await again.goto(`${round}/findings/${leak.id}`);
	await again.getByRole('button', { name: 'Delete photo 1' }).click();
	await again.getByRole('button', { name: 'Yes, delete photo 1' }).click();
	await expect(again.getByTestId('photo-thumb')).toHaveCount(0);
	await again.getByRole('button', { name: 'Save', exact: true }).click();
	await expect(again).toHaveURL(round);
	const header = mine.find((f) => f.kind === 'header')!;
	await again.goto(`${round}/findings/${header.id}`);
	await again.getByRole('button', { name: 'Delete this finding…' }).click();
	await again.getByRole('button', { name: 'Yes, delete it' }).click();
	await expect(again).toHaveURL(round);
	const after = await deviceRows(again);
	// Gone from the round: removed outright, or (when a send was already tried) marked deleted
	// with its deletion queued, since an unanswered try may still have reached the server.
	const gone = after.findings.find((f) => f.id === header.id) as { deleted?: number } | undefined;
	expect(gone === undefined || gone.deleted === 1).toBe(true);
	await expect(again.locator(`a[href$="${header.id}"]`)).toHaveCount(0);
	expect(after.photos.filter((p) => p.findingId === leak.id)).toHaveLength(0);
	const leakRow = after.findings.find((f) => f.id === leak.id) as unknown as {
		capture: { photoIds: string[] };
	};
	expect(leakRow.capture.photoIds).toEqual([]);

	// Changes still on the device: signing out asks first.
	await again.getByRole('button', { name: 'Sign out' }).click();
	await expect(again.getByTestId('unsent-warning')).toContainText('not reached the server');
	await again.getByRole('button', { name: 'Stay signed in' }).click();
	await expect(again.getByTestId('unsent-warning')).toHaveCount(0);

	// The signal returns: everything goes, and the device says so.
	await context.setOffline(false);
	await again.goto('/walk');
	const status = again.getByTestId('sync-status');
	await status.getByRole('button', { name: 'Send now' }).click();
	await expect(status.getByTestId('sync-words')).toHaveText('All sent', { timeout: 30_000 });
	await expect(again.getByTestId('sync-headline')).toHaveText('All sent');
	await expect(status).toContainText('Last exchange with the server:');
	const sent = await deviceRows(again);
	expect(sent.outbox).toEqual([]);
	expect(sent.findings.filter((f) => f.pending === 1)).toEqual([]);

	// In MariaDB: the four findings kept (the header reading deleted on the device is not there),
	// each priced by the server as the device estimated it, and the three photos byte for byte.
	const db = openTestDb();
	try {
		const kept = mine.filter((f) => f.id !== header.id);
		const server = await query<{
			id: string;
			version: number;
			heat_kw: number;
			steam_kg_h: number | null;
			cost_minor: number;
		}>(
			db,
			'SELECT id, version, heat_kw, steam_kg_h, cost_minor FROM findings WHERE id IN (?) AND deleted_at IS NULL',
			[kept.map((f) => f.id)]
		);
		expect(server.map((r) => r.id).sort()).toEqual(kept.map((f) => f.id).sort());
		expect(
			await query(db, 'SELECT id FROM findings WHERE id = ? AND deleted_at IS NULL', [header.id])
		).toEqual([]);
		for (const f of kept) {
			const row = server.find((r) => r.id === f.id)!;
			const device = sent.findings.find((d) => d.id === f.id)!;
			const engine = evaluateFinding(device.capture, {
				costBasis: site.costBasis,
				headers: site.headers
			});
			// The server's typed figure columns (docs/desk.md, "Figures").
			expect(row.heat_kw).toBeCloseTo(engine.heatLoss, 9);
			expect(Number(row.cost_minor)).toBe(engine.cost.minor);
			if (engine.steamLoss !== null) expect(row.steam_kg_h).toBeCloseTo(engine.steamLoss, 9);
			expect(device.version).toBe(row.version);
		}
		const stored = await query<{ id: string; sha256: string; bytes: number }>(
			db,
			'SELECT id, sha256, bytes FROM photos WHERE finding_id IN (?)',
			[kept.map((f) => f.id)]
		);
		expect(stored.map((p) => p.id).sort()).toEqual(sent.photos.map((p) => p.id).sort());
		for (const p of sent.photos) {
			const row = stored.find((r) => r.id === p.id)!;
			expect(row.sha256).toBe(p.sha256);
			const back = await again.request.get(`/api/photos/${p.id}`);
			expect(back.status()).toBe(200);
			expect(
				createHash('sha256')
					.update(await back.body())
					.digest('hex')
			).toBe(p.sha256);
		}
	} finally {
		await db.end();
	}
});
