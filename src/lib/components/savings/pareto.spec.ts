import { describe, expect, it } from 'vitest';
import { barFractions, DEFAULT_FRAME, niceScale, paretoGeometry, thinPoints } from './pareto';

/** Items as the savings list gives them: running sums of saving and known repair cost. */
function ranked(rows: { saving: number; repair: number | null }[]) {
	let s = 0;
	let r = 0;
	return rows.map((row, i) => {
		s += row.saving;
		r += row.repair ?? 0;
		return { rank: i + 1, cumulativeSavingMinor: s, cumulativeRepairCostMinor: r };
	});
}

describe('niceScale', () => {
	it('rounds the maximum up to a whole number of 1, 2, 2.5 or 5 × 10ⁿ steps', () => {
		expect(niceScale(0)).toEqual({ max: 1, step: 0.2 });
		expect(niceScale(100)).toEqual({ max: 100, step: 20 });
		expect(niceScale(101)).toEqual({ max: 125, step: 25 });
		expect(niceScale(7_340_000)).toEqual({ max: 8_000_000, step: 2_000_000 });
		expect(niceScale(3)).toEqual({ max: 3, step: 1 });
	});
	it('never steps finer than the smallest step it is given (whole minor units of money)', () => {
		expect(niceScale(0, 5, 1)).toEqual({ max: 5, step: 1 });
		expect(niceScale(2, 5, 1)).toEqual({ max: 2, step: 1 });
		expect(niceScale(7_340_000, 5, 1)).toEqual({ max: 8_000_000, step: 2_000_000 });
	});
	it('refuses a negative or non-finite maximum in words', () => {
		expect(() => niceScale(-1)).toThrow(/maximum ≥ 0/);
		expect(() => niceScale(Number.NaN)).toThrow(/maximum ≥ 0/);
	});
});

describe('paretoGeometry', () => {
	it('gives whole-minor-unit ticks when no repair is priced and savings are tiny', () => {
		const g = paretoGeometry(ranked([{ saving: 3, repair: null }]));
		for (const t of [...g.xTicks, ...g.yTicks]) expect(Number.isInteger(t.value)).toBe(true);
		expect(g.xTicks.length).toBeGreaterThan(1);
	});

	const items = ranked([
		{ saving: 600, repair: 100 },
		{ saving: 300, repair: null },
		{ saving: 100, repair: 300 }
	]);
	const g = paretoGeometry(items);
	const { plot } = g;

	it('starts at the origin and puts each point at the running sums', () => {
		expect(g.points.map((p) => [p.rank, p.repairMinor, p.savingMinor])).toEqual([
			[0, 0, 0],
			[1, 100, 600],
			[2, 100, 900],
			[3, 400, 1000]
		]);
		expect(g.points[0]).toMatchObject({ x: plot.x0, y: plot.y0 });
	});

	it('scales both axes to a round maximum at or above the last running sum', () => {
		expect(g.xMax).toBe(400);
		expect(g.yMax).toBe(1000);
		const last = g.points.at(-1)!;
		expect(last.x).toBe(plot.x1);
		expect(last.y).toBe(plot.y1);
		// 100 of 400 along x; 600 of 1000 up y (y grows downwards in SVG)
		expect(g.points[1].x).toBeCloseTo(plot.x0 + 0.25 * (plot.x1 - plot.x0), 2);
		expect(g.points[1].y).toBeCloseTo(plot.y0 - 0.6 * (plot.y0 - plot.y1), 2);
	});

	it('moves straight up for a finding without a repair cost', () => {
		expect(g.points[2].x).toBe(g.points[1].x);
		expect(g.points[2].y).toBeLessThan(g.points[1].y);
	});

	it('gives ticks from zero to the maximum, evenly placed', () => {
		expect(g.xTicks.map((t) => t.value)).toEqual([0, 100, 200, 300, 400]);
		expect(g.yTicks.map((t) => t.value)).toEqual([0, 200, 400, 600, 800, 1000]);
		expect(g.xTicks[0].at).toBe(plot.x0);
		expect(g.xTicks.at(-1)!.at).toBe(plot.x1);
		expect(g.yTicks.at(-1)!.at).toBe(plot.y1);
	});

	it('draws the path through every point of a short list', () => {
		expect(g.path.split(/[ML]/).filter(Boolean)).toHaveLength(4);
		expect(g.path.startsWith(`M${plot.x0} ${plot.y0}`)).toBe(true);
	});

	it('draws nothing for an empty list, with axes of five whole minor units', () => {
		const e = paretoGeometry([]);
		expect(e.empty).toBe(true);
		expect(e.points).toEqual([]);
		expect(e.path).toBe('');
		expect(e.xMax).toBe(5);
		expect(e.yMax).toBe(5);
		expect(e.frame).toEqual(DEFAULT_FRAME);
	});

	it('keeps x at zero when nothing is priced yet', () => {
		const unpriced = paretoGeometry(ranked([{ saving: 50, repair: null }]));
		expect(unpriced.xMax).toBe(5);
		expect(unpriced.points.every((p) => p.x === unpriced.plot.x0)).toBe(true);
	});
});

describe('thinPoints', () => {
	it('keeps first and last and at most the limit', () => {
		const g = paretoGeometry(
			ranked(Array.from({ length: 5000 }, () => ({ saving: 7, repair: 3 })))
		);
		const thin = thinPoints(g.points, 400);
		expect(thin).toHaveLength(400);
		expect(thin[0]).toBe(g.points[0]);
		expect(thin.at(-1)).toBe(g.points.at(-1));
		expect(g.path.split('L')).toHaveLength(400);
	});
	it('leaves a short list as it is', () => {
		const g = paretoGeometry(ranked([{ saving: 1, repair: 1 }]));
		expect(thinPoints(g.points)).toEqual(g.points);
	});
});

describe('barFractions', () => {
	it('is each value over the biggest', () => {
		expect(barFractions([50, 100, 25])).toEqual([0.5, 1, 0.25]);
		expect(barFractions([0, 0])).toEqual([0, 0]);
		expect(barFractions([])).toEqual([]);
	});
});
