import { describe, expect, it } from 'vitest';
import { simplePaybackYears } from './payback';

describe('simplePaybackYears', () => {
	it('divides the repair cost by the annual saving', () => {
		// A repair of 600.00 saving 2,988.00 a year: 60000 / 298800 = 0.2008 years (arithmetic).
		expect(simplePaybackYears(60_000, 298_800)).toBeCloseTo(0.200803, 6);
		expect(simplePaybackYears(1_000, 250)).toBe(4);
	});

	it('says a free repair that saves something pays back at once', () => {
		expect(simplePaybackYears(0, 500)).toBe(0);
	});

	it('has no payback with no saving, a negative saving or no priced repair', () => {
		expect(simplePaybackYears(1_000, 0)).toBeNull();
		expect(simplePaybackYears(1_000, -50)).toBeNull();
		expect(simplePaybackYears(0, 0)).toBeNull();
		expect(simplePaybackYears(null, 500)).toBeNull();
		expect(simplePaybackYears(1_000, null)).toBeNull();
	});

	it('refuses a negative cost and numbers that are not finite', () => {
		expect(() => simplePaybackYears(-1, 10)).toThrow('Repair cost cannot be negative, got -1');
		expect(() => simplePaybackYears(10, NaN)).toThrow(
			'Annual saving must be a finite number, got NaN'
		);
		expect(() => simplePaybackYears(Infinity, 10)).toThrow('Repair cost must be a finite number');
	});
});
