/**
 * The photo store interface, the same checks against both implementations: local disk in a
 * temporary directory, and S3 through @aws-sdk/client-s3 against s3rver (an S3 fake from npm)
 * started here on 127.0.0.1.
 */
import { createHash, randomUUID } from 'node:crypto';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import S3rver from 's3rver';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
	LocalDiskStore,
	photoKey,
	S3Store,
	storeFromEnv,
	type PhotoStore
} from '../../src/lib/server/storage';
import { JPEG } from './photo-bytes';

const BUCKET = 'steamwisp-photos';
/** Every directory this spec makes, under one temporary parent removed at the end. */
const parent = mkdtempSync(join(tmpdir(), 'steamwisp-photo-store-'));
const tempDir = (name: string) => mkdtempSync(join(parent, name));
let s3: S3rver;
let endpoint = '';

beforeAll(async () => {
	s3 = new S3rver({
		address: '127.0.0.1',
		port: 0,
		silent: true,
		directory: tempDir('s3rver-'),
		configureBuckets: [{ name: BUCKET, configs: [] }]
	});
	const { port } = (await s3.run()) as { port: number };
	endpoint = `http://127.0.0.1:${port}`;
});
afterAll(async () => {
	await s3.close();
	rmSync(parent, { recursive: true, force: true });
});

/** The SHA-256 of a stream's bytes: compared instead of 350 kB element by element. */
const hashOf = async (stream: ReadableStream<Uint8Array>) =>
	sha(new Uint8Array(await new Response(stream).arrayBuffer()));
const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

const stores: [string, () => PhotoStore][] = [
	['local disk', () => new LocalDiskStore(tempDir('disk-'))],
	[
		'S3 (s3rver)',
		() =>
			storeFromEnv({
				STEAMWISP_S3_BUCKET: BUCKET,
				STEAMWISP_S3_ENDPOINT: endpoint,
				STEAMWISP_S3_ACCESS_KEY_ID: 'S3RVER',
				STEAMWISP_S3_SECRET_ACCESS_KEY: 'S3RVER'
			})
	]
];

describe.each(stores)('%s', (name, make) => {
	it('puts, finds, reads back byte-identical and deletes a photo', async () => {
		const store = make();
		expect(store.kind).toBe(name === 'local disk' ? 'disk' : 's3');
		const key = photoKey(randomUUID());
		expect(await store.has(key)).toBe(false);
		expect(await store.get(key)).toBeNull();
		await store.put(key, JPEG, 'image/jpeg');
		expect(await store.has(key)).toBe(true);
		const got = await store.get(key);
		expect(got?.bytes).toBe(JPEG.byteLength);
		expect(await hashOf(got!.body)).toBe(sha(JPEG));
		await store.delete(key);
		expect(await store.has(key)).toBe(false);
	});

	it('a second put of the same key replaces it whole', async () => {
		const store = make();
		const key = photoKey(randomUUID());
		await store.put(key, new Uint8Array([1, 2, 3]), 'image/png');
		await store.put(key, JPEG, 'image/jpeg');
		expect(await hashOf((await store.get(key))!.body)).toBe(sha(JPEG));
	});

	it('refuses keys it did not make (no path traversal)', async () => {
		const store = make();
		for (const key of ['../../etc/passwd', 'photos/00/../../x', 'static/logo.svg', '']) {
			await expect(store.put(key, JPEG, 'image/jpeg')).rejects.toThrow(/Not a photo storage key/);
		}
	});
});

describe('local disk', () => {
	it('a write that fails leaves neither the photo nor a temporary file', async () => {
		const root = tempDir('disk-');
		const store = new LocalDiskStore(root);
		const key = photoKey(randomUUID());
		const broken = new Proxy(JPEG, {
			get(target, prop) {
				// writeFile reads the buffer: fail as a full disk would.
				if (prop === 'buffer') throw new Error('ENOSPC: no space left on device');
				return Reflect.get(target, prop);
			}
		});
		await expect(store.put(key, broken, 'image/jpeg')).rejects.toThrow();
		expect(await store.has(key)).toBe(false);
		const shard = join(root, 'photos', key.split('/')[1]);
		expect(readdirSync(shard)).toEqual([]);
	});

	it('defaults to the data directory, never static/', () => {
		const store = storeFromEnv({ STEAMWISP_DATA_DIR: '/srv/steamwisp' }) as LocalDiskStore;
		expect(store.root).toBe('/srv/steamwisp/photos');
		expect(storeFromEnv({ STEAMWISP_PHOTO_DIR: '/mnt/photos' })).toMatchObject({
			root: '/mnt/photos'
		});
		expect(storeFromEnv({ STEAMWISP_S3_BUCKET: 'b' })).toBeInstanceOf(S3Store);
	});

	it('refuses half a key pair and a path style that is not true or false, in words', () => {
		expect(() =>
			storeFromEnv({ STEAMWISP_S3_BUCKET: 'b', STEAMWISP_S3_ACCESS_KEY_ID: 'id' })
		).toThrow(/both STEAMWISP_S3_ACCESS_KEY_ID and STEAMWISP_S3_SECRET_ACCESS_KEY/);
		expect(() =>
			storeFromEnv({ STEAMWISP_S3_BUCKET: 'b', STEAMWISP_S3_FORCE_PATH_STYLE: 'yes' })
		).toThrow(/must be true or false/);
	});
});
