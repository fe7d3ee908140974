import { describe, expect, it } from 'vitest';
import { irrWords, paybackShort, paybackWords } from './figures';

describe('paybackWords', () => {
	it('says years, and a payback under a year also in months', () => {
		expect(paybackWords(null)).toBe('does not pay back');
		expect(paybackWords(2.5)).toBe('2.5 years');
		expect(paybackWords(1)).toBe('1 year');
		expect(paybackWords(0.5)).toMatch(/^0\.5 years \(about 6 months\)$/);
		expect(paybackWords(1 / 12)).toMatch(/\(about 1 month\)$/);
		expect(paybackWords(0.02)).toMatch(/\(under a month\)$/);
		expect(paybackWords(0.96)).toMatch(/\(about 12 months\)$/);
	});
});

describe('paybackShort', () => {
	it('gives months under a year, years with one decimal under ten', () => {
		expect(paybackShort(null)).toBe('—');
		expect(paybackShort(0.01)).toBe('under a month');
		expect(paybackShort(0.25)).toBe('about 3 months');
		expect(paybackShort(2.345)).toBe('2.3 years');
		expect(paybackShort(12.6)).toBe('13 years');
	});
});

describe('irrWords', () => {
	it('gives the rate, a bound above 100 % per year, or none', () => {
		expect(irrWords(null)).toBe('none (no single rate)');
		expect(irrWords(0.142)).toBe('14.2 % per year');
		expect(irrWords(1)).toBe('100 % per year');
		expect(irrWords(16.8)).toBe('over 100 % per year');
	});
});
