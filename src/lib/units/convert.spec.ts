import { describe, expect, expectTypeOf, it } from 'vitest';
import { convert, fromBase, toBase } from './convert';
import { UnitError } from './errors';
import {
	QUANTITIES,
	quantities,
	unitsOf,
	type Quantity,
	type Unit,
	type UnitOf
} from './quantities';

/** Relative closeness, for values that went through floating-point factors. */
function expectClose(actual: number, expected: number, rel = 1e-12) {
	const scale = Math.max(Math.abs(expected), 1e-300);
	expect(Math.abs(actual - expected) / scale).toBeLessThanOrEqual(rel);
}

/** Base values to round-trip: physical ranges for absolute quantities, signed for the rest. */
const baseSamples: Record<Quantity, number[]> = {
	pressure: [0, 1e-3, 0.101325, 1, 22.064, 100],
	temperature: [0, 1, 273.15, 373.15, 647.096, 2273.15],
	temperatureDifference: [-50, 0, 0.5, 10, 300],
	massFlow: [-2, 0, 1e-4, 0.5, 12.3, 500],
	specificEnthalpy: [-10, 0, 0.001, 419.1, 2776.2, 4000],
	specificEntropy: [-0.01, 0, 1.3, 6.5, 12],
	power: [-1e3, 0, 1, 3.5e4, 2e8],
	energy: [-1e6, 0, 1, 3.6e6, 1.2e13],
	length: [-1, 0, 0.0005, 0.3048, 1500],
	shortLength: [0, 0.003, 0.0508, 0.3],
	area: [0, 6.4516e-4, 0.09290304, 1, 2500],
	volume: [0, 1e-3, 3.785411784e-3, 40],
	mass: [-5, 0, 0.45359237, 1000, 2e6],
	speed: [0, 0.44704, 1, 12.5, 35]
};

describe('round trips through the base unit, every unit of every quantity', () => {
	for (const quantity of QUANTITIES) {
		for (const unit of unitsOf(quantity)) {
			it(`${quantity}: ${unit}`, () => {
				for (const base of baseSamples[quantity]) {
					const shown = fromBase(quantity, base, unit);
					const back = toBase(quantity, shown, unit);
					// Offset scales (°C, °F) and gauge units cancel against the offset: compare
					// on the scale of the terms involved rather than the result alone.
					expect(Math.abs(back - base)).toBeLessThanOrEqual(1e-12 * Math.max(Math.abs(base), 1000));
				}
			});
		}
	}
});

describe('convert between every pair of units of a quantity', () => {
	for (const quantity of QUANTITIES) {
		const units = unitsOf(quantity) as Unit[];
		it(`${quantity}: ${units.length}² pairs agree with toBase/fromBase and round-trip`, () => {
			for (const from of units) {
				for (const to of units) {
					for (const base of baseSamples[quantity]) {
						const value = fromBase(quantity, base, from as UnitOf<typeof quantity>);
						const there = convert(value, from, to as never);
						const direct = fromBase(quantity, base, to as UnitOf<typeof quantity>);
						expect(Math.abs(there - direct)).toBeLessThanOrEqual(
							1e-12 * Math.max(Math.abs(direct), 1000)
						);
						const back = convert(there, to, from as never);
						expect(Math.abs(back - value)).toBeLessThanOrEqual(
							1e-12 * Math.max(Math.abs(value), 1000)
						);
					}
				}
			}
		});
	}
});

describe('known equalities between units (exact by definition, NIST SP 811 B.8)', () => {
	it('mass flow', () => {
		expectClose(convert(1, 't/h', 'kg/h'), 1000); // t = 1000 kg
		expectClose(convert(1000, 'lb/h', 'kg/h'), 453.59237); // lb = 0.45359237 kg
		expectClose(toBase('massFlow', 3600, 'kg/h'), 1); // 1 h = 3600 s
	});
	it('specific enthalpy and entropy', () => {
		expectClose(convert(1, 'Btu/lb', 'kJ/kg'), 2.326, 1e-15); // Btu_IT/lb = 2.326 kJ/kg
		expectClose(convert(1, 'Btu/(lb degF)', 'kJ/(kg K)'), 4.1868, 1e-15); // = 4.1868 kJ/(kg K)
	});
	it('power', () => {
		expectClose(convert(1, 'MMBtu/h', 'Btu/h'), 1e6);
		expectClose(convert(1, 'MW', 'kW'), 1000);
		// 1 kW = 3600 kJ/h ÷ 1.05505585262 kJ/Btu = 3412.1416 Btu/h (derived from the Btu_IT)
		expectClose(convert(1, 'kW', 'Btu/h'), 3_600_000 / 1055.05585262);
	});
	it('energy', () => {
		expectClose(convert(1, 'MMBtu', 'therm'), 10); // therm = 100 000 Btu
		expectClose(convert(1, 'MWh', 'GJ'), 3.6); // kWh = 3.6 MJ
		expectClose(convert(1, 'kWh', 'kJ'), 3600);
		expectClose(convert(1, 'MMBtu', 'GJ'), 1.05505585262);
		expectClose(convert(1, 'Btu', 'J'), 1055.05585262);
	});
	it('length, volume and mass', () => {
		expectClose(convert(1, 'ft', 'in'), 12);
		expectClose(convert(1, 'ft', 'mm'), 304.8);
		expectClose(convert(1, 'gal_US', 'L'), 3.785411784); // 231 in³
		expectClose(convert(1, 'm3', 'L'), 1000);
		expectClose(convert(1, 't', 'lb'), 1000 / 0.45359237);
	});
	it('the base unit converts to itself unchanged', () => {
		for (const quantity of QUANTITIES) {
			const base = quantities[quantity].base as UnitOf<typeof quantity>;
			expect(toBase(quantity, 123.456, base)).toBe(123.456);
		}
	});
});

