import { describe, expect, it } from 'vitest';
import { UnitError } from './errors';
import { formatSignificant, roundToSignificant } from './number-format';

// Expected strings follow the rounding rule (3 significant figures unless stated) and the
// en-US conventions of the Unicode CLDR data that Intl.NumberFormat uses.
describe('roundToSignificant', () => {
	it('rounds to significant figures', () => {
		expect(roundToSignificant(1234.5, 3)).toBe(1230);
		expect(roundToSignificant(0.0012345, 2)).toBe(0.0012);
		expect(roundToSignificant(-987.65, 2)).toBe(-990);
		expect(roundToSignificant(2.5, 1)).toBe(3);
		expect(roundToSignificant(0, 3)).toBe(0);
		expect(roundToSignificant(123_456_789)).toBe(123_000_000);
	});

	it('rejects non-finite values and bad figures', () => {
		expect(() => roundToSignificant(NaN)).toThrow(UnitError);
		expect(() => roundToSignificant(1, 0)).toThrow(/from 1 to 21/);
	});
});

describe('formatSignificant', () => {
	it('three significant figures, no trailing zeros, grouped thousands', () => {
		expect(formatSignificant(12345.6)).toBe('12,300');
		expect(formatSignificant(0.012345)).toBe('0.0123');
		expect(formatSignificant(12)).toBe('12');
		expect(formatSignificant(12.04)).toBe('12');
		expect(formatSignificant(1.5)).toBe('1.5');
		expect(formatSignificant(999.6)).toBe('1,000');
		expect(formatSignificant(-42.195)).toBe('-42.2');
		expect(formatSignificant(123_456_789_012)).toBe('123,000,000,000');
	});

	it('zero reads "0", never "-0"', () => {
		expect(formatSignificant(0)).toBe('0');
		expect(formatSignificant(-0)).toBe('0');
	});

	it('plain notation for everyday magnitudes, scientific only for extremes', () => {
		expect(formatSignificant(0.00049)).toBe('0.00049');
		expect(formatSignificant(0.0001)).toBe('0.0001');
		expect(formatSignificant(0.000099996)).toBe('0.0001'); // rounds up into the plain band
		expect(formatSignificant(0.00001234)).toBe('1.23E-5');
		expect(formatSignificant(999_999_999_999_999)).toBe('1E15');
		expect(formatSignificant(1e15)).toBe('1E15');
	});

	it('honours sigFigs and keepTrailingZeros', () => {
		expect(formatSignificant(Math.PI, { sigFigs: 5 })).toBe('3.1416');
		expect(formatSignificant(0.96, { sigFigs: 1 })).toBe('1');
		expect(formatSignificant(12, { keepTrailingZeros: true })).toBe('12.0');
		expect(formatSignificant(1.5, { sigFigs: 4, keepTrailingZeros: true })).toBe('1.500');
	});

	it('follows the locale for decimal mark and grouping', () => {
		expect(formatSignificant(12345.6, { locale: 'de-DE' })).toBe('12.300');
		expect(formatSignificant(1.5, { locale: 'de-DE' })).toBe('1,5');
		expect(formatSignificant(12345.6, { locale: 'fr-FR' })).toBe('12\u202f300');
		// Spanish groups only from five digits up (CLDR minimum grouping digits 2).
		expect(formatSignificant(1234, { locale: 'es-ES', sigFigs: 4 })).toBe('1234');
		expect(formatSignificant(12345.6, { grouping: false })).toBe('12300');
	});

	it('rejects non-finite values and bad significant figures', () => {
		for (const bad of [NaN, Infinity, -Infinity]) {
			expect(() => formatSignificant(bad)).toThrow(/Cannot format/);
		}
		for (const sigFigs of [0, 22, 2.5, NaN]) {
			expect(() => formatSignificant(1, { sigFigs })).toThrow(
				/must be a whole number from 1 to 21/
			);
		}
	});
});
