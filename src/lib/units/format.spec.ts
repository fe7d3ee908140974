import { describe, expect, it } from 'vitest';
import { toBase } from './convert';
import { UnitError } from './errors';
import { formatQuantity, formatQuantityParts } from './format';

describe('formatQuantity', () => {
	it('converts from base units to the system display unit', () => {
		expect(formatQuantity(12.3 / 3600, 'massFlow', 'SI')).toBe('12.3 kg/h');
		expect(formatQuantity(toBase('massFlow', 1500, 'lb/h'), 'massFlow', 'US')).toBe('1,500 lb/h');
		expect(formatQuantity(458.15, 'temperature', 'SI')).toBe('185 °C');
		expect(formatQuantity(458.15, 'temperature', 'US')).toBe('365 °F'); // 185 × 1.8 + 32
		expect(formatQuantity(1.23e13, 'energy', 'SI')).toBe('12,300 GJ');
		// 1.23e13 J ÷ 1.055 055 852 62e9 J/MMBtu = 11 658 MMBtu
		expect(formatQuantity(1.23e13, 'energy', 'US')).toBe('11,700 MMBtu');
		expect(formatQuantity(0.0508, 'shortLength', 'SI')).toBe('50.8 mm');
		expect(formatQuantity(0.0508, 'shortLength', 'US')).toBe('2 in');
		expect(formatQuantity(30.48, 'length', 'US')).toBe('100 ft');
		expect(formatQuantity(2776.2, 'specificEnthalpy', 'US')).toBe('1,190 Btu/lb'); // ÷ 2.326
		expect(formatQuantity(10, 'temperatureDifference', 'US')).toBe('18 °F');
	});

	it('shows gauge pressure against the site atmosphere', () => {
		const p = toBase('pressure', 150, 'psig');
		expect(formatQuantity(p, 'pressure', 'US')).toBe('150 psig');
		expect(formatQuantity(p, 'pressure', 'SI')).toBe('10.3 bar g'); // 150 × 0.0689476 bar
		// 1.1 MPa a is 9.99 bar g at sea level but 10.1 bar g where the atmosphere is 0.0899 MPa.
		expect(formatQuantity(1.1, 'pressure', 'SI')).toBe('9.99 bar g');
		expect(formatQuantity(1.1, 'pressure', 'SI', { atmosphericPressure: 0.0899 })).toBe(
			'10.1 bar g'
		);
		expect(formatQuantity(1.1, 'pressure', 'bar_a')).toBe('11 bar a');
	});

	it('accepts an explicit unit instead of a system', () => {
		expect(formatQuantity(1000, 'power', 'Btu/h')).toBe('3,410 Btu/h'); // 1 kW = 3412.14 Btu/h
		expect(formatQuantity(3.6e9, 'energy', 'MWh')).toBe('1 MWh');
		expect(formatQuantity(1.05505585262e8, 'energy', 'therm')).toBe('1 therm');
		expect(formatQuantity(0.003785411784, 'volume', 'L')).toBe('3.79 L');
	});

	it('shows a missing value as a dash, or the given text', () => {
		expect(formatQuantity(null, 'massFlow', 'SI')).toBe('—');
		expect(formatQuantity(undefined, 'power', 'US')).toBe('—');
		expect(formatQuantity(null, 'power', 'US', { nullText: 'not measured' })).toBe('not measured');
	});

	it('passes number options through and takes a separator', () => {
		expect(formatQuantity(0.0508, 'shortLength', 'US', { sigFigs: 4 })).toBe('2 in');
		expect(formatQuantity(0.05, 'shortLength', 'US', { sigFigs: 4 })).toBe('1.969 in');
		expect(formatQuantity(12.3 / 3600, 'massFlow', 'SI', { locale: 'de-DE' })).toBe('12,3 kg/h');
		expect(formatQuantity(12 / 3600, 'massFlow', 'SI', { keepTrailingZeros: true })).toBe(
			'12.0 kg/h'
		);
		expect(formatQuantity(12.3 / 3600, 'massFlow', 'SI', { separator: '\u00a0' })).toBe(
			'12.3\u00a0kg/h'
		);
	});

	it('throws for bad input rather than showing a wrong number', () => {
		expect(() => formatQuantity(NaN, 'massFlow', 'SI')).toThrow(UnitError);
		expect(() => formatQuantity(-0.2, 'pressure', 'SI')).toThrow(/below absolute zero/);
		expect(() => formatQuantity(1, 'pressure', 'bogus' as never)).toThrow(
			'"bogus" is neither a unit system nor a pressure unit'
		);
		// @ts-expect-error a temperature unit cannot show a pressure
		expect(() => formatQuantity(1, 'pressure', 'degC')).toThrow(
			/neither a unit system nor a pressure unit/
		);
	});
});

describe('formatQuantityParts', () => {
	it('keeps number, unit and label apart', () => {
		const parts = formatQuantityParts(12.3 / 3600, 'massFlow', 'SI');
		expect(parts.number).toBe('12.3');
		expect(parts.unit).toBe('kg/h');
		expect(parts.label).toBe('kg/h');
		expect(parts.value).toBeCloseTo(12.3, 12);
	});

	it('gives the unit even for a missing value', () => {
		expect(formatQuantityParts(null, 'energy', 'US')).toEqual({
			number: '—',
			unit: 'MMBtu',
			label: 'MMBtu',
			value: null
		});
	});
});
