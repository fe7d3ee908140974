import { describe, expect, it } from 'vitest';
import {
	CHURCHILL_BERNSTEIN_MIN_RE_PR,
	FLAT_PLATE_TRANSITION_RE,
	combineMixedConvection,
	nusseltCylinderCrossFlow,
	nusseltFlatPlateForced,
	nusseltHorizontalCylinderNatural,
	nusseltVerticalPlateNatural,
	rayleighNumber,
	reynoldsNumber
} from './convection';

describe('dimensionless groups', () => {
	it('Rayleigh and Reynolds numbers follow their definitions', () => {
		expect(rayleighNumber(0.1, 50, 1 / 320, 2e-5, 0.72)).toBeCloseTo(
			(9.80665 * (1 / 320) * 50 * 0.001 * 0.72) / 4e-10,
			3
		);
		expect(reynoldsNumber(5, 0.2, 2e-5)).toBeCloseTo(50000, 9);
	});
});

describe('Churchill–Chu, horizontal cylinder', () => {
	it('tends to 0.36 (= 0.6²) as Ra → 0, the conduction limit of the correlation', () => {
		expect(nusseltHorizontalCylinderNatural(0, 0.7)).toBeCloseTo(0.36, 12);
	});

	it('rises monotonically with Ra', () => {
		let previous = 0;
		for (let ra = 1e-3; ra < 1e12; ra *= 10) {
			const nu = nusseltHorizontalCylinderNatural(ra, 0.71);
			expect(nu).toBeGreaterThan(previous);
			previous = nu;
		}
	});
});

describe('Churchill–Bernstein, cylinder in cross-flow', () => {
	it('is zero below Re·Pr = 0.2 and at least 0.3 from there on', () => {
		const pr = 0.7;
		const threshold = CHURCHILL_BERNSTEIN_MIN_RE_PR / pr;
		expect(nusseltCylinderCrossFlow(0, pr)).toBe(0);
		expect(nusseltCylinderCrossFlow(threshold * 0.99, pr)).toBe(0);
		expect(nusseltCylinderCrossFlow(threshold, pr)).toBeGreaterThan(0.3);
	});

	it('rises monotonically with Re up to 10⁷', () => {
		let previous = 0;
		for (let re = 1; re < 1e7; re *= 3) {
			const nu = nusseltCylinderCrossFlow(re, 0.71);
			expect(nu).toBeGreaterThan(previous);
			previous = nu;
		}
	});
});

describe('vertical plate and flat plate', () => {
	it('Churchill–Chu vertical plate tends to 0.825² as Ra → 0 and rises with Ra', () => {
		expect(nusseltVerticalPlateNatural(0, 0.7)).toBeCloseTo(0.825 ** 2, 12);
		expect(nusseltVerticalPlateNatural(1e9, 0.7)).toBeGreaterThan(
			nusseltVerticalPlateNatural(1e8, 0.7)
		);
	});

	it('flat-plate forced convection is continuous at the transition Reynolds number', () => {
		const below = nusseltFlatPlateForced(FLAT_PLATE_TRANSITION_RE, 0.7);
		const above = nusseltFlatPlateForced(FLAT_PLATE_TRANSITION_RE * (1 + 1e-9), 0.7);
		expect(Math.abs(above / below - 1)).toBeLessThan(2e-3);
		expect(nusseltFlatPlateForced(2e6, 0.7)).toBeGreaterThan(above);
	});
});

describe('mixed-convection combination', () => {
	it('returns one part when the other is zero, and at least the larger part', () => {
		expect(combineMixedConvection(17.4, 0)).toBeCloseTo(17.4, 12);
		expect(combineMixedConvection(0, 50)).toBeCloseTo(50, 12);
		expect(combineMixedConvection(20, 20)).toBeCloseTo(20 * 2 ** (1 / 3), 12);
		expect(combineMixedConvection(20, 30)).toBeGreaterThan(30);
	});
});
