/**
 * Re-pricing stored physics on a new cost basis must give exactly what a full evaluation on that
 * basis gives: the physics may not depend on anything money-side (fuel, price, efficiency,
 * feedwater, return, water, hours, emission factor). Property test over seeded random findings
 * and bases; a failing seed is printed and can be replayed.
 */
import { describe, expect, it } from 'vitest';
import { mulberry32, type Rng } from '../../../../tests/integration/chaos/prng';
import {
	findingCommon,
	lossCostBasis,
	mainsHeader,
	superheatedHeader
} from '../../../../tests/fixtures/loss-site';
import { evaluateFinding } from './evaluate';
import type { CostBasis, FindingInput, Header } from './inputs';
import { findingPhysics } from './physics';
import { priceFinding } from './pricing';
import { LEAK_SIZE_CLASSES, TRAP_CONDITIONS, TRAP_DISCHARGES, TRAP_TYPES } from '../vocabulary';

const lowHeader: Header = {
	id: '0b7d4c2e-5f61-4a8e-9c3b-2d1e0f9a8b7c',
	name: 'Low 2 bar',
	pressure: 0.301325,
	operatingHours: 5000
};
const headers = [mainsHeader, superheatedHeader, lowHeader];

/** The physics side of a basis stays with the site; only money moves between A and B. */
const physicsSide = { elevation: 120, trapFactors: { failedOpen: 0.4 } };

function randomBasis(r: Rng): CostBasis {
	const fuel = r.pick([
		{ kind: 'natural-gas', price: (r.int(300, 2000) / 100).toFixed(2), unit: 'GJ' },
		{ kind: 'fuel-oil-2', price: (r.int(40, 150) / 100).toFixed(2), unit: 'L' },
		{ kind: 'coal', price: r.int(80, 300).toFixed(2), unit: 't', energyContent: 25 },
		{ kind: 'electricity', price: (r.int(5, 40) / 100).toFixed(2), unit: 'kWh' }
	] as const);
	return {
		fuel,
		currency: r.pick(['EUR', 'USD', 'GBP']),
		boilerEfficiency: r.int(60, 95) / 100,
		feedwaterTemperature: 273.15 + r.int(20, 140),
		condensateReturnFraction: r.int(0, 100) / 100,
		makeupWaterPrice: (r.int(0, 400) / 100).toFixed(2),
		waterTreatmentPrice: (r.int(0, 200) / 100).toFixed(2),
		operatingHours: r.int(500, 8760),
		...(r.chance(0.5) ? { makeupWaterTemperature: 273.15 + r.int(5, 30) } : {}),
		...(fuel.kind === 'electricity' || r.chance(0.3) ? { emissionFactor: r.int(0, 120) } : {}),
		...(r.chance(0.5) ? { discountRate: r.int(0, 15) / 100, lifeYears: r.int(1, 20) } : {}),
		...physicsSide
	} as CostBasis;
}

function randomFinding(r: Rng): FindingInput {
	const headerId = r.pick(headers).id;
	const hours = r.chance(0.3) ? { operatingHours: r.int(100, 8760) } : {};
	const repair = r.chance(0.7) ? { repairCost: r.int(1000, 500000) } : {};
	const common = { ...findingCommon, id: r.uuid(), headerId, ...repair };
	switch (r.int(0, 3)) {
		case 0:
			return {
				...common,
				kind: 'trap',
				inputs: {
					trapType: r.pick(TRAP_TYPES),
					dn: r.pick([15, 20, 25]),
					condition: r.pick(TRAP_CONDITIONS),
					discharge: r.pick(TRAP_DISCHARGES),
					...(r.chance(0.4) ? { condensateLoad: r.int(1, 50) / 1000 } : {}),
					...hours
				}
			} as FindingInput;
		case 1:
			return {
				...common,
				kind: 'leak',
				inputs: { sizeClass: r.pick(LEAK_SIZE_CLASSES), ...hours }
			} as FindingInput;
		case 2:
			return {
				...common,
				kind: 'insulation',
				inputs: {
					item: 'pipe',
					dn: r.pick([25, 50, 100, 150]),
					length: r.int(1, 40),
					ambientTemperature: 273.15 + r.int(0, 35),
					windSpeed: r.int(0, 5),
					layers: [{ thickness: r.pick([0.03, 0.05, 0.08]), material: 'mineral-wool' }],
					jacketEmissivity: 0.1,
					bareEmissivity: 0.9,
					...hours
				}
			} as FindingInput;
		default:
			return {
				...common,
				headerId: mainsHeader.id,
				kind: 'header',
				inputs: {
					measuredPressure: r.int(80, 120) / 100,
					measuredTemperature: 273.15 + r.int(175, 260)
				}
			} as FindingInput;
	}
}

