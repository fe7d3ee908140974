import type { SvelteKitPWAOptions } from '@vite-pwa/sveltekit';
import { manifest } from './manifest.ts';

/**
 * Service-worker strategy: cache only what the offline design needs.
 * - Precached at install: the app's JS, CSS, fonts, icons, the tag scanner's WebAssembly (about 1.1 MB), the
 *   prerendered Walk shell and the offline page.
 * - Every navigation under /walk is answered with the precached Walk shell, online or not:
 *   the Walk renders on the device from the per-person device database, so a cold start, a
 *   reload or a deep link to a finding works in a plant room with no signal.
 * - Every other page goes to the network only (signed-in pages are `no-store` and never kept
 *   by the worker); without a network the precached offline page is shown instead.
 * - API calls are never cached by the worker: the device database and outbox own that data.
 * - No runtime cache at all: on activation the worker deletes any cache but its precache
 *   (static/sw-caches.js), and sign-out does the same on the page (docs/security.md).
 */
export const pwaOptions: SvelteKitPWAOptions = {
	registerType: 'autoUpdate',
	injectRegister: false,
	strategies: 'generateSW',
	// Absolute, so the worker is found from nested pages too (not ./sw.js beside /password/…).
	base: '/',
	scope: '/',
	manifest,
	includeManifestIcons: true,
	kit: { includeVersionFile: true },
	workbox: {
		globPatterns: [
			'client/**/*.{js,css,html,ico,png,svg,webp,woff,woff2,wasm,webmanifest}',
			'prerendered/**/*.html'
		],
		navigateFallback: '/walk',
		navigateFallbackAllowlist: [/^\/walk(\/|$)/],
		cleanupOutdatedCaches: true,
		// Background Sync: the worker wakes open Walk pages to send (static/sw-sync.js); on
		// activation it deletes every cache but its precache (static/sw-caches.js).
		importScripts: ['/sw-sync.js', '/sw-caches.js'],
		clientsClaim: true,
		skipWaiting: true,
		runtimeCaching: [
			{
				urlPattern: ({ request, url }) =>
					request.mode === 'navigate' && !/^\/walk(\/|$)/.test(url.pathname),
				handler: 'NetworkOnly',
				options: { precacheFallback: { fallbackURL: '/offline' } }
			}
		]
	},
	devOptions: { enabled: false }
};
