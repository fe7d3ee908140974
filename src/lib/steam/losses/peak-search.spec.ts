import { describe, expect, it } from 'vitest';
import { peakOf } from './peak-search';

/** f wrapped to count its evaluations. */
function counted(f: (x: number) => number) {
	const wrapped = (x: number) => {
		wrapped.calls++;
		return f(x);
	};
	wrapped.calls = 0;
	return wrapped;
}

describe('peakOf', () => {
	it('finds the peak of x·e^(−x) at x = 1 to 1e-7 in a few evaluations', () => {
		const f = counted((x) => x * Math.exp(-x));
		const { x, f: top } = peakOf(f, 0.2, f(0.2), 0.9, f(0.9), 3, f(3), 1e-8);
		expect(Math.abs(x - 1)).toBeLessThan(1e-7);
		expect(top).toBe(f(x));
		expect(f.calls).toBeLessThan(20);
	});

	it('finds a peak near one end of a wide, lopsided interval', () => {
		// Peak of sin on [0, 1.6] is π/2 ≈ 1.5708, close to the right end.
		const f = counted(Math.sin);
		const { x } = peakOf(f, 0, 0, 1.2, Math.sin(1.2), 1.6, Math.sin(1.6), 1e-9);
		expect(Math.abs(x - Math.PI / 2)).toBeLessThan(1e-7);
		expect(f.calls).toBeLessThan(25);
	});

	it('starts from the parabola through the three known points: a parabola takes a few steps', () => {
		const f = counted((x) => 3 - (x - 0.7) ** 2);
		const { x } = peakOf(f, 0, f(0), 0.5, f(0.5), 2, f(2), 1e-9);
		expect(Math.abs(x - 0.7)).toBeLessThan(3e-8);
		// Three evaluations above were the caller's; the vertex is then exact at once.
		expect(f.calls - 3).toBeLessThan(6);
	});

	it('returns the end of the interval when f rises all the way to it', () => {
		expect(peakOf((x) => x, 0.5, 0.5, 0.5, 0.5, 1, 1, 1e-9).x).toBeGreaterThan(1 - 1e-7);
		expect(peakOf((x) => -x, 0.5, -0.5, 0.5, -0.5, 1, -1, 1e-9).x).toBe(0.5);
	});
});
