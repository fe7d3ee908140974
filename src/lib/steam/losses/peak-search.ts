/**
 * The maximum of a smooth function of one variable with a single peak in an interval: Brent's
 * method (R. P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 5), parabolic
 * steps through the three best points with golden-section steps when a parabola misbehaves.
 * Near a smooth peak the parabola is exact to third order, so it converges in a handful of
 * evaluations where golden section alone needs one per 0.38 of the interval (about 35 to
 * narrow 1 to 1e-7).
 */

const GOLDEN = (3 - Math.sqrt(5)) / 2;
/**
 * Relative resolution of the peak's position: below about √ε of it, f near its peak differs by
 * less than rounding, so function values cannot place it any closer (Brent, ch. 5).
 */
const RELATIVE = Math.sqrt(Number.EPSILON);

/** Where f peaks and its value there. */
export interface Peak {
	x: number;
	f: number;
}

/**
 * The peak of f in [a, b], given a point x inside with f(x) no lower than f at either end (so
 * the peak is bracketed), to within about tol + 3e-8·|x|. fa, fx, fb are f at a, x, b, already
 * known: the first step is the vertex of the parabola through them.
 */
export function peakOf(
	f: (x: number) => number,
	a: number,
	fa: number,
	x: number,
	fx: number,
	b: number,
	fb: number,
	tol: number
): Peak {
	// Brent's localmin, on −f: x is the best point so far, w the second best, v the previous w.
	let [w, fw, v, fv] = fa > fb ? [a, fa, b, fb] : [b, fb, a, fa];
	let d = 0;
	// The step before last; a parabola is tried only while the steps keep shrinking.
	let e = b - a;
	for (let i = 0; i < 200; i++) {
		const m = 0.5 * (a + b);
		const tol1 = RELATIVE * Math.abs(x) + tol / 2;
		const tol2 = 2 * tol1;
		if (Math.abs(x - m) <= tol2 - 0.5 * (b - a)) break;
		let parabolic = false;
		if (Math.abs(e) > tol1 && w !== x && v !== x && v !== w) {
			// Vertex of the parabola through (v, fv), (w, fw), (x, fx): x + p/q.
			const r = (x - w) * (fx - fv);
			let q = (x - v) * (fx - fw);
			let p = (x - v) * q - (x - w) * r;
			q = 2 * (q - r);
			if (q > 0) p = -p;
			else q = -q;
			// The vertex is the same for f and −f, so localmin's formula serves unchanged.
			const previous = e;
			if (Math.abs(p) < Math.abs(0.5 * q * previous) && p > q * (a - x) && p < q * (b - x)) {
				e = d;
				d = p / q;
				const u = x + d;
				if (u - a < tol2 || b - u < tol2) d = x < m ? tol1 : -tol1;
				parabolic = true;
			}
		}
		if (!parabolic) {
			e = (x < m ? b : a) - x;
			d = GOLDEN * e;
		}
		const u = x + (Math.abs(d) >= tol1 ? d : d > 0 ? tol1 : -tol1);
		const fu = f(u);
		if (fu >= fx) {
			if (u < x) b = x;
			else a = x;
			v = w;
			fv = fw;
			w = x;
			fw = fx;
			x = u;
			fx = fu;
		} else {
			if (u < x) a = u;
			else b = u;
			if (fu >= fw || w === x) {
				v = w;
				fv = fw;
				w = u;
				fw = fu;
			} else if (fu >= fv || v === x || v === w) {
				v = u;
				fv = fu;
			}
		}
	}
	return { x, f: fx };
}
