/**
 * Steam flow through a sharp orifice (a failed trap's seat, a leak's hole), from the steam's
 * own IF97 properties: isentropic expansion from the upstream stagnation state to the throat,
 * mass flux G = ρ·√(2Δh). G rises as the throat pressure falls, peaks at the critical
 * pressure and cannot be exceeded: when the back pressure is below that peak the flow is
 * choked and the throat sits at the critical pressure. Two-phase throats use the homogeneous
 * equilibrium model (the mixture's density from IF97's dryness fraction).
 */
import { stateFromPT } from '../forward';
import { stateFromPS } from '../inverse';
import { saturationTemperature } from '../region4';
import { saturatedVapour, stateFromPX } from '../saturation';
import type { SteamState } from '../types';
import { LB_KG, IN_M, PSI_PA } from '../../units/constants';
import { peakOf, type Peak } from './peak-search';
import { requireFinite, requirePositive } from './sourced';

export interface OrificeInput {
	/** Upstream (stagnation) pressure, MPa absolute. */
	p1: number;
	/** Back pressure downstream of the orifice, MPa absolute; below p1. */
	p2: number;
	/** Orifice diameter, m. */
	diameter: number;
	/** Discharge coefficient, (0, 1]: actual ÷ ideal isentropic flow. */
	cd: number;
	/** Upstream temperature for superheated steam, K (at or above saturation). */
	T1?: number;
	/** Upstream dryness fraction for wet steam, [0, 1]. */
	x1?: number;
}

export interface OrificeFlow {
	/** Mass flow, kg/s (cd × area × ideal mass flux). */
	massFlow: number;
	/** True when the back pressure is at or below the critical pressure. */
	choked: boolean;
	/** Pressure at the throat, MPa absolute: the critical pressure if choked, else p2. */
	throatPressure: number;
	/** Pressure at which the ideal mass flux peaks for this upstream state, MPa absolute. */
	criticalPressure: number;
	/** Ideal isentropic mass flux at the throat, kg/(m² s). */
	massFlux: number;
}

/** Lowest throat-to-upstream pressure ratio searched; real steam's peak is near 0.55–0.6. */
const RATIO_MIN = 0.05;
/**
 * Where the search for the peak starts, and its first step: between ideal-gas steam's critical
 * ratio (κ ≈ 1.3: 0.546) and that of dry saturated steam expanding into the dome (≈ 0.58).
 * Wet upstream steam peaks higher (0.67 at 15 MPa and x = 0.2); the bracket then walks up.
 */
const RATIO_GUESS = 0.58;
const RATIO_STEP = 0.04;
/**
 * Relative uncertainty of the flux from its throat enthalpy, which the engine solves to 1e-13
 * of T: Δh, a tenth of h, then carries about 1e-12. Function values cannot place the peak
 * closer than where the flux falls by this much.
 */
const FLUX_NOISE = 1e-12;
/** Coarsest resolution of the peak's pressure ratio, for a flux too flat to estimate. */
const RATIO_TOLERANCE = 1e-6;

/** Upstream state: dry saturated unless T1 (superheated) or x1 (wet) is given. */
export function upstreamState(p1: number, T1?: number, x1?: number): SteamState {
	if (T1 !== undefined && x1 !== undefined) {
		throw new Error(
			'Give either the upstream temperature (superheated) or the dryness fraction (wet), not both'
		);
	}
	if (x1 !== undefined) {
		requireFinite('Upstream dryness fraction', x1, '(kg vapour per kg)');
		if (x1 < 0 || x1 > 1)
			throw new Error(`Upstream dryness fraction must be between 0 and 1, got ${x1}`);
		return stateFromPX(p1, x1);
	}
	if (T1 === undefined) return saturatedVapour(p1);
	requireFinite('Upstream temperature', T1, 'K');
	const Tsat = saturationTemperature(p1);
	if (T1 < Tsat - 1e-6) {
		throw new Error(
			`Upstream temperature ${T1.toFixed(2)} K is below saturation (${Tsat.toFixed(2)} K at ${p1} MPa): give the dryness fraction for wet steam instead`
		);
	}
	return T1 - Tsat < 1e-6 ? saturatedVapour(p1) : stateFromPT(p1, T1);
}

/** Ideal isentropic mass flux from the upstream state to throat pressure p, kg/(m² s). */
export function isentropicMassFlux(upstream: SteamState, p: number): number {
	if (p >= upstream.p) return 0;
	const throat = stateFromPS(p, upstream.s);
	const dh = upstream.h - throat.h; // kJ/kg
	return dh <= 0 ? 0 : Math.sqrt(2 * dh * 1000) / throat.v;
}

