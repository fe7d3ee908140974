/**
 * Where the browser tests' servers listen, shared by playwright.config.ts and the tests: the
 * built app on 127.0.0.1, its own SMTP fake and mailbox (apart from a developer's running one
 * on 2525 with .data/mailbox), and the test database.
 */
import { resolve } from 'node:path';

export const appPort = Number(process.env.STEAMWISP_E2E_PORT ?? 4181);
export const appOrigin = `http://127.0.0.1:${appPort}`;
export const testDbName = process.env.STEAMWISP_DB_NAME ?? 'steamwisp_test';
// The browser tests write people, sessions and surveys: never into the development database.
if (testDbName === 'steamwisp') {
	throw new Error(
		'Browser tests will not run on "steamwisp": it is the development database, with your ' +
			'demo data. Run them through `npm test`, or set STEAMWISP_DB_NAME=steamwisp_test.'
	);
}

export const e2eMail = {
	// The app sends to the fake and shows the development mailbox only when told to.
	STEAMWISP_DEV_MAILBOX: '1',
	STEAMWISP_MAIL_PORT: process.env.STEAMWISP_E2E_MAIL_PORT ?? '2526',
	STEAMWISP_MAILBOX_DIR: resolve(import.meta.dirname, '../../../.data/mailbox-e2e')
};

/** The environment every app process (`node server`) of the tests runs with. */
export function appEnv(port: number, extra: Record<string, string> = {}): Record<string, string> {
	return {
		HOST: '127.0.0.1',
		PORT: String(port),
		ORIGIN: `http://127.0.0.1:${port}`,
		STEAMWISP_DB_NAME: testDbName,
		// As npm start does: adapter-node's own 512K would refuse a photo the contract allows.
		BODY_SIZE_LIMIT: '9M',
		STEAMWISP_PHOTO_DIR: resolve(import.meta.dirname, '../../../.data/photos-e2e'),
		...e2eMail,
		...extra
	};
}
