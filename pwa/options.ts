import type { SvelteKitPWAOptions } from '@vite-pwa/sveltekit';
import { manifest } from './manifest.ts';

/**
 * Service-worker strategy.
 * - The app shell (JS, CSS, fonts, icons, the offline page) is precached at install.
 * - Page navigations go network-first with a short timeout, falling back to the last copy
 *   seen and finally to the offline page: an auditor in a plant room with no signal still
 *   gets the shell.
 * - API calls are never cached by the worker: the outbox and sync client own that data.
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
			'client/**/*.{js,css,html,ico,png,svg,webp,woff,woff2,webmanifest}',
			'prerendered/**/*.html'
		],
		navigateFallback: null,
		cleanupOutdatedCaches: true,
		clientsClaim: true,
		skipWaiting: true,
		runtimeCaching: [
			{
				urlPattern: ({ request, url }) =>
					request.mode === 'navigate' && !url.pathname.startsWith('/api/'),
				handler: 'NetworkFirst',
				options: {
					cacheName: 'steamwisp-pages',
					networkTimeoutSeconds: 4,
					expiration: { maxEntries: 60 },
					precacheFallback: { fallbackURL: '/offline' }
				}
			}
		]
	},
	devOptions: { enabled: false }
};
