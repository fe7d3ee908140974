/**
 * IF97 region 3 checked against the outside world.
 *  - IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997 for the
 *    Thermodynamic Properties of Water and Steam, table 33: the computer-program verification
 *    values of the region 3 equation (eq. 28). Each value must round to its nine published digits.
 *    (pub) = read from the release (docs/sources.md).
 *  - Debian's python3-iapws 1.5.2 (IAPWS97 class, which iterates on the same eq. 28): region 3
 *    states from (p, T) and saturated states, within 1e-6 relative. (lib) = computed with it.
 * The supplementary backward equations for region 3 are not implemented (region 3 iterates on
 * eq. 28 instead), so their verification tables have no counterpart here.
 */
import { describe, expect, it } from 'vitest';
import { region3FromRhoT } from '../../src/lib/steam/region3';
import {
	region3FromPH,
	region3FromPS,
	region3FromPT,
	region3SaturatedLiquid,
	region3SaturatedVapour
} from '../../src/lib/steam/region3-solve';
import type { Properties } from '../../src/lib/steam/types';
import { expectPublished } from './if97-digits';

type Table33Row = [
	T: number,
	rho: number,
	p: string,
	h: string,
	u: string,
	s: string,
	cp: string,
	w: string
];

// IAPWS R7-97(2012) table 33 (pub): T [K], ρ [kg/m³] → p, h, u, s, cp, w.
const TABLE_33: Table33Row[] = [
	[
		650,
		500,
		'0.255837018e2',
		'0.186343019e4',
		'0.181226279e4',
		'0.405427273e1',
		'0.138935717e2',
		'0.502005554e3'
	],
	[
		650,
		200,
		'0.222930643e2',
		'0.237512401e4',
		'0.226365868e4',
		'0.485438792e1',
		'0.446579342e2',
		'0.383444594e3'
	],
	[
		750,
		500,
		'0.783095639e2',
		'0.225868845e4',
		'0.210206932e4',
		'0.446971906e1',
		'0.634165359e1',
		'0.760696041e3'
	]
];

describe('region 3 equation, IAPWS R7-97(2012) table 33 (pub)', () => {
	for (const [T, rho, p, h, u, s, cp, w] of TABLE_33) {
		it(`T = ${T} K, ρ = ${rho} kg/m³ (table 33)`, () => {
			const state = region3FromRhoT(rho, T);
			expectPublished(state.p, p);
			expectPublished(state.h, h);
			expectPublished(state.u, u);
			expectPublished(state.s, s);
			expectPublished(state.cp, cp);
			expectPublished(state.w, w);
		});

		it(`recovers ρ = ${rho} kg/m³ from table 33's p at T = ${T} K, and its h from (p, h)`, () => {
			const pub = Number(p);
			// p is published to nine digits (0.ddddddddd e±x), so ρ is only fixed to within half a
			// unit of the ninth digit divided by the isotherm's slope dp/dρ.
			const halfUnit = 0.5 * 10 ** (Number(p.split('e')[1]) - 9);
			const slope =
				(region3FromRhoT(rho * 1.000001, T).p - region3FromRhoT(rho * 0.999999, T).p) /
				(rho * 2e-6);
			const tolerance = halfUnit / slope + 1e-9 * rho;
			expect(Math.abs(1 / region3FromPT(pub, T).v - rho)).toBeLessThan(tolerance);
			expect(Math.abs(region3FromPH(pub, Number(h)).T - T)).toBeLessThan(1e-6 * T);
			expect(Math.abs(region3FromPS(pub, Number(s)).T - T)).toBeLessThan(1e-6 * T);
		});
	}
});

function expectClose(actual: number, expected: number, relative: number, what: string): void {
	expect(
		Math.abs(actual - expected) / Math.abs(expected),
		`${what}: ${actual} vs ${expected}`
	).toBeLessThan(relative);
}

function expectState(state: Properties, v: number, h: number, s: number, what: string): void {
	expectClose(state.v, v, 1e-6, `${what} v`);
	expectClose(state.h, h, 1e-6, `${what} h`);
	expectClose(state.s, s, 1e-6, `${what} s`);
}

describe('region 3 from (p, T) against python3-iapws 1.5.2 (lib)', () => {
	// (lib) IAPWS97(P=p, T=T): p MPa, T K → v, h, s, cp, w; all reported as region 3 by it.
	const rows: [p: number, T: number, v: number, h: number, s: number, cp: number, w: number][] = [
		[25, 650, 0.002045512439, 1876.359123, 4.075979, 15.73102414, 478.9802547],
		[20, 630, 0.001761691558, 1706.767391, 3.825886843, 9.871992912, 587.1058965],
		[20, 645, 0.007231943988, 2558.053323, 5.158558802, 15.70548706, 430.9343575],
		[22.064, 647.2, 0.003884994661, 2213.349339, 4.606424931, 365.5133468, 337.9998531],
		[23, 650, 0.002609028594, 2009.626976, 4.287788734, 108.3559456, 339.8841169],
		[60, 650, 0.001511693134, 1710.089233, 3.730485423, 5.524516704, 938.6740859],
		[100, 800, 0.002074121924, 2466.715834, 4.681250832, 5.61367842, 812.9129053],
		[40, 720, 0.003542269371, 2476.450504, 4.89575277, 11.4763947, 498.1867913]
	];
	for (const [p, T, v, h, s, cp, w] of rows) {
		it(`p = ${p} MPa, T = ${T} K`, () => {
			const state = region3FromPT(p, T);
			expectState(state, v, h, s, 'state');
			expectClose(state.cp, cp, 1e-6, 'cp');
			expectClose(state.w, w, 1e-6, 'w');
			expectState(region3FromPH(p, h), v, h, s, '(p, h)');
			expectState(region3FromPS(p, s), v, h, s, '(p, s)');
		});
	}
});

describe('region 3 saturated states against python3-iapws 1.5.2 (lib)', () => {
	// (lib) IAPWS97(P=p, x=0) and IAPWS97(P=p, x=1): T, v', h', s', v'', h'', s''.
	const rows: [
		p: number,
		T: number,
		vL: number,
		hL: number,
		sL: number,
		vV: number,
		hV: number,
		sV: number
	][] = [
		[
			17, 625.4434396, 0.001769343935, 1690.035825, 3.807669583, 0.008369344175, 2547.412768,
			5.178500093
		],
		[
			19, 634.6208361, 0.001925454887, 1776.890889, 3.939645429, 0.006672607052, 2465.409167,
			5.0245713
		],
		[
			21, 642.977343, 0.002211860539, 1889.396324, 4.109255212, 0.004987680787, 2337.543215,
			4.806241328
		],
		[
			22, 646.8565652, 0.002750387571, 2021.916651, 4.310869797, 0.003576621987, 2164.181768,
			4.530802854
		]
	];
	for (const [p, T, vL, hL, sL, vV, hV, sV] of rows) {
		it(`p = ${p} MPa`, () => {
			const liquid = region3SaturatedLiquid(p);
			const vapour = region3SaturatedVapour(p);
			expectClose(liquid.T, T, 1e-9, 'T');
			expectClose(vapour.T, T, 1e-9, 'T');
			expectState(liquid, vL, hL, sL, 'liquid');
			expectState(vapour, vV, hV, sV, 'vapour');
		});
	}
});
