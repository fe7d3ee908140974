/**
 * Evaluators for the double power series Σ nᵢ · x^Iᵢ · y^Jᵢ that make up the IF97 equations.
 * They run millions of times a second, so each call fills two small tables of powers by
 * repeated multiplication (no Math.pow per term) and allocates nothing.
 */

/** Fills table[k] = base^(lo + k) for k = 0 … hi − lo. */
function fillPowers(table: Float64Array, base: number, lo: number, hi: number): void {
	if (lo < 0) {
		const inverse = 1 / base;
		let q = 1;
		for (let e = -1; e >= lo; e--) {
			q *= inverse;
			if (e <= hi) table[e - lo] = q;
		}
	}
	let q = 1;
	for (let e = 0; e <= hi; e++) {
		if (e >= lo) table[e - lo] = q;
		q *= base;
	}
}

function range(values: readonly number[]): [number, number] {
	return [Math.min(...values), Math.max(...values)];
}

function checkShape(I: readonly number[], J: readonly number[], n: readonly number[]): void {
	if (I.length !== n.length || J.length !== n.length) {
		throw new Error('power series: I, J and n must have the same length');
	}
	for (const e of [...I, ...J]) {
		if (!Number.isInteger(e)) throw new Error('power series: exponents must be integers');
	}
}

/** Σ nᵢ · x^Iᵢ · y^Jᵢ, value only: the backward equations. */
export class PowerSum {
	private readonly n: Float64Array;
	private readonly ix: Int32Array;
	private readonly iy: Int32Array;
	private readonly xLo: number;
	private readonly xHi: number;
	private readonly yLo: number;
	private readonly yHi: number;
	private readonly px: Float64Array;
	private readonly py: Float64Array;

	constructor(I: readonly number[], J: readonly number[], n: readonly number[]) {
		checkShape(I, J, n);
		[this.xLo, this.xHi] = range(I);
		[this.yLo, this.yHi] = range(J);
		this.n = Float64Array.from(n);
		this.ix = Int32Array.from(I, (e) => e - this.xLo);
		this.iy = Int32Array.from(J, (e) => e - this.yLo);
		this.px = new Float64Array(this.xHi - this.xLo + 1);
		this.py = new Float64Array(this.yHi - this.yLo + 1);
	}

	value(x: number, y: number): number {
		const { n, ix, iy, px, py } = this;
		fillPowers(px, x, this.xLo, this.xHi);
		fillPowers(py, y, this.yLo, this.yHi);
		let sum = 0;
		for (let k = 0; k < n.length; k++) sum += n[k] * px[ix[k]] * py[iy[k]];
		return sum;
	}
}

/** Slots of the array filled by GibbsSeries.evaluate. */
export const F = 0;
export const F_X = 1;
export const F_XX = 2;
export const F_Y = 3;
export const F_YY = 4;
export const F_XY = 5;

/**
 * Σ nᵢ · x^Iᵢ · y^Jᵢ with its first and second partial derivatives: the Gibbs equations of
 * regions 1, 2 and 5. One pass sums nᵢ·x^Iᵢ·y^Jᵢ weighted by I, I(I−1), J, J(J−1) and IJ;
 * the derivatives follow by dividing by x and y once at the end. So x and y must not be zero,
 * which holds everywhere the regions are used (region 1: x = 7.1 − π ≥ 1.05, y = τ − 1.222
 * ≥ 1.0; region 2: y = τ − 0.5 ≥ 0.003 up to 1073.15 K; region 5: y = τ ≥ 0.44).
 */
export class GibbsSeries {
	private readonly n: Float64Array;
	private readonly i: Float64Array;
	private readonly j: Float64Array;
	private readonly ix: Int32Array;
	private readonly iy: Int32Array;
	private readonly xLo: number;
	private readonly xHi: number;
	private readonly yLo: number;
	private readonly yHi: number;
	private readonly px: Float64Array;
	private readonly py: Float64Array;

	constructor(I: readonly number[], J: readonly number[], n: readonly number[]) {
		checkShape(I, J, n);
		[this.xLo, this.xHi] = range(I);
		[this.yLo, this.yHi] = range(J);
		this.n = Float64Array.from(n);
		this.i = Float64Array.from(I);
		this.j = Float64Array.from(J);
		this.ix = Int32Array.from(I, (e) => e - this.xLo);
		this.iy = Int32Array.from(J, (e) => e - this.yLo);
		this.px = new Float64Array(this.xHi - this.xLo + 1);
		this.py = new Float64Array(this.yHi - this.yLo + 1);
	}

	/** Writes f, f_x, f_xx, f_y, f_yy, f_xy at (x, y) into out[F … F_XY]; x, y ≠ 0. */
	evaluate(x: number, y: number, out: Float64Array): void {
		const { n, i, j, ix, iy, px, py } = this;
		fillPowers(px, x, this.xLo, this.xHi);
		fillPowers(py, y, this.yLo, this.yHi);
		let f = 0;
		let fx = 0;
		let fxx = 0;
		let fy = 0;
		let fyy = 0;
		let fxy = 0;
		for (let k = 0; k < n.length; k++) {
			const t = n[k] * px[ix[k]] * py[iy[k]];
			const ik = i[k];
			const jk = j[k];
			const it = ik * t;
			const jt = jk * t;
			f += t;
			fx += it;
			fxx += (ik - 1) * it;
			fy += jt;
			fyy += (jk - 1) * jt;
			fxy += jk * it;
		}
		const rx = 1 / x;
		const ry = 1 / y;
		out[F] = f;
		out[F_X] = fx * rx;
		out[F_XX] = fxx * rx * rx;
		out[F_Y] = fy * ry;
		out[F_YY] = fyy * ry * ry;
		out[F_XY] = fxy * rx * ry;
	}
}
