import { describe, expect, it } from 'vitest';
import { findRoot } from './root-finding';

describe('findRoot (Brent)', () => {
	it('finds √2 to the tolerance asked', () => {
		const result = findRoot((x) => x * x - 2, 0, 2, 1e-14);
		expect(Math.abs(result.root - Math.SQRT2)).toBeLessThan(1e-14);
		expect(result.iterations).toBeLessThan(20);
	});

	it('finds the fixed point of cos x, a transcendental equation', () => {
		const { root } = findRoot((x) => Math.cos(x) - x, 0, 1, 1e-15);
		expect(Math.cos(root)).toBeCloseTo(root, 14);
	});

	it('converges on a function flat near the root, where Newton would struggle', () => {
		const { root } = findRoot((x) => (x - 1) ** 3, -3, 10, 1e-12);
		expect(Math.abs(root - 1)).toBeLessThan(1e-4);
	});

	it('returns a bracket end that is a root', () => {
		expect(findRoot((x) => x - 3, 3, 5, 1e-12).root).toBe(3);
		expect(findRoot((x) => x - 5, 3, 5, 1e-12).root).toBe(5);
	});

	it('refuses an interval that does not bracket a root, and non-finite values', () => {
		expect(() => findRoot((x) => x * x + 1, -1, 1, 1e-9)).toThrow(/not bracketed/);
		expect(() => findRoot((x) => (x > 0.5 ? NaN : -1), 0, 1, 1e-9)).toThrow(/not finite/);
	});
});
