/**
 * Sync over loopback, measured (part of `npm run bench`, run by bench-walk.sh after the Walk's
 * benchmark, on the same fresh bench database and build):
 * 1. an auditor's day: 1,000 findings and 1,000 photos of about 300 kB (the test fixture, 342 kB)
 *    sent by the device's real sync client (src/lib/offline on fake-indexeddb) to the built app,
 *    against the same day sent as plain sequential HTTP requests (one per change, one per photo,
 *    nothing in flight at once) to the same app in the same run (target ratio ≤ 1.5×), and, for
 *    scale, the same bytes to a bare Node server that stores nothing;
 * 2. a pull of 10,000 changes from the first cursor, the server's pages alone and the device
 *    applying them (target ≤ 2 s);
 * 3. the app server's CPU time per pushed mutation and per photo (from /proc).
 * Figures are printed; nothing is asserted.
 */
import 'fake-indexeddb/auto';
import { spawn } from 'node:child_process';
import { waitForApp, benchSignIn } from './bench-app';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync } from 'node:fs';
import { createServer } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DeviceDatabase } from '../src/lib/offline/db';
import { saveFinding } from '../src/lib/offline/findings';
import { addPhoto } from '../src/lib/offline/photos';
import { storeSnapshot } from '../src/lib/offline/snapshot';
import { syncOnce } from '../src/lib/offline/sync';
import { demoPassword, demoSurveys } from '../src/lib/server/seed/demo';
import { benchPullRows } from './bench-sync-rows';

const PORT = Number(process.env.STEAMWISP_BENCH_SYNC_PORT ?? 4184);
const ORIGIN = `http://127.0.0.1:${PORT}`;
const SURVEY = demoSurveys[0].id;
const AUDITOR = 'auditor@cinderbrook.example';
const PHOTO = new Uint8Array(
	readFileSync(new URL('../tests/fixtures/trap-photo.jpg', import.meta.url))
);
const FINDINGS = 1000;
const PULL = 10_000;

const app = spawn('node', ['server'], {
	env: {
		...process.env,
		HOST: '127.0.0.1',
		PORT: String(PORT),
		ORIGIN,
		BODY_SIZE_LIMIT: '9M',
		STEAMWISP_PHOTO_DIR: mkdtempSync(join(tmpdir(), 'steamwisp-bench-photos-'))
	},
	stdio: ['ignore', 'ignore', 'inherit']
});

/** User + system CPU seconds of the app process so far (Linux /proc). */
function appCpu(): number {
	const fields = readFileSync(`/proc/${app.pid}/stat`, 'utf8').split(') ')[1].split(' ');
	return (Number(fields[11]) + Number(fields[12])) / 100;
}

const signIn = () => benchSignIn(ORIGIN, AUDITOR, demoPassword);

/** What the device sent: push body sizes, and the app's CPU when the first photo went. */
const wire = {
	pushBytes: [] as number[],
	cpuAtFirstPhoto: null as number | null,
	firstPhotoAt: null as number | null,
	/** Milliseconds spent waiting for the server's answers, by route. */
	waited: { push: 0, photo: 0, pull: 0 }
};

function deviceFetch(cookie: string): typeof fetch {
	return (input, init) => {
		const url = typeof input === 'string' && input.startsWith('/') ? `${ORIGIN}${input}` : input;
		const path = String(url);
		if (path.endsWith('/api/sync/push') && typeof init?.body === 'string') {
			wire.pushBytes.push(Buffer.byteLength(init.body));
		}
		if (path.includes('/api/photos/') && wire.cpuAtFirstPhoto === null) {
			wire.cpuAtFirstPhoto = appCpu();
			wire.firstPhotoAt = performance.now();
		}
		const headers = new Headers(init?.headers);
		headers.set('cookie', cookie);
		headers.set('origin', ORIGIN);
		const kind = path.includes('/api/photos/') ? 'photo' : path.includes('/push') ? 'push' : 'pull';
		const t = performance.now();
		return fetch(url, { ...init, headers }).then(async (res) => {
			const body = await res.arrayBuffer();
			wire.waited[kind] += performance.now() - t;
			return new Response(body, { status: res.status, headers: res.headers });
		});
	};
}

