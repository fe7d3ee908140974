import { describe, expect, it } from 'vitest';
import { flatSurfaceHeatLoss } from '../heat/flat-surface';
import { insulatedFlatSurfaceHeatLoss } from './flat-insulation';

const base = {
	height: 2,
	processTemperature: 453.15,
	jacketEmissivity: 0.1,
	ambientTemperature: 293.15,
	windSpeed: 1
};

describe('insulatedFlatSurfaceHeatLoss', () => {
	it('balances conduction through a constant-k layer with the jacket loss', () => {
		const k = 0.05;
		const t = 0.05;
		const result = insulatedFlatSurfaceHeatLoss({
			...base,
			layers: [{ thickness: t, material: { conductivity: k } }]
		});
		const conduction = (k * (base.processTemperature - result.surfaceTemperature)) / t;
		expect(result.total).toBeCloseTo(conduction, 6);
		const surface = flatSurfaceHeatLoss({
			height: base.height,
			surfaceTemperature: result.surfaceTemperature,
			ambientTemperature: base.ambientTemperature,
			windSpeed: base.windSpeed,
			emissivity: base.jacketEmissivity
		}).total;
		expect(result.total).toBeCloseTo(surface, 6);
	});

	it('treats two half layers of one material as one layer', () => {
		const one = insulatedFlatSurfaceHeatLoss({
			...base,
			layers: [{ thickness: 0.08, material: 'mineral-wool' }]
		});
		const two = insulatedFlatSurfaceHeatLoss({
			...base,
			layers: [
				{ thickness: 0.04, material: 'mineral-wool' },
				{ thickness: 0.04, material: 'mineral-wool' }
			]
		});
		expect(two.total).toBeCloseTo(one.total, 6);
		expect(two.surfaceTemperature).toBeCloseTo(one.surfaceTemperature, 6);
	});

	it('cuts the bare loss by far more than half with 50 mm of mineral wool', () => {
		const bare = flatSurfaceHeatLoss({
			...base,
			surfaceTemperature: base.processTemperature,
			emissivity: 0.9
		}).total;
		const covered = insulatedFlatSurfaceHeatLoss({
			...base,
			layers: [{ thickness: 0.05, material: 'mineral-wool' }]
		});
		// US DOE steam fact sheet on insulation: insulation typically cuts losses by about 90 %.
		expect(covered.total / bare).toBeLessThan(0.15);
		expect(covered.surfaceTemperature).toBeGreaterThan(base.ambientTemperature);
	});

	it('refuses a material above its maximum use temperature', () => {
		expect(() =>
			insulatedFlatSurfaceHeatLoss({
				...base,
				processTemperature: 900,
				layers: [{ thickness: 0.05, material: 'cellular-glass' }]
			})
		).toThrow(/above its maximum use temperature/);
	});
});
