import { describe, expect, it } from 'vitest';
import {
	findingCommon,
	lossSite as site,
	mainsHeader as header
} from '../../../../tests/fixtures/loss-site';
import { saturationTemperature } from '../region4';
import { evaluateFinding } from './evaluate';
import { COLD_INLET_MARGIN, coldInletNote, surfaceStateNote } from './field-readings';
import type { FindingInput, InsulationInputs, TrapInputs } from './inputs';

const Tsat = saturationTemperature(header.pressure);
const trapInputs: TrapInputs = {
	trapType: 'inverted-bucket',
	dn: 20,
	condition: 'working',
	discharge: 'atmosphere',
	testMethod: 'temperature'
};
const trap = (inputs: Partial<TrapInputs>): FindingInput => ({
	id: findingCommon.id,
	kind: 'trap',
	headerId: header.id,
	inputs: { ...trapInputs, ...inputs }
});
const pipe: InsulationInputs = {
	item: 'pipe',
	dn: 50,
	length: 8,
	ambientTemperature: 293.15,
	windSpeed: 0,
	layers: [{ thickness: 0.04, material: 'mineral-wool' }],
	jacketEmissivity: 0.1,
	bareEmissivity: 0.9
};
const insulation = (inputs: Partial<InsulationInputs>): FindingInput => ({
	id: findingCommon.id,
	kind: 'insulation',
	headerId: header.id,
	inputs: { ...pipe, ...inputs }
});

describe('a trap’s temperature test', () => {
	it('names its threshold as common practice', () => {
		expect(COLD_INLET_MARGIN.value).toBe(15);
		expect(COLD_INLET_MARGIN.source).toMatch(/^common practice/);
	});

	it('notes an inlet well below saturation at the header’s pressure', () => {
		const result = evaluateFinding(
			trap({ inletTemperature: Tsat - 40, outletTemperature: 320 }),
			site
		);
		expect(result.notes.some((n) => /40 K below the steam's saturation temperature/.test(n))).toBe(
			true
		);
		expect(result.assumptions.find((a) => a.key === 'coldInletMargin')?.value).toBe(15);
		// A note, not a loss: a working trap still loses no steam.
		expect(result.steamLoss).toBe(0);
	});

	it('stays quiet for an inlet near saturation or no reading', () => {
		for (const inputs of [{ inletTemperature: Tsat - 5 }, { inletTemperature: Tsat - 14.9 }, {}]) {
			const result = evaluateFinding(trap(inputs), site);
			expect(result.notes.join(' ')).not.toMatch(/below the steam's saturation/);
			expect(result.assumptions.some((a) => a.key === 'coldInletMargin')).toBe(false);
		}
	});

	it('flags exactly past the margin', () => {
		expect(coldInletNote({ ...trapInputs, inletTemperature: 400 }, 415)).toBeNull();
		expect(coldInletNote({ ...trapInputs, inletTemperature: 399.9 }, 415)).not.toBeNull();
	});
});

describe('an insulation surface found damaged or wet', () => {
	const bare = evaluateFinding(insulation({}), site);

	it('prices damaged and wet insulation exactly as bare, saying so', () => {
		for (const state of ['damaged', 'wet'] as const) {
			const result = evaluateFinding(insulation({ surfaceState: state }), site);
			expect(result.heatLoss).toBe(bare.heatLoss);
			expect(result.cost.minor).toBe(bare.cost.minor);
			const assumption = result.assumptions.find((a) => a.key === 'surfaceState')!;
			expect(assumption.label).toContain(`${state} insulation taken as bare`);
			expect(assumption.value).toBe(result.insulation!.bare);
			expect(assumption.source).toMatch(/^common practice/);
		}
		const wet = evaluateFinding(insulation({ surfaceState: 'wet' }), site);
		expect(wet.notes.join(' ')).toMatch(/can lose more heat than bare metal/);
		const damaged = evaluateFinding(insulation({ surfaceState: 'damaged' }), site);
		expect(damaged.notes.join(' ')).toMatch(/enter only the stretch that is missing/);
	});

	it('adds nothing for a bare surface', () => {
		expect(surfaceStateNote('bare', 100)).toBeNull();
		expect(surfaceStateNote(undefined, 100)).toBeNull();
		expect(bare.assumptions.some((a) => a.key === 'surfaceState')).toBe(false);
	});
});
