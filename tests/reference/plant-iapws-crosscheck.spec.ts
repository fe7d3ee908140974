/**
 * The plant module against Debian's python3-iapws (IAPWS-IF97): a grid of expansions, pumps and
 * Rankine cycles worked independently in tests/reference/plant_points.py from python3-iapws's
 * own states, and the saturation dome's entropies. Every result's energy balance is checked to
 * close, and the pump's v Δp approximation is compared with the exact isentropic rise.
 * What the grid leaves out (states a hair from saturation, inversions python3-iapws misses),
 * and why, is in plant_points.py.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import {
	expandSteam,
	pumpWork,
	rankineCycle,
	type RankineResult,
	saturationDome
} from '../../src/lib/steam/plant/index';
import { ensureIapws, loadGenerated } from './iapws-reference';

/**
 * Relative tolerance against python3-iapws. Both are IF97 and the grid keeps off the region
 * boundaries, so they agree to round-off (about 1e-14 measured with 1.5.3); 1e-8 leaves room
 * for python3-iapws's iterated inversions, which plant_points.py accepts only within 1e-9.
 */
const TOLERANCE = 1e-8;
/** Relative closure of an energy balance. */
const BALANCE = 1e-9;

interface Expansion {
	p1: number;
	T1: number | null;
	x1: number | null;
	p2: number;
	eta: number;
	ref: {
		h1: number;
		s1: number;
		h2s: number;
		T2s: number;
		x2s: number | null;
		h2: number;
		T2: number;
		s2: number;
		x2: number | null;
		work: number;
	};
}

interface Pump {
	p1: number;
	T1: number | null;
	p2: number;
	eta: number;
	ref: { h1: number; v1: number; vdp: number; isentropic: number; work: number; h2: number };
}

interface Cycle {
	boilerPressure: number;
	condenserPressure: number;
	temperature: number | null;
	dryness: number | null;
	eta_t: number;
	eta_p: number;
	ref: Pick<
		RankineResult,
		| 'turbineWork'
		| 'pumpWork'
		| 'netWork'
		| 'heatSupplied'
		| 'heatRejected'
		| 'thermalEfficiency'
		| 'specificSteamConsumption'
		| 'exhaustDryness'
	>;
}

interface PlantPoints {
	meta: { library: string; domePoints: number; dropped: Record<string, number> };
	expansions: Expansion[];
	pumps: Pump[];
	cycles: Cycle[];
	dome: { i: number; T: number; sLiquid: number; sVapour: number }[];
}

let points: PlantPoints;

beforeAll(() => {
	points = loadGenerated<PlantPoints>('plant_points.py', 'plant-points.json', ensureIapws());
	console.log(
		`plant cross-check: ${points.expansions.length} expansions, ${points.pumps.length} pumps, ` +
			`${points.cycles.length} cycles, ${points.dome.length} dome points from ${points.meta.library}; ` +
			`dropped ${JSON.stringify(points.meta.dropped)}`
	);
}, 120_000);

/** |a − b| ÷ max(|b|, floor): relative, with an absolute floor where values pass through zero. */
function deviation(a: number, b: number, floor = 1): number {
	return Math.abs(a - b) / Math.max(Math.abs(b), floor);
}

/** Dryness agrees (absolute) and is null on both sides off the dome. */
function expectDryness(actual: number | null, expected: number | null, where: string): void {
	if (expected === null) expect(actual, where).toBeNull();
	else expect(Math.abs(actual! - expected), where).toBeLessThan(TOLERANCE);
}

describe('expandSteam against python3-iapws', () => {
	it('covers the grid', () => {
		expect(points.expansions.length).toBeGreaterThan(400);
		expect(points.expansions.some((c) => c.ref.x2 !== null)).toBe(true);
		expect(points.expansions.some((c) => c.ref.x2 === null)).toBe(true);
	});

	it('agrees on every inlet, isentropic and actual end state, and the work', () => {
		for (const c of points.expansions) {
			const where = `p1=${c.p1} T1=${c.T1} x1=${c.x1} p2=${c.p2} η=${c.eta}`;
			const r = expandSteam({
				p1: c.p1,
				T1: c.T1 ?? undefined,
				x1: c.x1 ?? undefined,
				p2: c.p2,
				isentropicEfficiency: c.eta
			});
			expect(deviation(r.h1, c.ref.h1), where).toBeLessThan(TOLERANCE);
			expect(deviation(r.s1, c.ref.s1), where).toBeLessThan(TOLERANCE);
			expect(deviation(r.h2s, c.ref.h2s), where).toBeLessThan(TOLERANCE);
			expect(deviation(r.T2s, c.ref.T2s), where).toBeLessThan(TOLERANCE);
			expect(deviation(r.h2, c.ref.h2), where).toBeLessThan(TOLERANCE);
			expect(deviation(r.T2, c.ref.T2), where).toBeLessThan(TOLERANCE);
			expect(deviation(r.s2, c.ref.s2), where).toBeLessThan(TOLERANCE);
			expectDryness(r.x2s, c.ref.x2s, where);
			expectDryness(r.x2, c.ref.x2, where);
			expect(r.wetExhaust, where).toBe(c.ref.x2 !== null);
			// Work is a difference of enthalpies: compared on the enthalpy's scale.
			expect(Math.abs(r.work - c.ref.work) / c.ref.h1, where).toBeLessThan(TOLERANCE);
			// Energy balance: inlet enthalpy = work + outlet enthalpy.
			expect(deviation(r.work + r.h2, r.h1), where).toBeLessThan(BALANCE);
		}
	});
});

