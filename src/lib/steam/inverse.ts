/**
 * States from pressure and enthalpy or entropy, in every region.
 *
 * Regions 1 and 2 start from the IF97 backward equations T(p, h), T(p, s) and polish the
 * temperature with Newton steps on the forward equation, so a state agrees with its own
 * (p, T) state to about 1e-12. A quick first try in the region the value most likely belongs
 * to is accepted only if its converged temperature lies inside that region, which is proof
 * (h and s rise with T at fixed p); otherwise the region boundaries are evaluated and
 * compared. Region 5 has no backward equation: Newton from a linear first guess. Region 3
 * and the dome above 16.529 MPa come from region3-solve.ts.
 */
import { P_CRIT, P_MAX_5, R, T_13, T_MAX, T_MAX_12, T_MIN } from './constants';
import { SteamRangeError } from './errors';
import { b23Temperature } from './b23';
import { checkFinite, checkPressure } from './limits';
import { H, S, propertiesBuffer } from './properties-buffer';
import { region1TemperaturePH, region1TemperaturePS } from './region1-backward';
import { region1Into } from './region1';
import { region2TemperaturePH } from './region2-backward-ph';
import { region2TemperaturePS } from './region2-backward-ps';
import { region2Into } from './region2';
import {
	region3FromPH,
	region3FromPS,
	region3SaturatedLiquid,
	region3SaturatedVapour
} from './region3-solve';
import { P_SAT_13, P_SAT_MIN, tsat } from './region4';
import { intoBuffer, region3State, saturationState, singlePhaseState } from './state';
import {
	gibbsHsCpInto,
	solveTemperature,
	type GibbsRegion,
	type Matched
} from './temperature-solver';
import type { SteamState } from './types';

const state = propertiesBuffer();
const liquid = propertiesBuffer();
const vapour = propertiesBuffer();

// Where the quick first tries are worth making. Region 1 never exceeds its value at
// (16.529 MPa, 623.15 K), ≈ 1671 kJ/kg and 3.78 kJ/(kg K); region 2 never falls below about
// 2500 kJ/kg (saturated vapour at 273.16 K) and 5.0 kJ/(kg K) (the B23 line at 100 MPa). They
// only choose what to try first: a wrong try costs time, never a wrong answer.
const H1_TRY_MAX = 1700;
const S1_TRY_MAX = 3.8;
const H2_TRY_MIN = 2400;
const S2_TRY_MIN = 4.9;

/**
 * Kelvin by which a backward equation's guess may lie outside a try's interval and still be
 * tried: 40 times their 25 mK, and ample for the ideal-gas shift of eq. 25 below 611 Pa.
 */
const GUESS_MARGIN = 1;

/** Extra kelvin below 1073.15 K allowed to region 5: see vapourSide. */
const REGION5_OVERLAP = 1;

function slot(matched: Matched): number {
	return matched === 'h' ? H : S;
}

function backward(region: 1 | 2, matched: Matched, p: number, y: number): number {
	if (region === 1) {
		return matched === 'h' ? region1TemperaturePH(p, y) : region1TemperaturePS(p, y);
	}
	if (matched === 'h') return region2TemperaturePH(p, y);
	// Eq. 25 (2a) loses its accuracy below 611 Pa (off by 1 K at 100 Pa, 1000 K at 1 Pa). The
	// vapour there is an ideal gas, whose entropy shifts by −R ln(p/p₀) from p₀ = 611 Pa.
	if (p < P_SAT_MIN) return region2TemperaturePS(P_SAT_MIN, y + R * Math.log(p / P_SAT_MIN));
	return region2TemperaturePS(p, y);
}

function valueAt(region: GibbsRegion, matched: Matched, p: number, T: number): number {
	gibbsHsCpInto(region, p, T, state);
	return state[slot(matched)];
}

