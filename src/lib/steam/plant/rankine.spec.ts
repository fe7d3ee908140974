import { describe, expect, it } from 'vitest';
import { SteamRangeError } from '../errors';
import { saturatedLiquid, saturatedVapour } from '../saturation';
import { rankineCycle, type RankineInput } from './rankine';

const superheated: RankineInput = {
	boilerPressure: 6,
	condenserPressure: 0.01,
	turbineInlet: { temperature: 773.15 },
	turbineEfficiency: 0.85,
	pumpEfficiency: 0.8
};

describe('rankineCycle', () => {
	it('closes its energy balance: turbine work + heat rejected = heat supplied + pump work', () => {
		const r = rankineCycle(superheated);
		const into = r.heatSupplied + r.pumpWork;
		expect(Math.abs(r.turbineWork + r.heatRejected - into) / into).toBeLessThan(1e-9);
		expect(Math.abs(r.netWork - (r.heatSupplied - r.heatRejected)) / r.netWork).toBeLessThan(1e-9);
	});

	it('links its states: condenser liquid, pump outlet, turbine inlet and exhaust', () => {
		const r = rankineCycle(superheated);
		expect(r.states.pumpInlet).toEqual(saturatedLiquid(0.01));
		expect(r.states.boilerInlet.p).toBe(6);
		expect(r.states.turbineInlet.T).toBe(773.15);
		expect(r.states.turbineExhaust.p).toBe(0.01);
		expect(r.heatSupplied).toBeCloseTo(r.states.turbineInlet.h - r.states.boilerInlet.h, 9);
	});

	it('derives its ratios from the works', () => {
		const r = rankineCycle(superheated);
		expect(r.thermalEfficiency).toBeCloseTo(r.netWork / r.heatSupplied, 14);
		expect(r.workRatio).toBeCloseTo(1 - r.backWorkRatio, 14);
		expect(r.specificSteamConsumption * r.netWork).toBeCloseTo(3600, 9);
		expect(r.heatRate).toBeCloseTo(r.specificSteamConsumption * r.heatSupplied, 6);
	});

	it('stays below the Carnot efficiency between its boiling and condensing temperatures', () => {
		const r = rankineCycle({ ...superheated, turbineEfficiency: 1, pumpEfficiency: 1 });
		const carnot = 1 - saturatedLiquid(0.01).T / 773.15;
		expect(r.thermalEfficiency).toBeGreaterThan(0.3);
		expect(r.thermalEfficiency).toBeLessThan(carnot);
		expect(rankineCycle(superheated).thermalEfficiency).toBeLessThan(r.thermalEfficiency);
	});

	it('starts from saturated steam with a dryness and reports a wet exhaust', () => {
		const r = rankineCycle({ ...superheated, turbineInlet: { dryness: 1 } });
		expect(r.states.turbineInlet.h).toBeCloseTo(saturatedVapour(6).h, 9);
		expect(r.wetExhaust).toBe(true);
		expect(r.exhaustDryness!).toBeGreaterThan(0.6);
		expect(r.exhaustDryness!).toBeLessThan(0.9);
	});

	it('refuses a condenser at or above the boiler, or off the saturation line', () => {
		expect(() => rankineCycle({ ...superheated, condenserPressure: 6 })).toThrow(
			'The condenser pressure (6 MPa abs) must be below the boiler pressure (6 MPa abs)'
		);
		expect(() => rankineCycle({ ...superheated, condenserPressure: 0.0001 })).toThrow(
			SteamRangeError
		);
		expect(() => rankineCycle({ ...superheated, boilerPressure: 101 })).toThrow(SteamRangeError);
	});

	it('refuses efficiencies outside (0, 1] by name, and a cycle with no net work', () => {
		expect(() => rankineCycle({ ...superheated, pumpEfficiency: 1.5 })).toThrow(
			'Pump efficiency must be greater than 0 and at most 1'
		);
		expect(() => rankineCycle({ ...superheated, turbineEfficiency: 0 })).toThrow(
			'Turbine isentropic efficiency must be greater than 0 and at most 1'
		);
		expect(() =>
			rankineCycle({ ...superheated, turbineEfficiency: 0.004, pumpEfficiency: 0.5 })
		).toThrow(/This cycle makes no net work/);
	});
});
