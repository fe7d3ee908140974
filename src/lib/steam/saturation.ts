/**
 * States on and inside the saturation dome: by pressure or temperature with a dryness
 * fraction, and the saturated liquid and vapour. Up to 623.15 K (16.529 MPa) the two phases
 * come from the region 1 and 2 equations at the saturation line of region 4; above, from the
 * region 3 equation (region3-solve.ts).
 */
import { inRange } from './errors';
import { T_CRIT, T_MIN } from './constants';
import { checkDryness } from './limits';
import { propertiesBuffer } from './properties-buffer';
import { region1Into } from './region1';
import { region2Into } from './region2';
import { region3SaturatedLiquid, region3SaturatedVapour } from './region3-solve';
import { checkSaturationPressure, P_SAT_13, psat, tsat } from './region4';
import { intoBuffer, saturationState } from './state';
import type { SteamState } from './types';

const liquid = propertiesBuffer();
const vapour = propertiesBuffer();

/** Fills the liquid and vapour buffers (only those needed for x) and builds the state. */
function onDome(p: number, T: number, x: number): SteamState {
	if (p <= P_SAT_13) {
		if (x < 1) region1Into(p, T, liquid);
		if (x > 0) region2Into(p, T, vapour);
		return saturationState(p, T, liquid, vapour, x, 1, 2);
	}
	if (x < 1) intoBuffer(region3SaturatedLiquid(p), liquid);
	if (x > 0) intoBuffer(region3SaturatedVapour(p), vapour);
	return saturationState(p, T, liquid, vapour, x, 3, 3);
}

/**
 * Water and steam mixture at saturation pressure p [MPa abs] with dryness fraction x
 * (kg vapour per kg mixture). Inside the dome (0 < x < 1) region 4 with cp, cv and w null;
 * x = 0 and x = 1 give the saturated liquid and vapour with their cp, cv and w.
 * @throws SteamRangeError unless 0.000611213 MPa ≤ p ≤ 22.064 MPa and 0 ≤ x ≤ 1
 */
export function stateFromPX(p: number, x: number): SteamState {
	checkSaturationPressure(p);
	checkDryness(x);
	return onDome(p, tsat(p), x);
}

/**
 * Water and steam mixture at saturation temperature T [K] with dryness fraction x; as
 * stateFromPX otherwise.
 * @throws SteamRangeError unless 273.15 K ≤ T ≤ 647.096 K and 0 ≤ x ≤ 1
 */
export function stateFromTX(T: number, x: number): SteamState {
	inRange('temperature T', T, T_MIN, T_CRIT, 'K (the saturation line)');
	checkDryness(x);
	// The caller's T is kept exactly; eq. 31 would give it back only to about 1e-12.
	return onDome(psat(T), T, x);
}

/**
 * Saturated liquid (x = 0) at pressure p [MPa abs].
 * @throws SteamRangeError unless 0.000611213 MPa ≤ p ≤ 22.064 MPa
 */
export function saturatedLiquid(p: number): SteamState {
	checkSaturationPressure(p);
	return onDome(p, tsat(p), 0);
}

/**
 * Saturated vapour (x = 1) at pressure p [MPa abs].
 * @throws SteamRangeError unless 0.000611213 MPa ≤ p ≤ 22.064 MPa
 */
export function saturatedVapour(p: number): SteamState {
	checkSaturationPressure(p);
	return onDome(p, tsat(p), 1);
}