/**
 * Solves in region 1 or 2 from the backward equation; null when the answer is not in [lo, hi].
 * A first guess more than GUESS_MARGIN outside [lo, hi] is not solved for: the backward
 * equations lie within 25 mK of the Gibbs equations wherever they apply, so the answer is not
 * in [lo, hi] either, and the callers' boundary comparisons place it. Wet steam thus spends no
 * evaluation proving that it is neither liquid nor vapour; states within the margin of a
 * boundary are solved for as before, so which side of a seam they land on does not change.
 */
function tryRegion(
	region: 1 | 2,
	matched: Matched,
	p: number,
	y: number,
	lo: number,
	hi: number
): SteamState | null {
	const T0 = backward(region, matched, p, y);
	if (!(T0 >= lo - GUESS_MARGIN && T0 <= hi + GUESS_MARGIN)) return null;
	return solveFrom(region, matched, p, y, T0, lo, hi);
}

/** Solves from first guess T0 [K]; null when the answer is not in [lo, hi]. */
function solveFrom(
	region: 1 | 2,
	matched: Matched,
	p: number,
	y: number,
	T0: number,
	lo: number,
	hi: number
): SteamState | null {
	const T = solveTemperature(region, matched, p, y, T0, lo, hi, state);
	return Number.isNaN(T) ? null : singlePhaseState(p, T, state, region);
}

/** Solves where the caller has shown the answer lies in region 1 or 2 between lo and hi. */
function solveIn(
	region: 1 | 2,
	matched: Matched,
	p: number,
	y: number,
	lo: number,
	hi: number
): SteamState {
	const found = solveFrom(region, matched, p, y, backward(region, matched, p, y), lo, hi);
	if (found === null) throw new Error(`IF97 region ${region}: no temperature found (internal)`);
	return found;
}

function outOfRange(matched: Matched, p: number, y: number): SteamRangeError {
	const lowest = p < P_SAT_MIN ? valueAt(2, matched, p, T_MIN) : valueAt(1, matched, p, T_MIN);
	const highest = p <= P_MAX_5 ? valueAt(5, matched, p, T_MAX) : valueAt(2, matched, p, T_MAX_12);
	const round = (x: number) => Number(x.toPrecision(6));
	return matched === 'h'
		? new SteamRangeError(
				'specific enthalpy h',
				y,
				`${round(lowest)} to ${round(highest)} kJ/kg at p = ${p} MPa`
			)
		: new SteamRangeError(
				'specific entropy s',
				y,
				`${round(lowest)} to ${round(highest)} kJ/(kg K) at p = ${p} MPa`
			);
}

/** Region 2 from lo [K] up to 1073.15 K, or region 5 above it. */
function vapourSide(matched: Matched, p: number, y: number, lo: number): SteamState {
	const y2max = valueAt(2, matched, p, T_MAX_12);
	if (y <= y2max) return solveIn(2, matched, p, y, lo, T_MAX_12);
	if (p > P_MAX_5) throw outOfRange(matched, p, y);
	const y5max = valueAt(5, matched, p, T_MAX);
	if (y > y5max) throw outOfRange(matched, p, y);
	// Regions 2 and 5 differ by up to about 0.1 kJ/kg at 1073.15 K. A value between them is
	// given by the region 5 equation a few hundredths of a kelvin below 1073.15 K.
	const lo5 = T_MAX_12 - REGION5_OVERLAP;
	const y5min = valueAt(5, matched, p, T_MAX_12);
	const T0 = T_MAX_12 + ((y - y5min) / (y5max - y5min)) * (T_MAX - T_MAX_12);
	const T = solveTemperature(5, matched, p, y, T0, lo5, T_MAX, state);
	if (Number.isNaN(T)) throw new Error('IF97 region 5: no temperature found (internal)');
	return singlePhaseState(p, T, state, 5);
}

