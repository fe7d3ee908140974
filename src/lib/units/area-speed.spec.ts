import { describe, expect, it } from 'vitest';
import { convert, fromBase, toBase } from './convert';
import { formatQuantity } from './format';
import { displayUnit, unitLabel } from './systems';

/** Relative closeness for values through floating-point factors. */
function expectClose(actual: number, expected: number, rel = 1e-14) {
	expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThanOrEqual(rel);
}

// Every factor here is exact by definition (NIST SP 811, 2008, Appendix B.8).
describe('area', () => {
	it('ft² = 0.092 903 04 m² and in² = 6.4516 E-04 m²', () => {
		expectClose(toBase('area', 1, 'ft2'), 0.09290304);
		expectClose(toBase('area', 1, 'in2'), 6.4516e-4);
		expectClose(convert(1, 'ft2', 'in2'), 144);
		expectClose(convert(10, 'm2', 'ft2'), 10 / 0.09290304);
	});

	it('is shown in m² (SI) and ft² (US)', () => {
		expect(unitLabel(displayUnit('area', 'SI'))).toBe('m²');
		expect(unitLabel(displayUnit('area', 'US'))).toBe('ft²');
		expect(formatQuantity(2.5, 'area', 'SI')).toBe('2.5 m²');
		// 2.5 m² ÷ 0.092 903 04 = 26.909… ft²
		expect(formatQuantity(2.5, 'area', 'US')).toBe('26.9 ft²');
	});
});

describe('speed (wind)', () => {
	it('mph = 0.447 04 m/s, km/h = 1/3.6 m/s, ft/s = 0.3048 m/s', () => {
		expectClose(toBase('speed', 1, 'mph'), 0.44704);
		expectClose(toBase('speed', 36, 'km/h'), 10);
		expectClose(toBase('speed', 1, 'ft/s'), 0.3048);
		// 60 mph = 88 ft/s (5280 ft per mile, 60 min per hour)
		expectClose(convert(60, 'mph', 'ft/s'), 88);
	});

	it('is shown in m/s (SI) and mph (US)', () => {
		expect(displayUnit('speed', 'SI')).toBe('m/s');
		expect(displayUnit('speed', 'US')).toBe('mph');
		expect(formatQuantity(4.4704, 'speed', 'US')).toBe('10 mph');
		expect(fromBase('speed', 0, 'mph')).toBe(0);
	});

	it('a speed is not an area or a length', () => {
		// @ts-expect-error speed cannot be converted to area
		expect(() => convert(1, 'mph', 'm2')).toThrow(/different quantities/);
		// @ts-expect-error a length unit is not a speed unit
		expect(() => toBase('speed', 1, 'm')).toThrow(/Unknown speed unit "m"/);
	});
});
