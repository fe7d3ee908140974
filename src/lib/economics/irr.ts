/**
 * Internal rate of return: the discount rate at which a repair's cash flows are worth nothing
 * today (NPV = 0). Found by bracketing and bisection, which cannot diverge or jump to another
 * root the way Newton's method from a guess can.
 *
 * Only flows that change sign exactly once (pay, then save; or the reverse) have one IRR: by
 * Descartes' rule of signs the NPV polynomial in 1/(1 + r) then has exactly one positive root,
 * so exactly one rate above −100 %. With no change of sign there is no rate at all (a repair
 * that never saves, or a free one — its return is unbounded); with more than one there may be
 * several, and no single answer is honest. Both answer null.
 */
import { finite } from './checks';
import { repairFlows, type NpvInput } from './present-value';

/** Closest a rate gets to −100 %: below −99.9999999999 % the answer is null. */
const LOWEST_GROWTH = 1e-12;
/** Highest rate searched, a fraction (10¹² = 10¹⁴ %); a bigger return answers null. */
const HIGHEST_RATE = 1e12;
const ITERATIONS = 400;

const sign = (v: number) => (v > 0 ? 1 : v < 0 ? -1 : 0);

/** How often the non-zero flows change sign. */
export function signChanges(flows: readonly number[]): number {
	let changes = 0;
	let last = 0;
	for (const f of flows) {
		const s = sign(f);
		if (s === 0) continue;
		if (last !== 0 && s !== last) changes++;
		last = s;
	}
	return changes;
}

/**
 * The sign of the NPV at `rate`, computed so that nothing overflows: for r ≥ 0 as
 * Σ c_t (1+r)^−t (factors ≤ 1); for r < 0 multiplied through by (1+r)^N > 0, which keeps its
 * sign, as Σ c_t (1+r)^(N−t) (factors ≤ 1 again).
 */
function npvSign(rate: number, flows: readonly number[]): number {
	const growth = 1 + rate;
	let sum = 0;
	if (rate >= 0) {
		let factor = 1;
		for (const c of flows) {
			sum += c * factor;
			factor /= growth;
		}
	} else {
		let factor = 1;
		for (let t = flows.length - 1; t >= 0; t--) {
			sum += flows[t] * factor;
			factor *= growth;
		}
	}
	return sign(sum);
}

/**
 * IRR of yearly cash flows (flows[0] today, flows[t] at the end of year t; costs negative,
 * savings positive), as a fraction per year (0.087 for 8.7 %); may be negative (the savings do
 * not repay the cost over the flows' years). Accurate to about 1e−12.
 * @returns null when the flows change sign other than exactly once, or the rate lies beyond
 *   −99.9999999999 % … 10¹⁴ %
 */
export function internalRateOfReturn(flows: readonly number[]): number | null {
	flows.forEach((f, t) => finite(`Cash flow of year ${t}`, f));
	if (signChanges(flows) !== 1) return null;
	// Leading zeros multiply the NPV by (1+r)^−k > 0 and trailing ones add nothing: drop both,
	// so the first flow rules the sign as r → ∞ and the last as r → −1.
	const first = flows.findIndex((f) => f !== 0);
	const last = flows.length - 1 - [...flows].reverse().findIndex((f) => f !== 0);
	const c = flows.slice(first, last + 1);
	const atHigh = sign(c[0]);
	const atLow = sign(c[c.length - 1]);

	let lo: number;
	let hi: number;
	const atZero = npvSign(0, c);
	if (atZero === 0) return 0;
	if (atZero === atLow) {
		// The root is above 0 %: widen upwards until the NPV takes the first flow's sign.
		lo = 0;
		hi = 1;
		for (let s = npvSign(hi, c); s !== atHigh; s = npvSign(hi, c)) {
			if (s === 0) return hi;
			lo = hi;
			hi = hi * 2 + 1;
			if (hi > HIGHEST_RATE) return null;
		}
	} else {
		// The root is below 0 %: move towards −100 % until the NPV takes the last flow's sign.
		hi = 0;
		let growth = 0.5;
		for (let s = npvSign(growth - 1, c); s !== atLow; s = npvSign(growth - 1, c)) {
			if (s === 0) return growth - 1;
			hi = growth - 1;
			growth /= 2;
			if (growth < LOWEST_GROWTH) return null;
		}
		lo = growth - 1;
	}
	// Bisection: the NPV has the last flow's sign at lo and the first flow's sign at hi.
	for (let i = 0; i < ITERATIONS; i++) {
		const mid = lo + (hi - lo) / 2;
		if (mid <= lo || mid >= hi) break; // no double left between them
		const s = npvSign(mid, c);
		if (s === 0) return mid;
		if (s === atLow) lo = mid;
		else hi = mid;
	}
	return lo + (hi - lo) / 2;
}

/**
 * IRR of a repair: −initialCost today, annualSaving at the end of each year of its life.
 * Null for a repair that saves nothing or loses money every year (no rate repays it), and for
 * a free one (no cost: an unbounded return).
 */
export function repairIrr(input: Omit<NpvInput, 'discountRate'>): number | null {
	return internalRateOfReturn(repairFlows(input));
}