/** Up to 16.529 MPa: regions 1, 2, 5 and the dome of regions 1/2. */
function lowPressure(matched: Matched, p: number, y: number): SteamState {
	const hasDome = p >= P_SAT_MIN;
	const Ts = hasDome ? tsat(p) : T_MIN;
	const h = matched === 'h';
	if (hasDome && y <= (h ? H1_TRY_MAX : S1_TRY_MAX)) {
		const found = tryRegion(1, matched, p, y, T_MIN, Ts);
		if (found !== null) return found;
	}
	if (y >= (h ? H2_TRY_MIN : S2_TRY_MIN)) {
		const found = tryRegion(2, matched, p, y, Ts, T_MAX_12);
		if (found !== null) return found;
	}
	if (hasDome) {
		region1Into(p, Ts, liquid);
		const yL = liquid[slot(matched)];
		if (y <= yL) {
			if (y < valueAt(1, matched, p, T_MIN)) throw outOfRange(matched, p, y);
			return solveIn(1, matched, p, y, T_MIN, Ts);
		}
		region2Into(p, Ts, vapour);
		const yV = vapour[slot(matched)];
		if (y < yV) return saturationState(p, Ts, liquid, vapour, (y - yL) / (yV - yL), 1, 2);
	} else if (y < valueAt(2, matched, p, T_MIN)) {
		throw outOfRange(matched, p, y);
	}
	return vapourSide(matched, p, y, Ts);
}

/** Above 16.529 MPa: regions 1, 3, 2, 5 and, below 22.064 MPa, the dome of region 3. */
function highPressure(matched: Matched, p: number, y: number): SteamState {
	const h = matched === 'h';
	const Tb = b23Temperature(p);
	if (y <= (h ? H1_TRY_MAX : S1_TRY_MAX)) {
		const found = tryRegion(1, matched, p, y, T_MIN, T_13);
		if (found !== null) return found;
	}
	if (y >= (h ? H2_TRY_MIN : S2_TRY_MIN)) {
		const found = tryRegion(2, matched, p, y, Tb, T_MAX_12);
		if (found !== null) return found;
	}
	if (y <= valueAt(1, matched, p, T_13)) {
		if (y < valueAt(1, matched, p, T_MIN)) throw outOfRange(matched, p, y);
		return solveIn(1, matched, p, y, T_MIN, T_13);
	}
	if (y >= valueAt(2, matched, p, Tb)) return vapourSide(matched, p, y, Tb);
	if (p < P_CRIT) {
		intoBuffer(region3SaturatedLiquid(p), liquid);
		intoBuffer(region3SaturatedVapour(p), vapour);
		const yL = liquid[slot(matched)];
		const yV = vapour[slot(matched)];
		if (y > yL && y < yV) {
			return saturationState(p, tsat(p), liquid, vapour, (y - yL) / (yV - yL), 3, 3);
		}
	}
	return region3State(h ? region3FromPH(p, y) : region3FromPS(p, y));
}

function fromPressureAnd(matched: Matched, p: number, y: number): SteamState {
	checkPressure(p);
	if (matched === 'h') checkFinite('specific enthalpy h', y, 'a finite number of kJ/kg');
	else checkFinite('specific entropy s', y, 'a finite number of kJ/(kg K)');
	return p <= P_SAT_13 ? lowPressure(matched, p, y) : highPressure(matched, p, y);
}

/**
 * State of water or steam at pressure p [MPa abs] and specific enthalpy h [kJ/kg], any region
 * (two-phase inside the dome, with dryness fraction x).
 * @throws SteamRangeError if p is outside 1e-6 to 100 MPa, or h outside the values of
 *   273.15 K to 1073.15 K (2273.15 K up to 50 MPa) at that pressure, or either is not finite
 */
export function stateFromPH(p: number, h: number): SteamState {
	return fromPressureAnd('h', p, h);
}

/**
 * State of water or steam at pressure p [MPa abs] and specific entropy s [kJ/(kg K)], any
 * region (two-phase inside the dome, with dryness fraction x).
 * @throws SteamRangeError if p is outside 1e-6 to 100 MPa, or s outside the values of
 *   273.15 K to 1073.15 K (2273.15 K up to 50 MPa) at that pressure, or either is not finite
 */
export function stateFromPS(p: number, s: number): SteamState {
	return fromPressureAnd('s', p, s);
}
