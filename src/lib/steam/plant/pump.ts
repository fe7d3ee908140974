/**
 * Work to pump liquid water from p1 to p2. Along an isentropic path dh = v dp (the Gibbs
 * relation dh = T ds + v dp with ds = 0), so the ideal work is ∫v dp: exactly h(p2, s1) − h1
 * from IAPWS-IF97, or ≈ v1 (p2 − p1) when the liquid is taken as incompressible, the textbook
 * pump work of the Rankine cycle (e.g. Çengel & Boles, "Thermodynamics: An Engineering
 * Approach", ch. 10). The actual work is the ideal work ÷ the pump's isentropic efficiency.
 * v1 (p2 − p1) slightly overstates the work, because water's volume shrinks under pressure:
 * by about 0.02 % to 1 MPa, 0.2 % to 10 MPa, 2 % to 100 MPa (tests/reference/plant-*.spec.ts).
 * Units: p MPa absolute, T K, v m³/kg, h and w kJ/kg (1 MPa · m³/kg = 1000 kJ/kg).
 */
import { T_MAX, T_MIN } from '../constants';
import { inRange, SteamRangeError } from '../errors';
import { stateFromPT } from '../forward';
import { stateFromPH, stateFromPS } from '../inverse';
import { requireEfficiency } from '../losses/energy-chain';
import { tsat } from '../region4';
import { saturatedLiquid } from '../saturation';
import type { SteamState } from '../types';
import { checkPressureNamed, onSaturationLine, SATURATION_MATCH_K } from './inlet';

export interface PumpInput {
	/** Inlet (suction) pressure, MPa absolute. */
	p1: number;
	/** Outlet (discharge) pressure, MPa absolute; above p1. */
	p2: number;
	/** Inlet temperature, K, for subcooled water; saturated liquid at p1 when absent. */
	T1?: number;
	/** Pump isentropic efficiency, (0, 1]. */
	efficiency: number;
}

export interface PumpResult {
	inlet: SteamState;
	h1: number;
	s1: number;
	/** Inlet specific volume, m³/kg. */
	v1: number;
	/** Incompressible-liquid ideal work v1 (p2 − p1), kJ/kg. */
	vdpWork: number;
	/** Exact ideal (isentropic) enthalpy rise h(p2, s1) − h1 from IF97, kJ/kg. */
	isentropicWork: number;
	isentropicOutlet: SteamState;
	/** Actual work, isentropicWork ÷ efficiency, kJ/kg. */
	work: number;
	/** The same from the v Δp approximation, vdpWork ÷ efficiency, kJ/kg. */
	approximateWork: number;
	/** (vdpWork − isentropicWork) ÷ isentropicWork: how far the approximation is off. */
	approximationError: number;
	/** The actual outlet state, at p2 and h1 + work. */
	outlet: SteamState;
	h2: number;
	T2: number;
	efficiency: number;
}

function liquidInlet(p1: number, T1: number | undefined): SteamState {
	if (T1 === undefined) {
		if (!onSaturationLine(p1)) {
			throw new SteamRangeError(
				'inlet pressure p1',
				p1,
				'0.000611213 to 22.064 MPa for saturated liquid at the inlet (or give T1)'
			);
		}
		return saturatedLiquid(p1);
	}
	inRange('inlet temperature T1', T1, T_MIN, T_MAX, 'K');
	if (onSaturationLine(p1)) {
		const Ts = tsat(p1);
		if (Math.abs(T1 - Ts) <= SATURATION_MATCH_K) return saturatedLiquid(p1);
		if (T1 > Ts) {
			throw new Error(
				`At p1 = ${p1} MPa abs, T1 = ${T1} K is above saturation (${Ts.toFixed(2)} K): that is steam, and a pump needs liquid water`
			);
		}
	}
	const state = stateFromPT(p1, T1);
	if (state.phase !== 'liquid') {
		throw new Error(`At p1 = ${p1} MPa abs and T1 = ${T1} K the water is not a liquid`);
	}
	return state;
}

/**
 * Pump work from p1 to p2: the v Δp approximation beside the exact isentropic rise.
 * @throws SteamRangeError for a state outside IAPWS-IF97; Error for p2 ≤ p1, an efficiency
 *   outside (0, 1] or an inlet that is not liquid
 */
export function pumpWork({ p1, p2, T1, efficiency }: PumpInput): PumpResult {
	const eta = requireEfficiency(efficiency, 'Pump efficiency');
	checkPressureNamed('inlet pressure p1', p1);
	const inlet = liquidInlet(p1, T1);
	checkPressureNamed('outlet pressure p2', p2);
	if (p2 <= p1) {
		throw new Error(
			`The pump's outlet pressure p2 (${p2} MPa abs) must be above its inlet pressure p1 (${p1} MPa abs)`
		);
	}
	const vdpWork = inlet.v * (p2 - p1) * 1000;
	const ideal = stateFromPS(p2, inlet.s);
	const isentropicWork = ideal.h - inlet.h;
	const work = isentropicWork / eta;
	const outlet = eta === 1 ? ideal : stateFromPH(p2, inlet.h + work);
	return {
		inlet,
		h1: inlet.h,
		s1: inlet.s,
		v1: inlet.v,
		vdpWork,
		isentropicWork,
		isentropicOutlet: ideal,
		work: outlet.h - inlet.h,
		approximateWork: vdpWork / eta,
		approximationError: (vdpWork - isentropicWork) / isentropicWork,
		outlet,
		h2: outlet.h,
		T2: outlet.T,
		efficiency: eta
	};
}
