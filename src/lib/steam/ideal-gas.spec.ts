import { describe, expect, it } from 'vitest';
import { idealCoefficients, idealGasInto } from './ideal-gas';
import { DERIVATIVE_SLOTS, F, F_Y, F_YY, F_YYY } from './power-series';

// Region 2's ideal-gas table (IAPWS R7-97(2012) table 10) as the example.
const J = [0, 1, -5, -4, -3, -2, -1, 2, 3];
const n = [
	-0.96927686500217e1, 0.10086655968018e2, -0.5608791128302e-2, 0.71452738081455e-1,
	-0.40710498223928, 0.14240819171444e1, -0.4383951131945e1, -0.28408632460772, 0.21268463753307e-1
];

describe('idealGasInto', () => {
	it('equals the term-by-term sums with Math.pow, and their first three τ-derivatives', () => {
		const out = new Float64Array(DERIVATIVE_SLOTS);
		const c = idealCoefficients(J, n);
		for (const tau of [0.5, 0.9, 1.7]) {
			idealGasInto(c, tau, out);
			const sum = (f: (e: number) => number) => J.reduce((s, e, k) => s + n[k] * f(e), 0);
			expect(out[F] / sum((e) => tau ** e) - 1).toBeCloseTo(0, 13);
			expect(out[F_Y] / sum((e) => e * tau ** (e - 1)) - 1).toBeCloseTo(0, 13);
			expect(out[F_YY] / sum((e) => e * (e - 1) * tau ** (e - 2)) - 1).toBeCloseTo(0, 12);
			const third = sum((e) => e * (e - 1) * (e - 2) * tau ** (e - 3));
			expect(out[F_YYY] / third - 1).toBeCloseTo(0, 12);
		}
	});

	it('refuses exponents outside −5 … 3', () => {
		expect(() => idealCoefficients([4], [1])).toThrow(/J from −5 to 3/);
		expect(() => idealCoefficients([0.5], [1])).toThrow(/J from −5 to 3/);
	});
});
