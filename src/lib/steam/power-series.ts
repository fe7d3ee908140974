/**
 * Evaluators for the double power series Σ nᵢ · x^Iᵢ · y^Jᵢ that make up the IF97 equations.
 * They run millions of times a second, so they allocate nothing and form each power they need
 * once, by multiplication along a short recipe (no Math.pow per term).
 */

/**
 * The powers base^e for a fixed set of integer exponents, stored at index e − lo. Each one is
 * a product of two earlier ones (halving the exponent), so the chain of dependent
 * multiplications stays short (about 2·log₂ e) where stepping one power at a time would be
 * as long as the largest exponent.
 */
class PowerTable {
	readonly lo: number;
	readonly values: Float64Array;
	private readonly target: Int32Array;
	private readonly left: Int32Array;
	private readonly right: Int32Array;
	private readonly hasNegative: boolean;
	private readonly hasPositive: boolean;

	constructor(exponents: readonly number[]) {
		const needed = new Set<number>();
		const need = (e: number): void => {
			if (needed.has(e)) return;
			needed.add(e);
			const m = Math.abs(e);
			if (m <= 1) return;
			const half = 2 ** Math.floor(Math.log2(m)) === m ? m / 2 : 2 ** Math.floor(Math.log2(m));
			need(Math.sign(e) * half);
			need(Math.sign(e) * (m - half));
		};
		for (const e of exponents) need(e);
		const all = [...needed];
		this.lo = Math.min(0, ...all);
		this.values = new Float64Array(Math.max(0, ...all) - this.lo + 1);
		// Products in order of |e|, so both factors exist before they are used.
		const steps = all.filter((e) => Math.abs(e) > 1).sort((a, b) => Math.abs(a) - Math.abs(b));
		this.target = Int32Array.from(steps, (e) => e - this.lo);
		this.left = Int32Array.from(steps, (e) => this.splitOf(e)[0] - this.lo);
		this.right = Int32Array.from(steps, (e) => this.splitOf(e)[1] - this.lo);
		this.hasNegative = all.some((e) => e < 0);
		this.hasPositive = all.some((e) => e > 0);
	}

	private splitOf(e: number): [number, number] {
		const m = Math.abs(e);
		const half = 2 ** Math.floor(Math.log2(m)) === m ? m / 2 : 2 ** Math.floor(Math.log2(m));
		return [Math.sign(e) * half, Math.sign(e) * (m - half)];
	}

	fill(base: number): void {
		const { values, target, left, right } = this;
		const zero = -this.lo;
		values[zero] = 1;
		if (this.hasPositive) values[zero + 1] = base;
		if (this.hasNegative) values[zero - 1] = 1 / base;
		for (let k = 0; k < target.length; k++) values[target[k]] = values[left[k]] * values[right[k]];
	}
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
	private readonly px: PowerTable;
	private readonly py: PowerTable;

	constructor(I: readonly number[], J: readonly number[], n: readonly number[]) {
		checkShape(I, J, n);
		this.px = new PowerTable(I);
		this.py = new PowerTable(J);
		this.n = Float64Array.from(n);
		this.ix = Int32Array.from(I, (e) => e - this.px.lo);
		this.iy = Int32Array.from(J, (e) => e - this.py.lo);
	}

	value(x: number, y: number): number {
		const { n, ix, iy } = this;
		this.px.fill(x);
		this.py.fill(y);
		const px = this.px.values;
		const py = this.py.values;
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
	private readonly px: PowerTable;
	private readonly py: PowerTable;

	constructor(I: readonly number[], J: readonly number[], n: readonly number[]) {
		checkShape(I, J, n);
		this.px = new PowerTable(I);
		this.py = new PowerTable(J);
		this.n = Float64Array.from(n);
		this.i = Float64Array.from(I);
		this.j = Float64Array.from(J);
		this.ix = Int32Array.from(I, (e) => e - this.px.lo);
		this.iy = Int32Array.from(J, (e) => e - this.py.lo);
	}

	/** Writes f, f_x, f_xx, f_y, f_yy, f_xy at (x, y) into out[F … F_XY]; x, y ≠ 0. */
	evaluate(x: number, y: number, out: Float64Array): void {
		const { n, i, j, ix, iy } = this;
		this.px.fill(x);
		this.py.fill(y);
		const px = this.px.values;
		const py = this.py.values;
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

	/**
	 * Writes only f, f_y and f_yy into out[F], out[F_Y], out[F_YY]; y ≠ 0. Enough for h, s and
	 * cp, which is all a temperature iteration needs, at half the work of evaluate.
	 */
	evaluateY(x: number, y: number, out: Float64Array): void {
		const { n, j, ix, iy } = this;
		this.px.fill(x);
		this.py.fill(y);
		const px = this.px.values;
		const py = this.py.values;
		let f = 0;
		let fy = 0;
		let fyy = 0;
		for (let k = 0; k < n.length; k++) {
			const t = n[k] * px[ix[k]] * py[iy[k]];
			const jt = j[k] * t;
			f += t;
			fy += jt;
			fyy += (j[k] - 1) * jt;
		}
		const ry = 1 / y;
		out[F] = f;
		out[F_Y] = fy * ry;
		out[F_YY] = fyy * ry * ry;
	}
}
