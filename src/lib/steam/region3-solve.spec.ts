import { describe, expect, it } from 'vitest';
import { b23Temperature } from './b23';
import { P_CRIT, T_CRIT } from './constants';
import { SteamRangeError } from './errors';
import { region3FromRhoT } from './region3';
import {
	region3FromPH,
	region3FromPS,
	region3FromPT,
	region3SaturatedLiquid,
	region3SaturatedVapour
} from './region3-solve';
import { psat, tsat } from './region4';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** (p, T) grid over region 3: 623.15 K to T_B23(p), 16.53 to 100 MPa, dense near the critical point. */
function grid(): [number, number][] {
	const pressures = [16.53, 17, 18.5, 20, 21, 21.8, 22, 22.05, 22.0639, 22.064, 22.07, 22.2, 23];
	for (let p = 25; p <= 100; p += 5) pressures.push(p);
	const points: [number, number][] = [];
	for (const p of pressures) {
		const tMax = b23Temperature(p);
		for (let k = 0; k <= 24; k++) points.push([p, 623.15 + ((tMax - 623.15) * k) / 24]);
		for (const T of [T_CRIT - 0.01, T_CRIT - 1e-4, T_CRIT, T_CRIT + 1e-4, T_CRIT + 0.01]) {
			if (T <= tMax) points.push([p, T]);
		}
		if (p < P_CRIT) {
			const Ts = tsat(p);
			for (const T of [Ts - 1e-3, Ts + 1e-3]) if (T >= 623.15 && T <= tMax) points.push([p, T]);
		}
	}
	return points;
}

describe('region3FromPT', () => {
	it('returns a density at which the region 3 equation gives the requested pressure', () => {
		for (const [p, T] of grid()) {
			const state = region3FromPT(p, T);
			expect(state.p).toBe(p);
			expect(state.T).toBe(T);
			const forward = region3FromRhoT(1 / state.v, T);
			// At the critical point itself ρ is ρc by definition, where eq. 28 gives pc to 2e-12.
			const tolerance = p === P_CRIT && T === T_CRIT ? 3e-12 : 1e-12;
			expect(rel(forward.p, p), `p = ${p}, T = ${T}`).toBeLessThan(tolerance);
			expect(rel(forward.h, state.h)).toBeLessThan(1e-13);
		}
	});

	it('returns only mechanically stable states (dp/dρ > 0)', () => {
		for (const [p, T] of grid()) {
			const rho = 1 / region3FromPT(p, T).v;
			const up = region3FromRhoT(rho * (1 + 1e-6), T).p;
			const down = region3FromRhoT(rho * (1 - 1e-6), T).p;
			expect(up, `p = ${p}, T = ${T}`).toBeGreaterThanOrEqual(down);
		}
	});

	it('picks the liquid-like root just below T_sat(p) and the vapour-like one just above', () => {
		for (const p of [16.6, 18, 20, 21.5, 22, 22.06]) {
			const Ts = tsat(p);
			const liquid = region3FromPT(p, Ts - 0.01);
			const vapour = region3FromPT(p, Ts + 0.01);
			// The saturated densities separate the two branches.
			expect(liquid.v).toBeLessThan(region3SaturatedLiquid(p).v);
			expect(vapour.v).toBeGreaterThan(region3SaturatedVapour(p).v);
			expect(vapour.h - liquid.h, `p = ${p}`).toBeGreaterThan(20);
		}
	});

	it('gives the critical point itself at (pc, Tc)', () => {
		const state = region3FromPT(P_CRIT, T_CRIT);
		// IF97 eq. 4 (pub): ρc = 322 kg/m³. h from Debian's python3-iapws 1.5.2,
		// IAPWS97(P=22.064, T=647.096).h = 2087.5468451171537 kJ/kg (lib).
		expect(state.v).toBe(1 / 322);
		expect(rel(state.h, 2087.5468451171537)).toBeLessThan(1e-12);
		// cp is unbounded at the critical point: huge and positive, never negative or NaN.
		expect(state.cp).toBeGreaterThan(1e8);
		expect(Number.isFinite(state.w)).toBe(true);
	});

	it('is continuous across the critical isotherm above the critical pressure', () => {
		for (const p of [22.1, 23, 25]) {
			const below = region3FromPT(p, T_CRIT - 1e-7);
			const above = region3FromPT(p, T_CRIT + 1e-7);
			expect(rel(below.v, above.v)).toBeLessThan(1e-5);
			expect(rel(below.h, above.h)).toBeLessThan(1e-5);
		}
	});
});

