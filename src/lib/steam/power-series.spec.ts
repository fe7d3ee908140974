import { describe, expect, it } from 'vitest';
import {
	DERIVATIVE_SLOTS,
	F,
	F_X,
	F_XX,
	F_XY,
	F_Y,
	F_YY,
	F_YYY,
	powerSeries,
	seriesDerivatives,
	seriesValue,
	seriesYDerivatives
} from './power-series';

// An arbitrary series with negative, zero and large exponents, like the IF97 tables.
const I = [0, 0, 1, 2, 3, 8, -2, 5, 10];
const J = [-3, 0, 1, -7, 4, 12, 2, -1, 20];
const n = [0.7, -1.3, 2.2, 0.05, -0.4, 1e-3, 0.9, -0.2, 1e-9];

function naive(x: number, y: number): number {
	return n.reduce((sum, nk, k) => sum + nk * Math.pow(x, I[k]) * Math.pow(y, J[k]), 0);
}

describe('seriesValue', () => {
	it('equals the term-by-term sum with Math.pow', () => {
		const series = powerSeries(I, J, n);
		for (const [x, y] of [
			[1.3, 0.7],
			[2.9, 1.1],
			[0.4, 1.3]
		]) {
			expect(seriesValue(series, x, y) / naive(x, y) - 1).toBeCloseTo(0, 13);
		}
	});

	it('refuses tables of unequal length or fractional exponents', () => {
		expect(() => powerSeries([1, 2], [1], [1, 2])).toThrow(/same length/);
		expect(() => powerSeries([0.5], [1], [1])).toThrow(/integers/);
	});
});

describe('seriesDerivatives', () => {
	const series = powerSeries(I, J, n);
	const out = new Float64Array(6);

	it('gives the value and first and second derivatives (against central differences)', () => {
		const [x, y] = [1.7, 1.2];
		seriesDerivatives(series, x, y, out);
		const d = 1e-4;
		const f = naive;
		expect(out[F] / f(x, y) - 1).toBeCloseTo(0, 13);
		const fx = (f(x + d, y) - f(x - d, y)) / (2 * d);
		const fy = (f(x, y + d) - f(x, y - d)) / (2 * d);
		const fxx = (f(x + d, y) - 2 * f(x, y) + f(x - d, y)) / (d * d);
		const fyy = (f(x, y + d) - 2 * f(x, y) + f(x, y - d)) / (d * d);
		const fxy =
			(f(x + d, y + d) - f(x + d, y - d) - f(x - d, y + d) + f(x - d, y - d)) / (4 * d * d);
		expect(out[F_X] / fx - 1).toBeCloseTo(0, 6);
		expect(out[F_Y] / fy - 1).toBeCloseTo(0, 6);
		expect(out[F_XX] / fxx - 1).toBeCloseTo(0, 4);
		expect(out[F_YY] / fyy - 1).toBeCloseTo(0, 4);
		expect(out[F_XY] / fxy - 1).toBeCloseTo(0, 4);
	});

	it('seriesYDerivatives gives the same f, f_y, f_yy, and f_yyy', () => {
		const full = new Float64Array(DERIVATIVE_SLOTS);
		const part = new Float64Array(DERIVATIVE_SLOTS);
		const [x, y] = [0.9, 1.05];
		seriesDerivatives(series, x, y, full);
		seriesYDerivatives(series, x, y, part);
		for (const slot of [F, F_Y, F_YY]) expect(part[slot]).toBe(full[slot]);
		const fyyy = n.reduce(
			(sum, nk, k) => sum + nk * x ** I[k] * J[k] * (J[k] - 1) * (J[k] - 2) * y ** (J[k] - 3),
			0
		);
		expect(part[F_YYY] / fyyy - 1).toBeCloseTo(0, 12);
	});

	it('derivatives of a single monomial are exact', () => {
		const mono = powerSeries([3], [-2], [2]);
		seriesDerivatives(mono, 2, 0.5, out);
		// f = 2 x³ y⁻²: at (2, 0.5) f = 64, f_x = 6x²y⁻² = 96, f_xx = 12x y⁻² = 96,
		// f_y = −4x³y⁻³ = −256, f_yy = 12x³y⁻⁴ = 1536, f_xy = −12x²y⁻³ = −384.
		expect(Array.from(out)).toEqual([64, 96, 96, -256, 1536, -384]);
	});
});
