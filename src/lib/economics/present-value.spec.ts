import { describe, expect, it } from 'vitest';
import { annuityFactor, netPresentValue, presentValueOfFlows, repairFlows } from './present-value';

describe('annuityFactor', () => {
	it('matches the standard present-value-of-an-annuity tables', () => {
		// Uniform present value factors as printed in interest tables of engineering-economics
		// textbooks (from memory; each is also (1 − 1.1^−5) / 0.1 etc. to the digits shown).
		expect(annuityFactor(0.1, 5)).toBeCloseTo(3.7908, 4);
		expect(annuityFactor(0.05, 10)).toBeCloseTo(7.7217, 4);
		expect(annuityFactor(0.08, 20)).toBeCloseTo(9.8181, 4);
	});

	it('is the number of years at a zero rate', () => {
		expect(annuityFactor(0, 7)).toBe(7);
	});
});

describe('netPresentValue', () => {
	it('sums the savings less the cost at a zero rate', () => {
		expect(
			netPresentValue({ initialCost: 1000, annualSaving: 400, discountRate: 0, lifeYears: 3 })
		).toBe(200);
	});

	it('equals the year-by-year sum of discounted savings', () => {
		const input = { initialCost: 2500, annualSaving: 900, discountRate: 0.08, lifeYears: 7 };
		let sum = -input.initialCost;
		for (let t = 1; t <= input.lifeYears; t++) sum += input.annualSaving / 1.08 ** t;
		expect(netPresentValue(input)).toBeCloseTo(sum, 9);
		expect(presentValueOfFlows(0.08, repairFlows(input))).toBeCloseTo(sum, 9);
	});

	it('takes a negative saving (a change that costs more every year) and goes further below zero', () => {
		const npv = netPresentValue({
			initialCost: 1000,
			annualSaving: -100,
			discountRate: 0.1,
			lifeYears: 5
		});
		expect(npv).toBeCloseTo(-1000 - 100 * 3.790787, 4);
	});

	it('refuses a rate of −100 % or below, a life that is not whole years and a negative cost', () => {
		const base = { initialCost: 1, annualSaving: 1, discountRate: 0.05, lifeYears: 5 };
		expect(() => netPresentValue({ ...base, discountRate: -1 })).toThrow(
			'Discount rate must be above −1 (−100 %), got -1'
		);
		expect(() => netPresentValue({ ...base, lifeYears: 2.5 })).toThrow(
			'Life must be a whole number of years from 1 to 100, got 2.5'
		);
		expect(() => netPresentValue({ ...base, lifeYears: 0 })).toThrow('Life must be');
		expect(() => netPresentValue({ ...base, initialCost: -5 })).toThrow(
			'Initial cost cannot be negative, got -5'
		);
	});
});

describe('presentValueOfFlows', () => {
	it('reproduces a published NPV example: 10 %, 500, 1 500, 4 000 and 10 000 over four years', () => {
		// Adobe LiveCycle Designer, FormCalc reference, NPV function: NPV(0.10, 500, 1500, 4000,
		// 10000) = 11529.60863329007, each amount at the end of years 1 to 4.
		expect(presentValueOfFlows(0.1, [0, 500, 1500, 4000, 10000])).toBeCloseTo(11529.60863329007, 8);
	});

	it('reproduces a published NPV example with the cost a year out: −1 000 then 500 a year for three years', () => {
		// docs.rs, crate `financial` 1.1.2, fn npv: npv(0.1, [-1000, 500, 500, 500]) =
		// 221.29635953828267, the first amount at the end of year 1.
		expect(presentValueOfFlows(0.1, [0, -1000, 500, 500, 500])).toBeCloseTo(221.29635953828267, 9);
	});

	it('refuses a flow that is not a number', () => {
		expect(() => presentValueOfFlows(0.1, [-1, NaN])).toThrow(
			'Cash flow of year 1 must be a finite number, got NaN'
		);
	});
});