/**
 * Throat pressure of the peak mass flux: the peak is bracketed by stepping from RATIO_GUESS
 * towards rising flux, then found by Brent's method (about a dozen isentropic states in all,
 * where golden section over the whole range took 35).
 */
export function criticalPressure(upstream: SteamState): number {
	return fluxPeak(upstream).x * upstream.p;
}

/** The peak of the mass flux over the pressure ratio: ratio x and flux f, kg/(m² s). */
function fluxPeak(upstream: SteamState): Peak {
	const flux = (ratio: number) => isentropicMassFlux(upstream, ratio * upstream.p);
	const lo = Math.max(RATIO_MIN, 0.000612 / upstream.p);
	let x = Math.min(Math.max(RATIO_GUESS, lo), 1 - RATIO_STEP);
	let fx = flux(x);
	let step = RATIO_STEP;
	// Flux is zero at ratio 1, so walking up always stops below it.
	let up = Math.min(1, x + step);
	let fUp = flux(up);
	let down = Math.max(lo, x - step);
	let fDown = flux(down);
	while (fUp > fx) {
		[down, fDown, x, fx] = [x, fx, up, fUp];
		step *= 2;
		up = Math.min(1, x + step);
		fUp = flux(up);
	}
	while (fDown > fx && x > lo) {
		[up, fUp, x, fx] = [x, fx, down, fDown];
		step *= 2;
		down = Math.max(lo, x - step);
		fDown = down === x ? fx : flux(down);
	}
	// Near its peak the flux is G·(1 − k·δ²/2) at a distance δ in the ratio, k from the three
	// points bracketing it; it is found to the δ at which that loss equals FLUX_NOISE, so the
	// flux is exact to about 1e-12 however sharp its peak (saturated liquid upstream: sharp).
	const bend = ((fUp - fx) / (up - x) - (fx - fDown) / (x - down)) / (up - down);
	const k = (-2 * bend) / fx;
	const tol = k > 0 ? Math.min(RATIO_TOLERANCE, Math.sqrt((2 * FLUX_NOISE) / k)) : RATIO_TOLERANCE;
	return peakOf(flux, down, fDown, x, fx, up, fUp, tol);
}

/**
 * Steam mass flow through an orifice from IF97 properties.
 * @returns mass flow kg/s, whether choked, throat and critical pressure MPa absolute, ideal flux
 */
export function orificeSteamFlow({ p1, p2, diameter, cd, T1, x1 }: OrificeInput): OrificeFlow {
	requirePositive('Upstream pressure', p1, 'MPa');
	requirePositive('Back pressure', p2, 'MPa');
	requirePositive('Orifice diameter', diameter, 'm');
	requireDischargeCoefficient(cd);
	if (p2 >= p1) {
		throw new Error(
			`Back pressure (${p2} MPa abs) must be below the upstream pressure (${p1} MPa abs): steam does not flow from low to high pressure`
		);
	}
	const upstream = upstreamState(p1, T1, x1);
	const peak = fluxPeak(upstream);
	const pCritical = peak.x * upstream.p;
	const choked = p2 <= pCritical;
	const throatPressure = choked ? pCritical : p2;
	// The search already evaluated the flux at the peak (the same call, so the same value).
	const massFlux = choked ? peak.f : isentropicMassFlux(upstream, throatPressure);
	const area = (Math.PI / 4) * diameter ** 2;
	return {
		massFlow: cd * area * massFlux,
		choked,
		throatPressure,
		criticalPressure: pCritical,
		massFlux
	};
}

/**
 * Napier's formula for choked flow of saturated steam, W [lb/s] = A [in²] · P [psia] / 70,
 * times a discharge coefficient (docs/sources.md: as recommended by ASME PTC 25.3-1976).
 * @param p1 upstream pressure, MPa absolute; diameter m; cd (0, 1]
 * @returns mass flow, kg/s
 */
export function napierSteamFlow({
	p1,
	diameter,
	cd
}: {
	p1: number;
	diameter: number;
	cd: number;
}): {
	massFlow: number;
} {
	requirePositive('Upstream pressure', p1, 'MPa');
	requirePositive('Orifice diameter', diameter, 'm');
	requireDischargeCoefficient(cd);
	const areaIn2 = ((Math.PI / 4) * diameter ** 2) / IN_M ** 2;
	const psia = (p1 * 1e6) / PSI_PA;
	return { massFlow: (cd * areaIn2 * psia * LB_KG) / 70 };
}

function requireDischargeCoefficient(cd: number): void {
	requireFinite('Discharge coefficient', cd, '(a fraction)');
	if (cd <= 0 || cd > 1)
		throw new Error(`Discharge coefficient must be greater than 0 and at most 1, got ${cd}`);
}
