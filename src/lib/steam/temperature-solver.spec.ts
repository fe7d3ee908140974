import { describe, expect, it } from 'vitest';
import { H, S, propertiesBuffer } from './properties-buffer';
import { region1Into } from './region1';
import { region2Into } from './region2';
import { solveTemperature } from './temperature-solver';

const out = propertiesBuffer();

describe('solveTemperature', () => {
	it('finds T from h in region 1 even from a poor first guess', () => {
		region1Into(10, 450, out);
		const h = out[H];
		for (const guess of [273.15, 300, 600, 623.15, Number.NaN]) {
			const T = solveTemperature(1, 'h', 10, h, guess, 273.15, 623.15, out);
			expect(Math.abs(T / 450 - 1)).toBeLessThan(1e-11);
			expect(Math.abs(out[H] / h - 1)).toBeLessThan(1e-11);
		}
	});

	it('finds T from s in region 2', () => {
		region2Into(1, 800, out);
		const s = out[S];
		const T = solveTemperature(2, 's', 1, s, 700, 453.04, 1073.15, out);
		expect(Math.abs(T / 800 - 1)).toBeLessThan(1e-11);
	});

	it('returns NaN when the answer lies outside the interval, either side', () => {
		region1Into(10, 450, out);
		const h = out[H];
		expect(solveTemperature(1, 'h', 10, h, 500, 460, 600, out)).toBeNaN();
		expect(solveTemperature(1, 'h', 10, h, 300, 273.15, 440, out)).toBeNaN();
	});
});
