/**
 * IF97 region 2, vapour: the Gibbs free energy equation as ideal-gas part plus residual part
 * (IAPWS R7-97(2012) eqs. 15–17, coefficients tables 10 and 11, relations table 12).
 */
import { R } from './constants';
import { CP, CV, H, S, U, V, W, propertiesBuffer, toProperties } from './properties-buffer';
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
import { idealCoefficients, idealGasInto } from './ideal-gas';
import type { Properties } from './types';

// Table 10, ideal-gas part γ° = ln π + Σ n°ᵢ τ^J°ᵢ.
const J0 = [0, 1, -5, -4, -3, -2, -1, 2, 3];
const n0 = [
	-0.96927686500217e1, 0.10086655968018e2, -0.5608791128302e-2, 0.71452738081455e-1,
	-0.40710498223928, 0.14240819171444e1, -0.4383951131945e1, -0.28408632460772, 0.21268463753307e-1
];

// Table 11, residual part γʳ = Σ nᵢ π^Iᵢ (τ − 0.5)^Jᵢ.
const I = [
	1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 4, 4, 5, 6, 6, 6, 7, 7, 7, 8, 8, 9, 10, 10, 10,
	16, 16, 18, 20, 20, 20, 21, 22, 23, 24, 24, 24
];
const J = [
	0, 1, 2, 3, 6, 1, 2, 4, 7, 36, 0, 1, 3, 6, 35, 1, 2, 3, 7, 3, 16, 35, 0, 11, 25, 8, 36, 13, 4, 10,
	14, 29, 50, 57, 20, 35, 48, 21, 53, 39, 26, 40, 58
];
const n = [
	-0.17731742473213e-2, -0.17834862292358e-1, -0.45996013696365e-1, -0.57581259083432e-1,
	-0.5032527872793e-1, -0.33032641670203e-4, -0.18948987516315e-3, -0.39392777243355e-2,
	-0.43797295650573e-1, -0.26674547914087e-4, 0.20481737692309e-7, 0.43870667284435e-6,
	-0.3227767723857e-4, -0.15033924542148e-2, -0.40668253562649e-1, -0.78847309559367e-9,
	0.12790717852285e-7, 0.48225372718507e-6, 0.22922076337661e-5, -0.16714766451061e-10,
	-0.21171472321355e-2, -0.23895741934104e2, -0.5905956432427e-17, -0.12621808899101e-5,
	-0.38946842435739e-1, 0.11256211360459e-10, -0.82311340897998e1, 0.19809712802088e-7,
	0.10406965210174e-18, -0.10234747095929e-12, -0.10018179379511e-8, -0.80882908646985e-10,
	0.10693031879409, -0.33662250574171, 0.89185845355421e-24, 0.30629316876232e-12,
	-0.42002467698208e-5, -0.59056029685639e-25, 0.37826947613457e-5, -0.12768608934681e-14,
	0.73087610595061e-28, 0.55414715350778e-16, -0.9436970724121e-6
];

const ideal = idealCoefficients(J0, n0);
const residual = powerSeries(I, J, n);
const g0 = new Float64Array(6);
const gr = new Float64Array(6);

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
	idealGasInto(ideal, tau, g0);
	seriesDerivatives(residual, pi, tau - 0.5, gr);
	idealPlusResidualInto(p, T, pi, tau, g0, gr, out);
}

/**
 * h, s and cp from the ideal and residual sums (τ-derivatives only), into slots H, S, CP (the parts of
 * idealPlusResidualInto a temperature iteration needs).
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
	out[H] = R * T * tau * gt;
	out[S] = R * (tau * gt - (Math.log(pi) + g0[F] + gr[F]));
	out[CP] = -R * tau * tau * (g0[F_YY] + gr[F_YY]);
}

/** Only h, s and cp of region 2 at p [MPa], T [K] into slots H, S, CP. */
export function region2HsCpInto(p: number, T: number, out: Float64Array): void {
	const tau = 540 / T;
	idealGasInto(ideal, tau, g0);
	seriesYDerivatives(residual, p, tau - 0.5, gr);
	idealPlusResidualHsCpInto(T, p, tau, g0, gr, out);
}

const buffer = propertiesBuffer();

/** Region 2 properties at p [MPa], T [K] as an object (base units, see Properties). */
export function region2(p: number, T: number): Properties {
	region2Into(p, T, buffer);
	return toProperties(p, T, buffer);
}
