/**
 * stateFromPT: region selection, phases and continuity across the region boundaries. Where two
 * regions meet, their equations differ slightly; the limits are the release's permissible
 * inconsistencies at region boundaries (IAPWS R7-97(2012), from memory): v 0.05 %, h 0.2 kJ/kg,
 * s 0.2 J/(kg K), cp 1 %, w 1 %, Gibbs energy g = h − Ts 0.2 kJ/kg.
 */
import { describe, expect, it } from 'vitest';
import { b23Pressure, b23Temperature } from './b23';
import { stateFromPT } from './forward';
import { psat, tsat } from './region4';
import type { SteamState } from './types';

function expectContinuous(a: SteamState, b: SteamState): void {
	expect(Math.abs(a.v / b.v - 1)).toBeLessThan(5e-4);
	expect(Math.abs(a.h - b.h)).toBeLessThan(0.2);
	expect(Math.abs(a.s - b.s)).toBeLessThan(2e-4);
	expect(Math.abs((a.cp as number) / (b.cp as number) - 1)).toBeLessThan(0.01);
	expect(Math.abs((a.w as number) / (b.w as number) - 1)).toBeLessThan(0.01);
	expect(Math.abs(a.h - a.T * a.s - (b.h - b.T * b.s))).toBeLessThan(0.2);
}

const up = (x: number) => x * (1 + 1e-12);
const down = (x: number) => x * (1 - 1e-12);

describe('stateFromPT: regions and phases', () => {
	it('compressed liquid up to the saturation temperature, vapour above', () => {
		const Ts = tsat(1);
		expect(stateFromPT(1, Ts)).toMatchObject({ region: 1, phase: 'liquid', x: null });
		expect(stateFromPT(1, up(Ts))).toMatchObject({ region: 2, phase: 'vapour', x: null });
	});

	it('region 3 between 623.15 K and the B23 line, region 2 beyond, region 5 above 1073.15 K', () => {
		expect(stateFromPT(30, 623.15).region).toBe(1);
		expect(stateFromPT(30, up(623.15)).region).toBe(3);
		const Tb = b23Temperature(30);
		expect(stateFromPT(30, down(Tb)).region).toBe(3);
		expect(stateFromPT(30, up(Tb)).region).toBe(2);
		expect(stateFromPT(30, 1073.15).region).toBe(2);
		expect(stateFromPT(30, up(1073.15)).region).toBe(5);
	});

	it('names the phase: liquid, vapour, supercritical', () => {
		expect(stateFromPT(30, 600).phase).toBe('liquid');
		expect(stateFromPT(30, 640).phase).toBe('liquid'); // region 3, below Tc
		expect(stateFromPT(30, 700).phase).toBe('supercritical');
		expect(stateFromPT(20, 640).phase).toBe('vapour'); // region 3, above Tsat(20 MPa)
		expect(stateFromPT(20, 630).phase).toBe('liquid'); // region 3, below Tsat(20 MPa)
		expect(stateFromPT(0.1, 1500).phase).toBe('vapour');
		expect(stateFromPT(40, 1500).phase).toBe('supercritical');
	});

	it('keeps the pressure and temperature given, and a finite value for every property', () => {
		for (const [p, T] of [
			[1e-6, 273.15],
			[100, 273.15],
			[100, 1073.15],
			[50, 2273.15],
			[1e-6, 2273.15],
			[22.064, 647.096]
		]) {
			const state = stateFromPT(p, T);
			expect(state.p).toBe(p);
			expect(state.T).toBe(T);
			for (const key of ['v', 'h', 'u', 's', 'cp', 'cv', 'w'] as const) {
				expect(Number.isFinite(state[key])).toBe(true);
			}
		}
	});

	it('u = h − p v in every region', () => {
		for (const [p, T] of [
			[3, 300],
			[0.1, 500],
			[25, 650],
			[10, 1500]
		]) {
			const { h, u, v } = stateFromPT(p, T);
			expect(u).toBeCloseTo(h - p * 1000 * v, 9);
		}
	});
});

describe('stateFromPT: continuity across region boundaries', () => {
	it('regions 1 and 3 meet at 623.15 K', () => {
		for (let p = psat(623.15) + 1e-6; p <= 100; p += 2.5) {
			const a = stateFromPT(p, 623.15);
			const b = stateFromPT(p, up(623.15));
			expect([a.region, b.region]).toEqual([1, 3]);
			expectContinuous(a, b);
		}
	});

	it('regions 2 and 3 meet along the B23 line', () => {
		for (let T = 623.2; T <= 863.15; T += 5) {
			const p = b23Pressure(T);
			const a = stateFromPT(up(p), T);
			const b = stateFromPT(p, T);
			expect([a.region, b.region]).toEqual([3, 2]);
			expectContinuous(a, b);
		}
	});

	it('regions 2 and 5 meet at 1073.15 K', () => {
		for (const p of [1e-6, 0.001, 0.1, 1, 5, 10, 20, 30, 40, 50]) {
			const a = stateFromPT(p, 1073.15);
			const b = stateFromPT(p, up(1073.15));
			expect([a.region, b.region]).toEqual([2, 5]);
			expectContinuous(a, b);
		}
	});

	it('regions 1 and 2 give the same Gibbs energy on the saturation line (phase equilibrium)', () => {
		for (let T = 273.15; T <= 623.15; T += 5) {
			const p = psat(T);
			const liquid = stateFromPT(p, T);
			const vapour = stateFromPT(down(p), T);
			expect([liquid.region, vapour.region]).toEqual([1, 2]);
			expect(Math.abs(liquid.h - T * liquid.s - (vapour.h - T * vapour.s))).toBeLessThan(0.2);
		}
	});
});
