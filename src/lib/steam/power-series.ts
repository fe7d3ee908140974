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
 * regions 1, 2 and 5. A derivative term whose factor (I, I(I−1), J, …) is zero points at the
 * term's own power, so no power below what the equation needs is ever formed (x or y may be
 * near zero where the equation never uses a negative power of it).
 */
export class GibbsSeries {
	private readonly c: Float64Array[];
	private readonly ix: Int32Array[];
	private readonly iy: Int32Array[];
	private readonly xLo: number;
	private readonly xHi: number;
	private readonly yLo: number;
	private readonly yHi: number;
	private readonly px: Float64Array;
	private readonly py: Float64Array;

	constructor(I: readonly number[], J: readonly number[], n: readonly number[]) {
		checkShape(I, J, n);
		// Order of the six sums: f, f_x, f_xx, f_y, f_yy, f_xy (slots F … F_XY).
		const dx = [0, 1, 2, 0, 0, 1];
		const dy = [0, 0, 0, 1, 2, 1];
		const factor = (e: number, d: number) => (d === 0 ? 1 : d === 1 ? e : e * (e - 1));
		const xs: number[] = [];
		const ys: number[] = [];
		const terms = dx.map((_, slot) =>
			n.map((nk, k) => {
				const c = nk * factor(I[k], dx[slot]) * factor(J[k], dy[slot]);
				const ex = c === 0 ? I[k] : I[k] - dx[slot];
				const ey = c === 0 ? J[k] : J[k] - dy[slot];
				xs.push(ex);
				ys.push(ey);
				return { c, ex, ey };
			})
		);
		[this.xLo, this.xHi] = range(xs);
		[this.yLo, this.yHi] = range(ys);
		this.c = terms.map((t) => Float64Array.from(t, (term) => term.c));
		this.ix = terms.map((t) => Int32Array.from(t, (term) => term.ex - this.xLo));
		this.iy = terms.map((t) => Int32Array.from(t, (term) => term.ey - this.yLo));
		this.px = new Float64Array(this.xHi - this.xLo + 1);
		this.py = new Float64Array(this.yHi - this.yLo + 1);
	}

	/** Writes f, f_x, f_xx, f_y, f_yy, f_xy at (x, y) into out[F … F_XY]. */
	evaluate(x: number, y: number, out: Float64Array): void {
		const { px, py } = this;
		fillPowers(px, x, this.xLo, this.xHi);
		fillPowers(py, y, this.yLo, this.yHi);
		for (let slot = 0; slot < 6; slot++) {
			const c = this.c[slot];
			const ix = this.ix[slot];
			const iy = this.iy[slot];
			let sum = 0;
			for (let k = 0; k < c.length; k++) sum += c[k] * px[ix[k]] * py[iy[k]];
			out[slot] = sum;
		}
	}
}
