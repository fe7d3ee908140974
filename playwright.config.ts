import { defineConfig } from '@playwright/test';
import { chromiumLaunchOptions } from './tests/e2e/support/chromium';
import { appEnv, appOrigin as origin, appPort as port, e2eMail } from './tests/e2e/support/servers';

/**
 * End-to-end tests against the built app (`node server`) in Debian's Chromium — never a
 * downloaded browser. `npm test` builds the app and points it at the fresh test database.
 */

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
		launchOptions: chromiumLaunchOptions
	},
	webServer: [
		{
			// The local SMTP fake the app sends to; the tests read what it kept.
			command: 'node --import tsx scripts/mail-fake.ts --fresh',
			port: Number(e2eMail.STEAMWISP_MAIL_PORT),
			reuseExistingServer: false,
			timeout: 30_000,
			env: e2eMail
		},
		{
			// The production server: adapter-node's handler with the security headers on every answer.
			command: 'node server',
			url: `${origin}/api/health`,
			reuseExistingServer: false,
			timeout: 60_000,
			env: appEnv(port)
		}
	]
});
