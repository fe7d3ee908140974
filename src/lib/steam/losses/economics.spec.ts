import { describe, expect, it } from 'vitest';
import { netPresentValue, simplePayback } from './economics';

describe('simplePayback', () => {
	it('divides repair cost by annual saving', () => {
		// DOE "Inspect and Repair Steam Traps": a repair saving $2,988/yr; a $600 repair (example)
		// pays back in 600 / 2988 = 0.2008 years.
		expect(simplePayback(600, 2988).years).toBeCloseTo(0.2008, 4);
	});

	it('says a repair with no saving never pays back instead of returning Infinity', () => {
		expect(simplePayback(500, 0)).toEqual({
			years: null,
			note: 'No annual saving: the repair does not pay back in money'
		});
		expect(simplePayback(0, 0)).toEqual({ years: 0, note: null });
	});

	it('refuses negative costs and NaN', () => {
		expect(() => simplePayback(-1, 10)).toThrow('Repair cost cannot be negative');
		expect(() => simplePayback(10, NaN)).toThrow('Annual saving must be a finite number');
	});
});

describe('netPresentValue', () => {
	it('matches the annuity factor of a textbook table: 10 %, 5 years → 3.7908 (standard PV tables)', () => {
		const npv = netPresentValue({
			repairCost: 0,
			annualSaving: 1,
			discountRate: 0.1,
			lifeYears: 5
		});
		expect(npv).toBeCloseTo(3.7908, 4);
	});

	it('sums undiscounted savings at a zero rate', () => {
		expect(
			netPresentValue({ repairCost: 1000, annualSaving: 400, discountRate: 0, lifeYears: 3 })
		).toBe(200);
	});

	it('equals the year-by-year sum of discounted savings', () => {
		const input = { repairCost: 2500, annualSaving: 900, discountRate: 0.08, lifeYears: 7 };
		let sum = -input.repairCost;
		for (let t = 1; t <= input.lifeYears; t++) sum += input.annualSaving / 1.08 ** t;
		expect(netPresentValue(input)).toBeCloseTo(sum, 9);
	});

	it('refuses a rate outside [0, 1) and a life that is not whole years', () => {
		const base = { repairCost: 1, annualSaving: 1, discountRate: 0.05, lifeYears: 5 };
		expect(() => netPresentValue({ ...base, discountRate: 8 })).toThrow(
			'Discount rate must be at least 0 and below 1, got 8'
		);
		expect(() => netPresentValue({ ...base, lifeYears: 2.5 })).toThrow(
			'Life must be a whole number of years, at least 1, got 2.5'
		);
	});
});
