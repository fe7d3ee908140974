/**
 * The inlet state of a turbine or letdown, from (p1, T1) or (p1, x1), and the pressure checks
 * shared by the plant functions. A value outside IAPWS-IF97 throws the engine's
 * SteamRangeError naming the input (p1, T1, x1, p2); inputs that contradict each other throw a
 * plain Error saying what to give instead.
 */
import { P_CRIT, P_MAX, P_MIN, T_MAX, T_MIN } from '../constants';
import { inRange, SteamRangeError } from '../errors';
import { stateFromPT } from '../forward';
import { P_SAT_MIN, tsat } from '../region4';
import { stateFromPX } from '../saturation';
import type { SteamState } from '../types';

/**
 * K within which a given T1 counts as the saturation temperature itself, where (p, T) does not
 * fix a state (the same margin as a header's design temperature, ../losses/site-basis.ts).
 */
export const SATURATION_MATCH_K = 1e-6;

/** The saturation line's range, as the engine prints it (rounded so the value shown is accepted). */
const SATURATION_LINE = `0.000611213 to ${P_CRIT} MPa (the saturation line, where a dryness fraction applies)`;

export interface InletInput {
	/** MPa absolute. */
	p1: number;
	/** K */
	T1?: number;
	/** Dryness fraction, 0..1. */
	x1?: number;
}

/** Checks p against IF97's pressure range under the caller's name for it; returns p. */
export function checkPressureNamed(quantity: string, p: number): number {
	return inRange(quantity, p, P_MIN, P_MAX, 'MPa');
}

/** True when p lies on the saturation line (a temperature and a dryness fraction exist). */
export function onSaturationLine(p: number): boolean {
	return p >= P_SAT_MIN && p <= P_CRIT;
}

function saturatedInlet(p1: number, x1: number): SteamState {
	if (!onSaturationLine(p1)) throw new SteamRangeError('inlet pressure p1', p1, SATURATION_LINE);
	if (!Number.isFinite(x1) || x1 < 0 || x1 > 1) {
		throw new SteamRangeError('inlet dryness fraction x1', x1, '0 to 1 (kg vapour per kg mixture)');
	}
	return stateFromPX(p1, x1);
}

function superheatedInlet(p1: number, T1: number): SteamState {
	inRange('inlet temperature T1', T1, T_MIN, T_MAX, 'K');
	if (onSaturationLine(p1)) {
		const Ts = tsat(p1);
		if (Math.abs(T1 - Ts) <= SATURATION_MATCH_K) {
			throw new Error(
				`T1 = ${T1} K is the saturation temperature at p1 = ${p1} MPa abs, where the temperature does not say how wet the steam is: give the dryness fraction x1 instead (1 for dry saturated steam)`
			);
		}
		if (T1 < Ts) {
			throw new Error(
				`At p1 = ${p1} MPa abs, T1 = ${T1} K is below saturation (${Ts.toFixed(2)} K): that is liquid water, not steam`
			);
		}
	}
	const state = stateFromPT(p1, T1);
	if (state.phase === 'liquid') {
		throw new Error(
			`At p1 = ${p1} MPa abs and T1 = ${T1} K the water is a compressed liquid, not steam`
		);
	}
	return state;
}

/**
 * The inlet state: superheated (or supercritical) steam from T1, saturated or wet steam from
 * x1. Both may be given only when T1 is the saturation temperature at p1 (x1 then decides).
 */
export function steamInlet({ p1, T1, x1 }: InletInput): SteamState {
	checkPressureNamed('inlet pressure p1', p1);
	if (T1 === undefined && x1 === undefined) {
		throw new Error(
			'Give the inlet temperature T1 (superheated steam) or the inlet dryness fraction x1 (saturated or wet steam)'
		);
	}
	if (x1 === undefined) return superheatedInlet(p1, T1!);
	if (T1 !== undefined) {
		const Ts = onSaturationLine(p1) ? tsat(p1) : NaN;
		if (!(Math.abs(T1 - Ts) <= SATURATION_MATCH_K)) {
			throw new Error(
				`Give T1 or x1, not both: a dryness fraction needs the saturation temperature${Number.isNaN(Ts) ? '' : ` (${Ts.toFixed(4)} K at p1 = ${p1} MPa abs)`}, and T1 = ${T1} K is not it`
			);
		}
	}
	return saturatedInlet(p1, x1);
}

/**
 * Checks that an outlet pressure is in IF97's range and below the inlet's (an expansion).
 * @throws SteamRangeError outside 1e-6 to 100 MPa; Error when p2 ≥ p1
 */
export function checkExpansionPressures(p1: number, p2: number): void {
	checkPressureNamed('outlet pressure p2', p2);
	if (p2 >= p1) {
		throw new Error(
			`The outlet pressure p2 (${p2} MPa abs) must be below the inlet pressure p1 (${p1} MPa abs): steam only expands from a higher pressure to a lower one`
		);
	}
}

/**
 * K above saturation at the state's pressure, for single-phase vapour below the critical
 * pressure; null inside or on the dome, for liquid, and where no saturation exists.
 */
export function superheatOf(state: SteamState): number | null {
	if (state.x !== null || state.phase !== 'vapour' || !onSaturationLine(state.p)) return null;
	return state.T - tsat(state.p);
}
