import { describe, expect, it } from 'vitest';
import { fromMinorUnits, minorUnitDigits, money, toMinorUnits } from './money';

describe('minor units', () => {
	it('knows the minor-unit digits of common currencies (ISO 4217, from memory)', () => {
		expect(minorUnitDigits('USD')).toBe(2);
		expect(minorUnitDigits('EUR')).toBe(2);
		expect(minorUnitDigits('JPY')).toBe(0);
		expect(minorUnitDigits('KWD')).toBe(3);
	});

	it('rounds half away from zero to whole minor units', () => {
		expect(toMinorUnits(2988.004, 'USD')).toBe(298800);
		expect(toMinorUnits(0.125, 'USD')).toBe(13);
		expect(toMinorUnits(-0.125, 'USD')).toBe(-13);
		expect(toMinorUnits(1234.5, 'JPY')).toBe(1235);
		expect(toMinorUnits(1.2345, 'KWD')).toBe(1235);
		expect(Object.is(toMinorUnits(-0.001, 'USD'), 0)).toBe(true);
	});

	it('converts back and pairs both forms', () => {
		expect(fromMinorUnits(298800, 'USD')).toBe(2988);
		expect(money(729.2, 'USD')).toEqual({ amount: 729.2, minor: 72920, currency: 'USD' });
	});

	it('refuses non-finite amounts, fractional minor units and bad codes', () => {
		expect(() => toMinorUnits(NaN, 'USD')).toThrow(
			'An amount of money must be a finite number, got NaN'
		);
		expect(() => fromMinorUnits(1.5, 'USD')).toThrow('Minor units must be a whole number, got 1.5');
		expect(() => minorUnitDigits('usd')).toThrow(
			'Currency must be a three-letter ISO 4217 code, got "usd"'
		);
	});
});
