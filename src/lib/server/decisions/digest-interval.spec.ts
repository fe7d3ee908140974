import { describe, expect, it } from 'vitest';
import { DEFAULT_DIGEST_MINUTES, digestMinutes } from './digest-interval';

describe('the digest interval', () => {
	it('is ten minutes unless set', () => {
		expect(digestMinutes({})).toBe(DEFAULT_DIGEST_MINUTES);
		expect(DEFAULT_DIGEST_MINUTES).toBe(10);
		expect(digestMinutes({ STEAMWISP_DIGEST_MINUTES: ' ' })).toBe(10);
	});

	it('takes whole minutes, and 0 or off for none', () => {
		expect(digestMinutes({ STEAMWISP_DIGEST_MINUTES: '30' })).toBe(30);
		expect(digestMinutes({ STEAMWISP_DIGEST_MINUTES: '0' })).toBeNull();
		expect(digestMinutes({ STEAMWISP_DIGEST_MINUTES: 'OFF' })).toBeNull();
	});

	it('refuses what it cannot read, saying what it takes', () => {
		for (const bad of ['1.5', '-2', '1441', 'hourly']) {
			expect(() => digestMinutes({ STEAMWISP_DIGEST_MINUTES: bad }), bad).toThrow(
				/whole minutes from 1 to 1440/
			);
		}
	});
});
