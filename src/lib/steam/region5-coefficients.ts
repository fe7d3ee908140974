/**
 * IAPWS R7-97(2012) tables 37 and 38: the coefficients and exponents of the region 5 Gibbs
 * equation γ = γ° + γʳ (eqs. 32–34). region5-series.generated.ts is written from them by
 * scripts/generate-if97-series.ts; the specs check one against the other.
 */

// Table 37, ideal-gas part γ° = ln π + Σ n°ᵢ τ^J°ᵢ.
export const J0 = [0, 1, -3, -2, -1, 2];
export const n0 = [
	-0.13179983674201e2, 0.68540841634434e1, -0.24805148933466e-1, 0.36901534980333,
	-0.31161318213925e1, -0.32961626538917
];

// Table 38, residual part γʳ = Σ nᵢ π^Iᵢ τ^Jᵢ.
export const I = [1, 1, 1, 2, 2, 3];
export const J = [1, 2, 3, 3, 9, 7];
export const n = [
	0.15736404855259e-2, 0.90153761673944e-3, -0.50270077677648e-2, 0.22440037409485e-5,
	-0.41163275453471e-5, 0.37919454822955e-7
];
