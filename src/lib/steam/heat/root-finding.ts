/**
 * Brent's bracketing root finder (R. P. Brent, "Algorithms for Minimization without
 * Derivatives", 1973, ch. 4, the zeroin procedure): inverse quadratic interpolation and secant
 * steps, falling back to bisection, so it always converges once the root is bracketed.
 */

export interface RootResult {
	/** The root, within the tolerance asked for. */
	root: number;
	/** Function value at the root. */
	residual: number;
	/** Function evaluations after the two at the bracket ends. */
	iterations: number;
}

/**
 * Finds x in [a, b] with f(x) = 0, where f(a) and f(b) have opposite signs (or one is zero).
 * `tolerance` is absolute, in the units of x. Throws if the root is not bracketed or the
 * function returns a non-finite value.
 */
export function findRoot(
	f: (x: number) => number,
	lower: number,
	upper: number,
	tolerance: number,
	maxIterations = 200
): RootResult {
	let a = lower;
	let b = upper;
	let fa = finite(f, a);
	let fb = finite(f, b);
	if (fa === 0) return { root: a, residual: 0, iterations: 0 };
	if (fb === 0) return { root: b, residual: 0, iterations: 0 };
	if (Math.sign(fa) === Math.sign(fb)) {
		throw new RangeError(
			`root not bracketed: f(${a}) = ${fa} and f(${b}) = ${fb} have the same sign`
		);
	}
	let c = a;
	let fc = fa;
	let d = b - a;
	let e = d;
	for (let iteration = 1; iteration <= maxIterations; iteration++) {
		if (Math.sign(fb) === Math.sign(fc)) {
			// Keep the root between b and c.
			c = a;
			fc = fa;
			d = b - a;
			e = d;
		}
		if (Math.abs(fc) < Math.abs(fb)) {
			// b is always the best estimate so far.
			a = b;
			b = c;
			c = a;
			fa = fb;
			fb = fc;
			fc = fa;
		}
		const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance;
		const m = 0.5 * (c - b);
		if (Math.abs(m) <= tol || fb === 0) return { root: b, residual: fb, iterations: iteration };
		if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
			let p: number;
			let q: number;
			const s = fb / fa;
			if (a === c) {
				// Secant step.
				p = 2 * m * s;
				q = 1 - s;
			} else {
				// Inverse quadratic interpolation.
				const qa = fa / fc;
				const r = fb / fc;
				p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
				q = (qa - 1) * (r - 1) * (s - 1);
			}
			if (p > 0) q = -q;
			else p = -p;
			if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
				e = d;
				d = p / q;
			} else {
				d = m;
				e = m;
			}
		} else {
			d = m;
			e = m;
		}
		a = b;
		fa = fb;
		b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
		fb = finite(f, b);
	}
	throw new RangeError(`root finder did not converge in ${maxIterations} iterations`);
}

function finite(f: (x: number) => number, x: number): number {
	const y = f(x);
	if (!Number.isFinite(y)) throw new RangeError(`function is not finite at x = ${x}: ${y}`);
	return y;
}
