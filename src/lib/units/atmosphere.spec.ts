import { describe, expect, it } from 'vitest';
import { atmosphericPressureAtElevation } from './atmosphere';
import { UnitError } from './errors';

// Published table values are checked in tests/reference/units-atmosphere.spec.ts; these are
// the formula's own properties.
describe('atmosphericPressureAtElevation', () => {
	it('is the standard atmosphere, 0.101325 MPa, at sea level (NIST SP 811 B.8)', () => {
		expect(atmosphericPressureAtElevation(0)).toBe(0.101325);
	});

	it('falls steadily with elevation and rises below sea level', () => {
		let previous = Infinity;
		for (let z = -5000; z <= 11_000; z += 250) {
			const p = atmosphericPressureAtElevation(z);
			expect(p).toBeLessThan(previous);
			previous = p;
		}
		expect(atmosphericPressureAtElevation(-430)).toBeGreaterThan(0.101325);
	});

	it('returns MPa, not kPa or Pa', () => {
		const p = atmosphericPressureAtElevation(2000);
		expect(p).toBeGreaterThan(0.07);
		expect(p).toBeLessThan(0.09);
	});

	it('rejects elevations outside the troposphere layer, or not finite', () => {
		for (const bad of [-5001, 11_001, NaN, Infinity, -Infinity]) {
			expect(() => atmosphericPressureAtElevation(bad)).toThrow(UnitError);
		}
		expect(() => atmosphericPressureAtElevation(12_000)).toThrow(
			'Elevation 12000 m is outside -5000 to 11000 m (the standard atmosphere troposphere)'
		);
		expect(() => atmosphericPressureAtElevation(NaN)).toThrow(/NaN \(not a finite number\) m/);
	});
});
