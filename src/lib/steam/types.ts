/**
 * Shared shapes of the steam engine. IF97 base units throughout:
 * p MPa (absolute), T K, v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s.
 */

/** IF97 region: 1 compressed liquid, 2 vapour, 3 near-critical, 4 two-phase, 5 high-temperature vapour. */
export type Region = 1 | 2 | 3 | 4 | 5;

export type Phase = 'liquid' | 'vapour' | 'two-phase' | 'supercritical';

/** Single-phase properties computed by a region's fundamental equation at one (p, T). */
export interface Properties {
	p: number;
	T: number;
	v: number;
	h: number;
	u: number;
	s: number;
	cp: number;
	cv: number;
	w: number;
}

/** A full state as returned by the public API. */
export interface SteamState {
	p: number;
	T: number;
	v: number;
	h: number;
	u: number;
	s: number;
	/** null inside the two-phase dome, where they are undefined. */
	cp: number | null;
	cv: number | null;
	w: number | null;
	/** Dryness fraction inside the two-phase dome (0..1); null outside it. */
	x: number | null;
	region: Region;
	phase: Phase;
}
