import { describe, expect, it } from 'vitest';
import { P_CRIT, RHO_CRIT, T_CRIT } from './constants';
import { SteamRangeError } from './errors';
import { region3FromRhoT } from './region3';
import { region3SaturatedLiquid, region3SaturatedVapour } from './region3-saturation';
import { P_SAT_13, tsat } from './region4';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const gibbs = (s: { h: number; T: number; s: number }) => s.h - s.T * s.s;

function pressures(): number[] {
	const list = [P_SAT_13, 16.6, 22.06, 22.063, 22.0639, P_CRIT];
	for (let p = 17; p < 22; p += 0.25) list.push(p);
	return list;
}

describe('region 3 saturated liquid and vapour', () => {
	it('share p and T (eq. 31), and the region 3 equation gives p at both densities', () => {
		for (const p of pressures()) {
			const liquid = region3SaturatedLiquid(p);
			const vapour = region3SaturatedVapour(p);
			expect(liquid.p).toBe(p);
			expect(vapour.p).toBe(p);
			expect(liquid.T).toBe(tsat(p));
			expect(vapour.T).toBe(liquid.T);
			expect(rel(region3FromRhoT(1 / liquid.v, liquid.T).p, p), `p = ${p}`).toBeLessThan(1e-12);
			expect(rel(region3FromRhoT(1 / vapour.v, vapour.T).p, p), `p = ${p}`).toBeLessThan(1e-12);
		}
	});

	it('have equal Gibbs energies within the consistency IF97 built into eq. 28', () => {
		// IF97 fitted the region 3 equation to meet the phase-equilibrium condition along the
		// saturation equation. The mismatch left, expressed as the shift of saturation temperature
		// Δg / (s'' − s') it implies, is at most 1.6 mK in this range (measured here); 3 mK allowed.
		for (const p of pressures()) {
			const liquid = region3SaturatedLiquid(p);
			const vapour = region3SaturatedVapour(p);
			const dg = gibbs(liquid) - gibbs(vapour);
			if (p < 22.06) {
				expect(Math.abs(dg / (vapour.s - liquid.s)), `p = ${p}`).toBeLessThan(0.003);
			} else {
				// Close to the critical point both phases converge, and so do their Gibbs energies.
				expect(Math.abs(dg), `p = ${p}`).toBeLessThan(1e-6);
			}
		}
	});

	it('are the densest and lightest stable roots: liquid denser, vapour lighter, dp/dρ > 0', () => {
		for (const p of pressures()) {
			if (p > 22.06) continue;
			const liquid = region3SaturatedLiquid(p);
			const vapour = region3SaturatedVapour(p);
			expect(1 / liquid.v).toBeGreaterThan(RHO_CRIT);
			expect(1 / vapour.v).toBeLessThan(RHO_CRIT);
			expect(vapour.h).toBeGreaterThan(liquid.h);
			expect(vapour.s).toBeGreaterThan(liquid.s);
			for (const state of [liquid, vapour]) {
				const rho = 1 / state.v;
				const slope =
					region3FromRhoT(rho * (1 + 1e-7), state.T).p -
					region3FromRhoT(rho * (1 - 1e-7), state.T).p;
				expect(slope, `p = ${p}`).toBeGreaterThan(0);
			}
		}
	});

	it('meet at the critical point', () => {
		const liquid = region3SaturatedLiquid(P_CRIT);
		const vapour = region3SaturatedVapour(P_CRIT);
		// IF97 eqs. 2–4 (pub): Tc = 647.096 K, ρc = 322 kg/m³. The flat critical isotherm fixes ρ
		// only loosely from p, hence the looser density check.
		expect(Math.abs(liquid.T - T_CRIT)).toBeLessThan(1e-6);
		expect(rel(1 / liquid.v, RHO_CRIT)).toBeLessThan(2e-3);
		expect(rel(1 / vapour.v, RHO_CRIT)).toBeLessThan(2e-3);
		expect(rel(liquid.h, vapour.h)).toBeLessThan(1e-4);
	});

	it('narrow steadily towards the critical point', () => {
		let previous = Infinity;
		for (const p of [17, 19, 21, 22, 22.06, 22.063, 22.0639]) {
			const gap = region3SaturatedVapour(p).h - region3SaturatedLiquid(p).h;
			expect(gap).toBeGreaterThan(0);
			expect(gap).toBeLessThan(previous);
			previous = gap;
		}
	});
});

describe('region 3 saturation rejects pressures off its part of the line', () => {
	for (const p of [Number.NaN, Number.POSITIVE_INFINITY, -1, 0, 10, 16.52, 22.07, 50]) {
		it(`p = ${p}`, () => {
			expect(() => region3SaturatedLiquid(p)).toThrow(SteamRangeError);
			expect(() => region3SaturatedVapour(p)).toThrow(SteamRangeError);
			expect(() => region3SaturatedLiquid(p)).toThrow(/pressure p = .* 16\.529\d* to 22\.064 MPa/);
		});
	}
});
