import { describe, expect, it } from 'vitest';
import { measureEconomics, measureSums, type MeasureFinding } from './measure';

const traps: MeasureFinding[] = [
	{ repairCostMinor: 45_000, annualSavingMinor: 120_000, steamKgH: 4.5, co2KgYear: 9_000 },
	{ repairCostMinor: 45_000, annualSavingMinor: 80_000, steamKgH: 3, co2KgYear: 6_000 },
	{ repairCostMinor: 60_000, annualSavingMinor: 50_000, steamKgH: 1.8, co2KgYear: 3_600 }
];

describe('measureSums', () => {
	it('adds the findings’ repair costs and savings, and the measure’s own extra costs', () => {
		const sums = measureSums(traps, [
			{ label: 'scaffold in the dryer hall', costMinor: 30_000 },
			{ label: 'weekend shutdown', costMinor: 20_000 }
		]);
		expect(sums).toMatchObject({
			findings: 3,
			repairCostMinor: 150_000,
			extraCostMinor: 50_000,
			costMinor: 200_000,
			annualSavingMinor: 250_000,
			withoutRepairCost: 0,
			withoutSaving: 0
		});
		expect(sums.steamKgH).toBeCloseTo(9.3, 9);
		expect(sums.co2KgYear).toBe(18_600);
		// Payback of the whole job: 200,000 / 250,000 a year.
		expect(sums.paybackYears).toBe(0.8);
	});

	it('counts findings not priced yet and leaves them out of the sums', () => {
		const sums = measureSums([
			...traps,
			{ repairCostMinor: null, annualSavingMinor: 10_000 },
			{ repairCostMinor: 5_000, annualSavingMinor: null }
		]);
		expect(sums).toMatchObject({
			findings: 5,
			repairCostMinor: 155_000,
			costMinor: 155_000,
			annualSavingMinor: 260_000,
			withoutRepairCost: 1,
			withoutSaving: 1
		});
		expect(sums.paybackYears).toBeCloseTo(155_000 / 260_000, 12);
	});

	it('has no payback while nothing is priced, or nothing saved', () => {
		expect(
			measureSums([{ repairCostMinor: null, annualSavingMinor: 5_000 }]).paybackYears
		).toBeNull();
		expect(measureSums([{ repairCostMinor: 5_000, annualSavingMinor: 0 }]).paybackYears).toBeNull();
		expect(measureSums([]).paybackYears).toBeNull();
		// An extra cost alone is a price: the job pays back on the findings' saving.
		expect(
			measureSums(
				[{ repairCostMinor: null, annualSavingMinor: 5_000 }],
				[{ label: 'access platform', costMinor: 10_000 }]
			).paybackYears
		).toBe(2);
	});

	it('refuses money that is not whole minor units, and negative costs', () => {
		expect(() => measureSums([{ repairCostMinor: 10.5, annualSavingMinor: 1 }])).toThrow(
			'Repair cost must be a whole number of minor units (cents), got 10.5'
		);
		expect(() => measureSums(traps, [{ label: 'credit', costMinor: -100 }])).toThrow(
			'Extra cost "credit" cannot be negative, got -100'
		);
	});
});

describe('measureEconomics', () => {
	it('prices the whole job over its life: NPV and IRR of its cost and saving', () => {
		// 10,000.00 saving 4,000.00 a year for four years at 8 %: 4000 × 3.312127 − 10000
		// (annuity factor of 8 %, 4 years, from the standard tables — from memory), and the
		// IRR of the ValQ example (21.86 %, see irr.spec.ts).
		const econ = measureEconomics(
			{ costMinor: 1_000_000, annualSavingMinor: 400_000 },
			{ discountRate: 0.08, lifeYears: 4 }
		);
		expect(econ.npvMinor).toBeCloseTo(400_000 * 3.312127 - 1_000_000, 0);
		expect(econ.irr).toBeCloseTo(0.2186, 4);
	});

	it('has an NPV but no IRR for a job that never pays back', () => {
		const econ = measureEconomics(
			{ costMinor: 1_000_000, annualSavingMinor: 0 },
			{ discountRate: 0.05, lifeYears: 10 }
		);
		expect(econ.npvMinor).toBe(-1_000_000);
		expect(econ.irr).toBeNull();
	});
});
