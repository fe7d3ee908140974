import { describe, expect, it } from 'vitest';
import { barePipeHeatLoss } from './bare-pipe';
import { fittingHeatLoss } from './fittings';
import { insulatedPipeHeatLoss } from './insulated-pipe';
import { type InsulationSavingInput, insulationSaving } from './insulation-saving';
import { CONTACT_BURN_THRESHOLD, HOT_SURFACE_CAUTION, INSULATE_ABOVE } from './surface-safety';

// 30 m of bare NPS 2 at 185 °C, to be lagged with 40 mm mineral wool; numbers for the specs only.
const base: InsulationSavingInput = {
	nps: 2,
	processTemperature: 458.15,
	ambientTemperature: 293.15,
	windSpeed: 1,
	bareEmissivity: 0.8,
	layers: [{ thickness: 0.04, material: 'mineral-wool' }],
	jacketEmissivity: 0.2,
	length: 30
};
const saving = (change: Partial<InsulationSavingInput>) => insulationSaving({ ...base, ...change });

describe('insulationSaving', () => {
	it('is bare loss minus insulated loss over the length', () => {
		const r = saving({});
		const conditions = { outerDiameter: 0.0603, ambientTemperature: 293.15, windSpeed: 1 };
		const bare = barePipeHeatLoss({ ...conditions, surfaceTemperature: 458.15, emissivity: 0.8 });
		const covered = insulatedPipeHeatLoss({
			...conditions,
			processTemperature: 458.15,
			layers: base.layers,
			jacketEmissivity: 0.2
		});
		expect(r.bare).toBeCloseTo(bare.total * 30, 9);
		expect(r.insulated).toBeCloseTo(covered.total * 30, 9);
		expect(r.saving).toBeCloseTo(r.bare - r.insulated, 9);
		expect(r.savingFraction).toBeCloseTo(r.saving / r.bare, 12);
		expect(r.bareSurfaceTemperature).toBe(458.15);
		expect(r.insulatedSurfaceTemperature).toBeCloseTo(covered.surfaceTemperature, 9);
	});

	it('scales with length', () => {
		expect(saving({ length: 60 }).saving).toBeCloseTo(2 * saving({}).saving, 9);
	});

	it('works for a count of fittings', () => {
		const r = saving({ length: undefined, fittings: { kind: 'flange-pair', count: 3 } });
		const conditions = {
			kind: 'flange-pair' as const,
			count: 3,
			outerDiameter: 0.0603,
			processTemperature: 458.15,
			ambientTemperature: 293.15,
			windSpeed: 1,
			emissivity: 0.8
		};
		expect(r.bare).toBeCloseTo(fittingHeatLoss(conditions).total, 9);
		expect(r.saving).toBeGreaterThan(0);
	});

	it('flags the burn risk and the caution for a hot bare surface, and clears it once lagged', () => {
		const r = saving({});
		expect(r.before).toEqual({ burnRisk: true, insulationAdvised: true });
		expect(r.after.burnRisk).toBe(false);
		expect(r.cautions).toEqual([HOT_SURFACE_CAUTION]);
		// Thresholds: 60 °C contact burn (ASTM C1055, from memory), 49 °C insulate (DOE fact sheet).
		expect(CONTACT_BURN_THRESHOLD).toBeCloseTo(333.15, 9);
		expect(INSULATE_ABOVE).toBeCloseTo(322.04, 2);
	});

	it('flags an insulated surface still too hot to touch', () => {
		const thin = saving({ layers: [{ thickness: 0.005, material: 'calcium-silicate' }] });
		expect(thin.insulatedSurfaceTemperature).toBeGreaterThan(CONTACT_BURN_THRESHOLD);
		expect(thin.after.burnRisk).toBe(true);
	});

	it('carries no caution for a lukewarm line', () => {
		const r = saving({ processTemperature: 318.15 });
		expect(r.before).toEqual({ burnRisk: false, insulationAdvised: false });
		expect(r.cautions).toEqual([]);
	});

	it('reports no saving, never NaN, for a line at the ambient temperature', () => {
		const r = saving({ processTemperature: 293.15 });
		expect(r.bare).toBe(0);
		expect(r.saving).toBe(0);
		expect(r.savingFraction).toBe(0);
	});

	it('wants a length or fittings, not both, not neither', () => {
		expect(() => saving({ length: undefined })).toThrow(/either length/);
		expect(() => saving({ fittings: { kind: 'valve', count: 1 } })).toThrow(/either length/);
		expect(() => saving({ length: 0 })).toThrow(/length = 0/);
		expect(() => saving({ length: -3 })).toThrow(/length = -3/);
	});
});
