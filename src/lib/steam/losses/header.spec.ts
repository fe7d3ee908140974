import { describe, expect, it } from 'vitest';
import { saturationTemperature } from '../region4';
import { saturatedVapour } from '../saturation';
import { readHeader, SATURATION_TOLERANCE } from './header';

describe('readHeader', () => {
	const p = 1.1;
	const Ts = saturationTemperature(p);

	it('takes a pressure-only reading as dry saturated', () => {
		const reading = readHeader(p);
		expect(reading.condition).toBe('pressure-only');
		expect(reading.superheat).toBeNull();
		expect(reading.enthalpy).toBe(saturatedVapour(p).h);
	});

	it('uses the stated tolerance of 3 K', () => {
		expect(SATURATION_TOLERANCE.value).toBe(3);
		expect(readHeader(p, Ts + 2).condition).toBe('at-saturation');
		expect(readHeader(p, Ts + 2, 1).condition).toBe('superheated');
	});

	it('flags readings below saturation as instrument or condensate trouble', () => {
		const reading = readHeader(p, Ts - 10);
		expect(reading.condition).toBe('below-saturation');
		expect(reading.note).toMatch(/^Reads 10.0 K below saturation/);
	});

	it('refuses nonsense', () => {
		expect(() => readHeader(-1)).toThrow('Header pressure must be greater than 0 MPa, got -1');
		expect(() => readHeader(1, NaN)).toThrow('Header temperature must be a finite number of K');
	});
});
