/**
 * Assembly of the public SteamState from solver buffers or region 3 property objects.
 * Every state is built by the one object literal in makeState, so all states share a shape.
 */
import { P_CRIT, RHO_CRIT, T_CRIT } from './constants';
import { CP, CV, H, S, U, V, W } from './properties-buffer';
import type { Phase, Properties, Region, SteamState } from './types';

function makeState(
	p: number,
	T: number,
	v: number,
	h: number,
	u: number,
	s: number,
	cp: number | null,
	cv: number | null,
	w: number | null,
	x: number | null,
	region: Region,
	phase: Phase
): SteamState {
	return { p, T, v, h, u, s, cp, cv, w, x, region, phase };
}

/**
 * Phase word of a single-phase state. Above the critical pressure the fluid is liquid below the
 * critical temperature and supercritical above it; below it, region 3 is liquid on the dense
 * side of the critical density and vapour on the other.
 */
export function singlePhaseOf(p: number, T: number, v: number, region: Region): Phase {
	if (region === 1) return 'liquid';
	if (p > P_CRIT) return T < T_CRIT ? 'liquid' : 'supercritical';
	if (region === 3) return v * RHO_CRIT < 1 ? 'liquid' : 'vapour';
	return 'vapour';
}

/** A single-phase state (x = null) from a filled property buffer. */
export function singlePhaseState(
	p: number,
	T: number,
	b: Float64Array,
	region: Region
): SteamState {
	const v = b[V];
	const phase = singlePhaseOf(p, T, v, region);
	return makeState(p, T, v, b[H], b[U], b[S], b[CP], b[CV], b[W], null, region, phase);
}

/** A single-phase state from a region 3 property object (its own p and T). */
export function region3State(props: Properties): SteamState {
	const { p, T, v } = props;
	const phase = singlePhaseOf(p, T, v, 3);
	return makeState(p, T, v, props.h, props.u, props.s, props.cp, props.cv, props.w, null, 3, phase);
}

/** Copies a property object into a buffer (for region 3 saturated phases). */
export function intoBuffer(props: Properties, b: Float64Array): void {
	b[V] = props.v;
	b[H] = props.h;
	b[U] = props.u;
	b[S] = props.s;
	b[CP] = props.cp;
	b[CV] = props.cv;
	b[W] = props.w;
}

/**
 * A state on or inside the saturation dome at p [MPa], T [K] with dryness fraction x, from the
 * saturated liquid and vapour buffers. On the dome's edges (x = 0 or 1) it is that saturated
 * phase with its cp, cv and w, in the region whose equation gave it; inside, region 4 with cp,
 * cv and w null (they are undefined for a two-phase mixture).
 */
export function saturationState(
	p: number,
	T: number,
	liquid: Float64Array,
	vapour: Float64Array,
	x: number,
	liquidRegion: Region,
	vapourRegion: Region
): SteamState {
	if (x === 0) {
		const l = liquid;
		return makeState(p, T, l[V], l[H], l[U], l[S], l[CP], l[CV], l[W], 0, liquidRegion, 'liquid');
	}
	if (x === 1) {
		const g = vapour;
		return makeState(p, T, g[V], g[H], g[U], g[S], g[CP], g[CV], g[W], 1, vapourRegion, 'vapour');
	}
	const l = liquid;
	const g = vapour;
	const v = l[V] + x * (g[V] - l[V]);
	const h = l[H] + x * (g[H] - l[H]);
	const u = l[U] + x * (g[U] - l[U]);
	const s = l[S] + x * (g[S] - l[S]);
	return makeState(p, T, v, h, u, s, null, null, null, x, 4, 'two-phase');
}
