/**
 * Seeded input arrays for the benchmark, spread over the conditions a steam plant runs at:
 * feedwater and condensate (region 1), superheated steam (region 2), wet steam for the
 * inversions, and saturation pressures from a condenser vacuum to a high-pressure boiler.
 */
import {
	saturationTemperature,
	stateFromPT,
	stateFromPX,
	type SteamState
} from '../src/lib/steam/index';

export type Operation = 'ptRegion1' | 'ptRegion2' | 'saturationTemperature' | 'ph' | 'ps';
export type BenchInputs = Record<Operation, { a: Float64Array; b: Float64Array }>;

const SIZE = 4096;

/** mulberry32: a small, fast, seeded generator, so every run times the same inputs. */
function generator(seed: number): () => number {
	let t = seed >>> 0;
	return () => {
		t = (t + 0x6d2b79f5) >>> 0;
		let r = Math.imul(t ^ (t >>> 15), 1 | t);
		r = (r + Math.imul(r ^ (r >>> 7), 61 | r)) ^ r;
		return ((r ^ (r >>> 14)) >>> 0) / 4294967296;
	};
}

const random = generator(1997);
const between = (lo: number, hi: number) => lo + (hi - lo) * random();
const logBetween = (lo: number, hi: number) => lo * (hi / lo) ** random();

/** Compressed liquid: 0.1 to 20 MPa, 10 °C up to 1 K below saturation (or 623.15 K). */
function liquid(): [number, number] {
	const p = between(0.1, 20);
	return [p, between(283.15, Math.min(saturationTemperature(p), 623.15) - 1)];
}

/** Superheated steam: 5 kPa to 16 MPa, 2 K above saturation up to 600 °C. */
function superheated(): [number, number] {
	const p = logBetween(0.005, 16);
	return [p, between(saturationTemperature(p) + 2, 873.15)];
}

/** A state for the inversions: one third each liquid, wet steam and superheated steam. */
function mixedState(): SteamState {
	const pick = random();
	if (pick < 1 / 3) return stateFromPT(...liquid());
	if (pick < 2 / 3) return stateFromPX(logBetween(0.005, 16), between(0.05, 1));
	return stateFromPT(...superheated());
}

function fill(make: () => [number, number]) {
	const a = new Float64Array(SIZE);
	const b = new Float64Array(SIZE);
	for (let i = 0; i < SIZE; i++) [a[i], b[i]] = make();
	return { a, b };
}

export function benchInputs(): BenchInputs {
	return {
		ptRegion1: fill(liquid),
		ptRegion2: fill(superheated),
		saturationTemperature: fill(() => [logBetween(0.005, 21), 0]),
		ph: fill(() => {
			const state = mixedState();
			return [state.p, state.h];
		}),
		ps: fill(() => {
			const state = mixedState();
			return [state.p, state.s];
		})
	};
}
