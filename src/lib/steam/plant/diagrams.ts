/**
 * Geometry for the pictures of a plant opportunity, as numbers only (no SVG): the saturation
 * dome of a temperature–entropy diagram, and the points of an expansion on an
 * enthalpy–entropy chart. Every point is a state from the engine (IAPWS-IF97).
 * Units: T K, s kJ/(kg K), h kJ/kg, p MPa absolute.
 */
import { T_CRIT } from '../constants';
import { stateFromPH, stateFromPS } from '../inverse';
import { stateFromTX } from '../saturation';
import { expandSteam, type ExpansionInput } from './expansion';

/**
 * Triple-point temperature of water, K (IAPWS R7-97(2012), with ITS-90's defining fixed
 * point). IF97's saturation line starts at 273.15 K; the dome is drawn from here.
 */
export const TRIPLE_POINT_T = 273.16;

export interface TsPoint {
	/** kJ/(kg K) */
	s: number;
	/** K */
	T: number;
}

export interface SaturationDome {
	/** Saturated liquid from the triple point up to the critical point. */
	liquid: TsPoint[];
	/** Saturated vapour from the triple point up to the critical point. */
	vapour: TsPoint[];
}

/**
 * The saturation dome: `points` temperatures from the triple point to the critical point
 * (647.096 K), closer together near the top, where entropy changes fastest with temperature:
 * T_i = T_c − (T_c − T_t)(1 − i/(n − 1))². Both lines end at the critical point.
 */
export function saturationDome(points = 80): SaturationDome {
	if (!Number.isInteger(points) || points < 2 || points > 10_000) {
		throw new Error(`A dome needs a whole number of points from 2 to 10000, got ${points}`);
	}
	const liquid: TsPoint[] = [];
	const vapour: TsPoint[] = [];
	for (let i = 0; i < points; i++) {
		const u = 1 - i / (points - 1);
		const T = i === points - 1 ? T_CRIT : T_CRIT - (T_CRIT - TRIPLE_POINT_T) * u * u;
		liquid.push({ s: stateFromTX(T, 0).s, T });
		vapour.push({ s: stateFromTX(T, 1).s, T });
	}
	return { liquid, vapour };
}

export interface HsPoint {
	/** MPa absolute */
	p: number;
	/** K */
	T: number;
	/** kJ/kg */
	h: number;
	/** kJ/(kg K) */
	s: number;
	/** Dryness fraction inside the dome; null outside it. */
	x: number | null;
}

export interface ExpansionLine {
	/** The isentropic expansion: s constant from p1 to p2. */
	isentropic: HsPoint[];
	/** The actual expansion: at each pressure, the efficiency applied to the work so far. */
	actual: HsPoint[];
}

/**
 * Points along an expansion for an h–s chart, at `points` pressures spaced evenly in log p
 * from p1 to p2. At each pressure p the actual point is h = h1 − η (h1 − h_s(p)): the overall
 * efficiency applied to the part expansion, a drawing line through the true end points (not a
 * stage-by-stage design, whose reheat effect bows it slightly). The last points are exactly
 * expandSteam's end states.
 */
export function expansionLine(input: ExpansionInput, points = 24): ExpansionLine {
	if (!Number.isInteger(points) || points < 2 || points > 10_000) {
		throw new Error(`A line needs a whole number of points from 2 to 10000, got ${points}`);
	}
	const end = expandSteam(input);
	const { h1, s1, isentropicEfficiency: eta } = end;
	const isentropic: HsPoint[] = [];
	const actual: HsPoint[] = [];
	const ratio = input.p2 / input.p1;
	for (let i = 0; i < points; i++) {
		if (i === 0 || i === points - 1) {
			const [ideal, real] = i === 0 ? [end.inlet, end.inlet] : [end.isentropicOutlet, end.outlet];
			isentropic.push(pointOf(ideal));
			actual.push(pointOf(real));
			continue;
		}
		const p = input.p1 * ratio ** (i / (points - 1));
		const ideal = stateFromPS(p, s1);
		isentropic.push(pointOf(ideal));
		actual.push(pointOf(eta === 1 ? ideal : stateFromPH(p, h1 - eta * (h1 - ideal.h))));
	}
	return { isentropic, actual };
}

function pointOf({ p, T, h, s, x }: HsPoint): HsPoint {
	return { p, T, h, s, x };
}
