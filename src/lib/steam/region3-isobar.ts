/**
 * The region 3 state on an isobar where enthalpy or entropy takes a given value.
 *
 * Parametrised by density, not temperature: along an isobar h and s fall strictly as ρ rises, and
 * dh/dρ|p and ds/dρ|p stay finite and non-zero even at the critical point (where cp and dρ/dT|p
 * diverge), so the problem is well conditioned everywhere in region 3. For each trial ρ the
 * temperature follows from p(ρ, T) = p, on which p rises steadily with T along an isochore and
 * Newton converges in two or three steps. The outer iteration is Newton in ρ, kept inside a
 * bracket that every evaluation narrows, with bisection when a step would leave it.
 */
import { R, RHO_CRIT, T_CRIT } from './constants';
import { propertiesFrom } from './region3';
import type { Properties } from './types';
import { helmholtz, PHI, PHI_D, PHI_DD, PHI_DT, PHI_T, PHI_TT } from './region3-helmholtz';

export const ENTHALPY = 0;
export const ENTROPY = 1;
export type IsobarQuantity = typeof ENTHALPY | typeof ENTROPY;

const f = new Float64Array(6);

/** h [kJ/kg] or s [kJ/(kg K)] from the derivatives in f at (ρ, T). */
function quantity(kind: IsobarQuantity, T: number): number {
	return kind === ENTHALPY ? R * T * (f[PHI_T] + f[PHI_D]) : R * (f[PHI_T] - f[PHI]);
}

/** d(h or s)/dρ along the isobar, from the derivatives in f at (ρ, T). */
function slopeOnIsobar(kind: IsobarQuantity, rho: number, T: number): number {
	const d1 = f[PHI_D];
	const stiffness = 2 * d1 + f[PHI_DD];
	const thermal = d1 - f[PHI_DT];
	if (kind === ENTHALPY) {
		const alongT = d1 + f[PHI_DD] + f[PHI_DT];
		const alongRho = d1 - f[PHI_TT] - f[PHI_DT];
		return ((R * T) / rho) * (alongT - (alongRho * stiffness) / thermal);
	}
	return (R / rho) * (f[PHI_DT] - d1 + (f[PHI_TT] * stiffness) / thermal);
}

/**
 * Temperature [K] at which p(ρ, T) = p, searched in [tLo, tHi] from the guess t0. Leaves the
 * region 3 derivatives at the returned temperature in f.
 */
function temperatureOnIsochore(
	rho: number,
	p: number,
	tLo: number,
	tHi: number,
	t0: number
): number {
	const delta = rho / RHO_CRIT;
	let T = t0 > tLo && t0 < tHi ? t0 : 0.5 * (tLo + tHi);
	for (let it = 0; it < 100; it++) {
		helmholtz(delta, T_CRIT / T, f);
		const r = (rho * R * T * f[PHI_D]) / 1000 - p;
		// Pressure carries rounding noise of a few 1e-14 relative (cancellation in δφ_δ).
		if (Math.abs(r) <= 1e-13 * p) return T;
		if (r < 0) tLo = T;
		else tHi = T;
		const dpdT = (rho * R * (f[PHI_D] - f[PHI_DT])) / 1000;
		let next = T - r / dpdT;
		if (!(next > tLo && next < tHi)) next = 0.5 * (tLo + tHi);
		if (Math.abs(next - T) <= 1e-14 * T) return T;
		T = next;
	}
	helmholtz(delta, T_CRIT / T, f);
	return T;
}

/** Offsets of the two bracket ends in the array solveOnIsobar takes: ρ, T, quantity, slope. */
export const END_A = 0;
export const END_B = 4;

/**
 * Stores the isobar state (ρ [kg/m³], T [K]) as a bracket end at ends[at..at+3]: ρ, T, its h or s,
 * and the slope of that quantity along the isobar.
 */
export function setEnd(
	kind: IsobarQuantity,
	rho: number,
	T: number,
	ends: Float64Array,
	at: number
): void {
	helmholtz(rho / RHO_CRIT, T_CRIT / T, f);
	ends[at] = rho;
	ends[at + 1] = T;
	ends[at + 2] = quantity(kind, T);
	ends[at + 3] = slopeOnIsobar(kind, rho, T);
}

/**
 * Solves h(ρ, T) = target (or s) with p(ρ, T) = p between two bracket ends stored by setEnd:
 * A, light and hot, with the quantity above target, and B, dense and cold, below it.
 * @returns the region 3 properties there (p as the equation gives it)
 */
export function solveOnIsobar(
	p: number,
	kind: IsobarQuantity,
	target: number,
	ends: Float64Array
): Properties {
	let rhoA = ends[END_A];
	let tA = ends[END_A + 1];
	let rhoB = ends[END_B];
	let tB = ends[END_B + 1];
	const qA = ends[END_A + 2];
	const qB = ends[END_B + 2];
	// Start from the cubic through both ends with their slopes (inverse Hermite interpolation of
	// ρ in the quantity); h and s bend strongly along near-critical isobars, a chord does not.
	const t = (target - qA) / (qB - qA);
	const span = qB - qA;
	let rho =
		(2 * t * t * t - 3 * t * t + 1) * rhoA +
		(t * t * t - 2 * t * t + t) * (span / ends[END_A + 3]) +
		(3 * t * t - 2 * t * t * t) * rhoB +
		(t * t * t - t * t) * (span / ends[END_B + 3]);
	if (!(rho > rhoA && rho < rhoB)) rho = rhoA + t * (rhoB - rhoA);
	let T = tA + ((tB - tA) * (rho - rhoA)) / (rhoB - rhoA);
	for (let it = 0; it < 200; it++) {
		T = temperatureOnIsochore(rho, p, tB, tA, T);
		const g = quantity(kind, T) - target;
		// h and s carry rounding noise of about 1e-14 relative; iterating below it only wanders.
		if (Math.abs(g) <= 5e-14 * Math.abs(target)) break;
		if (g > 0) {
			rhoA = rho;
			tA = T;
		} else {
			rhoB = rho;
			tB = T;
		}
		let next = rho - g / slopeOnIsobar(kind, rho, T);
		if (!(next > rhoA && next < rhoB)) next = 0.5 * (rhoA + rhoB);
		const step = next - rho;
		if (Math.abs(step) <= 1e-13 * rho || rhoB - rhoA <= 4e-16 * rho) break;
		// Start the next temperature search where the isobar's local slope dT/dρ|p points.
		T -= (((T / rho) * (2 * f[PHI_D] + f[PHI_DD])) / (f[PHI_D] - f[PHI_DT])) * step;
		rho = next;
	}
	// f still holds the derivatives at (ρ, T) from the last temperature search.
	return propertiesFrom(rho, T, f);
}
