/**
 * Region 3 states from (p, T), (p, h) and (p, s), and region 3's saturated states.
 *
 * Method: iteration on the region 3 basic equation itself (IAPWS R7-97(2012) eq. 28), not the
 * supplementary backward equations for region 3. Every result therefore satisfies the forward
 * equation to about 1e-13 relative, with no backward-equation error to hide.
 *  - (p, T): the isotherm's pressure is a polynomial in density; the root is bracketed on the
 *    liquid-like or vapour-like branch (chosen by p against the saturation pressure eq. 30, with
 *    the critical density or the van der Waals loop's spinodals as bracket ends) and found by
 *    safeguarded Newton (region3-isotherm.ts).
 *  - (p, h), (p, s): Newton in density along the isobar, bracketed between states found by (p, T)
 *    at the region's temperature limits and, below the critical pressure, the saturated states,
 *    which also decide the branch; the first guess is a cubic through the bracket ends
 *    (region3-isobar.ts).
 *  - Saturation: T from eq. 31, both densities by (p, T) on their branches (region3-saturation.ts).
 *
 * Range: 623.15 K ≤ T ≤ T_B23(p) and p_B23(T) ≤ p ≤ 100 MPa. The region 1 and region 2 equations
 * disagree with region 3's at the shared boundaries by up to about 0.1 kJ/kg in h, which is
 * 0.02 K in temperature (measured against python3-iapws), so a dispatcher that places (p, h) or
 * (p, s) by the neighbouring region's boundary value can hand region 3 a state just beyond its
 * own boundary value. (p, h) and (p, s) therefore accept states up to BAND kelvin outside the
 * temperature limits and return the region 3 equation's answer there; (p, T) needs no band since
 * the boundary is given in T. All limits carry a relative slack of EDGE (1e-9) for rounding.
 */
import { b23Temperature } from './b23';
import { P_CRIT, P_MAX, RHO_CRIT, T_13, T_CRIT } from './constants';
import { SteamRangeError } from './errors';
import {
	END_A,
	END_B,
	ENTHALPY,
	ENTROPY,
	setEnd,
	solveOnIsobar,
	type IsobarQuantity
} from './region3-isobar';
import { densityOnIsotherm, LIQUID, VAPOUR, type Branch } from './region3-isotherm';
import { EDGE, saturationTemperature3 } from './region3-saturation';
import { region3FromRhoT } from './region3';
import { P_SAT_13, psat } from './region4';
import type { Properties } from './types';

export { region3SaturatedLiquid, region3SaturatedVapour } from './region3-saturation';

/** Temperature band [K] beyond region 3's limits accepted by (p, h) and (p, s); see header. */
const BAND = 0.1;

function checkPressure(p: number): void {
	if (!(Number.isFinite(p) && p >= P_SAT_13 * (1 - EDGE) && p <= P_MAX * (1 + EDGE))) {
		throw new SteamRangeError('pressure p', p, `${P_SAT_13.toFixed(7)} to ${P_MAX} MPa (region 3)`);
	}
}

function round(x: number): number {
	return Number(x.toPrecision(9));
}

/**
 * Region 3 state at pressure p [MPa] and temperature T [K]. Below the critical temperature the
 * liquid-like state is returned for p ≥ p_sat(T) (eq. 30) and the vapour-like one below it.
 * @returns p MPa, T K, v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s
 * @throws SteamRangeError unless 623.15 K ≤ T ≤ T_B23(p) and 16.529 MPa ≤ p ≤ 100 MPa
 */
export function region3FromPT(p: number, T: number): Properties {
	checkPressure(p);
	const tMax = b23Temperature(p);
	if (!(Number.isFinite(T) && T >= T_13 * (1 - EDGE) && T <= tMax * (1 + EDGE))) {
		throw new SteamRangeError(
			'temperature T',
			T,
			`${T_13} to ${round(tMax)} K (region 3 at p = ${p} MPa)`
		);
	}
	const branch = T < T_CRIT && p < psat(T) ? VAPOUR : LIQUID;
	// The critical point is (pc, Tc, ρc) by definition (IF97 eqs. 2–4). Eq. 28 gives pc at ρc only
	// to 2e-12 relative, and its isotherm is flat to third order there, so a root search would
	// land 0.03 % off ρc on rounding alone.
	const rho = p === P_CRIT && T === T_CRIT ? RHO_CRIT : densityOnIsotherm(p, T, branch);
	const state = region3FromRhoT(rho, T);
	state.p = p;
	return state;
}

