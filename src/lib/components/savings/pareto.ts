/**
 * The Pareto chart's geometry, pure (no Svelte, no DOM) so the Desk's page, the Ladder and any
 * other drawing of the same idea share it and it is unit-tested on its own: cumulative annual
 * saving (y) against cumulative repair cost (x), one point per ranked finding, starting at the
 * origin. The running sums are the savings list's own (`cumulativeSavingMinor`,
 * `cumulativeRepairCostMinor`, docs/savings.md), so a point is where the list stands after that
 * finding; a finding without a known repair cost moves the curve straight up.
 */

/** What the chart reads of each ranked item (a SavingsItem has these and more). */
export interface ParetoInput {
	rank: number;
	cumulativeSavingMinor: number;
	cumulativeRepairCostMinor: number;
}

export interface ParetoPoint {
	/** 0 for the origin, else the item's rank. */
	rank: number;
	/** Running repair cost and saving, minor units. */
	repairMinor: number;
	savingMinor: number;
	/** Position in the drawing, in SVG user units (y grows downwards). */
	x: number;
	y: number;
}

export interface Tick {
	/** The value, minor units. */
	value: number;
	/** Its position along the axis, SVG user units. */
	at: number;
}

export interface Frame {
	width: number;
	height: number;
	/** Room for the axis labels: left, bottom, top, right. */
	left: number;
	bottom: number;
	top: number;
	right: number;
}

export interface ParetoGeometry {
	frame: Frame;
	/** The plotting area. */
	plot: { x0: number; x1: number; y0: number; y1: number };
	points: ParetoPoint[];
	/** SVG path through the points, thinned to at most 400 ('' with none). */
	path: string;
	/** Axis maxima (a "nice" value at or above the largest sum), minor units. */
	xMax: number;
	yMax: number;
	xTicks: Tick[];
	yTicks: Tick[];
	/** No finding to draw. */
	empty: boolean;
}

export const DEFAULT_FRAME: Frame = {
	width: 640,
	height: 360,
	left: 88,
	bottom: 56,
	top: 16,
	right: 24
};

/**
 * A round axis maximum at or above `max` and its step, so ticks fall on 1, 2, 2.5 or 5 × 10ⁿ:
 * about `count` steps, never finer than `minStep` (money axes count whole minor units). A
 * maximum of zero (nothing saved, nothing priced) gives `count` steps of `minStep`, or 0–1.
 */
export function niceScale(max: number, count = 5, minStep = 0): { max: number; step: number } {
	if (!Number.isFinite(max) || max < 0) throw new Error(`An axis needs a maximum ≥ 0, got ${max}`);
	if (max === 0)
		return minStep > 0 ? { max: count * minStep, step: minStep } : { max: 1, step: 1 / count };
	const rough = max / count;
	const power = 10 ** Math.floor(Math.log10(rough));
	const nice = [1, 2, 2.5, 5, 10].map((m) => m * power).find((s) => s >= rough) ?? 10 * power;
	const step = Math.max(nice, minStep);
	return { max: Math.ceil(max / step - 1e-9) * step, step };
}

function ticks(max: number, step: number, place: (v: number) => number): Tick[] {
	const out: Tick[] = [];
	const n = Math.round(max / step);
	for (let i = 0; i <= n; i++) {
		const value = Math.round(i * step * 1e6) / 1e6;
		out.push({ value, at: place(value) });
	}
	return out;
}

const round = (v: number) => Math.round(v * 100) / 100;

/** The chart for ranked items in rank order (as the list gives them). */
export function paretoGeometry(
	items: readonly ParetoInput[],
	frame: Frame = DEFAULT_FRAME
): ParetoGeometry {
	const plot = {
		x0: frame.left,
		x1: frame.width - frame.right,
		y0: frame.height - frame.bottom,
		y1: frame.top
	};
	const last = items.at(-1);
	// Both axes are money in minor units: a tick is never a fraction of a cent.
	const x = niceScale(last ? Math.max(0, last.cumulativeRepairCostMinor) : 0, 5, 1);
	const y = niceScale(last ? Math.max(0, last.cumulativeSavingMinor) : 0, 5, 1);
	const px = (v: number) => round(plot.x0 + (v / x.max) * (plot.x1 - plot.x0));
	const py = (v: number) => round(plot.y0 - (v / y.max) * (plot.y0 - plot.y1));
	const points: ParetoPoint[] =
		items.length === 0
			? []
			: [
					{ rank: 0, repairMinor: 0, savingMinor: 0, x: px(0), y: py(0) },
					...items.map((item) => ({
						rank: item.rank,
						repairMinor: item.cumulativeRepairCostMinor,
						savingMinor: item.cumulativeSavingMinor,
						x: px(item.cumulativeRepairCostMinor),
						y: py(item.cumulativeSavingMinor)
					}))
				];
	const path = thinPoints(points)
		.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x} ${p.y}`)
		.join(' ');
	return {
		frame,
		plot,
		points,
		path,
		xMax: x.max,
		yMax: y.max,
		xTicks: ticks(x.max, x.step, px),
		yTicks: ticks(y.max, y.step, py),
		empty: items.length === 0
	};
}

/**
 * At most `limit` points for drawing, always keeping the first and last and every corner the
 * eye would miss least (evenly spaced by rank): a list of 5,000 findings draws as a few hundred
 * segments. The text table lists every item regardless.
 */
export function thinPoints(points: readonly ParetoPoint[], limit = 400): ParetoPoint[] {
	if (limit < 2) throw new Error('Keep at least two points');
	if (points.length <= limit) return [...points];
	const out: ParetoPoint[] = [];
	const step = (points.length - 1) / (limit - 1);
	for (let i = 0; i < limit; i++) out.push(points[Math.round(i * step)]);
	return out;
}

/** Widths of a breakdown's bars as fractions of the biggest (0 when nothing saves). */
export function barFractions(values: readonly number[]): number[] {
	const max = Math.max(0, ...values);
	return values.map((v) => (max === 0 ? 0 : Math.max(0, v) / max));
}
