import { describe, expect, it } from 'vitest';
import { stateFromPT } from './forward';
import { psat, tsat } from './region4';
import { saturatedLiquid, saturatedVapour, stateFromPX, stateFromTX } from './saturation';

const PRESSURES = [0.000611213, 0.001, 0.1, 1, 5, 10, 16.5, 16.6, 18, 20, 22];

describe('states on the saturation dome', () => {
	it('mix liquid and vapour by the lever rule in v, h, u and s', () => {
		for (const p of PRESSURES) {
			const liquid = saturatedLiquid(p);
			const vapour = saturatedVapour(p);
			for (const x of [0.1, 0.5, 0.95]) {
				const mix = stateFromPX(p, x);
				expect(mix).toMatchObject({
					region: 4,
					phase: 'two-phase',
					x,
					cp: null,
					cv: null,
					w: null
				});
				for (const key of ['v', 'h', 'u', 's'] as const) {
					const lever = liquid[key] + x * (vapour[key] - liquid[key]);
					expect(Math.abs(mix[key] - lever)).toBeLessThanOrEqual(1e-12 * Math.abs(lever) + 1e-15);
				}
				expect(mix.T).toBe(tsat(p));
			}
		}
	});

	it('x = 0 and x = 1 are the saturated liquid and vapour, with cp, cv and w', () => {
		for (const p of PRESSURES) {
			expect(stateFromPX(p, 0)).toEqual(saturatedLiquid(p));
			expect(stateFromPX(p, 1)).toEqual(saturatedVapour(p));
			const liquid = saturatedLiquid(p);
			const vapour = saturatedVapour(p);
			expect(liquid).toMatchObject({ x: 0, phase: 'liquid', region: p <= psat(623.15) ? 1 : 3 });
			expect(vapour).toMatchObject({ x: 1, phase: 'vapour', region: p <= psat(623.15) ? 2 : 3 });
			for (const s of [liquid, vapour]) {
				for (const key of ['cp', 'cv', 'w'] as const) expect(s[key]).toBeGreaterThan(0);
			}
			expect(vapour.v).toBeGreaterThan(liquid.v);
			expect(vapour.h).toBeGreaterThan(liquid.h);
		}
	});

	it('the saturated liquid below 623.15 K is the compressed-liquid state at (p, Tsat)', () => {
		const p = 1;
		const fromPT = stateFromPT(p, tsat(p));
		expect({ ...saturatedLiquid(p), x: null }).toEqual(fromPT);
	});

	it('by temperature gives the same states as by pressure', () => {
		for (const T of [273.15, 300, 373.15, 500, 623.15, 630, 645]) {
			const p = psat(T);
			for (const x of [0, 0.3, 1]) {
				const byT = stateFromTX(T, x);
				const byP = stateFromPX(p, x);
				expect(byT.T).toBe(T);
				expect(byT.p).toBe(p);
				expect(Math.abs(byT.h / byP.h - 1)).toBeLessThan(1e-10);
				expect(Math.abs(byT.v / byP.v - 1)).toBeLessThan(1e-9);
				expect(byT.region).toBe(byP.region);
			}
		}
	});

	it('latent heat at 100 °C, 1 atm: about 2257 kJ/kg (common practice)', () => {
		const T = 373.124; // boiling point at 0.101325 MPa
		expect(tsat(0.101325)).toBeCloseTo(T, 2);
		const hfg = stateFromTX(T, 1).h - stateFromTX(T, 0).h;
		expect(hfg).toBeGreaterThan(2255);
		expect(hfg).toBeLessThan(2259);
	});

	it('approaches one state at the critical point', () => {
		const liquid = saturatedLiquid(22.064);
		const vapour = saturatedVapour(22.064);
		expect(Math.abs(liquid.h - vapour.h)).toBeLessThan(5);
		expect(Math.abs(liquid.v / vapour.v - 1)).toBeLessThan(0.01);
	});
});
