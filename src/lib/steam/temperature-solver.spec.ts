import { describe, expect, it } from 'vitest';
import { H, S, propertiesBuffer } from './properties-buffer';
import { region1Into } from './region1';
import { region2Into } from './region2';
import { region5Into } from './region5';
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

	it('lands within 1e-13 of T from a guess a backward equation could give (±25 mK)', () => {
		const cases: [1 | 2 | 5, number, number, number, number][] = [
			[1, 0.1, 300, 273.15, 372.75],
			[1, 15, 600, 273.15, 615.3],
			[2, 0.01, 320, 319, 1073.15],
			[2, 16, 625, 621, 1073.15],
			[2, 30, 720, 699, 1073.15],
			[5, 30, 1500, 1073.15, 2273.15]
		];
		for (const [region, p, T, lo, hi] of cases) {
			if (region === 1) region1Into(p, T, out);
			else if (region === 2) region2Into(p, T, out);
			else region5Into(p, T, out);
			const [h, s] = [out[H], out[S]];
			for (const guess of [T - 0.025, T + 0.025]) {
				expect(
					Math.abs(solveTemperature(region, 'h', p, h, guess, lo, hi, out) / T - 1)
				).toBeLessThan(2e-13);
				expect(
					Math.abs(solveTemperature(region, 's', p, s, guess, lo, hi, out) / T - 1)
				).toBeLessThan(2e-13);
			}
		}
	});

	it('returns NaN when the answer lies outside the interval, either side', () => {
		region1Into(10, 450, out);
		const h = out[H];
		expect(solveTemperature(1, 'h', 10, h, 500, 460, 600, out)).toBeNaN();
		expect(solveTemperature(1, 'h', 10, h, 300, 273.15, 440, out)).toBeNaN();
	});
});
