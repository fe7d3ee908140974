import { sveltekit } from '@sveltejs/kit/vite';
import tailwindcss from '@tailwindcss/vite';
import { SvelteKitPWA } from '@vite-pwa/sveltekit';
import { defineConfig } from 'vitest/config';
import { pwaOptions } from './pwa/options.ts';
import { pwaIcons } from './pwa/icons-plugin.ts';

export default defineConfig({
	plugins: [tailwindcss(), sveltekit(), SvelteKitPWA(pwaOptions), pwaIcons()],
	server: { host: '127.0.0.1' },
	preview: { host: '127.0.0.1' },
	// The timing report is for bundler authors; keep build output to what a person needs.
	build: { rolldownOptions: { checks: { bundlerTimings: false } } },
	test: {
		projects: [
			{
				extends: true,
				test: {
					name: 'unit',
					environment: 'node',
					include: ['src/**/*.spec.ts', 'server/**/*.spec.ts', 'tests/reference/**/*.spec.ts']
				}
			},
			{
				extends: true,
				test: {
					name: 'integration',
					environment: 'node',
					include: ['tests/integration/**/*.spec.ts'],
					// One real database, shared: run these files one after another.
					fileParallelism: false,
					testTimeout: 30_000,
					hookTimeout: 60_000
				}
			}
		]
	}
});
