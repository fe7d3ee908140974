/**
 * The general evaluator of the double power series Σ nᵢ · x^Iᵢ · y^Jᵢ that make up the IF97
 * equations, and the slots its derivatives are written to. The engine itself evaluates every
 * series through straight-line code generated from the release's tables
 * (scripts/generate-if97-series.ts, *.generated.ts), several times faster; this evaluator reads
 * the same tables as data and is the independent reference the specs check that code against.
 *
 * It allocates nothing and forms each power it needs once, by multiplication along a short
 * recipe (no Math.pow per term). A series is plain data (typed arrays in an object of one
 * fixed shape) read by one module function for all series.
 */

/**
 * The powers base^e for a fixed set of integer exponents, stored at index e − lo. Each one is
 * a product of two earlier ones (halving the exponent), so the chain of dependent
 * multiplications stays short (about 2·log₂ e) where stepping one power at a time would be
 * as long as the largest exponent.
 */
interface PowerTable {
	/** Lowest exponent held (≤ 0); base^e sits at index e − lo. */
	readonly lo: number;
	readonly values: Float64Array;
	readonly target: Int32Array;
	readonly left: Int32Array;
	readonly right: Int32Array;
	readonly hasNegative: boolean;
	readonly hasPositive: boolean;
}

function split(e: number): [number, number] {
	const m = Math.abs(e);
	const top = 2 ** Math.floor(Math.log2(m));
	const half = top === m ? m / 2 : top;
	return [Math.sign(e) * half, Math.sign(e) * (m - half)];
}

function powerTable(exponents: readonly number[]): PowerTable {
	const needed = new Set<number>();
	const need = (e: number): void => {
		if (needed.has(e)) return;
		needed.add(e);
		if (Math.abs(e) > 1) split(e).forEach(need);
	};
	exponents.forEach(need);
	const all = [...needed];
	const lo = Math.min(0, ...all);
	// Products in order of |e|, so both factors exist before they are used.
	const steps = all.filter((e) => Math.abs(e) > 1).sort((a, b) => Math.abs(a) - Math.abs(b));
	return {
		lo,
		values: new Float64Array(Math.max(0, ...all) - lo + 1),
		target: Int32Array.from(steps, (e) => e - lo),
		left: Int32Array.from(steps, (e) => split(e)[0] - lo),
		right: Int32Array.from(steps, (e) => split(e)[1] - lo),
		hasNegative: all.some((e) => e < 0),
		hasPositive: all.some((e) => e > 0)
	};
}

function fillPowers(table: PowerTable, base: number): void {
	const { values, target, left, right } = table;
	const zero = -table.lo;
	values[zero] = 1;
	if (table.hasPositive) values[zero + 1] = base;
	if (table.hasNegative) values[zero - 1] = 1 / base;
	for (let k = 0; k < target.length; k++) values[target[k]] = values[left[k]] * values[right[k]];
}

/** A series Σ nᵢ · x^Iᵢ · y^Jᵢ prepared for evaluation. */
export interface PowerSeries {
	readonly n: Float64Array;
	/** The exponents as numbers, for the derivative weights. */
	readonly i: Float64Array;
	readonly j: Float64Array;
	/** Where each term's powers sit in the tables. */
	readonly ix: Int32Array;
	readonly iy: Int32Array;
	readonly tx: PowerTable;
	readonly ty: PowerTable;
}

/** Prepares Σ nᵢ · x^Iᵢ · y^Jᵢ from a release table's columns I, J and n (integer exponents). */
export function powerSeries(
	I: readonly number[],
	J: readonly number[],
	n: readonly number[]
): PowerSeries {
	if (I.length !== n.length || J.length !== n.length) {
		throw new Error('power series: I, J and n must have the same length');
	}
	for (const e of [...I, ...J]) {
		if (!Number.isInteger(e)) throw new Error('power series: exponents must be integers');
	}
	const tx = powerTable(I);
	const ty = powerTable(J);
	return {
		n: Float64Array.from(n),
		i: Float64Array.from(I),
		j: Float64Array.from(J),
		ix: Int32Array.from(I, (e) => e - tx.lo),
		iy: Int32Array.from(J, (e) => e - ty.lo),
		tx,
		ty
	};
}

/** Σ nᵢ · x^Iᵢ · y^Jᵢ, value only: the backward equations. */
export function seriesValue(series: PowerSeries, x: number, y: number): number {
	const { n, ix, iy, tx, ty } = series;
	fillPowers(tx, x);
	fillPowers(ty, y);
	const px = tx.values;
	const py = ty.values;
	let sum = 0;
	for (let k = 0; k < n.length; k++) sum += n[k] * px[ix[k]] * py[iy[k]];
	return sum;
}

/** Slots of the array filled by seriesDerivatives. */
export const F = 0;
export const F_X = 1;
export const F_XX = 2;
export const F_Y = 3;
export const F_YY = 4;
export const F_XY = 5;
/** Third y-derivative, written only by the τ-only evaluators (for dcp/dT in the solvers). */
export const F_YYY = 6;
/** Length of an array that receives a series and its derivatives. */
export const DERIVATIVE_SLOTS = 7;

/**
 * The series with its first and second partial derivatives, into out[F … F_XY]: the Gibbs
 * equations of regions 1, 2 and 5. One pass sums nᵢ·x^Iᵢ·y^Jᵢ weighted by I, I(I−1), J,
 * J(J−1) and IJ; the derivatives follow by dividing by x and y once at the end. So x and y
 * must not be zero, which holds everywhere the regions are used (region 1: x = 7.1 − π ≥ 1.05,
 * y = τ − 1.222 ≥ 1.0; region 2: y = τ − 0.5 ≥ 0.003 up to 1073.15 K; region 5: y = τ ≥ 0.44).
 */
export function seriesDerivatives(
	series: PowerSeries,
	x: number,
	y: number,
	out: Float64Array
): void {
	const { n, i, j, ix, iy, tx, ty } = series;
	fillPowers(tx, x);
	fillPowers(ty, y);
	const px = tx.values;
	const py = ty.values;
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
 * Only f, f_y, f_yy and f_yyy into out[F], out[F_Y], out[F_YY], out[F_YYY] (y ≠ 0): enough
 * for h, s, cp and dcp/dT, which is all a temperature iteration needs, at about half the work.
 */
export function seriesYDerivatives(
	series: PowerSeries,
	x: number,
	y: number,
	out: Float64Array
): void {
	const { n, j, ix, iy, tx, ty } = series;
	fillPowers(tx, x);
	fillPowers(ty, y);
	const px = tx.values;
	const py = ty.values;
	let f = 0;
	let fy = 0;
	let fyy = 0;
	let fyyy = 0;
	for (let k = 0; k < n.length; k++) {
		const t = n[k] * px[ix[k]] * py[iy[k]];
		const jk = j[k];
		const jt = jk * t;
		const jjt = (jk - 1) * jt;
		f += t;
		fy += jt;
		fyy += jjt;
		fyyy += (jk - 2) * jjt;
	}
	const ry = 1 / y;
	out[F] = f;
	out[F_Y] = fy * ry;
	out[F_YY] = fyy * ry * ry;
	out[F_YYY] = fyyy * ry * ry * ry;
}
