/**
 * IF97 region 1 backward equations T(p, h) and T(p, s) (IAPWS R7-97(2012) eqs. 11 and 13,
 * tables 6 and 8). They agree with the Gibbs equation to within 25 mK; the solvers polish
 * them with Newton steps on the forward equation. The series are generated from the tables
 * (region1-backward-coefficients.ts) by scripts/generate-if97-series.ts.
 */
import { region1ThetaPH, region1ThetaPS } from './region1-backward-series.generated';

/** Region 1 temperature [K] from p [MPa] and h [kJ/kg], backward eq. 11 (no range check). */
export function region1TemperaturePH(p: number, h: number): number {
	return region1ThetaPH(p, h / 2500 + 1);
}

/** Region 1 temperature [K] from p [MPa] and s [kJ/(kg K)], backward eq. 13 (no range check). */
export function region1TemperaturePS(p: number, s: number): number {
	return region1ThetaPS(p, s + 2);
}
