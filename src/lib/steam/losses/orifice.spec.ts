import { describe, expect, it } from 'vitest';
import { saturationTemperature } from '../region4';
import {
	criticalPressure,
	isentropicMassFlux,
	napierSteamFlow,
	orificeSteamFlow,
	upstreamState
} from './orifice';

const base = { p1: 1.1, p2: 0.101325, diameter: 0.003, cd: 0.72 };

describe('orificeSteamFlow', () => {
	it('is choked into atmosphere from 10 bar(g), with the throat at the critical pressure', () => {
		const flow = orificeSteamFlow(base);
		expect(flow.choked).toBe(true);
		expect(flow.throatPressure).toBe(flow.criticalPressure);
		expect(flow.criticalPressure / base.p1).toBeGreaterThan(0.55);
		expect(flow.criticalPressure / base.p1).toBeLessThan(0.6);
	});

	it('scales with cd and diameter squared', () => {
		const one = orificeSteamFlow(base).massFlow;
		expect(orificeSteamFlow({ ...base, cd: 0.36 }).massFlow).toBeCloseTo(one / 2, 12);
		expect(orificeSteamFlow({ ...base, diameter: 0.006 }).massFlow).toBeCloseTo(one * 4, 12);
	});

	it('does not depend on back pressure once choked, and falls once it is not', () => {
		const choked = orificeSteamFlow(base);
		expect(orificeSteamFlow({ ...base, p2: 0.3 }).massFlow).toBeCloseTo(choked.massFlow, 12);
		const high = orificeSteamFlow({ ...base, p2: 0.9 });
		expect(high.choked).toBe(false);
		expect(high.throatPressure).toBe(0.9);
		expect(high.massFlow).toBeLessThan(choked.massFlow);
		expect(orificeSteamFlow({ ...base, p2: 1.05 }).massFlow).toBeLessThan(high.massFlow);
	});

	it('is continuous at the critical pressure (the peak of the flux)', () => {
		const up = upstreamState(base.p1);
		const pc = criticalPressure(up);
		const peak = isentropicMassFlux(up, pc);
		expect(isentropicMassFlux(up, pc * 1.01)).toBeLessThan(peak);
		expect(isentropicMassFlux(up, pc * 0.99)).toBeLessThan(peak);
		expect(isentropicMassFlux(up, pc * 1.001) / peak).toBeGreaterThan(0.9999);
	});

	it('finds the peak to well within 1e-4 of its pressure, dry, wet, superheated or saturated liquid', () => {
		for (const up of [
			upstreamState(1.1),
			upstreamState(15, undefined, 0.2),
			upstreamState(1, undefined, 0),
			upstreamState(4.1, 673.15),
			upstreamState(0.002)
		]) {
			const pc = criticalPressure(up);
			const peak = isentropicMassFlux(up, pc);
			expect(isentropicMassFlux(up, pc * (1 + 1e-4))).toBeLessThan(peak);
			expect(isentropicMassFlux(up, pc * (1 - 1e-4))).toBeLessThan(peak);
		}
	});

	it('stops at the lowest throat pressure searched (612 Pa) when the flux still rises there', () => {
		// 0.8 kPa superheated steam: its peak ratio (≈ 0.55) lies below 612/800.
		const up = upstreamState(0.0008, 400);
		expect(criticalPressure(up)).toBe(0.000612);
	});

	it('passes less superheated steam and more wet steam than dry saturated at one pressure', () => {
		const dry = orificeSteamFlow(base).massFlow;
		const hot = orificeSteamFlow({ ...base, T1: saturationTemperature(base.p1) + 100 }).massFlow;
		const wet = orificeSteamFlow({ ...base, x1: 0.9 }).massFlow;
		expect(hot).toBeLessThan(dry);
		expect(wet).toBeGreaterThan(dry);
	});

	it('treats T1 at saturation as dry saturated steam', () => {
		const Ts = saturationTemperature(base.p1);
		expect(orificeSteamFlow({ ...base, T1: Ts }).massFlow).toBe(orificeSteamFlow(base).massFlow);
	});
});

describe('bad input gives a clear error, never NaN or zero', () => {
	it.each([
		[{ diameter: -0.003 }, 'Orifice diameter must be greater than 0 m, got -0.003'],
		[{ diameter: 0 }, 'Orifice diameter must be greater than 0 m, got 0'],
		[{ p2: 1.2 }, 'Back pressure (1.2 MPa abs) must be below the upstream pressure (1.1 MPa abs)'],
		[{ p2: 1.1 }, 'Back pressure (1.1 MPa abs) must be below the upstream pressure'],
		[{ cd: 1.2 }, 'Discharge coefficient must be greater than 0 and at most 1, got 1.2'],
		[{ p1: NaN }, 'Upstream pressure must be a finite number of MPa, got NaN'],
		[{ x1: 1.5 }, 'Upstream dryness fraction must be between 0 and 1, got 1.5'],
		[{ T1: 400 }, 'Upstream temperature 400.00 K is below saturation (457.22 K at 1.1 MPa)'],
		[
			{ T1: 500, x1: 0.9 },
			'Give either the upstream temperature (superheated) or the dryness fraction (wet), not both'
		]
	])('%o', (change, message) => {
		expect(() => orificeSteamFlow({ ...base, ...change })).toThrow(message);
	});

	it('napierSteamFlow checks its inputs too', () => {
		expect(() => napierSteamFlow({ p1: 1, diameter: -1, cd: 1 })).toThrow(
			'Orifice diameter must be greater than 0 m'
		);
		expect(() => napierSteamFlow({ p1: 1, diameter: 0.01, cd: 0 })).toThrow(
			'Discharge coefficient must be greater than 0'
		);
	});
});

describe('napierSteamFlow', () => {
	it('is A·P/70 lb/s in inches and psia', () => {
		// 1 in² at 70 psia → 1 lb/s (the formula's own units).
		const diameter = Math.sqrt(4 / Math.PI) * 0.0254;
		const p1 = (70 * 6894.757293168361) / 1e6;
		expect(napierSteamFlow({ p1, diameter, cd: 1 }).massFlow).toBeCloseTo(0.45359237, 9);
	});
});
