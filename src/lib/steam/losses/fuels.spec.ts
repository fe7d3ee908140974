import { describe, expect, it } from 'vitest';
import type { Fuel } from './inputs';
import {
	ENERGY_UNIT_GJ,
	FUELS,
	MMBTU_GJ,
	defaultEnergyContent,
	emissionFactor,
	energyPerPriceUnit,
	fuelPricePerGJ,
	parseDecimal
} from './fuels';

describe('energy units', () => {
	it('uses the International Table Btu: 1 MMBtu = 1.055056 GJ (NIST SP 811 B.8, rounded there)', () => {
		expect(MMBTU_GJ).toBeCloseTo(1.055056, 6);
		// A therm is 100 000 Btu, 1 kWh is 3.6 MJ (definitions).
		expect(ENERGY_UNIT_GJ.therm * 10).toBeCloseTo(MMBTU_GJ, 12);
		expect(ENERGY_UNIT_GJ.kWh * 1000).toBe(ENERGY_UNIT_GJ.MWh);
	});
});

describe('default emission factors', () => {
	// Published values, kg CO2/MMBtu (docs/sources.md), converted per GJ with 1.055056 GJ/MMBtu.
	const published: [keyof typeof FUELS, number, string][] = [
		['natural-gas', 53.06, 'EPA GHG Emission Factors Hub 2024, Table 1'],
		['fuel-oil-2', 73.96, '40 CFR 98 Table C-1'],
		['fuel-oil-6', 75.1, '40 CFR 98 Table C-1'],
		['lpg', 62.87, '40 CFR 98 Table C-1 (81 FR 89188, 2016), propane'],
		['coal', 93.28, 'EPA GHG Emission Factors Hub 2024, Table 1, bituminous'],
		['biomass', 93.8, 'EPA GHG Emission Factors Hub 2024, Table 1, wood']
	];
	it.each(published)('%s: %f kg CO2/MMBtu (%s)', (kind, perMmbtu) => {
		const factor = FUELS[kind].emissionFactor!;
		expect(factor.value).toBeCloseTo(perMmbtu / 1.055056, 3);
		expect(factor.source).toContain(String(perMmbtu));
	});

	it('agrees with IPCC 2006 Vol. 2 Table 1.4 for natural gas within the HHV/LHV gap', () => {
		// IPCC: 56 100 kg/TJ on net calorific value; gas HHV ≈ 1.11 × LHV (common practice), so
		// the HHV-based EPA factor should be near 56.1 / 1.11 ≈ 50.5 kg/GJ.
		const epa = FUELS['natural-gas'].emissionFactor!.value;
		expect(epa * 1.11).toBeGreaterThan(56.1 * 0.98);
		expect(epa * 1.11).toBeLessThan(56.1 * 1.02);
	});

	it('takes the site factor over the default and refuses electricity without one', () => {
		const fuel: Fuel = { kind: 'electricity', price: '0.12', unit: 'kWh' };
		expect(emissionFactor({ fuel, emissionFactor: 55.6 })).toEqual({
			value: 55.6,
			unit: 'kg CO2/GJ',
			source: 'site cost basis'
		});
		expect(() => emissionFactor({ fuel })).toThrow(
			'Electricity has no default emission factor: enter one in kg CO2 per GJ in the cost basis'
		);
	});
});

describe('energy per priced unit', () => {
	it('natural gas per Mcf and per m³ from 0.001026 MMBtu/scf (EPA Hub 2024)', () => {
		expect(defaultEnergyContent('natural-gas', 'Mcf')!.value).toBeCloseTo(1.026 * 1.055056, 5);
		// 1 scf = 0.3048³ m³ = 0.0283168 m³ (NIST SP 811).
		expect(defaultEnergyContent('natural-gas', 'm3')!.value).toBeCloseTo(
			(0.001026 * 1.055056) / 0.0283168,
			5
		);
	});

	it('fuel oil No. 2 per gallon and per litre from 0.138 MMBtu/gal (40 CFR 98 Table C-1)', () => {
		expect(defaultEnergyContent('fuel-oil-2', 'US-gal')!.value).toBeCloseTo(0.138 * 1.055056, 6);
		// 1 US gal = 3.785411784 L (NIST SP 811).
		expect(defaultEnergyContent('fuel-oil-2', 'L')!.value).toBeCloseTo(
			(0.138 * 1.055056) / 3.785411784,
			6
		);
	});

	it('has no default for coal per tonne, and says so', () => {
		expect(defaultEnergyContent('coal', 't')).toBeNull();
		expect(() => energyPerPriceUnit({ kind: 'coal', price: '120', unit: 't' })).toThrow(
			'No default energy content for Coal (bituminous) priced per t: enter it in GJ per t in the cost basis'
		);
		expect(
			energyPerPriceUnit({ kind: 'coal', price: '120', unit: 't', energyContent: 26 })
		).toEqual({ value: 26, unit: 'GJ/t', source: 'site cost basis' });
	});
});

describe('fuel price per GJ', () => {
	it('converts a price per MMBtu and per therm', () => {
		// $6.23/MMBtu is the gas price of the Manczyk worked example (docs/sources.md).
		expect(fuelPricePerGJ({ kind: 'natural-gas', price: '6.23', unit: 'MMBtu' }).value).toBeCloseTo(
			6.23 / 1.055056,
			5
		);
		expect(
			fuelPricePerGJ({ kind: 'natural-gas', price: '0.623', unit: 'therm' }).value
		).toBeCloseTo(6.23 / 1.055056, 5);
	});

	it('converts electricity per kWh: 0.10 per kWh is 27.78 per GJ (1 GJ = 277.78 kWh)', () => {
		expect(fuelPricePerGJ({ kind: 'electricity', price: '0.10', unit: 'kWh' }).value).toBeCloseTo(
			27.7778,
			4
		);
	});

	it('refuses a malformed decimal instead of pricing at NaN or zero', () => {
		expect(() => parseDecimal('Fuel price', '1e3')).toThrow(
			'Fuel price must be a decimal number such as 12.50, got "1e3"'
		);
		expect(() => fuelPricePerGJ({ kind: 'natural-gas', price: '' as string, unit: 'GJ' })).toThrow(
			'Fuel price must be a decimal number'
		);
	});
});