/**
 * Region 3 state at pressure p [MPa] and specific enthalpy h [kJ/kg].
 * @returns p MPa, T K, v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s
 * @throws SteamRangeError for p outside 16.529 to 100 MPa, or h outside region 3 at that
 *   pressure (including inside the two-phase dome below 22.064 MPa), or non-finite input
 */
export function region3FromPH(p: number, h: number): Properties {
	return fromIsobar(p, ENTHALPY, h);
}

/**
 * Region 3 state at pressure p [MPa] and specific entropy s [kJ/(kg K)].
 * @returns p MPa, T K, v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s
 * @throws SteamRangeError for p outside 16.529 to 100 MPa, or s outside region 3 at that
 *   pressure (including inside the two-phase dome below 22.064 MPa), or non-finite input
 */
export function region3FromPS(p: number, s: number): Properties {
	return fromIsobar(p, ENTROPY, s);
}

const ends = new Float64Array(8);

function fromIsobar(p: number, kind: IsobarQuantity, target: number): Properties {
	checkPressure(p);
	// A is the light, hot end of the bracket, B the dense, cold end. Below the critical pressure
	// the saturated states decide the side, and the far end is only needed on that side.
	let hotEnd = true;
	let coldEnd = true;
	if (p < P_CRIT) {
		const tSat = saturationTemperature3(p);
		setEnd(kind, densityOnIsotherm(p, tSat, LIQUID), tSat, ends, END_A);
		setEnd(kind, densityOnIsotherm(p, tSat, VAPOUR), tSat, ends, END_B);
		const liquidSide = target < 0.5 * (ends[END_A + 2] + ends[END_B + 2]);
		hotEnd = !liquidSide;
		coldEnd = liquidSide;
	}
	if (hotEnd) {
		const tHot = b23Temperature(p) + BAND;
		setEnd(kind, densityOnIsotherm(p, tHot, VAPOUR), tHot, ends, END_A);
	}
	if (coldEnd) {
		const tCold = T_13 - BAND;
		setEnd(kind, densityOnIsotherm(p, tCold, LIQUID), tCold, ends, END_B);
	}
	const qA = ends[END_A + 2];
	const qB = ends[END_B + 2];
	let result: Properties;
	if (target < qA && target > qB) {
		result = solveOnIsobar(p, kind, target, ends);
	} else if (Math.abs(target - qA) <= EDGE * Math.abs(qA)) {
		result = region3FromRhoT(ends[END_A], ends[END_A + 1]);
	} else if (Math.abs(target - qB) <= EDGE * Math.abs(qB)) {
		result = region3FromRhoT(ends[END_B], ends[END_B + 1]);
	} else {
		throw outOfRange(p, kind, target);
	}
	result.p = p;
	return result;
}

function valueOf(kind: IsobarQuantity, state: Properties): number {
	return kind === ENTHALPY ? state.h : state.s;
}

function stateAt(p: number, T: number, branch: Branch): Properties {
	return region3FromRhoT(densityOnIsotherm(p, T, branch), T);
}

/** The error for a target outside region 3 on this isobar, quoting the strict limits. */
function outOfRange(p: number, kind: IsobarQuantity, target: number): SteamRangeError {
	const name = kind === ENTHALPY ? 'specific enthalpy h' : 'specific entropy s';
	const unit = kind === ENTHALPY ? 'kJ/kg' : 'kJ/(kg K)';
	const low = round(valueOf(kind, stateAt(p, T_13, LIQUID)));
	const high = round(valueOf(kind, stateAt(p, b23Temperature(p), VAPOUR)));
	if (!Number.isFinite(target) || p >= P_CRIT) {
		return new SteamRangeError(
			name,
			target,
			`${low} to ${high} ${unit} (region 3 at p = ${p} MPa)`
		);
	}
	const tSat = saturationTemperature3(p);
	const liquid = round(valueOf(kind, stateAt(p, tSat, LIQUID)));
	const vapour = round(valueOf(kind, stateAt(p, tSat, VAPOUR)));
	return new SteamRangeError(
		name,
		target,
		`${low} to ${liquid} or ${vapour} to ${high} ${unit} (region 3 at p = ${p} MPa; ` +
			`between ${liquid} and ${vapour} the state is two-phase)`
	);
}
