import { describe, expect, it } from 'vitest';
import { plantCostBasis, plantElectricityPrice } from '../../../../tests/fixtures/plant-site';
import { SteamRangeError } from '../errors';
import { saturatedVapour } from '../saturation';
import { letdownTurbine, type LetdownInput } from './letdown';

const station: LetdownInput = {
	steamFlow: 3,
	p1: 1.8,
	T1: 573.15,
	p2: 0.45,
	isentropicEfficiency: 0.65,
	generatorEfficiency: 0.95,
	basis: plantCostBasis,
	electricityPrice: plantElectricityPrice
};

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('letdownTurbine', () => {
	it('makes shaft power ṁ w and electrical power ṁ w η_g', () => {
		const r = letdownTurbine(station);
		expect(r.shaftPower).toBeCloseTo(3 * r.expansion.work, 12);
		expect(r.electricalPower).toBeCloseTo(0.95 * r.shaftPower, 12);
		expect(r.generatorLoss).toBeCloseTo(0.05 * r.shaftPower, 12);
	});

	it('closes its energy balance: ṁ h1 = electrical power + generator loss + ṁ h2', () => {
		const r = letdownTurbine(station);
		const into = 3 * r.expansion.h1;
		const out = r.electricalPower + r.generatorLoss + 3 * r.exhaust.h;
		expect(Math.abs(into - out) / into).toBeLessThan(1e-9);
	});

	it('compares with the valve: same enthalpy out of the valve, the deficit made up at the boiler', () => {
		const r = letdownTurbine(station);
		expect(r.valveOutlet.h).toBeCloseTo(r.expansion.h1, 9);
		expect(r.valveOutlet.T).toBeGreaterThan(r.exhaust.T);
		expect(r.enthalpyDeficit).toBeCloseTo(r.valveOutlet.h - r.exhaust.h, 9);
		expect(r.extraBoilerHeat).toBe(r.shaftPower);
		expect(r.extraFuel.fuelPower).toBeCloseTo(r.shaftPower / plantCostBasis.boilerEfficiency, 9);
	});

	it('prices the year: electricity value − extra fuel cost', () => {
		const r = letdownTurbine(station);
		expect(r.electricityPerYear).toBeCloseTo(r.electricalPower * 8000, 9);
		expect(r.electricityValue.amount).toBeCloseTo(r.electricityPerYear * 0.12, 6);
		// 9 EUR/GJ × fuel kW × 8000 h × 3600 s ÷ 1e6 kJ/GJ.
		const fuelCost = (9 * r.extraFuel.fuelPower * 8000 * 3600) / 1e6;
		expect(rel(r.extraFuel.fuelCost.amount, fuelCost)).toBeLessThan(1e-12);
		expect(r.netSaving.amount).toBeCloseTo(r.electricityValue.amount - fuelCost, 6);
		expect(r.netSaving.currency).toBe('EUR');
		expect(r.extraFuel.year.co2).toBeGreaterThan(0);
	});

	it('breaks even at 1 / (η_b η_g) whatever the turbine efficiency', () => {
		const r = letdownTurbine(station);
		expect(r.breakevenPriceRatio).toBeCloseTo(1 / (0.8 * 0.95), 14);
		expect(r.fuelPricePerKWh).toBeCloseTo(9 * 0.0036, 14);
		expect(r.priceRatio).toBeCloseTo(0.12 / (9 * 0.0036), 12);
		for (const eta of [0.4, 0.65, 1]) {
			const atBreakeven = letdownTurbine({
				...station,
				isentropicEfficiency: eta,
				electricityPrice: r.breakevenElectricityPrice
			});
			expect(Math.abs(atBreakeven.netSaving.amount)).toBeLessThan(1e-6);
		}
		const cheap = letdownTurbine({ ...station, electricityPrice: 0.02 });
		expect(cheap.netSaving.amount).toBeLessThan(0);
	});

	it('takes dry saturated steam when neither T1 nor x1 is given, and says so', () => {
		const r = letdownTurbine({ ...station, T1: undefined });
		expect(r.expansion.h1).toBeCloseTo(saturatedVapour(1.8).h, 9);
		expect(r.assumptions.map((a) => a.key)).toContain('inletDryness');
	});

	it('flags a wet exhaust with its dryness and a caution', () => {
		const r = letdownTurbine({ ...station, T1: undefined, isentropicEfficiency: 0.8 });
		expect(r.wetExhaust).toBe(true);
		expect(r.exhaustDryness!).toBeGreaterThan(0.9);
		expect(r.exhaustDryness!).toBeLessThan(1);
		expect(r.cautions.map((c) => c.key)).toContain('wet-exhaust');
		const dry = letdownTurbine(station);
		expect(dry.wetExhaust).toBe(false);
		expect(dry.exhaustDryness).toBeNull();
		expect(dry.cautions.map((c) => c.key)).not.toContain('wet-exhaust');
		expect(dry.cautions[0].key).toBe('pressure-systems');
	});

	it('runs the hours entered for the station', () => {
		const r = letdownTurbine({ ...station, operatingHours: 4000 });
		expect(r.electricityPerYear).toBeCloseTo(r.electricalPower * 4000, 9);
		const hours = r.assumptions.find((a) => a.key === 'operatingHours')!;
		expect(hours.source).toBe('entered for this opportunity');
	});

	it('refuses bad inputs with plain messages and IF97 states with the range error', () => {
		expect(() => letdownTurbine({ ...station, steamFlow: 0 })).toThrow(
			'Steam flow must be greater than 0 kg/s'
		);
		expect(() => letdownTurbine({ ...station, generatorEfficiency: 1.5 })).toThrow(
			'Generator efficiency must be greater than 0 and at most 1, got 1.5'
		);
		expect(() => letdownTurbine({ ...station, isentropicEfficiency: -1 })).toThrow(
			'Turbine isentropic efficiency must be greater than 0 and at most 1'
		);
		expect(() => letdownTurbine({ ...station, electricityPrice: -0.1 })).toThrow(
			'Electricity price cannot be negative'
		);
		expect(() => letdownTurbine({ ...station, p2: 2 })).toThrow(
			'The outlet pressure p2 (2 MPa abs) must be below the inlet pressure p1 (1.8 MPa abs)'
		);
		expect(() =>
			letdownTurbine({ ...station, basis: null as unknown as LetdownInput['basis'] })
		).toThrow('The site has no cost basis');
		expect(() => letdownTurbine({ ...station, T1: 2500 })).toThrow(SteamRangeError);
	});
});