describe('pumpWork against python3-iapws', () => {
	it('agrees on v Δp, the exact isentropic rise and the actual outlet', () => {
		expect(points.pumps.length).toBeGreaterThan(150);
		for (const c of points.pumps) {
			const where = `p1=${c.p1} T1=${c.T1} p2=${c.p2} η=${c.eta}`;
			const r = pumpWork({ p1: c.p1, p2: c.p2, T1: c.T1 ?? undefined, efficiency: c.eta });
			expect(deviation(r.v1, c.ref.v1), where).toBeLessThan(TOLERANCE);
			expect(deviation(r.vdpWork, c.ref.vdp), where).toBeLessThan(TOLERANCE);
			// A few kJ/kg from two enthalpies near 100–400 kJ/kg: compared on their scale.
			const scale = Math.max(c.ref.h1, c.ref.h2);
			expect(Math.abs(r.isentropicWork - c.ref.isentropic) / scale, where).toBeLessThan(TOLERANCE);
			expect(deviation(r.h2, c.ref.h2), where).toBeLessThan(TOLERANCE);
			expect(deviation(r.h1 + r.work, r.h2), where).toBeLessThan(BALANCE);
		}
	});

	it('v Δp is close at low pressure and drifts high as the pressure rises', () => {
		// From saturated liquid at 10 kPa: python3-iapws's own v Δp beside its exact rise.
		const line = points.pumps
			.filter((c) => c.p1 === 0.005 && c.T1 === null && c.eta === 1)
			.sort((a, b) => a.p2 - b.p2);
		expect(line.length).toBeGreaterThan(6);
		let previous = 0;
		for (const c of line) {
			const ours = pumpWork({ p1: c.p1, p2: c.p2, efficiency: 1 }).approximationError;
			const theirs = (c.ref.vdp - c.ref.isentropic) / c.ref.isentropic;
			expect(Math.abs(ours - theirs), `p2=${c.p2}`).toBeLessThan(1e-8);
			expect(ours, `p2=${c.p2}`).toBeGreaterThan(previous);
			previous = ours;
			if (c.p2 <= 3) expect(ours, `p2=${c.p2}`).toBeLessThan(1e-3);
			if (c.p2 >= 60) expect(ours, `p2=${c.p2}`).toBeGreaterThan(1e-2);
		}
	});
});

describe('rankineCycle against python3-iapws', () => {
	it('agrees on the works, heats, efficiency and steam consumption, and closes its balance', () => {
		expect(points.cycles.length).toBeGreaterThan(200);
		for (const c of points.cycles) {
			const where = `pb=${c.boilerPressure} pc=${c.condenserPressure} T=${c.temperature} ηt=${c.eta_t} ηp=${c.eta_p}`;
			const r = rankineCycle({
				boilerPressure: c.boilerPressure,
				condenserPressure: c.condenserPressure,
				turbineInlet:
					c.temperature === null ? { dryness: c.dryness! } : { temperature: c.temperature },
				turbineEfficiency: c.eta_t,
				pumpEfficiency: c.eta_p
			});
			const scale = r.states.turbineInlet.h;
			for (const key of [
				'turbineWork',
				'pumpWork',
				'netWork',
				'heatSupplied',
				'heatRejected'
			] as const) {
				expect(Math.abs(r[key] - c.ref[key]) / scale, `${where} ${key}`).toBeLessThan(TOLERANCE);
			}
			expect(Math.abs(r.thermalEfficiency - c.ref.thermalEfficiency), where).toBeLessThan(
				TOLERANCE
			);
			expect(
				deviation(r.specificSteamConsumption, c.ref.specificSteamConsumption),
				where
			).toBeLessThan(TOLERANCE);
			expectDryness(r.exhaustDryness, c.ref.exhaustDryness, where);
			// Work + heat out = heat in: w_t + q_out = q_in + w_p.
			const into = r.heatSupplied + r.pumpWork;
			expect(deviation(r.turbineWork + r.heatRejected, into), where).toBeLessThan(BALANCE);
		}
	});
});

describe('saturationDome against python3-iapws', () => {
	it('has python3-iapws’s saturated entropies at its temperatures', () => {
		const dome = saturationDome(points.meta.domePoints);
		expect(points.dome.length).toBeGreaterThan(70);
		for (const ref of points.dome) {
			const where = `T=${ref.T}`;
			expect(deviation(dome.liquid[ref.i].T, ref.T), where).toBeLessThan(1e-12);
			// s' is zero at the triple point by IF97's reference state: an absolute floor there.
			expect(deviation(dome.liquid[ref.i].s, ref.sLiquid, 1e-3), where).toBeLessThan(TOLERANCE);
			expect(deviation(dome.vapour[ref.i].s, ref.sVapour), where).toBeLessThan(TOLERANCE);
		}
	});
});
