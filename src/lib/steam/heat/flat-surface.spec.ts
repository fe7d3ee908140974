import { describe, expect, it } from 'vitest';
import { STEFAN_BOLTZMANN } from './constants';
import { flatSurfaceHeatLoss, type FlatSurfaceInput } from './flat-surface';
import { SteamRangeError } from '../errors';

// A 2 m tall condensate-tank wall at 90 °C in a 20 °C room; numbers for the specs only.
const base: FlatSurfaceInput = {
	height: 2,
	surfaceTemperature: 363.15,
	ambientTemperature: 293.15,
	windSpeed: 0,
	emissivity: 0.9
};
const loss = (change: Partial<FlatSurfaceInput>) => flatSurfaceHeatLoss({ ...base, ...change });

describe('flatSurfaceHeatLoss', () => {
	it('adds grey-body radiation to convection, per square metre', () => {
		const r = loss({});
		expect(r.total).toBeCloseTo(r.convection + r.radiation, 10);
		expect(r.radiation).toBeCloseTo(0.9 * STEFAN_BOLTZMANN * (363.15 ** 4 - 293.15 ** 4), 10);
		expect(r.convection).toBeCloseTo(r.convectionCoefficient * 70, 10);
	});

	it('gives a still-air coefficient of a few W/(m² K), as for any warm wall', () => {
		// Turbulent natural convection from a vertical wall: h ≈ 1.3·ΔT^(1/3) to 1.5·ΔT^(1/3)
		// W/(m² K) (common practice), so 5.3 to 6.2 for ΔT = 70 K.
		const h = loss({}).convectionCoefficient;
		expect(h).toBeGreaterThan(5);
		expect(h).toBeLessThan(6.5);
	});

	it('loses more with wind and with a hotter surface, nothing at ambient', () => {
		expect(loss({ windSpeed: 2 }).total).toBeGreaterThan(loss({}).total);
		expect(loss({ windSpeed: 10 }).total).toBeGreaterThan(loss({ windSpeed: 2 }).total);
		expect(loss({ surfaceTemperature: 400 }).total).toBeGreaterThan(loss({}).total);
		expect(loss({ surfaceTemperature: 293.15 }).total).toBe(0);
	});

	it('takes the wind length from the height unless given', () => {
		expect(loss({ windSpeed: 3, windLength: 2 }).total).toBe(loss({ windSpeed: 3 }).total);
		expect(loss({ windSpeed: 3, windLength: 0.5 }).total).toBeGreaterThan(
			loss({ windSpeed: 3 }).total
		);
	});

	it('refuses bad input with the quantity named', () => {
		expect(() => loss({ height: 0 })).toThrow(SteamRangeError);
		expect(() => loss({ height: -1 })).toThrow(/height = -1/);
		expect(() => loss({ windLength: 0 })).toThrow(/windLength = 0/);
		expect(() => loss({ emissivity: -0.1 })).toThrow(/emissivity/);
		expect(() => loss({ surfaceTemperature: 280 })).toThrow(/surfaceTemperature = 280/);
	});
});
