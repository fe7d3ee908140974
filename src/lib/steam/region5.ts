/**
 * IF97 region 5, high-temperature vapour (1073.15 K < T ≤ 2273.15 K, p ≤ 50 MPa): the Gibbs
 * equation as ideal-gas plus residual part (IAPWS R7-97(2012) eqs. 32–34, tables 37–39).
 */
import { propertiesBuffer, toProperties } from './properties-buffer';
import {
	DERIVATIVE_SLOTS,
	powerSeries,
	seriesDerivatives,
	seriesYDerivatives
} from './power-series';
import { idealPlusResidualHsCpInto, idealPlusResidualInto } from './region2';
import { idealCoefficients, idealGasInto } from './ideal-gas';
import type { Properties } from './types';

// Table 37, ideal-gas part γ° = ln π + Σ n°ᵢ τ^J°ᵢ.
const J0 = [0, 1, -3, -2, -1, 2];
const n0 = [
	-0.13179983674201e2, 0.68540841634434e1, -0.24805148933466e-1, 0.36901534980333,
	-0.31161318213925e1, -0.32961626538917
];

// Table 38, residual part γʳ = Σ nᵢ π^Iᵢ τ^Jᵢ.
const I = [1, 1, 1, 2, 2, 3];
const J = [1, 2, 3, 3, 9, 7];
const n = [
	0.15736404855259e-2, 0.90153761673944e-3, -0.50270077677648e-2, 0.22440037409485e-5,
	-0.41163275453471e-5, 0.37919454822955e-7
];

const ideal = idealCoefficients(J0, n0);
const residual = powerSeries(I, J, n);
const g0 = new Float64Array(DERIVATIVE_SLOTS);
const gr = new Float64Array(DERIVATIVE_SLOTS);

/**
 * Region 5 properties at pressure p [MPa] and temperature T [K] into buffer slots V … W
 * (v m³/kg, h and u kJ/kg, s, cp and cv kJ/(kg K), w m/s). No range check: callers choose the
 * region.
 */
export function region5Into(p: number, T: number, out: Float64Array): void {
	const tau = 1000 / T;
	idealGasInto(ideal, tau, g0);
	seriesDerivatives(residual, p, tau, gr);
	idealPlusResidualInto(p, T, p, tau, g0, gr, out);
}

/** Only h, s, cp and dcp/dT of region 5 at p [MPa], T [K] into slots H, S, CP, CP_T. */
export function region5HsCpInto(p: number, T: number, out: Float64Array): void {
	const tau = 1000 / T;
	idealGasInto(ideal, tau, g0);
	seriesYDerivatives(residual, p, tau, gr);
	idealPlusResidualHsCpInto(T, p, tau, g0, gr, out);
}

const buffer = propertiesBuffer();

/** Region 5 properties at p [MPa], T [K] as an object (base units, see Properties). */
export function region5(p: number, T: number): Properties {
	region5Into(p, T, buffer);
	return toProperties(p, T, buffer);
}
