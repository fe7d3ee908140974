import { describe, expect, it } from 'vitest';
import { P_CRIT, RHO_CRIT, T_CRIT } from './constants';
import { SteamRangeError } from './errors';
import { region3FromRhoT } from './region3';

/** Specific Helmholtz energy f = u − Ts [kJ/kg]. */
function helmholtzEnergy(rho: number, T: number): number {
	const state = region3FromRhoT(rho, T);
	return state.u - T * state.s;
}

// States spread over region 3: dense liquid-like, near-critical, light vapour-like, hot.
const STATES: [rho: number, T: number][] = [
	[600, 630],
	[500, 650],
	[322, 660],
	[200, 650],
	[150, 700],
	[400, 800],
	[250, 860]
];

describe('region3FromRhoT: the table 31 relations agree with derivatives of f(ρ, T)', () => {
	for (const [rho, T] of STATES) {
		it(`ρ = ${rho} kg/m³, T = ${T} K`, () => {
			const state = region3FromRhoT(rho, T);
			const dr = rho * 1e-5;
			const dT = T * 1e-5;
			// p = ρ² (∂f/∂ρ)_T, with f in kJ/kg and p in MPa.
			const dfdrho = (helmholtzEnergy(rho + dr, T) - helmholtzEnergy(rho - dr, T)) / (2 * dr);
			expect(Math.abs((rho * rho * dfdrho) / 1000 - state.p) / state.p).toBeLessThan(1e-7);
			// s = −(∂f/∂T)_ρ and cv = (∂u/∂T)_ρ.
			const dfdT = (helmholtzEnergy(rho, T + dT) - helmholtzEnergy(rho, T - dT)) / (2 * dT);
			expect(Math.abs(-dfdT - state.s) / state.s).toBeLessThan(1e-7);
			const dudT = (region3FromRhoT(rho, T + dT).u - region3FromRhoT(rho, T - dT).u) / (2 * dT);
			expect(Math.abs(dudT - state.cv) / state.cv).toBeLessThan(1e-6);
			// h = u + pv.
			expect(Math.abs(state.u + state.p * 1000 * state.v - state.h) / state.h).toBeLessThan(1e-13);
			expect(state.v).toBe(1 / rho);
			expect(state.T).toBe(T);
		});
	}

	it('has w² = (∂p/∂ρ)_s, checked by a small step along an isentrope', () => {
		const rho = 450;
		const T = 700;
		const state = region3FromRhoT(rho, T);
		// Step ρ by dρ and T by the isentropic dT = T (∂p/∂T)_ρ dρ / (ρ² cv), then compare Δp/Δρ.
		const dr = 0.01;
		const dpdT = (region3FromRhoT(rho, T + 1e-4).p - region3FromRhoT(rho, T - 1e-4).p) / 2e-4;
		const dT = (T * dpdT * 1000 * dr) / (rho * rho * state.cv);
		const up = region3FromRhoT(rho + dr, T + dT);
		const down = region3FromRhoT(rho - dr, T - dT);
		expect(Math.abs(up.s - down.s)).toBeLessThan(1e-9);
		const w2 = ((up.p - down.p) * 1e6) / (2 * dr);
		expect(Math.abs(Math.sqrt(w2) - state.w) / state.w).toBeLessThan(1e-6);
	});

	it('has cp ≥ cv > 0 and real sound speeds across the region', () => {
		for (const [rho, T] of STATES) {
			const state = region3FromRhoT(rho, T);
			expect(state.cv).toBeGreaterThan(0);
			expect(state.cp).toBeGreaterThan(state.cv);
			expect(state.w).toBeGreaterThan(0);
		}
	});
});

describe('region3FromRhoT at the critical point', () => {
	it('reproduces the critical pressure, with dp/dρ vanishing there', () => {
		// IF97 eqs. 2–4: Tc = 647.096 K, pc = 22.064 MPa, ρc = 322 kg/m³ (pub). That eq. 28 yields
		// pc and a zero slope at (ρc, Tc) is stated in the release (from memory).
		const state = region3FromRhoT(RHO_CRIT, T_CRIT);
		expect(Math.abs(state.p - P_CRIT)).toBeLessThan(1e-8);
		const slope =
			(region3FromRhoT(RHO_CRIT + 0.01, T_CRIT).p - region3FromRhoT(RHO_CRIT - 0.01, T_CRIT).p) /
			0.02;
		// Away from the critical point the same slope is of order 0.01–1 MPa per kg/m³.
		expect(Math.abs(slope)).toBeLessThan(1e-9);
		// cp diverges at the critical point.
		expect(state.cp).toBeGreaterThan(1e6);
	});
});

describe('region3FromRhoT rejects non-physical input', () => {
	const cases: [number, number, string][] = [
		[0, 650, 'density ρ'],
		[-5, 650, 'density ρ'],
		[Number.NaN, 650, 'density ρ'],
		[Number.POSITIVE_INFINITY, 650, 'density ρ'],
		[500, 0, 'temperature T'],
		[500, -650, 'temperature T'],
		[500, Number.NaN, 'temperature T'],
		[500, Number.NEGATIVE_INFINITY, 'temperature T']
	];
	for (const [rho, T, quantity] of cases) {
		it(`ρ = ${rho}, T = ${T}`, () => {
			expect(() => region3FromRhoT(rho, T)).toThrow(SteamRangeError);
			expect(() => region3FromRhoT(rho, T)).toThrow(quantity);
		});
	}
});
