/**
 * IF97 region 1, compressed liquid: the Gibbs free energy equation (IAPWS R7-97(2012) eq. 7,
 * coefficients table 2, property relations table 3).
 */
import { R } from './constants';
import { CP, CV, H, S, U, V, W, propertiesBuffer, toProperties } from './properties-buffer';
import type { Properties } from './types';
import {
	F,
	F_X,
	F_XX,
	F_XY,
	F_Y,
	F_YY,
	powerSeries,
	seriesDerivatives,
	seriesYDerivatives
} from './power-series';

// Table 2.
const I = [
	0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29,
	30, 31, 32
];
const J = [
	-2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6,
	-29, -31, -38, -39, -40, -41
];
const n = [
	0.14632971213167, -0.84548187169114, -0.3756360367204e1, 0.33855169168385e1, -0.95791963387872,
	0.15772038513228, -0.16616417199501e-1, 0.81214629983568e-3, 0.28319080123804e-3,
	-0.60706301565874e-3, -0.18990068218419e-1, -0.32529748770505e-1, -0.21841717175414e-1,
	-0.5283835796993e-4, -0.47184321073267e-3, -0.30001780793026e-3, 0.47661393906987e-4,
	-0.44141845330846e-5, -0.72694996297594e-15, -0.31679644845054e-4, -0.28270797985312e-5,
	-0.85205128120103e-9, -0.22425281908e-5, -0.65171222895601e-6, -0.14341729937924e-12,
	-0.40516996860117e-6, -0.12734301741641e-8, -0.17424871230634e-9, -0.68762131295531e-18,
	0.14478307828521e-19, 0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23,
	-0.93537087292458e-25
];

const series = powerSeries(I, J, n);
const g = new Float64Array(6);

/**
 * Region 1 properties at pressure p [MPa] and temperature T [K] into buffer slots V … W
 * (v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s). No range check: callers choose the
 * region.
 */
export function region1Into(p: number, T: number, out: Float64Array): void {
	const pi = p / 16.53;
	const tau = 1386 / T;
	// The series runs in (7.1 − π): d/dπ flips the sign of odd π-derivatives.
	seriesDerivatives(series, 7.1 - pi, tau - 1.222, g);
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
 * Only h, s and cp of region 1 at p [MPa], T [K] into slots H, S, CP: what a temperature
 * iteration needs, at about half the cost of region1Into.
 */
export function region1HsCpInto(p: number, T: number, out: Float64Array): void {
	const tau = 1386 / T;
	seriesYDerivatives(series, 7.1 - p / 16.53, tau - 1.222, g);
	out[H] = tau * g[F_Y] * R * T;
	out[S] = R * (tau * g[F_Y] - g[F]);
	out[CP] = -R * tau * tau * g[F_YY];
}

const buffer = propertiesBuffer();

/** Region 1 properties at p [MPa], T [K] as an object (base units, see Properties). */
export function region1(p: number, T: number): Properties {
	region1Into(p, T, buffer);
	return toProperties(p, T, buffer);
}
