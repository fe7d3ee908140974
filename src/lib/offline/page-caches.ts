/**
 * The device's HTTP-level caches (Cache Storage) on sign-out. The service worker keeps only the
 * app shell — the precache of the Walk shell, the offline page and the app's files, none of
 * them anyone's data — and that stays, so the Walk still opens offline for the next person
 * signing in here. Any other cache is dropped: a page cache an older worker kept (it held
 * signed-in Desk pages), or anything a browser extension or a future worker left. The person's
 * own data is in their device database, which sign-out never touches (unsent work waits there).
 */

/** Workbox names its precache `workbox-precache-v2-<scope>`; static/sw-caches.js keeps the same. */
export const SHELL_CACHE_PREFIX = 'workbox-precache';

/** Deletes every cache that is not the app shell's; resolves to the names deleted. */
export async function forgetPageCaches(storage: CacheStorage | null = globalThis.caches ?? null) {
	if (!storage) return [];
	const names = (await storage.keys()).filter((name) => !name.startsWith(SHELL_CACHE_PREFIX));
	await Promise.all(names.map((name) => storage.delete(name)));
	return names;
}