/** The i-th trap test of the benchmark's day (tags of its own, one photo each). */
function benchCapture(i: number, id: string, photoId: string, header: string, at: Date) {
	const when = at.toISOString();
	return {
		id,
		surveyId: SURVEY,
		kind: 'trap' as const,
		headerId: header,
		assetTag: `BENCH-${String(i).padStart(4, '0')}`,
		location: `Bench line ${i}`,
		notes: '',
		photoIds: [photoId],
		createdAt: when,
		updatedAt: when,
		inputs: {
			trapType: 'thermodynamic' as const,
			dn: 15,
			condition: 'failed-open' as const,
			discharge: 'atmosphere' as const
		}
	};
}

/**
 * The same day sent the plain way to the same app, for comparison: one request per change and
 * per photo, one after another, no batching, nothing in flight at once, new ids (so the server
 * does the same work as for the device), the same body sizes.
 */
async function plainToApp(cookie: string, header: string): Promise<number> {
	const f = deviceFetch(cookie);
	const sha = createHash('sha256').update(PHOTO).digest('hex');
	const deviceId = crypto.randomUUID();
	const at = Date.parse('2026-11-22T06:00:00Z');
	const t0 = performance.now();
	for (let i = 0; i < FINDINGS; i++) {
		const id = crypto.randomUUID();
		const photoId = crypto.randomUUID();
		const data = benchCapture(FINDINGS + i, id, photoId, header, new Date(at + i * 20_000));
		const mutation = {
			mutationId: crypto.randomUUID(),
			entity: 'finding',
			op: 'upsert',
			id,
			baseVersion: 0,
			data
		};
		const push = await f('/api/sync/push', {
			method: 'POST',
			headers: { 'content-type': 'application/json' },
			body: JSON.stringify({ deviceId, mutations: [mutation] })
		});
		if (!push.ok) throw new Error(`Plain push answered ${push.status}`);
		const put = await f(`/api/photos/${photoId}`, {
			method: 'PUT',
			headers: {
				'content-type': 'image/jpeg',
				'x-steamwisp-finding': id,
				'x-steamwisp-survey': SURVEY,
				'x-steamwisp-sha256': sha
			},
			body: PHOTO
		});
		if (put.status !== 201) throw new Error(`Plain photo answered ${put.status}`);
	}
	return performance.now() - t0;
}

const seconds = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

async function auditorsDay(cookie: string) {
	const device = new DeviceDatabase(`bench-${Date.now()}`);
	const snap = await (await deviceFetch(cookie)(`/api/surveys/${SURVEY}/snapshot`)).json();
	await storeSnapshot(device, snap);
	const header = (snap as { headers: { id: string }[] }).headers[0].id;
	const at = Date.parse('2026-11-20T06:00:00Z');
	for (let i = 0; i < FINDINGS; i++) {
		const id = crypto.randomUUID();
		const blob = new Blob([PHOTO], { type: 'image/jpeg' });
		const photo = await addPhoto(device, {
			findingId: id,
			surveyId: SURVEY,
			prepared: { blob, thumbnail: blob, width: 2400, height: 1800, contentType: 'image/jpeg' }
		});
		await saveFinding(device, benchCapture(i, id, photo.id, header, new Date(at + i * 20_000)));
	}
	const cpu0 = appCpu();
	const t0 = performance.now();
	const first = await syncOnce(device, { fetch: deviceFetch(cookie) });
	const t1 = performance.now();
	if (first.problem) throw new Error(`Sync stopped: ${first.problem.message}`);
	const cpu1 = appCpu();
	const left = await device.outbox.count();
	const unsent = await device.photos.where('uploaded').equals(0).count();
	if (left + unsent > 0) throw new Error(`Not all sent: ${left} changes, ${unsent} photos`);
	device.close();
	await device.delete();
	const pushCpu = (wire.cpuAtFirstPhoto ?? cpu1) - cpu0;
	const pushMs = (wire.firstPhotoAt ?? t1) - t0;
	return { ms: t1 - t0, pushMs, pushCpu, photoCpu: cpu1 - cpu0 - pushCpu, summary: first, header };
}

