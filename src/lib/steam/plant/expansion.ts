/**
 * Expansion of steam through a turbine (or a turbine stage) with an isentropic efficiency:
 * the isentropic end state at the outlet pressure from the inlet entropy, then the actual end
 * state from h₂ = h₁ − η_s (h₁ − h₂s), the definition of a turbine's isentropic efficiency
 * (any engineering-thermodynamics textbook; e.g. Çengel & Boles, "Thermodynamics: An
 * Engineering Approach", ch. 7, isentropic efficiencies of steady-flow devices). Adiabatic, no
 * change in kinetic or potential energy, so the specific work is w = h₁ − h₂.
 * Units: p MPa absolute, T K, h kJ/kg, s kJ/(kg K), w kJ/kg.
 */
import { requireEfficiency } from '../losses/energy-chain';
import { stateFromPH, stateFromPS } from '../inverse';
import type { SteamState } from '../types';
import { checkExpansionPressures, steamInlet, superheatOf } from './inlet';

export interface ExpansionInput {
	/** Inlet pressure, MPa absolute. */
	p1: number;
	/** Inlet temperature, K, for superheated (or supercritical) steam. */
	T1?: number;
	/** Inlet dryness fraction, 0..1, for saturated or wet steam (p1 ≤ 22.064 MPa). */
	x1?: number;
	/** Outlet (exhaust) pressure, MPa absolute; below p1. */
	p2: number;
	/** Isentropic efficiency, (0, 1]: actual work ÷ isentropic work. */
	isentropicEfficiency: number;
}

export interface ExpansionResult {
	inlet: SteamState;
	/** Inlet enthalpy, kJ/kg, and entropy, kJ/(kg K). */
	h1: number;
	s1: number;
	/** The end state of the isentropic expansion to p2 (s = s1). */
	isentropicOutlet: SteamState;
	h2s: number;
	T2s: number;
	/** Dryness of the isentropic end state; null when it is not inside the dome. */
	x2s: number | null;
	/** K above saturation at p2 of the isentropic end state; null when wet or p2 has no saturation. */
	superheat2s: number | null;
	/** The actual end state, at p2 and h2. */
	outlet: SteamState;
	h2: number;
	T2: number;
	s2: number;
	/** Exhaust dryness fraction; null when superheated (or beyond the dome). */
	x2: number | null;
	/** K above saturation at p2 of the exhaust; null when wet. */
	superheat2: number | null;
	/** True when the exhaust is inside the dome (0 ≤ x2 < 1): water droplets in the exhaust. */
	wetExhaust: boolean;
	/** Isentropic work h1 − h2s, kJ/kg. */
	isentropicWork: number;
	/** Actual specific work h1 − h2, kJ/kg. */
	work: number;
	isentropicEfficiency: number;
}

/**
 * Expands steam from (p1, T1) or (p1, x1) to p2 with an isentropic efficiency.
 * @throws SteamRangeError for a state outside IAPWS-IF97 (naming p1, T1, x1 or p2)
 * @throws Error for an efficiency outside (0, 1], p2 ≥ p1, both or neither of T1 and x1, or
 *   an inlet that is liquid water
 */
export function expandSteam(input: ExpansionInput): ExpansionResult {
	const efficiency = requireEfficiency(input.isentropicEfficiency, 'Isentropic efficiency');
	const inlet = steamInlet(input);
	checkExpansionPressures(input.p1, input.p2);
	const { h: h1, s: s1 } = inlet;
	const ideal = stateFromPS(input.p2, s1);
	const target = h1 - efficiency * (h1 - ideal.h);
	// Efficiency 1 is the isentropic state itself, not a second inversion that could differ in
	// its last digits.
	const outlet = efficiency === 1 ? ideal : stateFromPH(input.p2, target);
	return {
		inlet,
		h1,
		s1,
		isentropicOutlet: ideal,
		h2s: ideal.h,
		T2s: ideal.T,
		x2s: ideal.x,
		superheat2s: superheatOf(ideal),
		outlet,
		h2: outlet.h,
		T2: outlet.T,
		s2: outlet.s,
		x2: outlet.x,
		superheat2: superheatOf(outlet),
		wetExhaust: outlet.x !== null && outlet.x < 1,
		isentropicWork: h1 - ideal.h,
		work: h1 - outlet.h,
		isentropicEfficiency: efficiency
	};
}
