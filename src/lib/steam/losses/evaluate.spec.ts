import { describe, expect, it } from 'vitest';
import {
	findingCommon,
	lossCostBasis as costBasis,
	lossSite as site,
	mainsHeader as header,
	superheatedHeader as hp
} from '../../../../tests/fixtures/loss-site';
import { saturationTemperature } from '../region4';
import type { FindingInput as Finding } from './inputs';
import { evaluateFinding, type FindingEvaluation } from './evaluate';

const common = { ...findingCommon, headerId: header.id };

const trap: Finding = {
	...common,
	kind: 'trap',
	repairCost: 45000,
	inputs: { trapType: 'thermodynamic', dn: 15, condition: 'failed-open', discharge: 'atmosphere' }
};
const leak: Finding = {
	...common,
	kind: 'leak',
	repairCost: 20000,
	inputs: { sizeClass: 'medium' }
};
const insulation: Finding = {
	...common,
	kind: 'insulation',
	repairCost: 120000,
	inputs: {
		item: 'pipe',
		dn: 100,
		length: 10,
		ambientTemperature: 293.15,
		windSpeed: 0,
		layers: [{ thickness: 0.05, material: 'mineral-wool' }],
		jacketEmissivity: 0.1,
		bareEmissivity: 0.9
	}
};
const reading: Finding = {
	...common,
	kind: 'header',
	headerId: hp.id,
	inputs: { measuredPressure: 4.0, measuredTemperature: 525 }
};

/** Every number in a result is finite: no NaN or Infinity leaks out. */
function allFinite(value: unknown): boolean {
	if (typeof value === 'number') return Number.isFinite(value);
	if (Array.isArray(value)) return value.every(allFinite);
	if (value && typeof value === 'object') return Object.values(value).every(allFinite);
	return true;
}

describe('evaluateFinding: a complete, sourced result for each kind', () => {
	it.each([trap, leak, insulation, reading])('$kind', (finding) => {
		const result = evaluateFinding(finding, site);
		expect(allFinite(result)).toBe(true);
		expect(result.assumptions.length).toBeGreaterThan(5);
		for (const a of result.assumptions) {
			expect(a.source.length).toBeGreaterThan(3);
			expect(Number.isFinite(a.value)).toBe(true);
		}
		expect(result.cautions.map((c) => c.key)).toContain('estimate');
		expect(Number.isInteger(result.cost.minor)).toBe(true);
	});
});

describe('trap', () => {
	const result = evaluateFinding(trap, site);

	it('ties steam, heat, fuel, cost and CO2 together through the energy chain', () => {
		const steamKgS = result.steamLoss! / 3600;
		const h = result.assumptions.find((a) => a.key === 'steamEnthalpy')!.value;
		const hfw = result.assumptions.find((a) => a.key === 'feedwaterEnthalpy')!.value;
		expect(result.heatLoss).toBeCloseTo(steamKgS * (h - hfw), 9);
		const gj = (result.heatLoss / 0.8) * 8000 * 3600 * 1e-6;
		expect(result.fuelEnergy).toBeCloseTo(gj, 9);
		expect(result.fuelCost.amount).toBeCloseTo(gj * 9, 9);
		expect(result.co2).toBeCloseTo(gj * (53.06 / 1.05505585262), 6);
		// All the steam vented to atmosphere is made up: kg/h × h / 1000 kg/m³.
		expect(result.water).toBeCloseTo((result.steamLoss! * 8000) / 1000, 9);
		expect(result.waterCost.amount).toBeCloseTo(result.water * 2.2, 9);
		expect(result.cost.amount).toBeCloseTo(result.fuelCost.amount + result.waterCost.amount, 9);
		expect(result.cost.minor).toBe(Math.round(result.cost.amount * 100));
	});

	it('uses the default orifice for a DN 15 thermodynamic trap, marked common practice', () => {
		const orifice = result.assumptions.find((a) => a.key === 'orificeDiameter')!;
		expect(orifice.value).toBe(0.0032);
		expect(orifice.source).toMatch(/^common practice/);
		expect(result.orifice?.choked).toBe(true);
	});

	it('pays back and has an NPV from the repair cost in minor units', () => {
		expect(result.repairCost).toEqual({ amount: 450, minor: 45000, currency: 'EUR' });
		expect(result.payback.years).toBeCloseTo(450 / result.cost.amount, 12);
		const annuity = (1 - 1.08 ** -5) / 0.08;
		expect(result.npv!.amount).toBeCloseTo(result.cost.amount * annuity - 450, 9);
	});

	it('carries the plume caution first', () => {
		expect(result.cautions[0].key).toBe('steam-plume');
	});

	it('takes the operating-hours override', () => {
		const part = evaluateFinding(
			{ ...trap, inputs: { ...trap.inputs, operatingHours: 2000 } } as Finding,
			site
		);
		expect(part.fuelEnergy).toBeCloseTo(result.fuelEnergy / 4, 9);
		expect(part.assumptions.find((a) => a.key === 'operatingHours')?.source).toBe(
			'finding (override)'
		);
	});

	it('counts condensate to drain as water and heat even for a working trap', () => {
		const working = evaluateFinding(
			{
				...trap,
				inputs: { ...trap.inputs, condition: 'working', condensateLoad: 0.01 }
			} as Finding,
			site
		);
		expect(working.steamLoss).toBe(0);
		expect(working.heatLoss).toBeGreaterThan(0);
		expect(working.water).toBeCloseTo((0.01 * 8000 * 3600) / 1000, 9);
	});

	it('recovers the site return fraction of steam blown into a condensate return', () => {
		const toReturn = evaluateFinding(
			{
				...trap,
				inputs: { ...trap.inputs, discharge: 'condensate-return', backPressure: 0.2 }
			} as Finding,
			site
		);
		expect(toReturn.water).toBeCloseTo((toReturn.steamLoss! * 8000 * 0.4) / 1000, 9);
		expect(toReturn.cautions[0].key).not.toBe('steam-plume');
	});

	it('gives a failed-closed trap no loss but a risk note and a water-hammer caution', () => {
		const closed = evaluateFinding(
			{ ...trap, inputs: { ...trap.inputs, condition: 'failed-closed' } } as Finding,
			site
		);
		expect(closed.steamLoss).toBe(0);
		expect(closed.cost.minor).toBe(0);
		expect(closed.riskNote).toMatch(/^Failed closed/);
		expect(closed.cautions.map((c) => c.key)).toContain('water-hammer');
		expect(closed.payback).toEqual({
			years: null,
			note: 'No annual saving: the repair does not pay back in money'
		});
	});
});

