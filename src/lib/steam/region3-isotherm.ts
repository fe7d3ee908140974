/**
 * Density from pressure along one region 3 isotherm.
 *
 * At fixed τ = Tc/T the region 3 equation's pressure is a polynomial in δ = ρ/ρc:
 * π(δ) = p/(ρc R T) = δ·δφ_δ = n1 δ + Σ_I I c_I(τ) δ^(I+1), with c_I(τ) = Σ n τ^J over the terms
 * of exponent I (table 30). Loading c_I once per temperature makes every later pressure
 * evaluation a 12-term Horner sum, so the root can be bracketed and bisected cheaply.
 *
 * Below the critical temperature the isotherm has a van der Waals loop: π rises to a local
 * maximum at the vapour spinodal, falls to a local minimum at the liquid spinodal and rises again.
 * Liquid roots lie right of the liquid spinodal, vapour roots left of the vapour spinodal, so the
 * root is bracketed on the branch asked for, using the critical density or, where that does not
 * separate the roots, the spinodals as bracket ends. A bracket holding exactly one sign change,
 * with safeguarded Newton iteration (bisection whenever a Newton step leaves the bracket or
 * stalls), always converges, including at the critical point where dπ/dδ → 0.
 */
import { R, RHO_CRIT, T_CRIT } from './constants';
import { MAX_I, MAX_J, N1, TERM_COUNT, TERM_I, TERM_J, TERM_N } from './region3-helmholtz';

/** Which root to return where an isotherm has three (below the critical temperature). */
export const LIQUID = 0;
export const VAPOUR = 1;
export type Branch = typeof LIQUID | typeof VAPOUR;

// Search interval in δ: 50 to 800 kg/m³. Across region 3 (and a little beyond its temperature
// limits) π rises with δ at both ends and spans 16.5 to 100 MPa with room to spare; past about
// 850 kg/m³ the polynomial turns down, a mathematical artefact, not water.
const DELTA_LO = 50 / RHO_CRIT;
const DELTA_HI = 800 / RHO_CRIT;

/** a[I] = I·c_I(τ) for the loaded isotherm. */
const a = new Float64Array(MAX_I + 1);
let loadedT = NaN;

const tauPow = new Float64Array(MAX_J + 1);

function loadIsotherm(T: number): void {
	if (T === loadedT) return;
	const tau = T_CRIT / T;
	tauPow[0] = 1;
	for (let j = 1; j <= MAX_J; j++) tauPow[j] = tauPow[j - 1] * tau;
	a.fill(0);
	for (let k = 0; k < TERM_COUNT; k++) {
		const i = TERM_I[k];
		a[i] += i * TERM_N[k] * tauPow[TERM_J[k]];
	}
	loadedT = T;
}

/** π(δ) = δ·δφ_δ. */
function pi(delta: number): number {
	let g = 0;
	for (let i = MAX_I; i >= 1; i--) g = (g + a[i]) * delta;
	return delta * (N1 + g);
}

/** dπ/dδ = 2δφ_δ + δ²φ_δδ (reduced, so positive where the fluid is mechanically stable). */
function dpi(delta: number): number {
	let g = 0;
	for (let i = MAX_I; i >= 1; i--) g = (g + (i + 1) * a[i]) * delta;
	return N1 + g;
}

/** d²π/dδ². */
function d2pi(delta: number): number {
	let g = 0;
	for (let i = MAX_I; i >= 1; i--) g = g * delta + i * (i + 1) * a[i];
	return g;
}

/**
 * Root of f(δ) = target in [lo, hi], which must hold exactly one crossing: f below target left
 * of it and above right of it when `rising` (the reverse otherwise), though f need not be
 * monotonic on either side. Safeguarded Newton from x0 with bisection, as in the usual "rtsafe"
 * scheme; every evaluation narrows the bracket by its sign alone.
 * Stops once |f − target| ≤ fTol (near the critical point f is so flat that rounding noise,
 * not the bracket, limits δ) or the Newton step falls below 1e-14 δ.
 */
function solveBracketed(
	f: (d: number) => number,
	df: (d: number) => number,
	target: number,
	lo: number,
	hi: number,
	rising: boolean,
	x0: number,
	fTol: number
): number {
	let x = x0 > lo && x0 < hi ? x0 : 0.5 * (lo + hi);
	let stepOld = hi - lo;
	let step = stepOld;
	for (let it = 0; it < 200; it++) {
		const r = f(x) - target;
		if (Math.abs(r) <= fTol) return x;
		if (r < 0 === rising) lo = x;
		else hi = x;
		const slope = df(x);
		const newton = x - r / slope;
		stepOld = step;
		if (!(newton > lo && newton < hi) || Math.abs(2 * r) > Math.abs(stepOld * slope)) {
			step = 0.5 * (hi - lo);
			x = lo + step;
		} else {
			step = r / slope;
			x = newton;
		}
		if (Math.abs(step) <= 1e-14 * x || hi - lo <= 4e-16 * x) return x;
	}
	return x;
}

/** Spinodal δ of the loaded isotherm: zero of dπ/dδ between lo and hi. Only a bracket end, so
 * it need not be sharp. */
function spinodal(lo: number, hi: number, rising: boolean): number {
	return solveBracketed(dpi, d2pi, 0, lo, hi, rising, 0.5 * (lo + hi), 1e-12);
}

/**
 * Density [kg/m³] at which the region 3 equation gives pressure p [MPa] at temperature T [K].
 * Below the critical temperature, `branch` picks the liquid-like (densest) or vapour-like
 * (lightest) root; where the requested branch has no root (p beyond its spinodal) the single
 * root that exists is returned. Callers check that (p, T) lies in region 3.
 */
export function densityOnIsotherm(p: number, T: number, branch: Branch): number {
	loadIsotherm(T);
	const target = (p * 1000) / (RHO_CRIT * R * T);
	let lo = DELTA_LO;
	let hi = DELTA_HI;
	// Below Tc the loop always spans the critical density (δ = 1); where dπ/dδ there is not
	// negative the isotherm is monotonic in practice. π(1) splits the search either way: with an
	// open loop, π(1) < target means π stays below target from δ = 1 down the loop to the liquid
	// spinodal, so the only root right of δ = 1 is the liquid one (and mirrored for vapour).
	// Only when π(1) sits on the wrong side are the spinodals needed.
	const atCritical = pi(1);
	const loopOpen = T < T_CRIT && dpi(1) < 0;
	if (!loopOpen || (branch === LIQUID ? atCritical < target : atCritical > target)) {
		if (atCritical < target) lo = 1;
		else hi = 1;
	} else if (branch === LIQUID) {
		const liquidSpinodal = spinodal(1, DELTA_HI, true);
		if (pi(liquidSpinodal) < target) lo = liquidSpinodal;
		else hi = spinodal(DELTA_LO, 1, false);
	} else {
		const vapourSpinodal = spinodal(DELTA_LO, 1, false);
		if (pi(vapourSpinodal) > target) hi = vapourSpinodal;
		else lo = spinodal(1, DELTA_HI, true);
	}
	const fLo = pi(lo) - target;
	const fHi = pi(hi) - target;
	const x0 = lo - (fLo * (hi - lo)) / (fHi - fLo);
	return RHO_CRIT * solveBracketed(pi, dpi, target, lo, hi, true, x0, 2e-15 * target);
}