/** The same bytes as plain sequential requests to a Node server that only reads them. */
async function plainBaseline(pushBytes: number[]): Promise<number> {
	const bare = createServer((req, res) => {
		req.on('data', () => undefined);
		req.on('end', () => res.end('{}'));
	});
	await new Promise<void>((r) => bare.listen(0, '127.0.0.1', r));
	const { port } = bare.address() as { port: number };
	const t0 = performance.now();
	for (const n of pushBytes) {
		await (
			await fetch(`http://127.0.0.1:${port}/push`, { method: 'POST', body: 'x'.repeat(n) })
		).text();
	}
	for (let i = 0; i < FINDINGS; i++) {
		await (await fetch(`http://127.0.0.1:${port}/photo`, { method: 'PUT', body: PHOTO })).text();
	}
	const ms = performance.now() - t0;
	bare.close();
	return ms;
}

async function pull(cookie: string) {
	const from = await benchPullRows(PULL);
	const f = deviceFetch(cookie);
	// The server's pages alone, from just before the 10,000 rows.
	const t0 = performance.now();
	let cursor = from;
	let changes = 0;
	for (;;) {
		const page = (await (await f(`/api/sync/pull?since=${cursor}&limit=1000`)).json()) as {
			changes: unknown[];
			cursor: number;
			more: boolean;
		};
		changes += page.changes.length;
		cursor = page.cursor;
		if (!page.more) break;
	}
	const server = performance.now() - t0;
	// The device taking them in (the survey on the device, pulling from the first cursor).
	const device = new DeviceDatabase(`bench-pull-${Date.now()}`);
	await storeSnapshot(device, await (await f(`/api/surveys/${SURVEY}/snapshot`)).json());
	await device.surveys.update(SURVEY, { cursor: from });
	await device.meta.put({ key: 'cursor', value: from });
	const t1 = performance.now();
	const result = await syncOnce(device, { fetch: f });
	const whole = performance.now() - t1;
	device.close();
	await device.delete();
	return { changes, server, whole, pulled: result.pulled };
}

try {
	await waitForApp(ORIGIN);
	const cookie = await signIn();
	const day = await auditorsDay(cookie);
	const waitedPush = wire.waited.push;
	const waitedPhoto = wire.waited.photo;
	const pushBytes = [...wire.pushBytes];
	const plainApp = await plainToApp(cookie, day.header);
	const bare = await plainBaseline(pushBytes);
	console.log(
		`\nSync over loopback (${FINDINGS} findings, ${FINDINGS} photos of ${Math.round(PHOTO.length / 1000)} kB)`
	);
	console.log(
		`  sync client to the app:        ${seconds(day.ms)}  (${day.summary.pushed} changes, ${day.summary.photosSent} photos)`
	);
	console.log(
		`    of which changes:            ${seconds(day.pushMs)}; photos and pull: ${seconds(day.ms - day.pushMs)}`
	);
	console.log(
		`    waiting on the server:       changes ${seconds(waitedPush)}, photos ${seconds(waitedPhoto)} (three at a time)`
	);
	console.log(`  plain sequential, to the app:  ${seconds(plainApp)}`);
	console.log(
		`  ratio sync / plain:            ${(day.ms / plainApp).toFixed(2)}×   target ≤ 1.5×`
	);
	console.log(
		`  plain sequential, to a bare Node server that stores nothing: ${seconds(bare)} (sync is ${(day.ms / bare).toFixed(1)}× that)`
	);
	console.log(
		`  app server CPU per mutation:   ${((day.pushCpu / FINDINGS) * 1000).toFixed(2)} ms (pushes of ${pushBytes.length} batches)`
	);
	console.log(
		`  app server CPU per photo:      ${((day.photoCpu / FINDINGS) * 1000).toFixed(2)} ms`
	);
	const p = await pull(cookie);
	console.log(`\nPull of ${p.changes.toLocaleString('en-GB')} changes`);
	console.log(`  server pages alone:         ${seconds(p.server)}   target ≤ 2 s`);
	console.log(`  device applying them:       ${seconds(p.whole)} (${p.pulled} applied)`);
} finally {
	app.kill();
}
