/**
 * IF97 region 1, compressed liquid: the Gibbs free energy equation (IAPWS R7-97(2012) eq. 7,
 * coefficients table 2, property relations table 3).
 */
import { R } from './constants';
import { CP, CP_T, CV, H, S, U, V, W, propertiesBuffer, toProperties } from './properties-buffer';
import type { Properties } from './types';
import { DERIVATIVE_SLOTS, F, F_X, F_XX, F_XY, F_Y, F_YY, F_YYY } from './power-series';
import { region1SeriesInto, region1SeriesTauInto } from './region1-series.generated';

const g = new Float64Array(DERIVATIVE_SLOTS);

/**
 * Region 1 properties at pressure p [MPa] and temperature T [K] into buffer slots V … W
 * (v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s). No range check: callers choose the
 * region.
 */
export function region1Into(p: number, T: number, out: Float64Array): void {
	const pi = p / 16.53;
	const tau = 1386 / T;
	// The series runs in (7.1 − π): d/dπ flips the sign of odd π-derivatives.
	region1SeriesInto(7.1 - pi, tau - 1.222, g);
	const gp = -g[F_X];
	const gpp = g[F_XX];
	const gt = g[F_Y];
	const gtt = g[F_YY];
	const gpt = -g[F_XY];
	const RT = R * T;
	const a = gp - tau * gpt;
	out[V] = (pi * gp * RT) / (p * 1000);
	out[H] = tau * gt * RT;
	out[U] = RT * (tau * gt - pi * gp);
	out[S] = R * (tau * gt - g[F]);
	out[CP] = -R * tau * tau * gtt;
	out[CV] = R * (-tau * tau * gtt + (a * a) / gpp);
	out[W] = Math.sqrt((RT * 1000 * gp * gp) / ((a * a) / (tau * tau * gtt) - gpp));
}

/**
 * Only h, s, cp and dcp/dT of region 1 at p [MPa], T [K] into slots H, S, CP, CP_T: what a
 * temperature iteration needs, at less than the cost of region1Into.
 */
export function region1HsCpInto(p: number, T: number, out: Float64Array): void {
	const tau = 1386 / T;
	region1SeriesTauInto(7.1 - p / 16.53, tau - 1.222, g);
	const tau2 = tau * tau;
	out[H] = tau * g[F_Y] * R * T;
	out[S] = R * (tau * g[F_Y] - g[F]);
	out[CP] = -R * tau2 * g[F_YY];
	// cp = −R τ² γ_ττ and dτ/dT = −τ/T.
	out[CP_T] = (R * tau2 * (2 * g[F_YY] + tau * g[F_YYY])) / T;
}

const buffer = propertiesBuffer();

/** Region 1 properties at p [MPa], T [K] as an object (base units, see Properties). */
export function region1(p: number, T: number): Properties {
	region1Into(p, T, buffer);
	return toProperties(p, T, buffer);
}
