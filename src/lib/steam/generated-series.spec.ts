/**
 * The generated straight-line series (Gibbs equations of regions 1, 2 and 5, backward equations
 * of regions 1 and 2) against the general evaluator in power-series.ts, from the same tables: a slip in scripts/generate-if97-series.ts would show here.
 */
import { describe, expect, it } from 'vitest';
import {
	DERIVATIVE_SLOTS,
	F,
	F_X,
	F_XX,
	F_XY,
	F_Y,
	F_YY,
	F_YYY,
	powerSeries,
	seriesDerivatives,
	seriesValue,
	seriesYDerivatives
} from './power-series';
import * as table2 from './region1-coefficients';
import * as table11 from './region2-coefficients';
import * as table37 from './region5-coefficients';
import { region1SeriesInto, region1SeriesTauInto } from './region1-series.generated';
import {
	region2IdealInto,
	region2ResidualInto,
	region2ResidualTauInto
} from './region2-series.generated';
import {
	region5IdealInto,
	region5ResidualInto,
	region5ResidualTauInto
} from './region5-series.generated';
import { TABLE_6, TABLE_8 } from './region1-backward-coefficients';
import {
	TABLE_20,
	TABLE_21,
	TABLE_22,
	TABLE_25,
	TABLE_26,
	TABLE_27
} from './region2-backward-coefficients';
import { region1ThetaPH, region1ThetaPS } from './region1-backward-series.generated';
import {
	region2aThetaPH,
	region2bThetaPH,
	region2cThetaPH
} from './region2-backward-ph-series.generated';
import {
	region2aThetaPS,
	region2bThetaPS,
	region2cThetaPS
} from './region2-backward-ps-series.generated';

type Into = (x: number, y: number, out: Float64Array) => void;

const cases: {
	name: string;
	table: { I: number[]; J: number[]; n: number[] };
	full: Into;
	tau: Into;
	x: [number, number];
	y: [number, number];
}[] = [
	{
		// x = 7.1 − π for 0 ≤ p ≤ 100 MPa; y = τ − 1.222 for 273.15 K ≤ T ≤ 623.15 K.
		name: 'region 1 (table 2)',
		table: table2,
		full: region1SeriesInto,
		tau: region1SeriesTauInto,
		x: [7.1 - 100 / 16.53, 7.1],
		y: [1386 / 623.15 - 1.222, 1386 / 273.15 - 1.222]
	},
	{
		// x = π for 1 Pa ≤ p ≤ 100 MPa; y = τ − 0.5 for 273.15 K ≤ T ≤ 1073.15 K.
		name: 'region 2 residual (table 11)',
		table: table11,
		full: region2ResidualInto,
		tau: region2ResidualTauInto,
		x: [1e-6, 100],
		y: [540 / 1073.15 - 0.5, 540 / 273.15 - 0.5]
	},
	{
		// x = π for p ≤ 50 MPa; y = τ for 1073.15 K ≤ T ≤ 2273.15 K.
		name: 'region 5 residual (table 38)',
		table: table37,
		full: region5ResidualInto,
		tau: region5ResidualTauInto,
		x: [1e-6, 50],
		y: [1000 / 2273.15, 1000 / 1073.15]
	}
];

describe('generated Gibbs series', () => {
	for (const { name, table, full, tau, x: xs, y: ys } of cases) {
		it(`${name}: the value and every derivative agree with the general evaluator`, () => {
			const series = powerSeries(table.I, table.J, table.n);
			// The same series with every coefficient positive: a scale for the rounding errors (a slip
			// in the generator would be off by far more than 1e-13 of it).
			const absolute = powerSeries(
				table.I,
				table.J,
				table.n.map((v) => Math.abs(v))
			);
			const want = new Float64Array(DERIVATIVE_SLOTS);
			const wantY = new Float64Array(DERIVATIVE_SLOTS);
			const scale = new Float64Array(DERIVATIVE_SLOTS);
			const scaleY = new Float64Array(DERIVATIVE_SLOTS);
			const got = new Float64Array(DERIVATIVE_SLOTS);
			const gotY = new Float64Array(DERIVATIVE_SLOTS);
			let worst = 0;
			for (let i = 0; i <= 20; i++) {
				// Pressures spread logarithmically where x spans decades (region 2), else linearly.
				const x =
					xs[0] > 0 && xs[1] / xs[0] > 100
						? xs[0] * (xs[1] / xs[0]) ** (i / 20)
						: xs[0] + ((xs[1] - xs[0]) * i) / 20;
				for (let j = 0; j <= 20; j++) {
					const y = ys[0] + ((ys[1] - ys[0]) * j) / 20;
					seriesDerivatives(series, x, y, want);
					seriesYDerivatives(series, x, y, wantY);
					seriesDerivatives(absolute, Math.abs(x), Math.abs(y), scale);
					seriesYDerivatives(absolute, Math.abs(x), Math.abs(y), scaleY);
					full(x, y, got);
					tau(x, y, gotY);
					for (const slot of [F, F_X, F_XX, F_Y, F_YY, F_XY]) {
						worst = Math.max(worst, Math.abs(got[slot] - want[slot]) / Math.abs(scale[slot]));
					}
					for (const slot of [F, F_Y, F_YY, F_YYY]) {
						worst = Math.max(worst, Math.abs(gotY[slot] - wantY[slot]) / Math.abs(scaleY[slot]));
					}
				}
			}
			expect(worst).toBeLessThan(1e-13);
		});
	}
});

