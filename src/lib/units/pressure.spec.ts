import { describe, expect, it } from 'vitest';
import { atmosphericPressureAtElevation } from './atmosphere';
import { PSI_PA, STANDARD_ATMOSPHERE_MPA } from './constants';
import { convert, fromBase, toBase } from './convert';

const PSI_MPA = PSI_PA / 1e6;

describe('gauge and absolute pressure', () => {
	it('0 psig at the standard atmosphere is 14.696 psia (101 325 Pa ÷ 6 894.757 Pa/psi, NIST SP 811 B.8)', () => {
		expect(convert(0, 'psig', 'psia')).toBeCloseTo(14.695948775513, 11);
		expect(toBase('pressure', 0, 'bar_g')).toBe(STANDARD_ATMOSPHERE_MPA);
		expect(convert(0, 'kPa_g', 'kPa_a')).toBeCloseTo(101.325, 12);
	});

	it('reads gauge units against a non-standard atmosphere', () => {
		const ctx = { atmosphericPressure: 0.0899 }; // a site near 1000 m (invented for the test)
		expect(toBase('pressure', 10, 'bar_g', ctx)).toBeCloseTo(1.0899, 14);
		expect(fromBase('pressure', 1.0899, 'bar_g', ctx)).toBeCloseTo(10, 13);
		expect(toBase('pressure', 50, 'kPa_g', ctx)).toBeCloseTo(0.1399, 14);
		expect(convert(0, 'psig', 'psia', ctx)).toBeCloseTo(0.0899 / PSI_MPA, 12);
		// The same gauge reading is a lower absolute pressure up the hill than at sea level.
		const atSea = toBase('pressure', 150, 'psig');
		const upHill = toBase('pressure', 150, 'psig', ctx);
		expect(atSea - upHill).toBeCloseTo(STANDARD_ATMOSPHERE_MPA - 0.0899, 14);
	});

	it('absolute units ignore the atmosphere', () => {
		const ctx = { atmosphericPressure: 0.08 };
		expect(toBase('pressure', 10, 'bar_a', ctx)).toBeCloseTo(1, 15);
		expect(toBase('pressure', 145, 'psia', ctx)).toBe(toBase('pressure', 145, 'psia'));
		expect(convert(1, 'MPa', 'kPa_a', ctx)).toBeCloseTo(1000, 12);
	});

	it('gauge-to-gauge conversion does not depend on the atmosphere', () => {
		for (const atmosphericPressure of [0.06, 0.0899, STANDARD_ATMOSPHERE_MPA, 0.106]) {
			// 100 psi × 6 894.757 Pa/psi = 6.894 757 bar (NIST SP 811 B.8)
			expect(convert(100, 'psig', 'bar_g', { atmosphericPressure })).toBeCloseTo(6.894757293, 9);
		}
	});

	it('works with the standard-atmosphere helper', () => {
		const atmosphericPressure = atmosphericPressureAtElevation(1500);
		const p = toBase('pressure', 7, 'bar_g', { atmosphericPressure });
		expect(p).toBeCloseTo(0.7 + atmosphericPressure, 14);
		expect(fromBase('pressure', p, 'bar_g', { atmosphericPressure })).toBeCloseTo(7, 13);
	});

	it('full vacuum on a gauge is exactly zero absolute, not a rounding error below it', () => {
		expect(toBase('pressure', -1.01325, 'bar_g')).toBe(0);
		expect(toBase('pressure', -101.325, 'kPa_g')).toBe(0);
		expect(toBase('pressure', -0.75, 'bar_g', { atmosphericPressure: 0.075 })).toBe(0);
	});
});

describe('pressure errors', () => {
	it('rejects absolute pressure below zero, naming value and unit', () => {
		expect(() => toBase('pressure', -2, 'bar_g')).toThrow(
			'pressure -2 bar g is below zero absolute (atmospheric pressure 0.101325 MPa)'
		);
		expect(() => toBase('pressure', -0.5, 'psia')).toThrow(
			/pressure -0.5 psia is below absolute zero/
		);
		expect(() => toBase('pressure', -15, 'psig')).toThrow(/-15 psig is below zero absolute/);
		expect(() => fromBase('pressure', -0.1, 'psig')).toThrow(
			/-0.1 MPa a is below absolute zero.*psig/
		);
		expect(() => convert(-1, 'kPa_a', 'bar_a')).toThrow(/-1 kPa a/);
	});

	it('accepts a gauge reading just above full vacuum at a high site', () => {
		const ctx = { atmosphericPressure: 0.07 };
		expect(toBase('pressure', -0.69, 'bar_g', ctx)).toBeCloseTo(0.001, 14);
		expect(() => toBase('pressure', -0.71, 'bar_g', ctx)).toThrow(/below zero absolute/);
	});

	it('rejects an atmospheric pressure given in the wrong unit or not finite', () => {
		for (const atmosphericPressure of [101.325, 1.01325, 101325, 0, -0.1, NaN, Infinity]) {
			expect(() => toBase('pressure', 1, 'bar_g', { atmosphericPressure })).toThrow(
				/Atmospheric pressure .* MPa is outside 0.02 to 0.15 MPa/
			);
			expect(() => fromBase('pressure', 1, 'psig', { atmosphericPressure })).toThrow(
				/Atmospheric pressure/
			);
		}
	});
});
