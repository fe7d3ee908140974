import { defineConfig } from '@playwright/test';

/**
 * End-to-end tests against the built app (`node build`) in Debian's Chromium — never a
 * downloaded browser. `npm test` builds the app and points it at the fresh test database.
 */
const port = Number(process.env.STEAMWISP_E2E_PORT ?? 4181);
const origin = `http://127.0.0.1:${port}`;

export default defineConfig({
	testDir: 'tests/e2e',
	testMatch: '**/*.e2e.ts',
	fullyParallel: false,
	workers: 1,
	retries: 0,
	timeout: 30_000,
	outputDir: '.data/test-results',
	use: {
		baseURL: origin,
		serviceWorkers: 'allow',
		screenshot: 'only-on-failure',
		launchOptions: {
			executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
			args: [
				'--no-sandbox',
				'--disable-gpu',
				'--disable-dev-shm-usage',
				'--disable-quic',
				'--no-first-run',
				'--disable-background-networking',
				'--disable-component-update',
				'--disable-sync'
			]
		}
	},
	webServer: {
		command: 'node build',
		url: `${origin}/api/health`,
		reuseExistingServer: false,
		timeout: 60_000,
		env: {
			HOST: '127.0.0.1',
			PORT: String(port),
			ORIGIN: origin,
			STEAMWISP_DB_NAME: process.env.STEAMWISP_DB_NAME ?? 'steamwisp_test'
		}
	}
});