type Value = (x: number, y: number) => number;

const backward: {
	name: string;
	table: { I: number[]; J: number[]; n: number[] };
	value: Value;
	/** The table's I are multiples of 1/root; the series runs in x = π^(1/root). */
	root?: number;
	x: [number, number];
	y: [number, number];
}[] = [
	// x and y over the ranges the callers pass (see the backward modules for the variables).
	{ name: 'table 6', table: TABLE_6, value: region1ThetaPH, x: [0, 100], y: [0.9, 2.6] },
	{ name: 'table 8', table: TABLE_8, value: region1ThetaPS, x: [0, 100], y: [2, 5.8] },
	{ name: 'table 20', table: TABLE_20, value: region2aThetaPH, x: [1e-6, 4], y: [-0.85, -0.05] },
	{ name: 'table 21', table: TABLE_21, value: region2bThetaPH, x: [2, 98], y: [-1.3, -0.5] },
	{ name: 'table 22', table: TABLE_22, value: region2cThetaPH, x: [31.5, 125], y: [-0.55, -0.05] },
	{
		name: 'table 25',
		table: TABLE_25,
		value: region2aThetaPS,
		root: 4,
		x: [0.03, 1.42],
		y: [1, 5]
	},
	{ name: 'table 26', table: TABLE_26, value: region2bThetaPS, x: [4, 100], y: [0.4, 2.6] },
	{ name: 'table 27', table: TABLE_27, value: region2cThetaPS, x: [6.5, 100], y: [0, 0.28] }
];

describe('generated backward series', () => {
	for (const { name, table, value, root = 1, x: xs, y: ys } of backward) {
		it(`${name}: agrees with the general evaluator`, () => {
			const I = table.I.map((e) => e * root);
			const series = powerSeries(I, table.J, table.n);
			const absolute = powerSeries(
				I,
				table.J,
				table.n.map((v) => Math.abs(v))
			);
			let worst = 0;
			for (let i = 0; i <= 20; i++) {
				const x = xs[0] + ((xs[1] - xs[0]) * i) / 20;
				for (let j = 0; j <= 20; j++) {
					const y = ys[0] + ((ys[1] - ys[0]) * j) / 20;
					const scale = seriesValue(absolute, Math.abs(x), Math.abs(y));
					worst = Math.max(worst, Math.abs(value(x, y) - seriesValue(series, x, y)) / scale);
				}
			}
			expect(worst).toBeLessThan(1e-14);
		});
	}
});

describe('generated ideal-gas parts', () => {
	const parts = [
		{ name: 'region 2 (table 10)', J: table11.J0, n: table11.n0, into: region2IdealInto },
		{ name: 'region 5 (table 37)', J: table37.J0, n: table37.n0, into: region5IdealInto }
	];
	for (const { name, J, n, into } of parts) {
		it(`${name}: the term-by-term sums with Math.pow, and their first three τ-derivatives`, () => {
			const out = new Float64Array(DERIVATIVE_SLOTS);
			// The k-th derivative of Σ n τ^J: Σ n J(J − 1)…(J − k + 1) τ^(J − k).
			const derivative = (tau: number, k: number) =>
				J.reduce((sum, e, i) => {
					let weight = 1;
					for (let m = 0; m < k; m++) weight *= e - m;
					return sum + n[i] * weight * tau ** (e - k);
				}, 0);
			// τ over regions 2 (540/1073.15 … 540/273.15) and 5 (1000/2273.15 … 1000/1073.15).
			for (const tau of [0.44, 0.5, 0.93, 1.3, 1.98]) {
				into(tau, out);
				expect(out[F] / derivative(tau, 0) - 1).toBeCloseTo(0, 13);
				expect(out[F_Y] / derivative(tau, 1) - 1).toBeCloseTo(0, 13);
				expect(out[F_YY] / derivative(tau, 2) - 1).toBeCloseTo(0, 12);
				expect(out[F_YYY] / derivative(tau, 3) - 1).toBeCloseTo(0, 12);
			}
		});
	}
});
