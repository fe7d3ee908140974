/**
 * Saturated liquid and vapour inside region 3 (16.529 MPa to the critical point).
 *
 * The saturation temperature comes from the IF97 saturation equation (eq. 31), the same line
 * region 4 uses, so region 3's saturated states meet region 4's two-phase states exactly in p
 * and T. The two densities are the liquid-like and vapour-like roots of the region 3 equation at
 * that (p, T). IF97 fitted the region 3 equation to the phase-equilibrium condition (equal Gibbs
 * energy) along eq. 30/31, so both phases also have nearly the same Gibbs energy: within
 * 0.002 kJ/kg, the equivalent of a 1.6 mK shift in saturation temperature (the unit specs check
 * it). Solving that condition exactly instead would move T off eq. 31 and break the seam with
 * region 4's two-phase states.
 */
import { P_CRIT } from './constants';
import { SteamRangeError } from './errors';
import { densityOnIsotherm, LIQUID, VAPOUR, type Branch } from './region3-isotherm';
import { P_SAT_13, tsat } from './region4';
import { region3FromRhoT } from './region3';
import type { Properties } from './types';

// Relative slack on range limits, so a dispatcher using its own copy of the boundary formulas
// (equal up to the last few bits) is never refused at the boundary itself.
export const EDGE = 1e-9;

/** Throws SteamRangeError unless p [MPa] is on region 3's part of the saturation line. */
export function checkSaturationPressure(p: number): void {
	if (!(Number.isFinite(p) && p >= P_SAT_13 * (1 - EDGE) && p <= P_CRIT * (1 + EDGE))) {
		throw new SteamRangeError(
			'pressure p',
			p,
			`${P_SAT_13.toFixed(7)} to ${P_CRIT} MPa (saturation in region 3)`
		);
	}
}

/** Saturation temperature [K] for region 3 use, never above the critical temperature. */
export function saturationTemperature3(p: number): number {
	return tsat(Math.min(p, P_CRIT));
}

function saturated(p: number, branch: Branch): Properties {
	checkSaturationPressure(p);
	const T = saturationTemperature3(p);
	const state = region3FromRhoT(densityOnIsotherm(p, T, branch), T);
	state.p = p;
	return state;
}

/**
 * Saturated liquid in region 3 at p [MPa] (16.529 to 22.064 MPa), T from IF97 eq. 31.
 * @returns p MPa, T K, v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s
 * @throws SteamRangeError for p outside region 3's saturation range or not finite
 */
export function region3SaturatedLiquid(p: number): Properties {
	return saturated(p, LIQUID);
}

/**
 * Saturated vapour in region 3 at p [MPa] (16.529 to 22.064 MPa), T from IF97 eq. 31.
 * @returns p MPa, T K, v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s
 * @throws SteamRangeError for p outside region 3's saturation range or not finite
 */
export function region3SaturatedVapour(p: number): Properties {
	return saturated(p, VAPOUR);
}
