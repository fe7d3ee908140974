import { describe, expect, it } from 'vitest';
import { b23Pressure, b23Temperature } from './b23';
import { psat } from './region4';

describe('B23 boundary (IF97 eqs. 5, 6)', () => {
	it('eq. 6 inverts eq. 5 along the whole line', () => {
		for (let T = 623.15; T <= 863.15; T += 0.5) {
			expect(Math.abs(b23Temperature(b23Pressure(T)) / T - 1)).toBeLessThan(1e-12);
		}
	});

	it('starts on the saturation line at 623.15 K', () => {
		expect(Math.abs(b23Pressure(623.15) / psat(623.15) - 1)).toBeLessThan(1e-9);
	});

	it('ends at 863.15 K and 100 MPa (IAPWS R7-97(2012) fig. 1, from memory)', () => {
		expect(b23Temperature(100)).toBeCloseTo(863.15, 6);
	});
});
