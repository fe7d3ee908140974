import { describe, expect, it } from 'vitest';
import { forgetPageCaches } from './page-caches';

/** A Cache Storage with named caches and nothing else (only keys and delete are used). */
function storageWith(names: string[]) {
	const kept = new Set(names);
	const storage = {
		keys: async () => [...kept],
		delete: async (name: string) => kept.delete(name)
	} as unknown as CacheStorage;
	return { storage, kept };
}

describe('forgetPageCaches', () => {
	it('drops every cache but the app shell precache', async () => {
		const { storage, kept } = storageWith([
			'workbox-precache-v2-https://audits.example/',
			'steamwisp-pages',
			'workbox-runtime-https://audits.example/'
		]);
		const deleted = await forgetPageCaches(storage);
		expect(deleted.sort()).toEqual(['steamwisp-pages', 'workbox-runtime-https://audits.example/']);
		expect([...kept]).toEqual(['workbox-precache-v2-https://audits.example/']);
	});

	it('does nothing where there is no Cache Storage (an insecure origin)', async () => {
		expect(await forgetPageCaches(null)).toEqual([]);
	});
});
