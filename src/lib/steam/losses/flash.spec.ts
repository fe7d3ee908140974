import { describe, expect, it } from 'vitest';
import { saturationTemperature } from '../region4';
import { flashSteamFraction } from './flash';

describe('flashSteamFraction', () => {
	it('grows with the pressure drop', () => {
		const small = flashSteamFraction({ pHigh: 0.5, pLow: 0.3 }).fraction;
		const large = flashSteamFraction({ pHigh: 1.0, pLow: 0.101325 }).fraction;
		expect(small).toBeGreaterThan(0);
		expect(large).toBeGreaterThan(small);
	});

	it('flashes less from subcooled condensate, and nothing below the low side boiling point', () => {
		const saturated = flashSteamFraction({ pHigh: 1.0, pLow: 0.101325 }).fraction;
		const subcooled = flashSteamFraction({
			pHigh: 1.0,
			pLow: 0.101325,
			condensateTemperature: 420
		}).fraction;
		expect(subcooled).toBeLessThan(saturated);
		const cold = flashSteamFraction({ pHigh: 1.0, pLow: 0.101325, condensateTemperature: 360 });
		expect(cold.fraction).toBe(0);
		expect(cold.lowSaturationTemperature).toBeCloseTo(saturationTemperature(0.101325), 12);
	});

	it('refuses a low side above the high side and condensate hotter than saturation', () => {
		expect(() => flashSteamFraction({ pHigh: 0.2, pLow: 0.3 })).toThrow(
			'The flash pressure (0.3 MPa abs) must be below the condensate pressure (0.2 MPa abs)'
		);
		expect(() => flashSteamFraction({ pHigh: 0.2, pLow: 0.1, condensateTemperature: 450 })).toThrow(
			'Condensate at 450.00 K would be steam at 0.2 MPa'
		);
		expect(() => flashSteamFraction({ pHigh: -1, pLow: 0.1 })).toThrow(
			'High pressure must be greater than 0 MPa'
		);
	});
});
