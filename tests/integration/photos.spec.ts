/**
 * `PUT /api/photos/[id]` and `GET /api/photos/[id]` against the real MariaDB and the local disk
 * store (docs/sync.md): stored once and whole, idempotent by id, refused by content, by hash,
 * by size and by tenancy with nothing written, readable only with the survey's authorization.
 */
import { createHash, randomUUID } from 'node:crypto';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { count, eq, inArray, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { PHOTO_HEADERS, MAX_PHOTO_BYTES } from '../../src/lib/schemas/sync';
import * as schema from '../../src/lib/server/db/schema';
import { storePhoto } from '../../src/lib/server/photos/upload';
import { publishedSurveyId } from '../../src/lib/server/seed/findings';
import type { PhotoStore } from '../../src/lib/server/storage';
import { appFetch } from './chaos/app-fetch';
import { testDatabase } from './db';
import { auditorA, auditorB, clientA, clientB, consultantA } from './demo-people';
import { JPEG, impostors, png, webp } from './photo-bytes';
import {
	batch,
	fieldSurveyId,
	postPush,
	remove,
	trapCapture,
	upsert,
	setFieldStage
} from './sync-api';

const dir = mkdtempSync(join(tmpdir(), 'steamwisp-photos-spec-'));
process.env.STEAMWISP_PHOTO_DIR ??= dir;
const photoDir = process.env.STEAMWISP_PHOTO_DIR;

const { pool, db } = testDatabase();
const made: string[] = [];
const findingsMade: string[] = [];
const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

function put(
	user: SessionUser | null,
	id: string,
	bytes: Uint8Array | ReadableStream<Uint8Array>,
	over: Partial<Record<'finding' | 'survey' | 'sha256', string>> = {},
	hash?: string
) {
	const headers: Record<string, string> = {
		'content-type': 'image/jpeg',
		[PHOTO_HEADERS.finding]: over.finding ?? randomUUID(),
		[PHOTO_HEADERS.survey]: over.survey ?? fieldSurveyId,
		[PHOTO_HEADERS.sha256]: over.sha256 ?? hash ?? sha(bytes as Uint8Array)
	};
	made.push(id);
	return appFetch(user as SessionUser)(`http://127.0.0.1/api/photos/${id}`, {
		method: 'PUT',
		headers,
		body: bytes as BodyInit,
		...(bytes instanceof ReadableStream ? { duplex: 'half' } : {})
	} as RequestInit);
}

const get = (user: SessionUser, id: string, headers: Record<string, string> = {}) =>
	appFetch(user)(`http://127.0.0.1/api/photos/${id}`, { headers });

async function nothingStoredFor(id: string) {
	const rows = await db.select().from(schema.photos).where(eq(schema.photos.id, id));
	expect(rows).toEqual([]);
	const shard = join(photoDir!, 'photos', id.slice(0, 2));
	const files = (() => {
		try {
			return readdirSync(shard);
		} catch {
			return [];
		}
	})();
	expect(files.filter((f) => f.startsWith(id))).toEqual([]);
}

beforeAll(async () => {
	await setFieldStage(db);
});

afterAll(async () => {
	await db.delete(schema.photos).where(inArray(schema.photos.id, made));
	await db
		.delete(schema.auditLog)
		.where(inArray(schema.auditLog.entityId, [...made, ...findingsMade]));
	if (findingsMade.length > 0) {
		await db.delete(schema.findings).where(inArray(schema.findings.id, findingsMade));
	}
	// The traps its pushes registered: left behind, they would head the demo's traps to test.
	await db.delete(schema.assets).where(like(schema.assets.tag, 'PHOTO-SPEC-%'));
	await pool.end();
	rmSync(dir, { recursive: true, force: true });
});

describe('a photo is stored once and whole', () => {
	const id = randomUUID();
	const findingId = randomUUID();

	it('an upload is stored (201) with its firm and survey, and reads back byte-identical', async () => {
		const res = await put(auditorA, id, JPEG, { finding: findingId });
		expect(res.status).toBe(201);
		expect(await res.json()).toEqual({
			id,
			sha256: sha(JPEG),
			bytes: JPEG.byteLength,
			contentType: 'image/jpeg'
		});
		const [row] = await db.select().from(schema.photos).where(eq(schema.photos.id, id));
		expect(row).toMatchObject({
			firmId: auditorA.firmId,
			surveyId: fieldSurveyId,
			findingId,
			uploadedBy: auditorA.id,
			width: 2400,
			height: 1800
		});
		expect(row.changeSeq).toBeGreaterThan(0);
		const audit = await db.select().from(schema.auditLog).where(eq(schema.auditLog.entityId, id));
		expect(audit).toMatchObject([
			{ entity: 'photo', action: 'upload', actorId: auditorA.id, firmId: auditorA.firmId }
		]);
		// Before its finding is pushed the photo is kept and readable by the survey's people.
		const back = await get(consultantA, id);
		expect(back.status).toBe(200);
		expect(back.headers.get('content-type')).toBe('image/jpeg');
		expect(back.headers.get('x-content-type-options')).toBe('nosniff');
		expect(back.headers.get('cache-control')).toBe('private, no-store');
		expect(sha(new Uint8Array(await back.arrayBuffer()))).toBe(sha(JPEG));
		const cached = await get(auditorA, id, { 'if-none-match': back.headers.get('etag')! });
		expect(cached.status).toBe(304);
	});

	it('the same bytes again answer 200 and leave one row', async () => {
		const res = await put(auditorA, id, JPEG, { finding: findingId });
		expect(res.status).toBe(200);
		const [{ n }] = await db
			.select({ n: count() })
			.from(schema.photos)
			.where(eq(schema.photos.id, id));
		expect(n).toBe(1);
	});

	it('other bytes under the same id are refused (409) and the stored ones stay', async () => {
		const res = await put(auditorA, id, png(), { finding: findingId });
		expect(res.status).toBe(409);
		expect((await res.json()).message).toMatch(/already stored/);
		const back = await get(auditorA, id);
		expect(sha(new Uint8Array(await back.arrayBuffer()))).toBe(sha(JPEG));
	});

	it('PNG and WebP are stored with the type their bytes say, whatever the label', async () => {
		for (const [bytes, type] of [
			[png(), 'image/png'],
			[webp(), 'image/webp']
		] as const) {
			const pid = randomUUID();
			const res = await put(auditorA, pid, bytes);
			expect(res.status).toBe(201);
			const [row] = await db.select().from(schema.photos).where(eq(schema.photos.id, pid));
			expect(row.contentType).toBe(type);
			expect(row).toMatchObject({ width: 1, height: 1 });
		}
	});

	it('a photo of a deleted finding is no longer served', async () => {
		const c = trapCapture('PHOTO-SPEC-1');
		findingsMade.push(c.id);
		expect((await postPush(auditorA, batch(upsert(c, 0)))).status).toBe(200);
		const pid = randomUUID();
		expect((await put(auditorA, pid, JPEG, { finding: c.id })).status).toBe(201);
		expect((await get(auditorA, pid)).status).toBe(200);
		expect((await postPush(auditorA, batch(remove(c.id, fieldSurveyId, 1)))).status).toBe(200);
		expect((await get(auditorA, pid)).status).toBe(404);
	});

	it('a photo sent before its finding stays readable once the finding arrives', async () => {
		const c = trapCapture('PHOTO-SPEC-3');
		findingsMade.push(c.id);
		const pid = randomUUID();
		expect((await put(auditorA, pid, JPEG, { finding: c.id })).status).toBe(201);
		const [before] = await db.select().from(schema.findings).where(eq(schema.findings.id, c.id));
		expect(before).toBeUndefined();
		expect((await postPush(auditorA, batch(upsert(c, 0)))).status).toBe(200);
		const back = await get(auditorA, pid);
		expect(back.status).toBe(200);
		expect(sha(new Uint8Array(await back.arrayBuffer()))).toBe(sha(JPEG));
	});

	it('a photo naming a finding of another survey is refused', async () => {
		const c = trapCapture('PHOTO-SPEC-2');
		findingsMade.push(c.id);
		expect((await postPush(auditorA, batch(upsert(c, 0)))).status).toBe(200);
		const [other] = await db
			.select({ id: schema.surveys.id })
			.from(schema.surveys)
			.where(eq(schema.surveys.id, publishedSurveyId));
		const pid = randomUUID();
		const res = await put(consultantA, pid, JPEG, { finding: c.id, survey: other.id });
		expect(res.status).toBe(422);
		expect((await res.json()).message).toMatch(/finding of another survey/);
		await nothingStoredFor(pid);
	});
});

describe('two uploads of one id at the same time', () => {
	it('the same bytes: one is stored (201), the other finds it (200), one row', async () => {
		const id = randomUUID();
		const finding = randomUUID();
		const answers = await Promise.all([
			put(auditorA, id, JPEG, { finding }),
			put(auditorA, id, JPEG, { finding })
		]);
		expect(answers.map((a) => a.status).sort()).toEqual([200, 201]);
		const rows = await db.select().from(schema.photos).where(eq(schema.photos.id, id));
		expect(rows).toHaveLength(1);
	});

	it('other bytes: one is stored, the other refused (409), and the bytes are the row’s', async () => {
		const id = randomUUID();
		const finding = randomUUID();
		const answers = await Promise.all([
			put(auditorA, id, JPEG, { finding }),
			put(auditorA, id, png(), { finding })
		]);
		expect(answers.map((a) => a.status).sort()).toEqual([201, 409]);
		const [row] = await db.select().from(schema.photos).where(eq(schema.photos.id, id));
		const back = await get(auditorA, id);
		expect(sha(new Uint8Array(await back.arrayBuffer()))).toBe(row.sha256);
	});
});

describe('refused, with nothing stored', () => {
	it('a wrong hash (422)', async () => {
		const id = randomUUID();
		const res = await put(auditorA, id, JPEG, { sha256: sha(png()) });
		expect(res.status).toBe(422);
		expect((await res.json()).message).toMatch(/SHA-256/);
		await nothingStoredFor(id);
	});

	it.each(Object.keys(impostors))('%s labelled image/jpeg (415)', async (name) => {
		const id = randomUUID();
		const res = await put(auditorA, id, impostors[name]);
		expect(res.status).toBe(415);
		expect((await res.json()).message).toMatch(/JPEG, PNG or WebP/);
		await nothingStoredFor(id);
	});

	it('more than the limit (413), declared or streamed', async () => {
		const id = randomUUID();
		const big = new Uint8Array(MAX_PHOTO_BYTES + 1);
		expect((await put(auditorA, id, big)).status).toBe(413);
		// A body with no end and no length: the route must stop reading at the limit, not buffer on.
		let sent = 0;
		let cancelled = false;
		const stream = new ReadableStream<Uint8Array>(
			{
				pull(c) {
					sent += 1 << 20;
					c.enqueue(new Uint8Array(1 << 20));
				},
				cancel() {
					cancelled = true;
				}
			},
			{ highWaterMark: 0 }
		);
		expect((await put(auditorA, id, stream, {}, sha(JPEG))).status).toBe(413);
		expect(cancelled).toBe(true);
		expect(sent).toBeLessThanOrEqual(MAX_PHOTO_BYTES + (2 << 20));
		await nothingStoredFor(id);
	});

	it('a Content-Length over the limit is refused (413) before the body is read', async () => {
		const id = randomUUID();
		made.push(id);
		let pulled = 0;
		// highWaterMark 0: nothing is pulled until someone reads.
		const body = new ReadableStream<Uint8Array>(
			{
				pull(c) {
					pulled++;
					c.enqueue(JPEG);
					c.close();
				}
			},
			{ highWaterMark: 0 }
		);
		const res = await appFetch(auditorA)(`http://127.0.0.1/api/photos/${id}`, {
			method: 'PUT',
			headers: {
				'content-length': String(MAX_PHOTO_BYTES + 1),
				[PHOTO_HEADERS.finding]: randomUUID(),
				[PHOTO_HEADERS.survey]: fieldSurveyId,
				[PHOTO_HEADERS.sha256]: sha(JPEG)
			},
			body,
			duplex: 'half'
		} as RequestInit);
		expect(res.status).toBe(413);
		expect((await res.json()).message).toMatch(/at most 8 MiB/);
		expect(pulled).toBe(0);
		await nothingStoredFor(id);
	});

	it('an upload cut halfway (400), and the retry is stored', async () => {
		const id = randomUUID();
		const half = JPEG.subarray(0, JPEG.length >> 1);
		const stream = new ReadableStream<Uint8Array>({
			start(c) {
				c.enqueue(half);
			},
			pull(c) {
				c.error(new Error('connection reset'));
			}
		});
		const res = await put(auditorA, id, stream, {}, sha(JPEG));
		expect(res.status).toBe(400);
		expect((await res.json()).message).toMatch(/did not arrive whole/);
		await nothingStoredFor(id);
		expect((await put(auditorA, id, JPEG)).status).toBe(201);
	});

	it('missing or malformed headers, or an id that is no UUID (400, in plain words)', async () => {
		const id = randomUUID();
		const upper = await put(auditorA, id, JPEG, { sha256: sha(JPEG).toUpperCase() });
		expect(upper.status).toBe(400);
		expect((await upper.json()).message).toMatch(/x-steamwisp-sha256 must be .* hex digits/);
		const badFinding = await put(auditorA, id, JPEG, { finding: 'not-a-uuid' });
		expect(badFinding.status).toBe(400);
		expect((await badFinding.json()).message).toMatch(/x-steamwisp-finding must be a UUID/);
		const badId = await put(auditorA, 'photo-1', JPEG);
		expect(badId.status).toBe(400);
		expect((await badId.json()).message).toMatch(/photo id must be a UUID/);
		await nothingStoredFor(id);
	});

	it('storage that fails (503): no row, and the retry is stored', async () => {
		const id = randomUUID();
		const failing: PhotoStore = {
			kind: 'disk',
			has: async () => false,
			get: async () => null,
			delete: async () => undefined,
			put: async () => {
				throw new Error('EIO: i/o error');
			}
		};
		const upload = {
			id,
			findingId: randomUUID(),
			surveyId: fieldSurveyId,
			firmId: auditorA.firmId,
			sha256: sha(JPEG),
			bytes: JPEG
		};
		made.push(id);
		const quiet = vi.spyOn(console, 'error').mockImplementation(() => undefined);
		const refused = await storePhoto(db, failing, auditorA, upload).catch((e: unknown) => e);
		quiet.mockRestore();
		expect(refused).toMatchObject({ status: 503 });
		await nothingStoredFor(id);
		const audit = await db.select().from(schema.auditLog).where(eq(schema.auditLog.entityId, id));
		expect(audit).toEqual([]);
		expect((await put(auditorA, id, JPEG)).status).toBe(201);
	});

	it('a survey hidden from the person (404) and a client (403)', async () => {
		const id = randomUUID();
		expect((await put(auditorB, id, JPEG)).status).toBe(404);
		expect((await put(auditorA, id, JPEG, { survey: publishedSurveyId })).status).toBe(404);
		expect((await put(auditorA, id, JPEG, { survey: randomUUID() })).status).toBe(404);
		expect((await put(clientA, id, JPEG)).status).toBe(403);
		await nothingStoredFor(id);
	});
});

describe('reading is the survey’s authorization', () => {
	it('another firm and a client of an unpublished survey get 404', async () => {
		const id = randomUUID();
		expect((await put(auditorA, id, JPEG)).status).toBe(201);
		expect((await get(auditorB, id)).status).toBe(404);
		expect((await get(clientB, id)).status).toBe(404);
		// The survey in the field is not published: its own client does not see it yet.
		expect((await get(clientA, id)).status).toBe(404);
	});

	it('a client reads a photo of their company’s published survey', async () => {
		const id = randomUUID();
		expect((await put(consultantA, id, JPEG, { survey: publishedSurveyId })).status).toBe(201);
		expect((await get(clientA, id)).status).toBe(200);
		expect((await get(clientB, id)).status).toBe(404);
	});

	it('If-None-Match with a list or the weak form of the tag answers 304', async () => {
		const id = randomUUID();
		expect((await put(auditorA, id, JPEG)).status).toBe(201);
		const tag = `"${sha(JPEG)}"`;
		expect((await get(auditorA, id, { 'if-none-match': `"other", W/${tag}` })).status).toBe(304);
		const other = await get(auditorA, id, { 'if-none-match': `"${sha(png())}"` });
		expect(other.status).toBe(200);
		expect(other.headers.get('etag')).toBe(tag);
		expect(other.headers.get('content-length')).toBe(String(JPEG.byteLength));
		expect(other.headers.get('content-disposition')).toBe('inline');
	});

	it('an id that is no uuid is simply not found', async () => {
		expect((await get(auditorA, 'nope')).status).toBe(404);
	});
});
