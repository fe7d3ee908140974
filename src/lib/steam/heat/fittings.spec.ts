import { describe, expect, it } from 'vitest';
import { barePipeHeatLoss } from './bare-pipe';
import { FITTING_EQUIVALENT_LENGTH, type FittingInput, fittingHeatLoss } from './fittings';
import { insulatedPipeHeatLoss } from './insulated-pipe';
import { SteamRangeError } from '../errors';

// An NPS 6 gate valve at 185 °C in a 20 °C plant room; numbers for the specs only.
const base: FittingInput = {
	kind: 'valve',
	nps: 6,
	processTemperature: 458.15,
	ambientTemperature: 293.15,
	windSpeed: 0,
	emissivity: 0.8
};
const pipe = barePipeHeatLoss({
	outerDiameter: 0.1683,
	surfaceTemperature: 458.15,
	ambientTemperature: 293.15,
	windSpeed: 0,
	emissivity: 0.8
}).total;

describe('fittingHeatLoss', () => {
	it('is the pipe’s loss per metre times the equivalent length, times the count', () => {
		const one = fittingHeatLoss(base);
		expect(one.perFitting).toBeCloseTo(pipe * FITTING_EQUIVALENT_LENGTH.valve.length, 9);
		expect(one.total).toBe(one.perFitting);
		expect(one.surfaceTemperature).toBe(458.15);
		expect(one.source).toMatch(/common practice/);
		const flanges = fittingHeatLoss({ ...base, kind: 'flange-pair', count: 4 });
		expect(flanges.total).toBeCloseTo(4 * pipe * 0.5, 9);
	});

	it('turns an entered surface area into an equivalent length (ASTM C1129 approach)', () => {
		const r = fittingHeatLoss({ ...base, surfaceArea: 0.6 });
		expect(r.equivalentLength).toBeCloseTo(0.6 / (Math.PI * 0.1683), 12);
		expect(r.perFitting).toBeCloseTo(pipe * r.equivalentLength, 9);
		expect(r.source).toMatch(/C1129/);
		expect(fittingHeatLoss({ ...base, equivalentLength: 2 }).perFitting).toBeCloseTo(2 * pipe, 9);
	});

	it('with a removable cover loses as the same length of insulated pipe, far less than bare', () => {
		const layers = [{ thickness: 0.05, material: 'mineral-wool' as const }];
		const covered = fittingHeatLoss({ ...base, insulation: { layers, jacketEmissivity: 0.9 } });
		const perMetre = insulatedPipeHeatLoss({
			outerDiameter: 0.1683,
			processTemperature: 458.15,
			layers,
			jacketEmissivity: 0.9,
			ambientTemperature: 293.15,
			windSpeed: 0
		});
		expect(covered.perFitting).toBeCloseTo(perMetre.total * 1.2, 9);
		expect(covered.surfaceTemperature).toBeCloseTo(perMetre.surfaceTemperature, 9);
		expect(covered.total).toBeLessThan(0.2 * fittingHeatLoss(base).total);
	});

	it('refuses bad input', () => {
		expect(() => fittingHeatLoss({ ...base, count: 0 })).toThrow(/count = 0/);
		expect(() => fittingHeatLoss({ ...base, count: 1.5 })).toThrow(SteamRangeError);
		expect(() => fittingHeatLoss({ ...base, surfaceArea: -1 })).toThrow(/surfaceArea = -1/);
		expect(() => fittingHeatLoss({ ...base, surfaceArea: 1, equivalentLength: 1 })).toThrow(
			/not both/
		);
		expect(() => fittingHeatLoss({ ...base, kind: 'elbow' as 'valve' })).toThrow(
			/Unknown fitting kind "elbow"/
		);
		expect(() => fittingHeatLoss({ ...base, nps: undefined })).toThrow(/exactly one/);
		expect(() => fittingHeatLoss({ ...base, emissivity: 2 })).toThrow(/emissivity = 2/);
	});
});
