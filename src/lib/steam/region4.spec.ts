import { describe, expect, it } from 'vitest';
import {
	P_SAT_13,
	P_SAT_MIN,
	psat,
	saturationPressure,
	saturationTemperature,
	tsat
} from './region4';

describe('saturation line (IF97 eqs. 30, 31)', () => {
	it('eq. 31 inverts eq. 30 across the whole line', () => {
		for (let T = 273.15; T <= 647.096; T += 0.25) {
			expect(Math.abs(tsat(psat(T)) / T - 1)).toBeLessThan(1e-13);
		}
	});

	it('pressure rises with temperature', () => {
		let last = 0;
		for (let T = 273.15; T <= 647.096; T += 0.5) {
			const p = saturationPressure(T);
			expect(p).toBeGreaterThan(last);
			last = p;
		}
	});

	it('starts at 611.212677 Pa at 273.15 K (IAPWS R7-97(2012) text on eq. 30, from memory)', () => {
		expect(P_SAT_MIN * 1e6).toBeCloseTo(611.212677, 5);
		expect(saturationTemperature(P_SAT_MIN)).toBeCloseTo(273.15, 9);
	});

	it('meets the critical point, 647.096 K and 22.064 MPa (IAPWS R7-97(2012) eqs. 2, 3)', () => {
		expect(Math.abs(saturationPressure(647.096) / 22.064 - 1)).toBeLessThan(1e-9);
		expect(Math.abs(saturationTemperature(22.064) / 647.096 - 1)).toBeLessThan(1e-9);
	});

	it('gives 16.529 MPa at 623.15 K, where regions 1 and 2 hand over to region 3', () => {
		// 16.5291643 MPa is the B23 value at 623.15 K, IAPWS R7-97(2012) eq. 5 check value (pub).
		expect(P_SAT_13).toBeCloseTo(16.5291643, 6);
	});
});
