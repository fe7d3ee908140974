/*
 * Imported by the generated service worker. On activation the worker deletes every cache that is
 * not its own precache (the app shell: the Walk shell, the offline page and the app's files):
 * an older worker kept signed-in pages in a page cache of its own, and a device updated from
 * it must not keep them. Workbox names the precache `workbox-precache-v2-<scope>`; the page's
 * sign-out does the same clean-up (src/lib/offline/page-caches.ts).
 */
self.addEventListener('activate', (event) => {
	event.waitUntil(
		caches
			.keys()
			.then((names) =>
				Promise.all(
					names
						.filter((name) => !name.startsWith('workbox-precache'))
						.map((name) => caches.delete(name))
				)
			)
	);
});
