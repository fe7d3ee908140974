import { describe, expect, it } from 'vitest';
import { CSV_BOM, csvField, csvNumber, csvRecord } from './csv';

// Quoting rules: RFC 4180 §2 (fields with comma, quote or line break are quoted; a quote inside
// is doubled; records end with CRLF). Formula prefixes: OWASP "CSV Injection" (cells starting
// with =, +, -, @, tab or carriage return are prefixed with a single quote).
describe('csvField', () => {
	it('leaves plain text and numbers alone', () => {
		expect(csvField('Steep house')).toBe('Steep house');
		expect(csvField(61596.24)).toBe('61596.24');
		expect(csvField(-3.5)).toBe('-3.5');
		expect(csvField(0)).toBe('0');
	});

	it('writes nothing for a missing value or a non-finite number', () => {
		expect(csvField(null)).toBe('');
		expect(csvField(undefined)).toBe('');
		expect(csvField(Number.NaN)).toBe('');
	});

	it('quotes fields with a comma, a quote or a line break, doubling quotes (RFC 4180)', () => {
		expect(csvField('Roasting plant, kiln')).toBe('"Roasting plant, kiln"');
		expect(csvField('the "old" trap')).toBe('"the ""old"" trap"');
		expect(csvField('line one\nline two')).toBe('"line one\nline two"');
		expect(csvField('cr\rhere')).toBe('"cr\rhere"');
	});

	it('prefixes text that a spreadsheet would run as a formula (OWASP)', () => {
		expect(csvField('=HYPERLINK("http://x","y")')).toBe(`"'=HYPERLINK(""http://x"",""y"")"`);
		expect(csvField('+1+2')).toBe("'+1+2");
		expect(csvField('-2+3')).toBe("'-2+3");
		expect(csvField('@SUM(A1)')).toBe("'@SUM(A1)");
		expect(csvField('\tcmd')).toBe("'\tcmd");
		expect(csvField('\r=1')).toBe(`"'\r=1"`);
		// Only the first character counts.
		expect(csvField('a=b')).toBe('a=b');
	});
});

describe('csvRecord', () => {
	it('joins fields with commas and ends with CRLF', () => {
		expect(csvRecord(['Water (m³/yr)', 12.5, null, 'a,b'])).toBe('Water (m³/yr),12.5,,"a,b"\r\n');
	});

	it('the BOM is U+FEFF, which is EF BB BF in UTF-8', () => {
		expect([...new TextEncoder().encode(CSV_BOM)]).toEqual([0xef, 0xbb, 0xbf]);
	});
});

describe('csvNumber', () => {
	it('keeps money to its minor unit and other figures to 12 significant digits', () => {
		expect(csvNumber(0.1 + 0.2, false, 2)).toBe(0.3);
		expect(csvNumber(1234.5, true, 2)).toBe(1234.5);
		expect(csvNumber(1234.567, true, 0)).toBe(1235);
		expect(csvNumber(null, true, 2)).toBeNull();
	});
});
