/**
 * The backward equations against the forward (Gibbs) equations over their whole ranges. The
 * limits are the permissible inconsistencies the release sets for them (IAPWS R7-97(2012),
 * from memory): 25 mK in region 1 and subregion 2c, 10 mK in subregions 2a and 2b.
 */
import { describe, expect, it } from 'vitest';
import { b23Temperature } from './b23';
import { region1TemperaturePH, region1TemperaturePS } from './region1-backward';
import { region1 } from './region1';
import {
	b2bcEnthalpy,
	b2bcPressure,
	region2aTemperaturePH,
	region2bTemperaturePH,
	region2cTemperaturePH
} from './region2-backward-ph';
import {
	S_2BC,
	region2aTemperaturePS,
	region2bTemperaturePS,
	region2cTemperaturePS
} from './region2-backward-ps';
import { region2 } from './region2';
import { P_SAT_13, P_SAT_MIN, tsat } from './region4';

const STEPS = 120;

function pressures(from: number, to: number): number[] {
	return Array.from({ length: STEPS + 1 }, (_, i) => from * Math.pow(to / from, i / STEPS));
}

describe('region 1 backward equations', () => {
	it('T(p, h) and T(p, s) stay within 25 mK of the Gibbs equation', () => {
		let worstH = 0;
		let worstS = 0;
		for (const p of pressures(P_SAT_MIN, 100)) {
			const top = p <= P_SAT_13 ? tsat(p) : 623.15;
			for (let k = 0; k <= STEPS; k++) {
				const T = 273.15 + ((top - 273.15) * k) / STEPS;
				const { h, s } = region1(p, T);
				worstH = Math.max(worstH, Math.abs(region1TemperaturePH(p, h) - T));
				worstS = Math.max(worstS, Math.abs(region1TemperaturePS(p, s) - T));
			}
		}
		expect(worstH).toBeLessThan(0.025);
		expect(worstS).toBeLessThan(0.025);
	});
});

describe('region 2 backward equations', () => {
	it('T(p, h) within 10 mK in 2a and 2b, 25 mK in 2c', () => {
		const worst = { a: 0, b: 0, c: 0 };
		for (const p of pressures(P_SAT_MIN, 100)) {
			const bottom = p <= P_SAT_13 ? tsat(p) : b23Temperature(p);
			for (let k = 0; k <= STEPS; k++) {
				const T = bottom + ((1073.15 - bottom) * k) / STEPS;
				const { h } = region2(p, T);
				const [sub, T2] =
					p <= 4
						? (['a', region2aTemperaturePH(p, h)] as const)
						: p <= 6.546699678 || h >= b2bcEnthalpy(p)
							? (['b', region2bTemperaturePH(p, h)] as const)
							: (['c', region2cTemperaturePH(p, h)] as const);
				worst[sub] = Math.max(worst[sub], Math.abs(T2 - T));
			}
		}
		expect(worst.a).toBeLessThan(0.01);
		expect(worst.b).toBeLessThan(0.01);
		expect(worst.c).toBeLessThan(0.025);
	});

	it('T(p, s) within 10 mK in 2a and 2b, 25 mK in 2c', () => {
		const worst = { a: 0, b: 0, c: 0 };
		for (const p of pressures(P_SAT_MIN, 100)) {
			const bottom = p <= P_SAT_13 ? tsat(p) : b23Temperature(p);
			for (let k = 0; k <= STEPS; k++) {
				const T = bottom + ((1073.15 - bottom) * k) / STEPS;
				const { s } = region2(p, T);
				const [sub, T2] =
					p <= 4
						? (['a', region2aTemperaturePS(p, s)] as const)
						: s >= S_2BC
							? (['b', region2bTemperaturePS(p, s)] as const)
							: (['c', region2cTemperaturePS(p, s)] as const);
				worst[sub] = Math.max(worst[sub], Math.abs(T2 - T));
			}
		}
		expect(worst.a).toBeLessThan(0.01);
		expect(worst.b).toBeLessThan(0.01);
		expect(worst.c).toBeLessThan(0.025);
	});

	it('the 2b/2c boundary equations invert each other', () => {
		for (const p of pressures(6.546699678, 100)) {
			expect(Math.abs(b2bcPressure(b2bcEnthalpy(p)) / p - 1)).toBeLessThan(1e-11);
		}
	});

	it('the 2b/2c boundary meets saturated vapour at 6.546699678 MPa (release eq. 21 note, from memory)', () => {
		const p = 6.546699678;
		expect(b2bcEnthalpy(p) - region2(p, tsat(p)).h).toBeCloseTo(0, 3);
	});
});