describe('type safety', () => {
	it('infers unit ids per quantity', () => {
		expectTypeOf<UnitOf<'temperature'>>().toEqualTypeOf<'K' | 'degC' | 'degF'>();
		expectTypeOf<UnitOf<'energy'>>().toEqualTypeOf<
			'J' | 'kJ' | 'MJ' | 'GJ' | 'kWh' | 'MWh' | 'Btu' | 'MMBtu' | 'therm'
		>();
		expectTypeOf(convert).parameter(0).toEqualTypeOf<number>();
	});

	it('refuses, at compile time and at run time, units of another quantity', () => {
		// @ts-expect-error pressure cannot be converted to temperature
		expect(() => convert(1, 'bar_g', 'degC')).toThrow(/different quantities/);
		// @ts-expect-error mass flow cannot be converted to mass
		expect(() => convert(1, 'kg/h', 'kg')).toThrow(/different quantities/);
		// @ts-expect-error a temperature unit is not a pressure unit
		expect(() => toBase('pressure', 1, 'degC')).toThrow(/Unknown pressure unit "degC"/);
		// @ts-expect-error an energy unit is not a power unit
		expect(() => fromBase('power', 1, 'kWh')).toThrow(/Unknown power unit "kWh"/);
	});

	it('lets length and shortLength share their units', () => {
		expect(convert(2, 'in', 'mm')).toBeCloseTo(50.8, 12);
		expect(toBase('shortLength', 50.8, 'mm')).toBeCloseTo(0.0508, 15);
		expect(toBase('length', 2, 'in')).toBeCloseTo(0.0508, 15);
	});
});

describe('errors name the unit and the value', () => {
	it('unknown units', () => {
		expect(() => toBase('pressure', 5, 'barg' as never)).toThrow(
			/Unknown pressure unit "barg" for value 5; expected one of MPa, kPa_a/
		);
		expect(() => convert(5, 'furlong' as never, 'm' as never)).toThrow(/Unknown unit "furlong"/);
		expect(() => convert(5, 'm', 'furlong' as never)).toThrow(/Unknown unit "furlong"/);
		expect(() => toBase('luminance' as never, 5, 'cd/m2' as never)).toThrow(
			/Unknown quantity "luminance"/
		);
		expect(() => toBase('massFlow', 2, 'kgh' as never)).toThrow(/Unknown mass flow unit "kgh"/);
		expect(() => convert(3, 'kg/h', 'kW' as never)).toThrow(
			'Cannot convert 3 kg/h (mass flow) to kW (power): different quantities'
		);
	});

	it('non-finite values', () => {
		for (const bad of [NaN, Infinity, -Infinity]) {
			expect(() => toBase('massFlow', bad, 'kg/h')).toThrow(UnitError);
			expect(() => toBase('massFlow', bad, 'kg/h')).toThrow(/kg\/h is not a finite number/);
			expect(() => fromBase('energy', bad, 'GJ')).toThrow(/not a finite number/);
			expect(() => convert(bad, 'ft', 'm')).toThrow(/not a finite number/);
		}
		expect(() => toBase('mass', '12' as unknown as number, 'kg')).toThrow(/not a number/);
	});

	it('carries unit and value on the error', () => {
		try {
			toBase('temperature', -300, 'degC');
			expect.unreachable();
		} catch (error) {
			expect(error).toBeInstanceOf(UnitError);
			const e = error as UnitError;
			expect(e.unit).toBe('degC');
			expect(e.value).toBe(-300);
			expect(e.message).toBe('temperature -300 °C is below absolute zero');
		}
	});
});
