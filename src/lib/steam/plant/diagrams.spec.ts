import { describe, expect, it } from 'vitest';
import { T_CRIT } from '../constants';
import { saturationPressure } from '../region4';
import { saturatedLiquid, saturatedVapour } from '../saturation';
import { expandSteam } from './expansion';
import { expansionLine, saturationDome, TRIPLE_POINT_T } from './diagrams';

describe('saturationDome', () => {
	it('runs from the triple point to the critical point, where its lines meet', () => {
		const { liquid, vapour } = saturationDome(60);
		expect(liquid).toHaveLength(60);
		expect(vapour).toHaveLength(60);
		expect(liquid[0].T).toBe(TRIPLE_POINT_T);
		expect(liquid[59].T).toBe(T_CRIT);
		expect(Math.abs(liquid[59].s - vapour[59].s)).toBeLessThan(1e-6);
		// IF97's reference state: the liquid's entropy is zero at the triple point.
		expect(Math.abs(liquid[0].s)).toBeLessThan(1e-6);
	});

	it('is made of saturation states from the engine', () => {
		const { liquid, vapour } = saturationDome(25);
		for (let i = 1; i < 24; i++) {
			const p = saturationPressure(liquid[i].T);
			expect(Math.abs(liquid[i].s - saturatedLiquid(p).s)).toBeLessThan(1e-9);
			expect(Math.abs(vapour[i].s - saturatedVapour(p).s)).toBeLessThan(1e-9);
		}
	});

	it('rises in temperature, the liquid line to the right and the vapour line to the left', () => {
		const { liquid, vapour } = saturationDome();
		for (let i = 1; i < liquid.length; i++) {
			expect(liquid[i].T).toBeGreaterThan(liquid[i - 1].T);
			expect(liquid[i].s).toBeGreaterThan(liquid[i - 1].s);
			expect(vapour[i].s).toBeLessThan(vapour[i - 1].s);
		}
	});

	it('crowds its points towards the top, where the lines bend', () => {
		const { liquid } = saturationDome(40);
		expect(liquid[39].T - liquid[38].T).toBeLessThan(liquid[1].T - liquid[0].T);
	});

	it('refuses a count that is not a whole number from 2', () => {
		expect(() => saturationDome(1)).toThrow('A dome needs a whole number of points from 2');
		expect(() => saturationDome(2.5)).toThrow('A dome needs a whole number of points from 2');
	});
});

describe('expansionLine', () => {
	const input = { p1: 4, T1: 673.15, p2: 0.01, isentropicEfficiency: 0.85 };

	it('starts at the inlet and ends at expandSteam’s end states', () => {
		const end = expandSteam(input);
		const line = expansionLine(input, 12);
		expect(line.actual).toHaveLength(12);
		expect(line.actual[0].h).toBe(end.h1);
		expect(line.actual[11].h).toBe(end.h2);
		expect(line.actual[11].x).toBe(end.x2);
		expect(line.isentropic[11].h).toBe(end.h2s);
	});

	it('keeps the isentropic line at s1 and the actual line to its right, falling in p and h', () => {
		const line = expansionLine(input, 12);
		const s1 = line.isentropic[0].s;
		for (let i = 1; i < 12; i++) {
			expect(Math.abs(line.isentropic[i].s - s1)).toBeLessThan(1e-9);
			expect(line.actual[i].s).toBeGreaterThan(line.actual[i - 1].s);
			expect(line.actual[i].h).toBeLessThan(line.actual[i - 1].h);
			expect(line.actual[i].p).toBeLessThan(line.actual[i - 1].p);
			const ideal = line.isentropic[i];
			expect(line.actual[i].h).toBeCloseTo(
				line.actual[0].h - 0.85 * (line.actual[0].h - ideal.h),
				9
			);
		}
	});

	it('draws one line when the expansion is isentropic', () => {
		const line = expansionLine({ ...input, isentropicEfficiency: 1 }, 6);
		expect(line.actual).toEqual(line.isentropic);
	});
});
