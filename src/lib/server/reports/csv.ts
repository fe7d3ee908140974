/**
 * CSV as RFC 4180 writes it: fields separated by commas, records by CRLF, a field quoted when it
 * holds a comma, a quote, CR or LF, and a quote inside doubled. UTF-8 with a byte order mark,
 * so spreadsheet programs read "m³" and "€" as written. A text field that a spreadsheet would
 * run as a formula — starting with =, +, -, @, a tab or a carriage return — is prefixed with a
 * single quote, as the OWASP page "CSV Injection" recommends; numbers are written as numbers
 * (a negative number is data, not a formula).
 */

export const CSV_BOM = '\uFEFF';
export const CSV_EOL = '\r\n';

const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]/;

/** One field's text. */
export function csvField(value: string | number | null | undefined): string {
	if (value === null || value === undefined) return '';
	if (typeof value === 'number') {
		if (!Number.isFinite(value)) return '';
		return String(value);
	}
	const safe = FORMULA_START.test(value) ? `'${value}` : value;
	return NEEDS_QUOTES.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** One record, with its line end. */
export function csvRecord(values: readonly (string | number | null | undefined)[]): string {
	return values.map(csvField).join(',') + CSV_EOL;
}

/** Numbers as a CSV carries them: 12 significant digits (no float noise), money to its minor unit. */
export function csvNumber(
	value: number | null,
	money: boolean,
	minorDigits: number
): number | null {
	if (value === null) return null;
	return money ? Number(value.toFixed(minorDigits)) : Number(value.toPrecision(12));
}
