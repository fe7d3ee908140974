/**
 * IF97 region 5, high-temperature vapour (1073.15 K < T ≤ 2273.15 K, p ≤ 50 MPa): the Gibbs
 * equation as ideal-gas plus residual part (IAPWS R7-97(2012) eqs. 32–34, tables 37–39). The
 * series are generated from the tables (region5-coefficients.ts) by
 * scripts/generate-if97-series.ts.
 */
import { propertiesBuffer, toProperties } from './properties-buffer';
import { DERIVATIVE_SLOTS } from './power-series';
import { idealPlusResidualHsCpInto, idealPlusResidualInto } from './region2';
import {
	region5IdealInto,
	region5ResidualInto,
	region5ResidualTauInto
} from './region5-series.generated';
import type { Properties } from './types';

const g0 = new Float64Array(DERIVATIVE_SLOTS);
const gr = new Float64Array(DERIVATIVE_SLOTS);

/**
 * Region 5 properties at pressure p [MPa] and temperature T [K] into buffer slots V … W
 * (v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s). No range check: callers choose the
 * region.
 */
export function region5Into(p: number, T: number, out: Float64Array): void {
	const tau = 1000 / T;
	region5IdealInto(tau, g0);
	region5ResidualInto(p, tau, gr);
	idealPlusResidualInto(p, T, p, tau, g0, gr, out);
}

/** Only h, s, cp and dcp/dT of region 5 at p [MPa], T [K] into slots H, S, CP, CP_T. */
export function region5HsCpInto(p: number, T: number, out: Float64Array): void {
	const tau = 1000 / T;
	region5IdealInto(tau, g0);
	region5ResidualTauInto(p, tau, gr);
	idealPlusResidualHsCpInto(T, p, tau, g0, gr, out);
}

const buffer = propertiesBuffer();

/** Region 5 properties at p [MPa], T [K] as an object (base units, see Properties). */
export function region5(p: number, T: number): Properties {
	region5Into(p, T, buffer);
	return toProperties(p, T, buffer);
}
