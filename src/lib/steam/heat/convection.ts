/**
 * Convection correlations as published, in dimensionless form. Every function takes the
 * dimensionless groups, so a test can feed a textbook's own property values and compare digits.
 */
import { STANDARD_GRAVITY } from './constants';

/** Rayleigh number Ra = g·β·ΔT·L³·Pr/ν² for a length L [m], ΔT [K], β [1/K], ν [m²/s]. */
export function rayleighNumber(
	length: number,
	temperatureDifference: number,
	expansionCoefficient: number,
	kinematicViscosity: number,
	prandtlNumber: number
): number {
	return (
		(STANDARD_GRAVITY *
			expansionCoefficient *
			temperatureDifference *
			length ** 3 *
			prandtlNumber) /
		kinematicViscosity ** 2
	);
}

/** Reynolds number Re = V·L/ν for a speed V [m/s], length L [m], ν [m²/s]. */
export function reynoldsNumber(speed: number, length: number, kinematicViscosity: number): number {
	return (speed * length) / kinematicViscosity;
}

/**
 * Natural convection from a horizontal cylinder, Churchill & Chu (1975), Int. J. Heat Mass
 * Transfer 18:1049: Nu_D = {0.60 + 0.387·Ra_D^(1/6) / [1 + (0.559/Pr)^(9/16)]^(8/27)}²,
 * for Ra_D ≲ 10¹² (the engine's diameter and temperature limits keep Ra below that).
 */
export function nusseltHorizontalCylinderNatural(rayleigh: number, prandtl: number): number {
	const prandtlFactor = (1 + (0.559 / prandtl) ** (9 / 16)) ** (8 / 27);
	return (0.6 + (0.387 * rayleigh ** (1 / 6)) / prandtlFactor) ** 2;
}

/** Re·Pr below which Churchill–Bernstein is not valid and forced convection is negligible. */
export const CHURCHILL_BERNSTEIN_MIN_RE_PR = 0.2;

/**
 * Cylinder in cross-flow, Churchill & Bernstein (1977), J. Heat Transfer 99:300:
 * Nu_D = 0.3 + 0.62·Re^(1/2)·Pr^(1/3) / [1 + (0.4/Pr)^(2/3)]^(1/4) · [1 + (Re/282000)^(5/8)]^(4/5),
 * valid for Re·Pr ≥ 0.2. Below that (still air or a breath of wind on a small pipe) the
 * forced part is returned as 0: natural convection then carries the loss, and the 0.3 floor
 * of the correlation would otherwise be counted twice with the natural-convection floor.
 */
export function nusseltCylinderCrossFlow(reynolds: number, prandtl: number): number {
	if (reynolds * prandtl < CHURCHILL_BERNSTEIN_MIN_RE_PR) return 0;
	const laminar =
		(0.62 * Math.sqrt(reynolds) * prandtl ** (1 / 3)) / (1 + (0.4 / prandtl) ** (2 / 3)) ** 0.25;
	return 0.3 + laminar * (1 + (reynolds / 282000) ** (5 / 8)) ** (4 / 5);
}

/**
 * Natural convection from a vertical plate of height L, Churchill & Chu (1975), Int. J. Heat
 * Mass Transfer 18:1323, the all-Ra form:
 * Nu_L = {0.825 + 0.387·Ra_L^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27)}².
 */
export function nusseltVerticalPlateNatural(rayleigh: number, prandtl: number): number {
	const prandtlFactor = (1 + (0.492 / prandtl) ** (9 / 16)) ** (8 / 27);
	return (0.825 + (0.387 * rayleigh ** (1 / 6)) / prandtlFactor) ** 2;
}

/** Transition Reynolds number for a flat plate in parallel flow (the usual 5·10⁵). */
export const FLAT_PLATE_TRANSITION_RE = 5e5;

/**
 * Average Nusselt number of a flat plate of length L in parallel flow: laminar
 * 0.664·Re^(1/2)·Pr^(1/3) up to Re = 5·10⁵, then the mixed laminar–turbulent boundary layer
 * (0.037·Re^(4/5) − 871)·Pr^(1/3) (Incropera, DeWitt et al., "Fundamentals of Heat and Mass
 * Transfer", eqs. 7.30 and 7.38; equation numbers from memory). The two meet at the transition.
 */
export function nusseltFlatPlateForced(reynolds: number, prandtl: number): number {
	const pr3 = prandtl ** (1 / 3);
	if (reynolds <= FLAT_PLATE_TRANSITION_RE) return 0.664 * Math.sqrt(reynolds) * pr3;
	return (0.037 * reynolds ** 0.8 - 871) * pr3;
}

/**
 * Exponent n of the mixed-convection combination Nu^n = Nu_forced^n + Nu_natural^n.
 * Churchill (1977), AIChE J. 23:10, correlates assisting and transverse mixed convection with
 * n = 3; Incropera §9.9 gives n = 3 as the usual value and notes 3.5–4 may fit transverse flow
 * over plates and cylinders a little better (from memory). We keep n = 3: wind across a
 * horizontal pipe is transverse to buoyancy, and n = 3 gives at most ~6% more than n = 4
 * where the two parts are equal, nothing where one dominates.
 */
export const MIXED_CONVECTION_EXPONENT = 3;

/** Combined Nusselt number (Nu_N^n + Nu_F^n)^(1/n), n = MIXED_CONVECTION_EXPONENT. */
export function combineMixedConvection(natural: number, forced: number): number {
	const n = MIXED_CONVECTION_EXPONENT;
	return (natural ** n + forced ** n) ** (1 / n);
}
