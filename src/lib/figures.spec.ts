import { describe, expect, it } from 'vitest';
import { paybackWords } from './figures';

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
