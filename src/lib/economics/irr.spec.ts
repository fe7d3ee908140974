import { describe, expect, it } from 'vitest';
import { mulberry32 } from '../../../tests/integration/chaos/prng';
import { internalRateOfReturn, repairIrr, signChanges } from './irr';
import { netPresentValue, presentValueOfFlows } from './present-value';

describe('internalRateOfReturn against a published worked example', () => {
	// Microsoft Support, "IRR function" (Excel), example table: a business costing 70,000 with
	// net income of 12,000, 15,000, 18,000, 21,000 and 26,000 in its first five years. Stated
	// answers, rounded to 0.1 %: after four years −2.1 %, after five 8.7 %, after two −44.4 %.
	const flows = [-70_000, 12_000, 15_000, 18_000, 21_000, 26_000];

	it('after five years: 8.7 %', () => {
		expect(internalRateOfReturn(flows)).toBeCloseTo(0.087, 3);
	});
	it('after four years: −2.1 % (the income has not repaid the cost)', () => {
		expect(internalRateOfReturn(flows.slice(0, 5))).toBeCloseTo(-0.021, 3);
	});
	it('after two years: −44.4 %', () => {
		expect(internalRateOfReturn(flows.slice(0, 3))).toBeCloseTo(-0.444, 3);
	});
});

describe('repairIrr', () => {
	it('reproduces a published constant-saving example: 10,000 returning 4,000 a year for four years', () => {
		// ValQ documentation, formula functions, IRR: an initial investment of 10,000 with cash
		// inflows of 4,000 for four years; stated IRR 21.86 %.
		expect(repairIrr({ initialCost: 10_000, annualSaving: 4_000, lifeYears: 4 })).toBeCloseTo(
			0.2186,
			4
		);
	});

	it('is zero when the savings exactly repay the cost', () => {
		expect(repairIrr({ initialCost: 3_000, annualSaving: 1_000, lifeYears: 3 })).toBe(0);
	});

	it('has no rate for a repair that saves nothing or loses money, nor for a free one', () => {
		expect(repairIrr({ initialCost: 1_000, annualSaving: 0, lifeYears: 10 })).toBeNull();
		expect(repairIrr({ initialCost: 1_000, annualSaving: -50, lifeYears: 10 })).toBeNull();
		expect(repairIrr({ initialCost: 0, annualSaving: 500, lifeYears: 10 })).toBeNull();
	});

	it('finds a very high and a very low rate without overflowing', () => {
		// One cent repaid by a million a year: the rate is about 10⁸ (saving ÷ cost).
		const high = repairIrr({ initialCost: 1, annualSaving: 1_000_000, lifeYears: 100 })!;
		expect(high).toBeGreaterThan(999_999);
		expect(high).toBeLessThan(1_000_001);
		// A million paid back with one, once: (1 + r) = 1 / 1,000,000, so r = −99.9999 %.
		const low = repairIrr({ initialCost: 1_000_000, annualSaving: 1, lifeYears: 1 })!;
		expect(low).toBeCloseTo(1e-6 - 1, 12);
		// …and with one a year for a century: a negative rate whose NPV is still zero.
		const century = repairIrr({ initialCost: 1_000_000, annualSaving: 1, lifeYears: 100 })!;
		expect(century).toBeLessThan(0);
		const flows = [-1_000_000, ...Array.from({ length: 100 }, () => 1)];
		expect(Math.abs(presentValueOfFlows(century, flows))).toBeLessThan(1e-3);
	});
});

describe('flows with no single rate', () => {
	it('answers null without a change of sign', () => {
		expect(internalRateOfReturn([-100, -50, 0])).toBeNull();
		expect(internalRateOfReturn([100, 50])).toBeNull();
		expect(internalRateOfReturn([0, 0])).toBeNull();
	});

	it('answers null for two changes of sign, where two rates fit', () => {
		// −100, +230, −132 has NPV 0 at both 10 % and 20 % (arithmetic: 230/1.1 − 132/1.21 = 100
		// and 230/1.2 − 132/1.44 = 100): no one rate is the answer.
		expect(presentValueOfFlows(0.1, [-100, 230, -132])).toBeCloseTo(0, 9);
		expect(presentValueOfFlows(0.2, [-100, 230, -132])).toBeCloseTo(0, 9);
		expect(signChanges([-100, 230, -132])).toBe(2);
		expect(internalRateOfReturn([-100, 230, -132])).toBeNull();
	});

	it('ignores zeros between, before and after the flows', () => {
		expect(signChanges([0, -5, 0, 0, 3, 0])).toBe(1);
		const plain = internalRateOfReturn([-10_000, 4_000, 4_000, 4_000, 4_000])!;
		// A cost paid a year later, and flows padded with zero years, keep the same rate.
		expect(internalRateOfReturn([0, -10_000, 4_000, 4_000, 4_000, 4_000, 0, 0])).toBeCloseTo(
			plain,
			12
		);
	});

	it('refuses a flow that is not a number', () => {
		expect(() => internalRateOfReturn([-1, Infinity])).toThrow(
			'Cash flow of year 1 must be a finite number, got Infinity'
		);
	});
});

describe('the IRR by its definition, over seeded random repairs', () => {
	it('makes the NPV zero (to a tiny share of the cost), and is the only such rate', () => {
		const r = mulberry32(20_261_118);
		for (let run = 0; run < 500; run++) {
			const initialCost = r.int(1, 50_000_000);
			const annualSaving = r.int(1, 20_000_000);
			const lifeYears = r.int(1, 40);
			const irr = repairIrr({ initialCost, annualSaving, lifeYears });
			const label = `run ${run}: ${initialCost} / ${annualSaving} × ${lifeYears}`;
			expect(irr, label).not.toBeNull();
			const npv = (rate: number) =>
				netPresentValue({ initialCost, annualSaving, discountRate: rate, lifeYears });
			expect(Math.abs(npv(irr!)), label).toBeLessThan(initialCost * 1e-9);
			// NPV falls as the rate rises: positive a little below the IRR, negative a little above.
			const step = Math.max(1e-6, Math.abs(irr!) * 1e-6);
			expect(npv(irr! - step), label).toBeGreaterThan(0);
			expect(npv(irr! + step), label).toBeLessThan(0);
			// Savings that add up to more than the cost earn a positive rate, and the reverse.
			expect(Math.sign(irr!), label).toBe(Math.sign(annualSaving * lifeYears - initialCost));
		}
	});

	it('solves uneven flows with one change of sign too', () => {
		const r = mulberry32(7);
		for (let run = 0; run < 300; run++) {
			const years = r.int(1, 30);
			const flows = [
				-r.int(1, 1_000_000),
				...Array.from({ length: years }, () => r.int(0, 400_000))
			];
			if (flows.slice(1).every((f) => f === 0)) flows[1] = 1;
			const irr = internalRateOfReturn(flows);
			expect(irr, `run ${run}`).not.toBeNull();
			expect(Math.abs(presentValueOfFlows(irr!, flows)), `run ${run}`).toBeLessThan(
				-flows[0] * 1e-9
			);
		}
	});
});
