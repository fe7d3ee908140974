import { describe, expect, it } from 'vitest';
import { SteamRangeError } from '../errors';
import { stateFromPS } from '../inverse';
import { saturatedLiquid } from '../saturation';
import { pumpWork } from './pump';

describe('pumpWork', () => {
	it('with efficiency 1 ends at the isentropic state', () => {
		const r = pumpWork({ p1: 0.01, p2: 3, efficiency: 1 });
		expect(r.outlet).toEqual(r.isentropicOutlet);
		expect(r.work).toBe(r.isentropicWork);
		expect(r.isentropicWork).toBeCloseTo(stateFromPS(3, saturatedLiquid(0.01).s).h - r.h1, 12);
	});

	it('divides the ideal work by the efficiency and lands at h1 + w', () => {
		const r = pumpWork({ p1: 0.01, p2: 3, efficiency: 0.8 });
		expect(Math.abs(r.work - r.isentropicWork / 0.8)).toBeLessThan(1e-9);
		expect(r.h2 - r.h1).toBe(r.work);
		expect(r.approximateWork).toBeCloseTo(r.vdpWork / 0.8, 12);
		expect(r.T2).toBeGreaterThan(r.isentropicOutlet.T);
	});

	it('computes v Δp from the inlet volume: 1 MPa · m³/kg = 1000 kJ/kg', () => {
		const r = pumpWork({ p1: 0.1, p2: 1.1, efficiency: 1 });
		expect(r.vdpWork).toBeCloseTo(saturatedLiquid(0.1).v * 1000, 12);
	});

	it('takes a subcooled inlet from T1, and the saturated liquid when T1 is T_sat', () => {
		const cold = pumpWork({ p1: 0.1, p2: 2, T1: 300, efficiency: 0.75 });
		expect(cold.inlet.T).toBe(300);
		expect(cold.inlet.phase).toBe('liquid');
		const Ts = saturatedLiquid(0.1).T;
		expect(pumpWork({ p1: 0.1, p2: 2, T1: Ts, efficiency: 1 }).inlet).toEqual(saturatedLiquid(0.1));
	});

	it('refuses steam at the inlet, an outlet at or below the inlet and bad efficiencies', () => {
		expect(() => pumpWork({ p1: 0.1, p2: 2, T1: 400, efficiency: 0.8 })).toThrow(
			/T1 = 400 K is above saturation \(372\.76 K\): that is steam, and a pump needs liquid water/
		);
		expect(() => pumpWork({ p1: 2, p2: 2, efficiency: 0.8 })).toThrow(
			"The pump's outlet pressure p2 (2 MPa abs) must be above its inlet pressure p1 (2 MPa abs)"
		);
		expect(() => pumpWork({ p1: 0.1, p2: 2, efficiency: 0 })).toThrow(
			'Pump efficiency must be greater than 0 and at most 1, got 0'
		);
	});

	it('refuses states outside IF97 with the engine range error', () => {
		expect(() => pumpWork({ p1: 0.1, p2: 120, efficiency: 0.8 })).toThrow(SteamRangeError);
		expect(() => pumpWork({ p1: 25, p2: 30, efficiency: 0.8 })).toThrow(
			/inlet pressure p1 = 25 .* for saturated liquid at the inlet \(or give T1\)/
		);
		expect(() => pumpWork({ p1: 0.1, p2: 2, T1: 200, efficiency: 0.8 })).toThrow(SteamRangeError);
	});
});
