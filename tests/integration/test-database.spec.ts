/** Integration tests refuse to run on the development database or on one nobody chose. */
import { describe, expect, it } from 'vitest';
import { refusal } from './db';

const url = (name: string) => `mysql://steamwisp:x@127.0.0.1:3407/${name}`;

describe('the test database guard', () => {
	it('refuses when no database was named (the default is the development one)', () => {
		expect(refusal({}, url('steamwisp'))).toMatch(/test database named on purpose/);
	});

	it('refuses the development database even when named', () => {
		expect(refusal({ STEAMWISP_DB_NAME: 'steamwisp' }, url('steamwisp'))).toMatch(
			/development database/
		);
		expect(refusal({ DATABASE_URL: url('steamwisp') }, url('steamwisp'))).toMatch(
			/development database/
		);
	});

	it('lets a test database through', () => {
		expect(refusal({ STEAMWISP_DB_NAME: 'steamwisp_test' }, url('steamwisp_test'))).toBeNull();
		expect(refusal({ DATABASE_URL: url('steamwisp_h2') }, url('steamwisp_h2'))).toBeNull();
	});
});
