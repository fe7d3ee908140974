/**
 * IF97 region 2 backward equation T(p, h), split into subregions 2a (p ≤ 4 MPa), 2b and 2c
 * by the 2b/2c boundary (IAPWS R7-97(2012) eqs. 20–24, tables 19–23). Within 10 mK of the
 * Gibbs equation in 2a and 2b, 25 mK in 2c; the solvers polish with Newton steps. The series
 * are generated from the tables (region2-backward-coefficients.ts) by
 * scripts/generate-if97-series.ts.
 */
import {
	region2aThetaPH,
	region2bThetaPH,
	region2cThetaPH
} from './region2-backward-ph-series.generated';

// Table 19, the B2bc equation.
const n1 = 0.90584278514723e3;
const n2 = -0.67955786399241;
const n3 = 0.12809002730136e-3;
const n4 = 0.26526571908428e4;
const n5 = 0.45257578905948e1;

/** Pressure [MPa] on the 2b/2c boundary at enthalpy h [kJ/kg] (eq. 20). */
export function b2bcPressure(h: number): number {
	return n1 + n2 * h + n3 * h * h;
}

/**
 * Enthalpy [kJ/kg] on the 2b/2c boundary at pressure p [MPa] (eq. 21); meaningful from
 * 6.5467 MPa (where the boundary meets saturation) to 100 MPa.
 */
export function b2bcEnthalpy(p: number): number {
	return n4 + Math.sqrt((p - n5) / n3);
}

/** Pressure [MPa] below which the 2b/2c boundary lies in region 4, so all of 2 above 4 MPa is 2b. */
const P_2BC_SAT = 6.546699678;

/** Region 2a temperature [K] from p [MPa], h [kJ/kg] (eq. 22). */
export function region2aTemperaturePH(p: number, h: number): number {
	return region2aThetaPH(p, h / 2000 - 2.1);
}

/** Region 2b temperature [K] from p [MPa], h [kJ/kg] (eq. 23). */
export function region2bTemperaturePH(p: number, h: number): number {
	return region2bThetaPH(p - 2, h / 2000 - 2.6);
}

/** Region 2c temperature [K] from p [MPa], h [kJ/kg] (eq. 24). */
export function region2cTemperaturePH(p: number, h: number): number {
	return region2cThetaPH(p + 25, h / 2000 - 1.8);
}

/**
 * Region 2 temperature [K] from p [MPa] and h [kJ/kg], choosing subregion 2a, 2b or 2c
 * (no range check; callers choose the region).
 */
export function region2TemperaturePH(p: number, h: number): number {
	if (p <= 4) return region2aTemperaturePH(p, h);
	if (p <= P_2BC_SAT || h >= b2bcEnthalpy(p)) return region2bTemperaturePH(p, h);
	return region2cTemperaturePH(p, h);
}
