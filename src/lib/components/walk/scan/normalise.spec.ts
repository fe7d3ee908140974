import { describe, expect, it } from 'vitest';
import { normaliseTag, readTag, TAG_MAX_LENGTH } from './normalise';

describe('normaliseTag', () => {
	it('trims, tidies spaces and puts the tag in capitals', () => {
		expect(normaliseTag('  st-0412 \n')).toBe('ST-0412');
		expect(normaliseTag('b2   north\tline')).toBe('B2 NORTH LINE');
	});

	it('drops control characters such as the GS1 group separator', () => {
		expect(normaliseTag('\u001dst\u001d0412\u0000')).toBe('ST 0412');
	});
});

describe('readTag', () => {
	it('takes a bare tag as it is, in capitals', () => {
		expect(readTag(' t-17a ')).toEqual({ ok: true, tag: 'T-17A' });
	});

	it('takes the tag parameter out of a web address', () => {
		expect(readTag('https://cmms.example/asset?tag=st-0412')).toEqual({ ok: true, tag: 'ST-0412' });
		expect(readTag('http://plant.example/a?site=9&Tag=hx%2F12&tag=other')).toEqual({
			ok: true,
			tag: 'HX/12'
		});
		expect(readTag('https://cmms.example/?asset_tag=+st 9+')).toEqual({ ok: true, tag: 'ST 9' });
	});

	it('refuses a web address with no tag in it, saying so', () => {
		const reading = readTag('https://cmms.example/asset/412');
		expect(reading.ok).toBe(false);
		expect(reading.ok ? '' : reading.reason).toMatch(/web address with no tag/);
		expect(readTag('https://cmms.example/asset?tag=%20').ok).toBe(false);
	});

	it('keeps text that only looks like a scheme without // as a tag', () => {
		expect(readTag('urn:st-1')).toEqual({ ok: true, tag: 'URN:ST-1' });
	});

	it('refuses an empty code and one longer than a tag can be', () => {
		expect(readTag(' \u001d ')).toEqual({ ok: false, reason: 'This code is empty.' });
		const long = readTag('x'.repeat(TAG_MAX_LENGTH + 1));
		expect(long.ok).toBe(false);
		expect(long.ok ? '' : long.reason).toContain(`${TAG_MAX_LENGTH + 1} characters`);
		expect(readTag('x'.repeat(TAG_MAX_LENGTH))).toEqual({
			ok: true,
			tag: 'X'.repeat(TAG_MAX_LENGTH)
		});
	});

	it('reads EAN-13 digits unchanged', () => {
		expect(readTag('4006381333931')).toEqual({ ok: true, tag: '4006381333931' });
	});
});
