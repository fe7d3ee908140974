/**
 * Newton iteration for the temperature at which a region's forward equation gives a wanted
 * enthalpy or entropy at fixed pressure. Both rise with temperature (cp > 0), which makes a
 * bracket from the signs of the residuals, and bisection covers any step that leaves it.
 *
 * Steps are Halley's (second order, from dcp/dT as well as cp), so from a backward equation's
 * first guess, a few hundredths of a kelvin off, one step usually lands within 1e-13 of T (at
 * worst about 1e-11). The next evaluation is then the full property set, which both checks
 * convergence and is the answer: one h-s-cp evaluation and one full evaluation in the common
 * case, where Newton needed two of the first kind before the full one.
 */
import { CP, CP_T, H, S } from './properties-buffer';
import { region1HsCpInto, region1Into } from './region1';
import { region2HsCpInto, region2Into } from './region2';
import { region5HsCpInto, region5Into } from './region5';

/** What the solver matches: enthalpy h [kJ/kg] or entropy s [kJ/(kg K)]. */
export type Matched = 'h' | 's';

/** Regions with a Gibbs equation in (p, T). */
export type GibbsRegion = 1 | 2 | 5;

/**
 * Converged when the Newton step is below this fraction of T: far inside the 1e-9 agreement
 * the round trips need, yet above the rounding noise of the equations (about 1e-15).
 */
const TOLERANCE = 1e-12;
/**
 * A full evaluation is the answer when the Newton step from it is below this fraction of T;
 * otherwise that step is taken (h and cp at T are known) and the evaluation repeated. Ten
 * times inside TOLERANCE, so answers lie within about 1e-13 of the exact T.
 */
const ACCEPT = 1e-13;
/**
 * A step below this fraction of T is taken without another check: Newton's error after it is
 * about (c′/2c)·ΔT², with c′/c under 0.1 per kelvin anywhere in regions 1, 2 and 5, so below
 * 1e-13 of T (Halley's is smaller still).
 */
const LAST_STEP = 1e-7;
/**
 * After a Halley step below this fraction of T the next evaluation is the full one: the
 * step's error, of order ΔT³ times c″/6c, then leaves at most a last step below LAST_STEP.
 */
const NEAR = 1e-4;
/** Halley's correction is used only while it changes the Newton step by less than half. */
const HALLEY_LIMIT = 0.5;
const MAX_ITERATIONS = 100;

/** All properties of a region at p [MPa], T [K] into a buffer (slots V … W). */
export function gibbsInto(region: GibbsRegion, p: number, T: number, out: Float64Array): void {
	if (region === 1) region1Into(p, T, out);
	else if (region === 2) region2Into(p, T, out);
	else region5Into(p, T, out);
}

/** Only h, s, cp and dcp/dT of a region at p [MPa], T [K] into slots H, S, CP, CP_T. */
export function gibbsHsCpInto(region: GibbsRegion, p: number, T: number, out: Float64Array): void {
	if (region === 1) region1HsCpInto(p, T, out);
	else if (region === 2) region2HsCpInto(p, T, out);
	else region5HsCpInto(p, T, out);
}

/**
 * Temperature [K] in [lo, hi] where the region's h (or s) at p [MPa] equals target, starting
 * from guess T0 [K]; out then holds all properties there. Returns NaN when the solution lies
 * outside [lo, hi], so callers can try a region first and fall back to its boundaries.
 */
export function solveTemperature(
	region: GibbsRegion,
	matched: Matched,
	p: number,
	target: number,
	T0: number,
	lo: number,
	hi: number,
	out: Float64Array
): number {
	let a = lo;
	let b = hi;
	let T = T0 >= lo && T0 <= hi ? T0 : T0 < lo ? lo : T0 > hi ? hi : 0.5 * (lo + hi);
	// Whether out holds the full property set at T (else only h, s, cp and dcp/dT).
	let full = false;
	for (let i = 0; i < MAX_ITERATIONS; i++) {
		if (full) gibbsInto(region, p, T, out);
		else gibbsHsCpInto(region, p, T, out);
		const f = matched === 'h' ? out[H] - target : out[S] - target;
		const slope = matched === 'h' ? out[CP] : out[CP] / T;
		if (f < 0) a = T;
		else b = T;
		let dT = -f / slope;
		if (full && Math.abs(dT) <= ACCEPT * T) return T;
		const converged = Math.abs(dT) <= TOLERANCE * T;
		// At a limit and still pointing out of it: the solution is not in [lo, hi].
		if (!converged && ((T <= lo && dT < 0) || (T >= hi && dT > 0))) return NaN;
		if (b - a <= TOLERANCE * T) return full ? T : finish(region, p, T, out);
		if (!full) {
			// Halley: f + f′·ΔT + f″·ΔT²/2 = 0 with the Newton step inside the square.
			const curvature = matched === 'h' ? out[CP_T] : (out[CP_T] - out[CP] / T) / T;
			const k = (0.5 * curvature * dT) / slope;
			if (Math.abs(k) < HALLEY_LIMIT) dT /= 1 + k;
		}
		let next = T + dT;
		if (next > a && next < b) {
			T = next;
			if (Math.abs(dT) <= LAST_STEP * T) return finish(region, p, T, out);
			full = Math.abs(dT) <= NEAR * T;
			continue;
		}
		if (converged) return full ? T : finish(region, p, T, out);
		// Try the limit itself once before bisecting, so a solution outside is found fast.
		if (next <= a) next = a === lo ? lo : 0.5 * (a + b);
		else next = b === hi ? hi : 0.5 * (a + b);
		T = next;
		full = false;
	}
	return full ? T : finish(region, p, T, out);
}

/** The full property set at the answer T [K]; returns T. */
function finish(region: GibbsRegion, p: number, T: number, out: Float64Array): number {
	gibbsInto(region, p, T, out);
	return T;
}