describe('round trips (p, T) → h → (p, h) and (p, T) → s → (p, s)', () => {
	it('recover T and v across region 3, including near the critical point', () => {
		for (const [p, T] of grid()) {
			const state = region3FromPT(p, T);
			const fromH = region3FromPH(p, state.h);
			const fromS = region3FromPS(p, state.s);
			const where = `p = ${p}, T = ${T}`;
			expect(rel(fromH.T, T), where).toBeLessThan(1e-10);
			expect(rel(fromS.T, T), where).toBeLessThan(1e-10);
			expect(rel(fromH.h, state.h), where).toBeLessThan(1e-12);
			expect(rel(fromS.s, state.s), where).toBeLessThan(1e-12);
			// At the critical point itself the isotherm is flat, so v is fixed only loosely by (p, T);
			// elsewhere v must match as tightly as T.
			const nearCritical = Math.abs(p - P_CRIT) < 0.01 && Math.abs(T - T_CRIT) < 0.01;
			const vTolerance = nearCritical ? 1e-5 : 1e-9;
			expect(rel(fromH.v, state.v), where).toBeLessThan(vTolerance);
			expect(rel(fromS.v, state.v), where).toBeLessThan(vTolerance);
			expect(fromH.p).toBe(p);
		}
	});

	it('give every result as a state of the region 3 equation at the requested pressure', () => {
		for (const [p, T] of grid()) {
			const state = region3FromPH(p, region3FromPT(p, T).h);
			expect(rel(region3FromRhoT(1 / state.v, state.T).p, p)).toBeLessThan(1e-12);
		}
	});
});

describe('continuity with regions 1 and 2 at the region boundaries', () => {
	// Region 1 at 623.15 K and region 2 at T_B23(p), computed with Debian's python3-iapws 1.5.2
	// (_Region1(623.15, p), _Region2(_t_P(p), p)): p MPa → v m³/kg, h kJ/kg, s kJ/(kg K).
	// IF97 allows the neighbouring equations to disagree on the boundary by up to 0.05 % in v,
	// 0.2 kJ/kg in h and 0.2 J/(kg K) in s (section 10 of the release, from memory).
	const region1: [p: number, v: number, h: number, s: number][] = [
		[17, 0.001727009096, 1666.589458, 3.770121311],
		[25, 0.001598792105, 1623.864576, 3.680331353],
		[50, 0.001442437213, 1575.98324, 3.542991724],
		[100, 0.001311760027, 1553.922503, 3.397782955]
	];
	const region2: [p: number, v: number, h: number, s: number][] = [
		[17, 0.008766081208, 2581.463992, 5.232854834],
		[25, 0.006357050919, 2622.770184, 5.205319038],
		[50, 0.00353809389, 2626.885086, 5.051220073],
		[100, 0.002584718496, 2812.942061, 5.097969028]
	];

	it('matches region 1 at 623.15 K within the IF97 boundary tolerances', () => {
		for (const [p, v, h, s] of region1) {
			const state = region3FromPT(p, 623.15);
			expect(rel(state.v, v)).toBeLessThan(5e-4);
			expect(Math.abs(state.h - h)).toBeLessThan(0.2);
			expect(Math.abs(state.s - s)).toBeLessThan(2e-4);
		}
	});

	it('matches region 2 at T_B23(p) within the IF97 boundary tolerances', () => {
		for (const [p, v, h, s] of region2) {
			const state = region3FromPT(p, b23Temperature(p));
			expect(rel(state.v, v)).toBeLessThan(5e-4);
			expect(Math.abs(state.h - h)).toBeLessThan(0.2);
			expect(Math.abs(state.s - s)).toBeLessThan(2e-4);
		}
	});

	it("accepts (p, h) and (p, s) at the neighbouring regions' boundary values", () => {
		// A dispatcher placing states by region 1's or region 2's boundary value hands region 3
		// states a hair beyond its own boundary; they must be solved, landing within 0.1 K.
		for (const [p, , h, s] of region1) {
			expect(Math.abs(region3FromPH(p, h).T - 623.15)).toBeLessThan(0.1);
			expect(Math.abs(region3FromPS(p, s).T - 623.15)).toBeLessThan(0.1);
		}
		for (const [p, , h, s] of region2) {
			expect(Math.abs(region3FromPH(p, h).T - b23Temperature(p))).toBeLessThan(0.1);
			expect(Math.abs(region3FromPS(p, s).T - b23Temperature(p))).toBeLessThan(0.1);
		}
	});
});

