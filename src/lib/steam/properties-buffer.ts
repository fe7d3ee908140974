/**
 * The solvers work on properties held in a small Float64Array instead of objects, so a
 * Newton iteration allocates nothing; slots below. Only the returned state becomes an object.
 */
import type { Properties } from './types';

export const V = 0;
export const H = 1;
export const U = 2;
export const S = 3;
export const CP = 4;
export const CV = 5;
export const W = 6;
/**
 * dcp/dT at constant p [kJ/(kg K²)], written only by the h-s-cp evaluations of the temperature
 * solver, which use it for a second-order step.
 */
export const CP_T = 7;

/** A buffer with one slot per property (v, h, u, s, cp, cv, w) and CP_T. */
export function propertiesBuffer(): Float64Array {
	return new Float64Array(8);
}

/** Builds a Properties object at p [MPa], T [K] from a filled buffer. */
export function toProperties(p: number, T: number, b: Float64Array): Properties {
	return { p, T, v: b[V], h: b[H], u: b[U], s: b[S], cp: b[CP], cv: b[CV], w: b[W] };
}
