/**
 * IF97 region 2 backward equation T(p, s), split into subregions 2a (p ≤ 4 MPa), 2b
 * (s ≥ 5.85 kJ/(kg K)) and 2c (IAPWS R7-97(2012) eqs. 25–27, tables 25–28). The solvers
 * polish the result with Newton steps on the Gibbs equation. The series are generated from
 * the tables (region2-backward-coefficients.ts) by scripts/generate-if97-series.ts.
 */
import {
	region2aThetaPS,
	region2bThetaPS,
	region2cThetaPS
} from './region2-backward-ps-series.generated';

/** Entropy of the 2b/2c boundary [kJ/(kg K)] for T(p, s) (release eq. 26 preamble). */
export const S_2BC = 5.85;

/** Region 2a temperature [K] from p [MPa], s [kJ/(kg K)] (eq. 25). */
export function region2aTemperaturePS(p: number, s: number): number {
	return region2aThetaPS(Math.sqrt(Math.sqrt(p)), s / 2 - 2);
}

/** Region 2b temperature [K] from p [MPa], s [kJ/(kg K)] (eq. 26). */
export function region2bTemperaturePS(p: number, s: number): number {
	return region2bThetaPS(p, 10 - s / 0.7853);
}

/** Region 2c temperature [K] from p [MPa], s [kJ/(kg K)] (eq. 27). */
export function region2cTemperaturePS(p: number, s: number): number {
	return region2cThetaPS(p, 2 - s / 2.9251);
}

/**
 * Region 2 temperature [K] from p [MPa] and s [kJ/(kg K)], choosing subregion 2a, 2b or 2c
 * (no range check; callers choose the region).
 */
export function region2TemperaturePS(p: number, s: number): number {
	if (p <= 4) return region2aTemperaturePS(p, s);
	return s >= S_2BC ? region2bTemperaturePS(p, s) : region2cTemperaturePS(p, s);
}
