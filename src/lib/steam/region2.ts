/**
 * IF97 region 2, vapour: the Gibbs free energy equation as ideal-gas part plus residual part
 * (IAPWS R7-97(2012) eqs. 15–17, coefficients tables 10 and 11, relations table 12). The
 * series are generated from the tables (region2-coefficients.ts) by
 * scripts/generate-if97-series.ts.
 */
import { R } from './constants';
import { CP, CP_T, CV, H, S, U, V, W, propertiesBuffer, toProperties } from './properties-buffer';
import { DERIVATIVE_SLOTS, F, F_X, F_XX, F_XY, F_Y, F_YY, F_YYY } from './power-series';
import {
	region2IdealInto,
	region2ResidualInto,
	region2ResidualTauInto
} from './region2-series.generated';
import type { Properties } from './types';

const g0 = new Float64Array(DERIVATIVE_SLOTS);
const gr = new Float64Array(DERIVATIVE_SLOTS);

/**
 * Properties from a Gibbs equation split into ideal-gas and residual parts, written into
 * buffer slots V … W (IF97 table 12 for region 2, table 39 for region 5). The ideal part's
 * π-dependence is ln π, so π·γ°_π = 1 and γ°_ππ, γ°_πτ are exact closed forms.
 */
export function idealPlusResidualInto(
	p: number,
	T: number,
	pi: number,
	tau: number,
	g0: Float64Array,
	gr: Float64Array,
	out: Float64Array
): void {
	const RT = R * T;
	const gt = g0[F_Y] + gr[F_Y];
	const gtt = g0[F_YY] + gr[F_YY];
	const piGrp = pi * gr[F_X];
	const pi2Grpp = pi * pi * gr[F_XX];
	const a = 1 + piGrp - tau * pi * gr[F_XY];
	out[V] = (RT * (1 + piGrp)) / (p * 1000);
	out[H] = RT * tau * gt;
	out[U] = RT * (tau * gt - 1 - piGrp);
	out[S] = R * (tau * gt - (Math.log(pi) + g0[F] + gr[F]));
	out[CP] = -R * tau * tau * gtt;
	out[CV] = R * (-tau * tau * gtt - (a * a) / (1 - pi2Grpp));
	out[W] = Math.sqrt(
		(RT * 1000 * (1 + 2 * piGrp + piGrp * piGrp)) / (1 - pi2Grpp + (a * a) / (tau * tau * gtt))
	);
}

/**
 * Region 2 properties at pressure p [MPa] and temperature T [K] into buffer slots V … W
 * (v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s). No range check: callers choose the
 * region.
 */
export function region2Into(p: number, T: number, out: Float64Array): void {
	const pi = p;
	const tau = 540 / T;
	region2IdealInto(tau, g0);
	region2ResidualInto(pi, tau - 0.5, gr);
	idealPlusResidualInto(p, T, pi, tau, g0, gr, out);
}

/**
 * h, s, cp and dcp/dT from the ideal and residual sums (τ-derivatives only), into slots H, S,
 * CP, CP_T (what a temperature iteration needs of idealPlusResidualInto).
 */
export function idealPlusResidualHsCpInto(
	T: number,
	pi: number,
	tau: number,
	g0: Float64Array,
	gr: Float64Array,
	out: Float64Array
): void {
	const gt = g0[F_Y] + gr[F_Y];
	const gtt = g0[F_YY] + gr[F_YY];
	const tau2 = tau * tau;
	out[H] = R * T * tau * gt;
	out[S] = R * (tau * gt - (Math.log(pi) + g0[F] + gr[F]));
	out[CP] = -R * tau2 * gtt;
	// cp = −R τ² γ_ττ and dτ/dT = −τ/T.
	out[CP_T] = (R * tau2 * (2 * gtt + tau * (g0[F_YYY] + gr[F_YYY]))) / T;
}

/** Only h, s, cp and dcp/dT of region 2 at p [MPa], T [K] into slots H, S, CP, CP_T. */
export function region2HsCpInto(p: number, T: number, out: Float64Array): void {
	const tau = 540 / T;
	region2IdealInto(tau, g0);
	region2ResidualTauInto(p, tau - 0.5, gr);
	idealPlusResidualHsCpInto(T, p, tau, g0, gr, out);
}

const buffer = propertiesBuffer();

/** Region 2 properties at p [MPa], T [K] as an object (base units, see Properties). */
export function region2(p: number, T: number): Properties {
	region2Into(p, T, buffer);
	return toProperties(p, T, buffer);
}
