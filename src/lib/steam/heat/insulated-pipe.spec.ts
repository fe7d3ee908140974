import { describe, expect, it } from 'vitest';
import { barePipeHeatLoss } from './bare-pipe';
import { type InsulatedPipeInput, insulatedPipeHeatLoss } from './insulated-pipe';
import { conductivityIntegral, materialData } from './insulation-materials';
import { SteamRangeError } from '../errors';

// An NPS 4 line at 185 °C (about 10 bar g) with 50 mm of mineral wool; numbers for the specs only.
const base: InsulatedPipeInput = {
	outerDiameter: 0.1143,
	processTemperature: 458.15,
	layers: [{ thickness: 0.05, material: 'mineral-wool' }],
	jacketEmissivity: 0.1,
	ambientTemperature: 293.15,
	windSpeed: 0
};
const solve = (change: Partial<InsulatedPipeInput>) =>
	insulatedPipeHeatLoss({ ...base, ...change });

describe('insulatedPipeHeatLoss', () => {
	it('puts the jacket between ambient and process temperature, converging quickly', () => {
		const r = solve({});
		expect(r.surfaceTemperature).toBeGreaterThan(293.15);
		expect(r.surfaceTemperature).toBeLessThan(458.15);
		expect(r.iterations).toBeLessThan(30);
		expect(r.jacketDiameter).toBeCloseTo(0.2143, 12);
		expect(r.interfaceTemperatures).toEqual([]);
	});

	it('balances conduction through each layer with the loss from the jacket', () => {
		const r = solve({
			layers: [
				{ thickness: 0.04, material: 'calcium-silicate' },
				{ thickness: 0.03, material: 'mineral-wool' }
			],
			windSpeed: 4,
			jacketEmissivity: 0.9
		});
		const radii = [0.05715, 0.09715, 0.12715];
		const temperatures = [458.15, ...r.interfaceTemperatures, r.surfaceTemperature];
		const materials = [materialData('calcium-silicate'), materialData('mineral-wool')];
		materials.forEach((data, i) => {
			const conducted =
				(2 * Math.PI * conductivityIntegral(data, temperatures[i + 1], temperatures[i])) /
				Math.log(radii[i + 1] / radii[i]);
			expect(conducted / r.total - 1).toBeCloseTo(0, 9);
		});
		const jacket = barePipeHeatLoss({
			outerDiameter: 0.2543,
			surfaceTemperature: r.surfaceTemperature,
			ambientTemperature: 293.15,
			windSpeed: 4,
			emissivity: 0.9
		});
		expect(jacket.total / r.total - 1).toBeCloseTo(0, 9);
		expect(r.convection + r.radiation).toBeCloseTo(r.total, 9);
		expect(r.interfaceTemperatures[0]).toBeLessThan(458.15);
		expect(r.interfaceTemperatures[0]).toBeGreaterThan(r.surfaceTemperature);
	});

	it('gives the same answer for one layer as for the same material split in two', () => {
		const one = solve({ layers: [{ thickness: 0.06, material: 'cellular-glass' }] });
		const two = solve({
			layers: [
				{ thickness: 0.025, material: 'cellular-glass' },
				{ thickness: 0.035, material: 'cellular-glass' }
			]
		});
		expect(two.total / one.total - 1).toBeCloseTo(0, 9);
		expect(two.surfaceTemperature).toBeCloseTo(one.surfaceTemperature, 7);
	});

	it('loses less, with a cooler jacket, as the insulation thickens', () => {
		let previous = solve({ layers: [{ thickness: 0.01, material: 'mineral-wool' }] });
		for (const thickness of [0.025, 0.05, 0.1, 0.2]) {
			const r = solve({ layers: [{ thickness, material: 'mineral-wool' }] });
			expect(r.total).toBeLessThan(previous.total);
			expect(r.surfaceTemperature).toBeLessThan(previous.surfaceTemperature);
			previous = r;
		}
	});

	it('loses more the hotter the process and the better the insulation conducts', () => {
		expect(solve({ processTemperature: 500 }).total).toBeGreaterThan(solve({}).total);
		const low = solve({ layers: [{ thickness: 0.05, material: { conductivity: 0.03 } }] });
		const high = solve({ layers: [{ thickness: 0.05, material: { conductivity: 0.06 } }] });
		expect(high.total).toBeGreaterThan(low.total);
	});

	it('reports each layer’s mean conductivity over its own temperature span', () => {
		const r = solve({ layers: [{ thickness: 0.05, material: { conductivity: 0.042 } }] });
		expect(r.layerConductivities[0]).toBeCloseTo(0.042, 12);
	});

	it('throws when a layer’s hot face exceeds its maximum use temperature', () => {
		// Cellular glass: 800 °F (699.8 K) maximum, ASTM C552.
		expect(() =>
			solve({ processTemperature: 720, layers: [{ thickness: 0.05, material: 'cellular-glass' }] })
		).toThrow(/hot-face temperature of layers\[0\].*699.82 K/);
		// A thin calcium silicate inner layer leaves the cellular glass over it too hot...
		const outerTooHot = {
			processTemperature: 900,
			layers: [
				{ thickness: 0.01, material: 'calcium-silicate' as const },
				{ thickness: 0.05, material: 'cellular-glass' as const }
			]
		};
		expect(() => solve(outerTooHot)).toThrow(/layers\[1\]/);
		// ...a thick one protects it.
		const r = solve({
			...outerTooHot,
			layers: [{ thickness: 0.08, material: 'calcium-silicate' }, outerTooHot.layers[1]]
		});
		expect(r.interfaceTemperatures[0]).toBeLessThan(699.82);
		// A custom limit is honoured too.
		expect(() =>
			solve({
				layers: [{ thickness: 0.05, material: { conductivity: 0.04, maxServiceTemperature: 400 } }]
			})
		).toThrow(SteamRangeError);
	});

	it('refuses bad input with the quantity named', () => {
		expect(() => solve({ layers: [] })).toThrow(/layers \(count\) = 0/);
		expect(() => solve({ layers: [{ thickness: 0, material: 'mineral-wool' }] })).toThrow(
			/layers\[0\].thickness = 0/
		);
		expect(() => solve({ layers: [{ thickness: -0.02, material: 'mineral-wool' }] })).toThrow(
			SteamRangeError
		);
		expect(() => solve({ processTemperature: 280 })).toThrow(/processTemperature = 280/);
		expect(() => solve({ jacketEmissivity: 0 })).toThrow(/jacketEmissivity = 0/);
		expect(() => solve({ outerDiameter: -1 })).toThrow(/outerDiameter = -1/);
		expect(() => solve({ windSpeed: NaN })).toThrow(/windSpeed = NaN/);
	});
});
