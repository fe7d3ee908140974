import { describe, expect, it } from 'vitest';
import { barePipeHeatLoss, type BarePipeInput } from './bare-pipe';
import { STEFAN_BOLTZMANN } from './constants';
import { SteamRangeError } from '../errors';

// A 4-inch (114.3 mm OD) line at about 10 bar g in a 20 °C plant room; numbers for the specs only.
const base: BarePipeInput = {
	outerDiameter: 0.1143,
	surfaceTemperature: 453.15,
	ambientTemperature: 293.15,
	windSpeed: 0,
	emissivity: 0.8
};
const loss = (change: Partial<BarePipeInput>) => barePipeHeatLoss({ ...base, ...change });

describe('barePipeHeatLoss', () => {
	it('splits the total into convection and grey-body radiation', () => {
		const r = loss({});
		expect(r.total).toBeCloseTo(r.convection + r.radiation, 10);
		const radiation = 0.8 * STEFAN_BOLTZMANN * (453.15 ** 4 - 293.15 ** 4) * Math.PI * 0.1143;
		expect(r.radiation).toBeCloseTo(radiation, 10);
		expect(r.convection).toBeCloseTo(r.convectionCoefficient * Math.PI * 0.1143 * 160, 10);
	});

	it('uses natural convection alone in still air and mixes in wind', () => {
		const still = loss({});
		expect(still.nusselt.forced).toBe(0);
		expect(still.nusselt.combined).toBeCloseTo(still.nusselt.natural, 12);
		const windy = loss({ windSpeed: 3 });
		expect(windy.nusselt.combined).toBeGreaterThan(windy.nusselt.forced);
		expect(windy.nusselt.forced).toBeGreaterThan(windy.nusselt.natural);
	});

	it('loses nothing at the ambient temperature', () => {
		const r = loss({ surfaceTemperature: 293.15 });
		expect(r.total).toBe(0);
	});

	it('loses more the hotter, the windier, the larger and the more emissive the pipe', () => {
		const rising = (values: number[], key: keyof BarePipeInput) => {
			const totals = values.map((v) => loss({ [key]: v }).total);
			for (let i = 1; i < totals.length; i++) expect(totals[i]).toBeGreaterThan(totals[i - 1]);
		};
		rising([300, 350, 400, 500, 700, 900], 'surfaceTemperature');
		rising([0, 0.5, 1, 2, 5, 10, 20, 35], 'windSpeed');
		rising([0.0213, 0.0603, 0.1143, 0.2191, 0.61, 2], 'outerDiameter');
		rising([0.05, 0.3, 0.8, 1], 'emissivity');
	});

	it('refuses bad input with the quantity, value and valid range', () => {
		const bad: [Partial<BarePipeInput>, RegExp][] = [
			[{ outerDiameter: -0.1 }, /outerDiameter = -0.1 .*greater than 0/],
			[{ outerDiameter: 0 }, /outerDiameter = 0 /],
			[{ outerDiameter: NaN }, /outerDiameter = NaN \(not a finite number\)/],
			[{ emissivity: 0 }, /emissivity = 0 .*greater than 0 and at most 1/],
			[{ emissivity: 1.2 }, /emissivity = 1.2/],
			[{ windSpeed: -1 }, /windSpeed = -1 .*0 to 35 m\/s/],
			[{ windSpeed: Infinity }, /windSpeed = Infinity/],
			[{ surfaceTemperature: 290 }, /surfaceTemperature = 290 .*not below the ambient/],
			[{ surfaceTemperature: 1500 }, /surfaceTemperature = 1500/],
			[{ ambientTemperature: 200 }, /ambientTemperature = 200 .*223.15 to 333.15 K/]
		];
		for (const [change, message] of bad) {
			expect(() => loss(change)).toThrow(SteamRangeError);
			expect(() => loss(change)).toThrow(message);
		}
	});
});