/** Throws → the message; else the evaluation (a refusal must be the same refusal on both paths). */
function attempt<T>(f: () => T): T | { refused: string } {
	try {
		return f();
	} catch (e) {
		return { refused: (e as Error).message };
	}
}

describe('re-pricing stored physics', () => {
	it('equals a full evaluation on the new basis, for 400 random findings and bases', () => {
		let priced = 0;
		for (let seed = 1; seed <= 400; seed++) {
			const r = mulberry32(seed);
			const finding = randomFinding(r);
			const basisA = randomBasis(r);
			const basisB = randomBasis(r);
			// The physics as stored when the finding was priced on A…
			const stored = attempt(() =>
				JSON.parse(JSON.stringify(findingPhysics(finding, { costBasis: basisA, headers })))
			);
			// …re-priced on B, against everything computed from scratch on B.
			const repriced =
				'refused' in stored
					? stored
					: attempt(() => priceFinding(stored, basisB, finding.repairCost));
			const full = attempt(() => evaluateFinding(finding, { costBasis: basisB, headers }));
			expect(JSON.parse(JSON.stringify(repriced)), `seed ${seed}`).toEqual(
				JSON.parse(JSON.stringify(full))
			);
			if (!('refused' in full)) priced++;
		}
		// Most draws are priceable: the property is about figures, not about shared refusals.
		expect(priced).toBeGreaterThan(300);
	});

	it('moves money with the basis but not the physics', () => {
		const finding = randomFinding(mulberry32(7));
		const trap = {
			...finding,
			kind: 'trap',
			headerId: mainsHeader.id,
			inputs: {
				trapType: 'thermodynamic',
				dn: 15,
				condition: 'failed-open',
				discharge: 'atmosphere'
			}
		} as FindingInput;
		const physics = findingPhysics(trap, { costBasis: lossCostBasis, headers });
		const cheap = priceFinding(physics, lossCostBasis);
		const dear = priceFinding(physics, {
			...lossCostBasis,
			fuel: { ...lossCostBasis.fuel, price: '18.00' }
		});
		expect(dear.steamLoss).toBe(cheap.steamLoss);
		expect(dear.fuelEnergy).toBeCloseTo(cheap.fuelEnergy, 9);
		expect(dear.fuelCost.amount).toBeCloseTo(2 * cheap.fuelCost.amount, 6);
	});

	it('charges unreturned water its heating from the makeup temperature when the basis gives one', () => {
		const leak = {
			...findingCommon,
			kind: 'leak',
			headerId: mainsHeader.id,
			inputs: { sizeClass: 'medium' }
		} as FindingInput;
		const physics = findingPhysics(leak, { costBasis: lossCostBasis, headers });
		const without = priceFinding(physics, lossCostBasis);
		const withCold = priceFinding(physics, { ...lossCostBasis, makeupWaterTemperature: 283.15 });
		// IAPWS-IF97 saturated liquid: h(378.15 K) ≈ 440.2 kJ/kg, h(283.15 K) ≈ 42.0 kJ/kg
		// (IAPWS-IF97 saturation table values, recalled from memory; the spec checks the sum only).
		const kgPerS = physics.steamFlow!;
		const extraKw = withCold.heatLoss - without.heatLoss;
		expect(extraKw / kgPerS).toBeGreaterThan(390);
		expect(extraKw / kgPerS).toBeLessThan(405);
		expect(withCold.assumptions.map((a) => a.key)).toContain('makeupHeating');
	});

	it('uses the header’s own operating hours when the finding gives none', () => {
		const leak = {
			...findingCommon,
			kind: 'leak',
			headerId: lowHeader.id,
			inputs: { sizeClass: 'small' }
		} as FindingInput;
		const result = evaluateFinding(leak, { costBasis: lossCostBasis, headers });
		expect(result.operatingHours).toBe(5000);
		expect(result.assumptions.find((a) => a.key === 'operatingHours')?.source).toBe(
			'header list (Low 2 bar)'
		);
	});
});
