/*
 * Background Sync for the Walk (imported by the generated service worker). When the browser
 * fires the `steamwisp-outbox` sync — a connection came back — the worker asks every open page
 * to send its outbox; the page's sync manager does the sending from the person's own device
 * database. With no page open nothing is sent until the app is opened again.
 */
self.addEventListener('sync', (event) => {
	if (event.tag !== 'steamwisp-outbox') return;
	event.waitUntil(
		self.clients
			.matchAll({ type: 'window', includeUncontrolled: true })
			.then((pages) => pages.forEach((page) => page.postMessage({ type: 'steamwisp-sync' })))
	);
});
