/**
 * IF97 region 3 basic equation (IAPWS R7-97(2012) eq. 28, table 30): the dimensionless Helmholtz
 * free energy φ(δ, τ) = n1 ln δ + Σ ni δ^Ii τ^Ji with δ = ρ/ρc, τ = Tc/T.
 * Shared by the forward equation and the region 3 solvers, which call it in tight loops, so it
 * writes into a caller-owned Float64Array instead of allocating, and raises δ and τ to integer
 * powers by repeated multiplication rather than Math.pow.
 */

/** n1, the coefficient of the logarithmic term (table 30, i = 1). */
export const N1 = 0.10658070028513e1;

// Table 30, i = 2..40.
export const TERM_I = Int8Array.from([
	0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 4, 4, 4, 5, 5, 5, 6, 6, 6, 7,
	8, 9, 9, 10, 10, 11
]);
export const TERM_J = Int8Array.from([
	0, 1, 2, 7, 10, 12, 23, 2, 6, 15, 17, 0, 2, 6, 7, 22, 26, 0, 2, 4, 16, 26, 0, 2, 4, 26, 1, 3, 26,
	0, 2, 26, 2, 26, 2, 26, 0, 1, 26
]);
export const TERM_N = Float64Array.from([
	-0.15732845290239e2, 0.20944396974307e2, -0.76867707878716e1, 0.26185947787954e1,
	-0.2808078114862e1, 0.12053369696517e1, -0.84566812812502e-2, -0.12654315477714e1,
	-0.11524407806681e1, 0.88521043984318, -0.64207765181607, 0.38493460186671, -0.85214708824206,
	0.48972281541877e1, -0.30502617256965e1, 0.39420536879154e-1, 0.12558408424308, -0.2799932969871,
	0.1389979956946e1, -0.2018991502357e1, -0.82147637173963e-2, -0.47596035734923, 0.439840744735e-1,
	-0.44476435428739, 0.90572070719733, 0.70522450087967, 0.10770512626332, -0.32913623258954,
	-0.50871062041158, -0.22175400873096e-1, 0.94260751665092e-1, 0.16436278447961,
	-0.13503372241348e-1, -0.14834345352472e-1, 0.57922953628084e-3, 0.32308904703711e-2,
	0.80964802996215e-4, -0.16557679795037e-3, -0.44923899061815e-4
]);

export const TERM_COUNT = TERM_N.length;
export const MAX_I = 11;
export const MAX_J = 26;

// Indices into the derivative vector written by helmholtz().
/** φ */
export const PHI = 0;
/** δ φ_δ */
export const PHI_D = 1;
/** δ² φ_δδ */
export const PHI_DD = 2;
/** τ φ_τ */
export const PHI_T = 3;
/** τ² φ_ττ */
export const PHI_TT = 4;
/** δ τ φ_δτ */
export const PHI_DT = 5;

const deltaPow = new Float64Array(MAX_I + 1);
const tauPow = new Float64Array(MAX_J + 1);

/**
 * Writes φ and its reduced derivatives (δφ_δ, δ²φ_δδ, τφ_τ, τ²φ_ττ, δτφ_δτ) at (δ, τ) into
 * out[PHI..PHI_DT]. Reduced forms keep the property formulas free of divisions by δ and τ.
 */
export function helmholtz(delta: number, tau: number, out: Float64Array): void {
	deltaPow[0] = 1;
	for (let k = 1; k <= MAX_I; k++) deltaPow[k] = deltaPow[k - 1] * delta;
	tauPow[0] = 1;
	for (let k = 1; k <= MAX_J; k++) tauPow[k] = tauPow[k - 1] * tau;

	let phi = N1 * Math.log(delta);
	let d1 = N1;
	let d2 = -N1;
	let t1 = 0;
	let t2 = 0;
	let dt = 0;
	for (let k = 0; k < TERM_COUNT; k++) {
		const i = TERM_I[k];
		const j = TERM_J[k];
		const term = TERM_N[k] * deltaPow[i] * tauPow[j];
		phi += term;
		d1 += i * term;
		d2 += i * (i - 1) * term;
		t1 += j * term;
		t2 += j * (j - 1) * term;
		dt += i * j * term;
	}
	out[PHI] = phi;
	out[PHI_D] = d1;
	out[PHI_DD] = d2;
	out[PHI_T] = t1;
	out[PHI_TT] = t2;
	out[PHI_DT] = dt;
}