describe('leak', () => {
	it('prices steam through the size class hole at the header', () => {
		const result = evaluateFinding(leak, site);
		expect(result.steamLoss).toBeGreaterThan(0);
		expect(result.assumptions.find((a) => a.key === 'holeDiameter')?.value).toBeCloseTo(
			0.0254 / 8,
			12
		);
		expect(result.cautions[0].key).toBe('steam-plume');
	});

	it('passes less superheated steam than saturated at the same pressure, at a higher enthalpy', () => {
		const sat = evaluateFinding({ ...leak, headerId: hp.id } as Finding, {
			...site,
			headers: [{ ...hp, designTemperature: undefined }]
		});
		const hot = evaluateFinding({ ...leak, headerId: hp.id } as Finding, site);
		expect(hot.steamLoss!).toBeLessThan(sat.steamLoss!);
		const h = (r: FindingEvaluation) => r.assumptions.find((a) => a.key === 'steamEnthalpy')!.value;
		expect(h(hot)).toBeGreaterThan(h(sat));
	});
});

describe('insulation', () => {
	const result = evaluateFinding(insulation, site);

	it('prices the heat saved, with no steam or water', () => {
		expect(result.steamLoss).toBeNull();
		expect(result.water).toBe(0);
		expect(result.heatLoss).toBeCloseTo(result.insulation!.saving / 1000, 12);
		expect(result.fuelEnergy).toBeCloseTo((result.heatLoss / 0.8) * 8000 * 3600 * 1e-6, 9);
	});

	it('takes the line temperature from the header and flags the bare burn risk', () => {
		expect(result.insulation!.bareSurfaceTemperature).toBe(saturationTemperature(header.pressure));
		expect(result.riskNote).toMatch(/burn/);
		expect(result.cautions.map((c) => c.key)).toEqual(
			expect.arrayContaining(['hot-surface', 'old-insulation'])
		);
	});

	it('prices valves and flat surfaces too', () => {
		const valves = evaluateFinding(
			{
				...insulation,
				inputs: { ...insulation.inputs, item: 'valve', length: undefined, count: 3 }
			} as Finding,
			site
		);
		expect(valves.heatLoss).toBeGreaterThan(0);
		expect(valves.assumptions.find((a) => a.key === 'equivalentLength.valve')).toBeDefined();
		const tank = evaluateFinding(
			{
				...insulation,
				headerId: undefined,
				inputs: {
					...insulation.inputs,
					item: 'surface',
					dn: undefined,
					length: undefined,
					area: 8,
					height: 2,
					processTemperature: 363.15
				}
			} as Finding,
			site
		);
		expect(tank.heatLoss).toBeGreaterThan(0);
		expect(tank.insulation!.insulatedSurfaceTemperature).toBeLessThan(363.15);
	});
});

describe('header reading', () => {
	it('reports a superheated header read at saturation as possibly wet, with the cost of its steam', () => {
		const result = evaluateFinding(reading, site);
		expect(result.header?.condition).toBe('at-saturation');
		expect(result.riskNote).toMatch(/may be wet/);
		expect(result.cost.minor).toBe(0);
		expect(result.steamLoss).toBeNull();
		expect(result.header!.steamCostPerTonne.amount).toBeGreaterThan(
			result.header!.fuelCostPerTonne.amount
		);
		expect(result.payback.note).toBe('A header reading has no repair to pay back');
	});

	it('notes a header running away from its listed pressure', () => {
		const low = evaluateFinding(
			{ ...reading, headerId: header.id, inputs: { measuredPressure: 0.8 } } as Finding,
			site
		);
		expect(low.notes.join(' ')).toMatch(/against the listed 1\.000 MPa gauge/);
	});
});

describe('errors', () => {
	it('refuses a missing cost basis, a missing header and a bad efficiency', () => {
		expect(() => evaluateFinding(trap, { headers: [header] } as never)).toThrow(
			/^The site has no cost basis/
		);
		expect(() => evaluateFinding(trap, { ...site, headers: [] })).toThrow(
			/is not in the site's header list/
		);
		expect(() =>
			evaluateFinding(trap, { ...site, costBasis: { ...costBasis, boilerEfficiency: 1.5 } })
		).toThrow('Boiler efficiency must be greater than 0 and at most 1, got 1.5');
	});

	it('refuses negative sizes and a back pressure above the header', () => {
		expect(() =>
			evaluateFinding(
				{ ...trap, inputs: { ...trap.inputs, orificeDiameter: -0.002 } } as Finding,
				site
			)
		).toThrow('Orifice diameter must be greater than 0 m, got -0.002');
		expect(() =>
			evaluateFinding(
				{
					...trap,
					inputs: { ...trap.inputs, discharge: 'condensate-return', backPressure: 1.5 }
				} as Finding,
				site
			)
		).toThrow(/must be below its inlet pressure/);
	});
});
