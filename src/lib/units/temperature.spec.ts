import { describe, expect, it } from 'vitest';
import { convert, fromBase, toBase } from './convert';

// Scale definitions, NIST SP 811 B.8: T/K = t/°C + 273.15 = (t/°F + 459.67)/1.8.
describe('temperature scales', () => {
	it('fixed points', () => {
		expect(toBase('temperature', 100, 'degC')).toBeCloseTo(373.15, 12);
		expect(toBase('temperature', 212, 'degF')).toBeCloseTo(373.15, 12);
		expect(toBase('temperature', 32, 'degF')).toBeCloseTo(273.15, 12);
		expect(convert(-40, 'degC', 'degF')).toBeCloseTo(-40, 12);
		expect(convert(32, 'degF', 'degC')).toBe(0);
		expect(convert(98.6, 'degF', 'degC')).toBeCloseTo(37, 12);
	});

	it('absolute zero on every scale is 0 K exactly', () => {
		expect(toBase('temperature', -273.15, 'degC')).toBe(0);
		expect(toBase('temperature', -459.67, 'degF')).toBe(0);
		expect(fromBase('temperature', 0, 'degC')).toBe(-273.15);
		expect(fromBase('temperature', 0, 'degF')).toBeCloseTo(-459.67, 12);
	});

	it('rejects temperatures below absolute zero', () => {
		expect(() => toBase('temperature', -274, 'degC')).toThrow(
			'temperature -274 °C is below absolute zero'
		);
		expect(() => toBase('temperature', -460, 'degF')).toThrow(
			'temperature -460 °F is below absolute zero'
		);
		expect(() => toBase('temperature', -1, 'K')).toThrow('temperature -1 K is below absolute zero');
		expect(() => fromBase('temperature', -0.5, 'degC')).toThrow(
			/-0.5 K is below absolute zero.*°C/
		);
		expect(() => convert(-300, 'degC', 'degF')).toThrow(/-300 °C/);
	});
});

describe('temperature differences', () => {
	it('have no offset: 10 K of difference is 10 °C and 18 °F of difference', () => {
		expect(convert(10, 'delta_K', 'delta_degF')).toBeCloseTo(18, 12);
		expect(convert(10, 'delta_degC', 'delta_K')).toBe(10);
		expect(convert(-18, 'delta_degF', 'delta_degC')).toBeCloseTo(-10, 12);
	});

	it('may be negative', () => {
		expect(toBase('temperatureDifference', -5, 'delta_degC')).toBe(-5);
	});
});
