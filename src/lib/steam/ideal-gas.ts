/**
 * The τ-part of the ideal-gas Gibbs energy of regions 2 and 5, Σ n°ᵢ τ^J°ᵢ with J° between −5
 * and 3 (IAPWS R7-97(2012) eqs. 16 and 33), written out term by term: a handful of
 * multiplications, cheaper than the general series for nine terms.
 */
import { F, F_X, F_XX, F_XY, F_Y, F_YY, F_YYY } from './power-series';

/** Coefficients by exponent, index J + 5 for J = −5 … 3 (zero where a table has no term). */
export function idealCoefficients(J: readonly number[], n: readonly number[]): Float64Array {
	const c = new Float64Array(9);
	J.forEach((e, k) => {
		if (!Number.isInteger(e) || e < -5 || e > 3) throw new Error('ideal-gas part: J from −5 to 3');
		c[e + 5] += n[k];
	});
	return c;
}

/**
 * γ°(τ) without its ln π term, with its first three τ-derivatives, into out[F], out[F_Y],
 * out[F_YY], out[F_YYY]; the π-slots are zero (the ln π term's derivatives are applied where the
 * properties are formed).
 */
export function idealGasInto(c: Float64Array, tau: number, out: Float64Array): void {
	const t2 = tau * tau;
	const t3 = t2 * tau;
	const r = 1 / tau;
	const r2 = r * r;
	const r3 = r2 * r;
	const r4 = r2 * r2;
	const r5 = r4 * r;
	const r6 = r3 * r3;
	const r7 = r6 * r;
	const r8 = r4 * r4;
	const m5 = c[0];
	const m4 = c[1];
	const m3 = c[2];
	const m2 = c[3];
	const m1 = c[4];
	const c0 = c[5];
	const p1 = c[6];
	const p2 = c[7];
	const p3 = c[8];
	out[F] = m5 * r5 + m4 * r4 + m3 * r3 + m2 * r2 + m1 * r + c0 + p1 * tau + p2 * t2 + p3 * t3;
	out[F_Y] = -5 * m5 * r6 - 4 * m4 * r5 - 3 * m3 * r4 - 2 * m2 * r3 - m1 * r2 + p1 + 2 * p2 * tau;
	out[F_Y] += 3 * p3 * t2;
	out[F_YY] = 30 * m5 * r7 + 20 * m4 * r6 + 12 * m3 * r5 + 6 * m2 * r4 + 2 * m1 * r3 + 2 * p2;
	out[F_YY] += 6 * p3 * tau;
	out[F_YYY] = -210 * m5 * r8 - 120 * m4 * r7 - 60 * m3 * r6 - 24 * m2 * r5 - 6 * m1 * r4;
	out[F_YYY] += 6 * p3;
	out[F_X] = 0;
	out[F_XX] = 0;
	out[F_XY] = 0;
}
