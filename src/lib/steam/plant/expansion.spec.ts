import { describe, expect, it } from 'vitest';
import { SteamRangeError } from '../errors';
import { stateFromPH, stateFromPS } from '../inverse';
import { saturationTemperature } from '../region4';
import { expandSteam } from './expansion';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('expandSteam', () => {
	it('with efficiency 1 ends at the isentropic state', () => {
		const r = expandSteam({ p1: 4, T1: 673.15, p2: 0.2, isentropicEfficiency: 1 });
		expect(r.outlet).toEqual(r.isentropicOutlet);
		expect(r.h2).toBe(r.h2s);
		expect(r.work).toBe(r.isentropicWork);
		expect(r.s2).toBeCloseTo(r.s1, 12);
		expect(r.h2s).toBeCloseTo(stateFromPS(0.2, r.s1).h, 9);
	});

	it('turns the efficiency into work: w = η (h1 − h2s), h2 = h1 − w', () => {
		const r = expandSteam({ p1: 4, T1: 673.15, p2: 0.2, isentropicEfficiency: 0.7 });
		expect(rel(r.work, 0.7 * r.isentropicWork)).toBeLessThan(1e-11);
		expect(r.h1 - r.work).toBe(r.h2);
		expect(r.s2).toBeGreaterThan(r.s1);
		expect(r.T2).toBeGreaterThan(r.T2s);
		expect(stateFromPH(0.2, r.h2).T).toBeCloseTo(r.T2, 9);
	});

	it('reports the dryness of a wet exhaust and flags it', () => {
		const r = expandSteam({ p1: 1, x1: 1, p2: 0.01, isentropicEfficiency: 0.8 });
		expect(r.x2s).not.toBeNull();
		expect(r.x2).not.toBeNull();
		expect(r.x2!).toBeGreaterThan(r.x2s!);
		expect(r.x2!).toBeLessThan(1);
		expect(r.wetExhaust).toBe(true);
		expect(r.superheat2).toBeNull();
		expect(r.superheat2s).toBeNull();
		expect(r.T2).toBeCloseTo(saturationTemperature(0.01), 9);
	});

	it('gives a superheated exhaust x2 = null and its superheat', () => {
		const r = expandSteam({ p1: 4, T1: 723.15, p2: 1, isentropicEfficiency: 0.75 });
		expect(r.x2).toBeNull();
		expect(r.x2s).toBeNull();
		expect(r.wetExhaust).toBe(false);
		expect(r.superheat2!).toBeCloseTo(r.T2 - saturationTemperature(1), 12);
		expect(r.superheat2!).toBeGreaterThan(r.superheat2s!);
	});

	it('can end superheated where the isentropic expansion ends wet', () => {
		// Steam 47 K superheated at 1 MPa to 0.3 MPa: the ideal end is wet, the losses reheat it.
		const r = expandSteam({ p1: 1, T1: 500, p2: 0.3, isentropicEfficiency: 0.5 });
		expect(r.x2s!).toBeLessThan(1);
		expect(r.x2).toBeNull();
		expect(r.superheat2!).toBeGreaterThan(0);
	});

	it('refuses efficiencies outside (0, 1] and names the efficiency', () => {
		for (const eta of [0, -0.2, 1.01, NaN]) {
			expect(() => expandSteam({ p1: 4, T1: 673.15, p2: 1, isentropicEfficiency: eta })).toThrow(
				/Isentropic efficiency must be greater than 0 and at most 1|Isentropic efficiency must be a finite number/
			);
		}
		expect(() => expandSteam({ p1: 4, T1: 673.15, p2: 1, isentropicEfficiency: 85 })).toThrow(
			'(enter 0.85 for 85 %)'
		);
	});

	it('refuses an outlet pressure at or above the inlet', () => {
		expect(() => expandSteam({ p1: 1, x1: 1, p2: 1.5, isentropicEfficiency: 0.8 })).toThrow(
			'The outlet pressure p2 (1.5 MPa abs) must be below the inlet pressure p1 (1 MPa abs)'
		);
	});

	it('refuses states outside IF97 with the engine range error', () => {
		expect(() => expandSteam({ p1: 120, T1: 800, p2: 1, isentropicEfficiency: 0.8 })).toThrow(
			SteamRangeError
		);
		expect(() => expandSteam({ p1: 1, T1: 2400, p2: 0.1, isentropicEfficiency: 0.8 })).toThrow(
			SteamRangeError
		);
		expect(() => expandSteam({ p1: 1, x1: 1, p2: 1e-7, isentropicEfficiency: 0.8 })).toThrow(
			SteamRangeError
		);
	});

	it('refuses an isentropic end state below 273.15 K with the engine range error', () => {
		// Very low exhaust pressures from modest inlet entropies fall off IF97's cold end.
		let error: unknown;
		try {
			expandSteam({ p1: 1, x1: 0, p2: 1e-5, isentropicEfficiency: 1 });
		} catch (e) {
			error = e;
		}
		expect(error).toBeInstanceOf(SteamRangeError);
		expect((error as SteamRangeError).quantity).toBe('specific entropy s');
	});
});
