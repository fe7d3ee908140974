/**
 * Flash steam fraction and header-reading logic against steam-table values from Debian's
 * python3-iapws 1.5.2 (tests/reference/losses_points.py).
 */
import { describe, expect, it } from 'vitest';
import { flashSteamFraction, readHeader } from '../../src/lib/steam/losses/index';

const PSI_MPA = (0.45359237 * 9.80665) / 0.0254 ** 2 / 1e6; // NIST SP 811, exact
const psig = (p: number) => (p + 14.696) * PSI_MPA;

describe('flash steam fraction', () => {
	// (lib) python3-iapws: x = (h'(p_high) − h'(p_low)) / (h''(p_low) − h'(p_low)).
	const cases: [number, number, number][] = [
		[100, 0, 0.132915], // (lib) python3-iapws: 100 psig → 0 psig ≈ 13.29 %
		[150, 15, 0.127136],
		[15, 0, 0.039376],
		[250, 50, 0.125351]
	];
	it.each(cases)('%i psig → %i psig flashes %f', (hi, lo, x) => {
		// Both are IF97; 1e-6 is the printed rounding.
		expect(flashSteamFraction({ pHigh: psig(hi), pLow: psig(lo) }).fraction).toBeCloseTo(x, 6);
	});
});

describe('header readings', () => {
	// (lib) python3-iapws: p MPa → T_sat K, h'' kJ/kg, and h(p, T) for a superheated reading.
	it('1.1 MPa at 500 K: T_sat 457.219676 K, superheated 42.78 K, h = 2886.7196 kJ/kg', () => {
		const reading = readHeader(1.1, 500);
		expect(reading.saturationTemperature).toBeCloseTo(457.219676, 5);
		expect(reading.condition).toBe('superheated');
		expect(reading.superheat).toBeCloseTo(500 - 457.219676, 5);
		expect(reading.enthalpy).toBeCloseTo(2886.7196, 3);
	});

	it('4.0 MPa at 673.15 K: T_sat 523.507519 K, h = 3214.3735 kJ/kg', () => {
		const reading = readHeader(4.0, 673.15);
		expect(reading.saturationTemperature).toBeCloseTo(523.507519, 5);
		expect(reading.enthalpy).toBeCloseTo(3214.3735, 3);
	});

	it('0.3 MPa read 1 K above T_sat (406.675358 K) is "at saturation", h = h″ = 2724.8917 kJ/kg', () => {
		const reading = readHeader(0.3, 406.675358 + 1);
		expect(reading.condition).toBe('at-saturation');
		expect(reading.enthalpy).toBeCloseTo(2724.8917, 3);
		expect(reading.note).toContain('possibly wet');
	});

	it('the band edge: 3 K above saturation is still at saturation, 3.1 K is superheat', () => {
		expect(readHeader(0.3, 406.675358 + 2.99).condition).toBe('at-saturation');
		expect(readHeader(0.3, 406.675358 + 3.1).condition).toBe('superheated');
		expect(readHeader(0.3, 406.675358 - 3.1).condition).toBe('below-saturation');
	});
});
