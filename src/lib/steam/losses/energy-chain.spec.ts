import { describe, expect, it } from 'vitest';
import {
	annualLoss,
	condensateHeatRate,
	fuelPower,
	requireEfficiency,
	steamFuelCostPerTonne,
	steamHeatRate
} from './energy-chain';

const basis = { hours: 8000, fuelPricePerGJ: 10, emissionFactor: 50, waterPricePerM3: 3 };

describe('steam and condensate heat', () => {
	it('is flow × (h − h_feedwater), in W', () => {
		// 0.01 kg/s × (2778 − 440) kJ/kg = 23.38 kW
		expect(steamHeatRate(0.01, 2778, 440)).toBeCloseTo(23380, 6);
	});

	it('refuses steam no hotter than its feedwater', () => {
		expect(() => steamHeatRate(0.01, 400, 440)).toThrow(
			'Steam enthalpy (400.0 kJ/kg) must exceed feedwater enthalpy (440.0 kJ/kg): check the feedwater temperature'
		);
	});

	it('counts condensate heat above feedwater only', () => {
		expect(condensateHeatRate(0.1, 762, 440)).toBeCloseTo(32200, 6);
		expect(condensateHeatRate(0.1, 300, 440)).toBe(0);
	});
});

describe('fuel power and efficiency', () => {
	it('divides heat by boiler efficiency', () => {
		expect(fuelPower(8000, 0.8)).toBe(10000);
	});

	it.each([0, -0.1, 1.01, NaN])('refuses an efficiency of %s', (efficiency) => {
		expect(() => requireEfficiency(efficiency)).toThrow(/Boiler efficiency must be/);
	});

	it('names the efficiency it was given for', () => {
		expect(() => requireEfficiency(1.2, 'Generator efficiency')).toThrow(
			'Generator efficiency must be greater than 0 and at most 1, got 1.2'
		);
	});

	it('tells a person who typed 80 to enter 0.8', () => {
		expect(() => fuelPower(1, 80)).toThrow(
			'Boiler efficiency must be greater than 0 and at most 1, got 80 (enter 0.8 for 80 %)'
		);
	});
});

describe('annualLoss', () => {
	it('turns 1 kW of fuel and 1 g/s of water into a year', () => {
		const year = annualLoss(1000, 0.001, basis);
		// 1 kW × 8000 h = 28.8 GJ; 1 g/s × 8000 h = 28.8 t = 28.8 m³
		expect(year.fuelEnergy).toBeCloseTo(28.8, 9);
		expect(year.fuelCost).toBeCloseTo(288, 9);
		expect(year.co2).toBeCloseTo(1440, 9);
		expect(year.water).toBeCloseTo(28.8, 9);
		expect(year.waterCost).toBeCloseTo(86.4, 9);
		expect(year.totalCost).toBeCloseTo(374.4, 9);
	});

	it('refuses hours outside (0, 8784] and negative flows', () => {
		expect(() => annualLoss(1, 0, { ...basis, hours: 9000 })).toThrow(
			'Operating hours must be greater than 0 and at most 8784 h per year, got 9000'
		);
		expect(() => annualLoss(-1, 0, basis)).toThrow('Fuel power cannot be negative');
		expect(() => annualLoss(1, NaN, basis)).toThrow('Makeup water flow must be a finite number');
	});
});

describe('steamFuelCostPerTonne', () => {
	it('is price × Δh ÷ (1000 η)', () => {
		// 10 per GJ × 2000 kJ/kg ÷ (1000 × 0.8) = 25 per tonne
		expect(steamFuelCostPerTonne(2440, 440, 0.8, 10)).toBeCloseTo(25, 9);
	});
});
