import { describe, expect, it } from 'vitest';
import { stateFromPT } from '../forward';
import { saturatedVapour, stateFromTX } from '../saturation';
import type { CostBasis, Header } from './inputs';
import { findHeader, headerSteam, resolveBasis, siteAtmosphere } from './site-basis';

const costBasis: CostBasis = {
	fuel: { kind: 'natural-gas', price: '9.00', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.82,
	feedwaterTemperature: 378.15,
	condensateReturnFraction: 0.6,
	makeupWaterPrice: '1.50',
	waterTreatmentPrice: '0.70',
	operatingHours: 8000
};

describe('resolveBasis', () => {
	it('resolves prices, feedwater enthalpy and the assumptions behind them', () => {
		const basis = resolveBasis(costBasis);
		expect(basis.feedwaterEnthalpy).toBe(stateFromTX(378.15, 0).h);
		expect(basis.fuelPricePerGJ.value).toBe(9);
		expect(basis.waterPricePerM3).toBeCloseTo(2.2, 12);
		expect(basis.emissionFactor.source).toMatch(/EPA GHG Emission Factors Hub/);
		expect(basis.assumptions.map((a) => a.key)).toContain('boilerEfficiency');
	});

	it('refuses a missing cost basis with a sentence a consultant understands', () => {
		expect(() => resolveBasis(undefined)).toThrow(
			'The site has no cost basis: set its fuel, price, boiler efficiency, feedwater temperature and operating hours before pricing findings'
		);
	});

	it('refuses an efficiency outside (0, 1] even if validation was skipped', () => {
		expect(() => resolveBasis({ ...costBasis, boilerEfficiency: 0 })).toThrow(
			'Boiler efficiency must be greater than 0 and at most 1, got 0'
		);
		expect(() => resolveBasis({ ...costBasis, boilerEfficiency: 82 })).toThrow(
			'(enter 0.82 for 82 %)'
		);
	});
});

describe('siteAtmosphere', () => {
	it('prefers a measured pressure, then elevation, then the standard atmosphere', () => {
		expect(siteAtmosphere({ atmosphericPressure: 0.098, elevation: 1000 }).value).toBe(0.098);
		// U.S. Standard Atmosphere 1976 at 1000 m: 89.875 kPa (its table, from memory).
		expect(siteAtmosphere({ elevation: 1000 }).value).toBeCloseTo(0.089875, 5);
		expect(siteAtmosphere({}).value).toBe(0.101325);
	});
});

describe('headers', () => {
	const saturated: Header = {
		id: '6c1a8c56-94a7-4f55-b4a6-3a3d1f0d2b11',
		name: 'LP',
		pressure: 0.5
	};
	const superheated: Header = {
		...saturated,
		id: 'f0e1d2c3-b4a5-4687-9a1b-2c3d4e5f6a7b',
		name: 'HP',
		pressure: 4,
		designTemperature: 673.15
	};

	it('finds a header or says which is missing', () => {
		expect(findHeader([saturated], saturated.id)).toBe(saturated);
		expect(() => findHeader([saturated], superheated.id)).toThrow(
			`Header ${superheated.id} is not in the site's header list`
		);
		expect(() => findHeader([saturated], undefined)).toThrow('This finding has no header');
	});

	it('carries dry saturated or superheated steam', () => {
		expect(headerSteam(saturated).enthalpy).toBe(saturatedVapour(0.5).h);
		expect(headerSteam(superheated).enthalpy).toBe(stateFromPT(4, 673.15).h);
		expect(() => headerSteam({ ...superheated, designTemperature: 400 })).toThrow(
			/below saturation/
		);
	});
});