describe('bad input throws SteamRangeError naming the quantity, value and range', () => {
	const bad = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -1, 0];

	it('rejects pressures outside 16.529 to 100 MPa and non-finite ones', () => {
		for (const p of [...bad, 10, 16.5, 100.01, 1e6]) {
			expect(() => region3FromPT(p, 650)).toThrow(SteamRangeError);
			expect(() => region3FromPH(p, 2000)).toThrow(SteamRangeError);
			expect(() => region3FromPS(p, 4.4)).toThrow(SteamRangeError);
			expect(() => region3FromPT(p, 650)).toThrow(/pressure p = .* 16\.529\d* to 100 MPa/);
		}
	});

	it('rejects temperatures outside 623.15 K to T_B23(p)', () => {
		for (const T of [...bad, 273.15, 623.1, 700.5]) {
			expect(() => region3FromPT(25, T)).toThrow(SteamRangeError);
			expect(() => region3FromPT(25, T)).toThrow(/temperature T = .* 623\.15 to 676\.81\d* K/);
		}
		// Just inside both limits is fine.
		expect(region3FromPT(25, 623.15).T).toBe(623.15);
		expect(region3FromPT(25, b23Temperature(25)).p).toBe(25);
	});

	it('rejects enthalpies and entropies outside region 3 at the given pressure', () => {
		for (const h of [Number.NaN, Number.POSITIVE_INFINITY, -100, 1000, 1500, 2700, 4000]) {
			expect(() => region3FromPH(25, h)).toThrow(SteamRangeError);
			expect(() => region3FromPH(25, h)).toThrow(/specific enthalpy h = .* kJ\/kg/);
		}
		for (const s of [Number.NaN, Number.NEGATIVE_INFINITY, 0, 3, 5.4, 9]) {
			expect(() => region3FromPS(25, s)).toThrow(SteamRangeError);
			expect(() => region3FromPS(25, s)).toThrow(/specific entropy s = .* kJ\/\(kg K\)/);
		}
	});

	it('rejects (p, h) and (p, s) inside the two-phase dome, quoting both saturation values', () => {
		const Ts = tsat(20);
		const hL = region3FromPT(20, Ts - 1e-9).h;
		const hV = region3FromPT(20, Ts + 1e-9).h;
		expect(() => region3FromPH(20, 0.5 * (hL + hV))).toThrow(/two-phase/);
		const sL = region3FromPT(20, Ts - 1e-9).s;
		const sV = region3FromPT(20, Ts + 1e-9).s;
		expect(() => region3FromPS(20, 0.5 * (sL + sV))).toThrow(/two-phase/);
		// psat(T) and tsat(p) are exact inverses, so the edges of the dome are still accepted.
		expect(psat(Ts)).toBeCloseTo(20, 9);
		expect(region3FromPH(20, hL - 1e-6).T).toBeLessThanOrEqual(Ts);
		expect(region3FromPH(20, hV + 1e-6).T).toBeGreaterThanOrEqual(Ts);
	});
});
