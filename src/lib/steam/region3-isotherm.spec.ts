import { describe, expect, it } from 'vitest';
import { b23Pressure } from './b23';
import { RHO_CRIT, T_CRIT } from './constants';
import { region3FromRhoT } from './region3';
import { densityOnIsotherm, LIQUID, VAPOUR } from './region3-isotherm';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** Pressure at the local extremes of the isotherm's van der Waals loop, by a fine scan. */
function loopExtremes(T: number): { max: number; min: number } {
	let max = -Infinity;
	let min = Infinity;
	let previous = region3FromRhoT(60, T).p;
	let rising = true;
	for (let rho = 60.25; rho < 750; rho += 0.25) {
		const p = region3FromRhoT(rho, T).p;
		if (rising && p < previous) {
			max = previous;
			rising = false;
		} else if (!rising && p > previous) {
			min = previous;
			break;
		}
		previous = p;
	}
	return { max, min };
}

describe('densityOnIsotherm below the critical temperature', () => {
	for (const T of [623.15, 630, 640, 646]) {
		const { max, min } = loopExtremes(T);

		it(`T = ${T} K: both roots inside the loop (p between ${min.toFixed(3)} and ${max.toFixed(3)} MPa)`, () => {
			expect(max).toBeGreaterThan(min);
			for (const p of [min + 0.1 * (max - min), 0.5 * (min + max), max - 0.1 * (max - min)]) {
				if (p <= 0) continue;
				const liquid = densityOnIsotherm(p, T, LIQUID);
				const vapour = densityOnIsotherm(p, T, VAPOUR);
				expect(rel(region3FromRhoT(liquid, T).p, p)).toBeLessThan(1e-12);
				expect(rel(region3FromRhoT(vapour, T).p, p)).toBeLessThan(1e-12);
				expect(liquid).toBeGreaterThan(RHO_CRIT);
				expect(vapour).toBeLessThan(RHO_CRIT);
				// Each lies on a rising (stable or metastable) branch, not the unstable middle one.
				for (const rho of [liquid, vapour]) {
					expect(region3FromRhoT(rho * 1.0001, T).p).toBeGreaterThan(region3FromRhoT(rho, T).p);
				}
			}
		});

		it(`T = ${T} K: a branch with no root gives the one root there is`, () => {
			const above = max + 1;
			expect(
				rel(densityOnIsotherm(above, T, VAPOUR), densityOnIsotherm(above, T, LIQUID))
			).toBeLessThan(1e-12);
			expect(densityOnIsotherm(above, T, LIQUID)).toBeGreaterThan(RHO_CRIT);
			const below = min - 1;
			if (below > 1) {
				expect(
					rel(densityOnIsotherm(below, T, LIQUID), densityOnIsotherm(below, T, VAPOUR))
				).toBeLessThan(1e-12);
				expect(densityOnIsotherm(below, T, VAPOUR)).toBeLessThan(RHO_CRIT);
			}
		});
	}
});

describe('densityOnIsotherm at and above the critical temperature', () => {
	it('has one root whichever branch is asked for', () => {
		for (const T of [T_CRIT, T_CRIT + 1e-6, 650, 700, 800, 863.15]) {
			for (const p of [22.064, 25, 40, 70, 100]) {
				const liquid = densityOnIsotherm(p, T, LIQUID);
				expect(rel(densityOnIsotherm(p, T, VAPOUR), liquid)).toBeLessThan(1e-12);
				expect(rel(region3FromRhoT(liquid, T).p, p)).toBeLessThan(1e-12);
			}
		}
	});

	it('finds the critical density on the critical isotherm at the critical pressure', () => {
		// The isotherm is flat to third order there: |p − pc| ~ (ρ − ρc)³, so a pressure exact to
		// 1e-15 fixes ρ only to about 1e-5 relative.
		expect(rel(densityOnIsotherm(22.064, T_CRIT, LIQUID), RHO_CRIT)).toBeLessThan(1e-3);
	});
});

describe('the search interval the solver relies on', () => {
	it('holds on every region 3 isotherm: 50 and 800 kg/m³ bracket its pressures, one loop at most', () => {
		for (let T = 623.05; T <= 863.25; T += 0.5) {
			const p = (rho: number) => region3FromRhoT(rho, T).p;
			// The lowest pressure region 3 (with its 0.1 K band) reaches on this isotherm.
			const pMin = T <= 623.25 ? 16.5 : b23Pressure(T - 0.1);
			expect(p(50), `T = ${T}`).toBeLessThan(pMin);
			expect(p(800), `T = ${T}`).toBeGreaterThan(100);
			// dp/dρ changes sign at most twice (the two spinodals), and only below Tc.
			let changes = 0;
			let previous = p(50.5) - p(50);
			expect(previous).toBeGreaterThan(0);
			for (let rho = 52; rho <= 800; rho += 2) {
				const slope = p(rho + 0.5) - p(rho);
				if (slope > 0 !== previous > 0) changes++;
				previous = slope;
			}
			expect(previous).toBeGreaterThan(0);
			expect(changes, `T = ${T}`).toBeLessThanOrEqual(T < T_CRIT ? 2 : 0);
		}
	});
});
