/**
 * stateFromPH and stateFromPS: round trips (p, T) → h or s → T over the whole range of the
 * formulation, two-phase states by x, and out-of-range values.
 */
import { describe, expect, it } from 'vitest';
import { SteamRangeError } from './errors';
import { stateFromPT } from './forward';
import { stateFromPH, stateFromPS } from './inverse';
import { b23Temperature } from './b23';
import { psat, tsat } from './region4';
import { stateFromPX } from './saturation';
import type { SteamState } from './types';

const KEYS = ['v', 'h', 'u', 's', 'cp', 'cv', 'w'] as const;

function expectSameState(a: SteamState, b: SteamState, rel: number): void {
	expect(b.region).toBe(a.region);
	expect(Math.abs(b.T / a.T - 1)).toBeLessThan(rel);
	for (const key of KEYS) {
		const [x, y] = [a[key] as number, b[key] as number];
		expect(Math.abs(x - y), key).toBeLessThanOrEqual(rel * Math.max(Math.abs(x), 1));
	}
}

/** p from 1 Pa to 100 MPa (log-spaced) × T from 273.15 K to 2273.15 K; 50 MPa cap above 1073.15 K. */
function* grid(nP: number, nT: number): Generator<[number, number]> {
	for (let i = 0; i <= nP; i++) {
		const p = 1e-6 * Math.pow(1e8, i / nP);
		for (let j = 0; j <= nT; j++) {
			const T = 273.15 + (2000 * j) / nT;
			if (T > 1073.15 && p > 50) continue;
			yield [p, T];
		}
	}
}

// About 3,500 states each, with a dozen assertions per state: allow a minute on a busy machine.
describe('round trips over the whole range', () => {
	it('(p, T) → h → (p, h) → T agrees to 1e-9 in every region', () => {
		const regions = new Set<number>();
		for (const [p, T] of grid(48, 72)) {
			const a = stateFromPT(p, T);
			regions.add(a.region);
			expectSameState(a, stateFromPH(p, a.h), 1e-9);
		}
		expect([...regions].sort()).toEqual([1, 2, 3, 5]);
	}, 60_000);

	it('(p, T) → s → (p, s) → T agrees to 1e-9 in every region', () => {
		for (const [p, T] of grid(48, 72)) {
			const a = stateFromPT(p, T);
			expectSameState(a, stateFromPS(p, a.s), 1e-9);
		}
	}, 60_000);

	it('round trips hold close to every region boundary', () => {
		const points: [number, number][] = [
			[1, tsat(1)], // saturated liquid, region 1
			[1, tsat(1) * (1 + 1e-9)], // just vapour, region 2
			[16.5, 623.15],
			[16.6, 623.15],
			[16.6, 623.16],
			[25, 623.15],
			[25, 623.2],
			// Beside the critical point (at it cp is infinite in principle and numerically ill-posed).
			[22.064, 647.2],
			[22.1, 647.096],
			[40, 1073.15],
			[40, 1073.16],
			[0.0001, 273.15],
			[100, 273.15],
			[psat(300), 300],
			[0.000611, 273.15]
		];
		for (const [p, T] of points) {
			const a = stateFromPT(p, T);
			expectSameState(a, stateFromPH(p, a.h), 1e-9);
			expectSameState(a, stateFromPS(p, a.s), 1e-9);
		}
	});
	it('within a hair of a seam, land on the other side by no more than the seam inconsistency', () => {
		// Region 3 just above 623.15 K can have a lower h than region 1 at 623.15 K (the
		// equations differ there by up to 0.2 kJ/kg, IAPWS R7-97(2012), from memory), so
		// (p, h) gives region 1 a few mK below 623.15 K: same h, nearly the same T.
		for (const [p, T] of [
			[25, 623.151],
			[40, 623.1501],
			[60, b23Temperature(60) * (1 + 1e-7)],
			[30, 1073.1501]
		]) {
			const a = stateFromPT(p, T);
			for (const b of [stateFromPH(p, a.h), stateFromPS(p, a.s)]) {
				expect(Math.abs(b.T - T)).toBeLessThan(0.05);
			}
			expect(stateFromPH(p, a.h).h / a.h - 1).toBeCloseTo(0, 11);
			expect(stateFromPS(p, a.s).s / a.s - 1).toBeCloseTo(0, 11);
		}
	});
});

describe('two-phase states from (p, h) and (p, s)', () => {
	it('give region 4 with the dryness fraction of the lever rule', () => {
		for (const p of [0.001, 0.1, 1, 10, 16.5, 18, 21]) {
			for (const x of [0.01, 0.25, 0.5, 0.9, 0.999]) {
				const mix = stateFromPX(p, x);
				for (const state of [stateFromPH(p, mix.h), stateFromPS(p, mix.s)]) {
					expect(state).toMatchObject({
						region: 4,
						phase: 'two-phase',
						cp: null,
						cv: null,
						w: null
					});
					expect(state.x as number).toBeCloseTo(x, 10);
					expect(state.T).toBe(mix.T);
					expect(state.v / mix.v - 1).toBeCloseTo(0, 10);
				}
			}
		}
	});

	it('leave the dome at its edges: liquid below h′, vapour above h″', () => {
		const p = 2;
		const h1 = stateFromPX(p, 0).h;
		const h2 = stateFromPX(p, 1).h;
		expect(stateFromPH(p, h1 - 1e-6)).toMatchObject({ region: 1, x: null });
		expect(stateFromPH(p, h1 + 1e-6).region).toBe(4);
		expect(stateFromPH(p, h2 - 1e-6).region).toBe(4);
		expect(stateFromPH(p, h2 + 1e-6)).toMatchObject({ region: 2, x: null });
	});
});

describe('values outside the formulation', () => {
	it('throw SteamRangeError naming the range at that pressure', () => {
		const cases: [() => SteamState, RegExp][] = [
			[() => stateFromPH(1, -10), /specific enthalpy h = -10 .*kJ\/kg at p = 1 MPa/],
			[() => stateFromPH(1, 8000), /specific enthalpy h = 8000 .* to 7\d{3}(\.\d+)? kJ\/kg/],
			[() => stateFromPH(80, 5000), /specific enthalpy h = 5000/], // above 1073.15 K at 80 MPa
			[() => stateFromPS(1, -0.5), /specific entropy s = -0.5 .*kJ\/\(kg K\) at p = 1 MPa/],
			[() => stateFromPS(0.01, 14), /specific entropy s = 14/],
			[() => stateFromPH(1, Number.NaN), /specific enthalpy h = NaN \(not a finite number\)/],
			[() => stateFromPS(1, Infinity), /specific entropy s = Infinity/],
			[() => stateFromPH(0, 1000), /pressure p = 0 .*1e-6|pressure p = 0 .*0\.000001/],
			[() => stateFromPS(101, 5), /pressure p = 101 .*100 MPa/]
		];
		for (const [call, message] of cases) {
			expect(call).toThrow(SteamRangeError);
			expect(call).toThrow(message);
		}
	});

	it('accept the lowest and highest value at a pressure', () => {
		const lowest = stateFromPT(1, 273.15);
		const highest = stateFromPT(1, 2273.15);
		expect(stateFromPH(1, lowest.h).T).toBeCloseTo(273.15, 8);
		expect(stateFromPH(1, highest.h).T).toBeCloseTo(2273.15, 8);
		expect(stateFromPS(1, highest.s).T).toBeCloseTo(2273.15, 8);
	});
});
