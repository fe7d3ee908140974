import { describe, expect, it } from 'vitest';
import {
	BTU_IN_PER_HR_FT2_F,
	MATERIALS,
	type NamedMaterial,
	conductivityAt,
	conductivityIntegral,
	materialData,
	meanConductivity
} from './insulation-materials';
import { SteamRangeError } from '../errors';

const named = Object.keys(MATERIALS) as NamedMaterial[];

describe('insulation materials', () => {
	it('converts Btu·in/(h·ft²·°F) to W/(m K) with the exact unit definitions', () => {
		// 0.1442279 W/(m K) per Btu·in/(h·ft²·°F) (common conversion factor, to 7 digits).
		expect(BTU_IN_PER_HR_FT2_F).toBeCloseTo(0.1442279, 7);
	});

	it('carries the specifications’ maximum use temperatures', () => {
		// ASTM C547 Type II and C533 Type I: 1200 °F; ASTM C552: 800 °F (the documents' scopes).
		expect(MATERIALS['mineral-wool'].maxServiceTemperature).toBeCloseTo(922.04, 2);
		expect(MATERIALS['calcium-silicate'].maxServiceTemperature).toBeCloseTo(922.04, 2);
		expect(MATERIALS['cellular-glass'].maxServiceTemperature).toBeCloseTo(699.82, 2);
	});

	it('returns the tabulated value at each tabulated mean temperature', () => {
		// ASTM C533 Type I, 0.41 Btu·in/(h·ft²·°F) at 100 °F mean (pub).
		const calsil = MATERIALS['calcium-silicate'];
		expect(conductivityAt(calsil, 310.9278)).toBeCloseTo(0.41 * BTU_IN_PER_HR_FT2_F, 6);
		// ASTM C552 Grade 6 Type II, 0.43 at 200 °F mean (NIA chart, pub).
		const glass = MATERIALS['cellular-glass'];
		expect(conductivityAt(glass, 366.4833)).toBeCloseTo(0.43 * BTU_IN_PER_HR_FT2_F, 6);
	});

	it.each(named)('%s: k never falls with temperature from 200 K to 1000 K', (name) => {
		const data = MATERIALS[name];
		let previous = 0;
		for (let T = 200; T <= 1000; T += 5) {
			const k = conductivityAt(data, T);
			expect(k).toBeGreaterThan(0);
			expect(k).toBeGreaterThanOrEqual(previous);
			previous = k;
		}
	});

	it.each(named)('%s: stays in the range of insulating solids, 0.02–0.15 W/(m K)', (name) => {
		for (const [, k] of MATERIALS[name].points) {
			expect(k).toBeGreaterThan(0.02);
			expect(k).toBeLessThan(0.15);
		}
	});

	it('integrates k(T) exactly: constant, linear and piecewise pieces', () => {
		const custom = materialData({ conductivity: 0.05 });
		expect(conductivityIntegral(custom, 300, 500)).toBeCloseTo(10, 12);
		const wool = MATERIALS['mineral-wool'];
		const [[t0, k0], [t1, k1]] = wool.points;
		// Within one linear segment the integral is the trapezoid.
		expect(conductivityIntegral(wool, t0, t1)).toBeCloseTo(((k0 + k1) / 2) * (t1 - t0), 12);
		// Additive across breakpoints and antisymmetric.
		const whole = conductivityIntegral(wool, 300, 700);
		expect(conductivityIntegral(wool, 300, 450) + conductivityIntegral(wool, 450, 700)).toBeCloseTo(
			whole,
			10
		);
		expect(conductivityIntegral(wool, 700, 300)).toBeCloseTo(-whole, 12);
		// Against a fine midpoint sum.
		let sum = 0;
		const n = 100000;
		for (let i = 0; i < n; i++)
			sum += conductivityAt(wool, 300 + ((i + 0.5) * 400) / n) * (400 / n);
		expect(whole).toBeCloseTo(sum, 6);
	});

	it('gives the mean conductivity over a span, and k itself over none', () => {
		const glass = MATERIALS['cellular-glass'];
		expect(meanConductivity(glass, 350, 350)).toBe(conductivityAt(glass, 350));
		const mean = meanConductivity(glass, 300, 600);
		expect(mean).toBeGreaterThan(conductivityAt(glass, 300));
		expect(mean).toBeLessThan(conductivityAt(glass, 600));
	});

	it('refuses unknown materials and impossible custom conductivities', () => {
		expect(() => materialData('foam' as NamedMaterial)).toThrow(
			/Unknown insulation material "foam"/
		);
		expect(() => materialData({ conductivity: 0 })).toThrow(SteamRangeError);
		expect(() => materialData({ conductivity: -0.04 })).toThrow(/conductivity = -0.04/);
		expect(() => materialData({ conductivity: NaN })).toThrow(/not a finite number/);
		expect(() => materialData({ conductivity: 0.04, maxServiceTemperature: -5 })).toThrow(
			/maxServiceTemperature/
		);
	});
});
