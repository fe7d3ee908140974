import { describe, expect, it } from 'vitest';
import { AIR_TABLE_A15 } from './air-properties-table';
import { AIR_T_MAX, AIR_T_MIN, airProperties, filmProperties } from './air-properties';
import { SteamRangeError } from '../errors';

describe('air-property table (Çengel & Ghajar Table A-15)', () => {
	// These checks are what guard the rows above 160 °C, which are from memory: a wrong digit in
	// any column breaks one of the identities below.
	it.each(AIR_TABLE_A15.map((row) => [row[0], row] as const))(
		'row %s °C is self-consistent: ν = μ/ρ, Pr = μ·cp/k, ρ = p/(R·T)',
		(_celsius, [celsius, rho, cp, k, mu, nu, pr]) => {
			expect(Math.abs(mu / rho / nu - 1)).toBeLessThan(0.005);
			expect(Math.abs((mu * cp) / k / pr - 1)).toBeLessThan(0.005);
			// Ideal gas at 101 325 Pa with R = 287.05 J/(kg K) (common practice for dry air).
			expect(Math.abs(101325 / (287.05 * (celsius + 273.15)) / rho - 1)).toBeLessThan(0.006);
		}
	);

	it.each(AIR_TABLE_A15.map((row) => [row[0], row] as const))(
		'row %s °C follows Sutherland’s law within 2% (μ₀ = 1.716e-5 Pa s, S = 110.4 K; White, Viscous Fluid Flow, from memory)',
		(_celsius, [celsius, , , , mu]) => {
			const T = celsius + 273.15;
			const sutherland = 1.716e-5 * (T / 273.15) ** 1.5 * ((273.15 + 110.4) / (T + 110.4));
			expect(Math.abs(mu / sutherland - 1)).toBeLessThan(0.02);
		}
	);

	it('rows are in ascending temperature with k and ν rising', () => {
		for (let i = 1; i < AIR_TABLE_A15.length; i++) {
			expect(AIR_TABLE_A15[i][0]).toBeGreaterThan(AIR_TABLE_A15[i - 1][0]);
			expect(AIR_TABLE_A15[i][3]).toBeGreaterThan(AIR_TABLE_A15[i - 1][3]);
			expect(AIR_TABLE_A15[i][5]).toBeGreaterThan(AIR_TABLE_A15[i - 1][5]);
		}
	});
});

describe('airProperties', () => {
	it('returns a table row exactly at its temperature', () => {
		const air = airProperties(45 + 273.15);
		expect(air.thermalConductivity).toBeCloseTo(0.02699, 12);
		expect(air.kinematicViscosity).toBeCloseTo(1.75e-5, 15);
		expect(air.prandtlNumber).toBeCloseTo(0.7241, 12);
		expect(air.expansionCoefficient).toBe(1 / 318.15);
	});

	it('interpolates linearly between rows', () => {
		const air = airProperties(55 + 273.15);
		expect(air.thermalConductivity).toBeCloseTo((0.02735 + 0.02808) / 2, 12);
		expect(air.kinematicViscosity).toBeCloseTo((1.798e-5 + 1.896e-5) / 2, 15);
	});

	it('covers the table ends and refuses temperatures outside them', () => {
		expect(airProperties(AIR_T_MIN).prandtlNumber).toBeCloseTo(0.744, 12);
		expect(airProperties(AIR_T_MAX).thermalConductivity).toBeCloseTo(0.05572, 12);
		expect(() => airProperties(AIR_T_MIN - 0.01)).toThrow(SteamRangeError);
		expect(() => airProperties(AIR_T_MAX + 0.01)).toThrow(/air temperature/);
		expect(() => airProperties(NaN)).toThrow(/not a finite number/);
	});

	it('takes film properties at the mean of surface and ambient', () => {
		expect(filmProperties(343.15, 293.15).temperature).toBeCloseTo(318.15, 12);
	});
});
