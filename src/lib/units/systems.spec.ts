import { describe, expect, it } from 'vitest';
import { isUnitOf, QUANTITIES, unitsOf, type Unit } from './quantities';
import {
	displayUnit,
	isUnitSystemId,
	UNIT_SYSTEMS,
	unitLabel,
	unitName,
	unitSystems
} from './systems';

describe('unit systems', () => {
	it('give every quantity a display unit of that quantity, in both systems', () => {
		expect(UNIT_SYSTEMS).toEqual(['SI', 'US']);
		for (const system of UNIT_SYSTEMS) {
			for (const quantity of QUANTITIES) {
				expect(isUnitOf(quantity, displayUnit(quantity, system))).toBe(true);
			}
			expect(Object.keys(unitSystems[system]).sort()).toEqual([...QUANTITIES].sort());
		}
	});

	// The display units each system shows (docs/walk.md: bar g, °C, mm / psig, °F, in).
	it('SI shows bar g, °C, kg/h, kW, GJ, kJ/kg, mm, m, m³ and kg', () => {
		const labels = QUANTITIES.map((q) => unitLabel(displayUnit(q, 'SI')));
		for (const label of ['bar g', '°C', 'kg/h', 'kW', 'GJ', 'kJ/kg', 'mm', 'm', 'm³', 'kg']) {
			expect(labels).toContain(label);
		}
		expect(displayUnit('pressure', 'SI')).toBe('bar_g');
		expect(displayUnit('shortLength', 'SI')).toBe('mm');
		expect(displayUnit('length', 'SI')).toBe('m');
	});

	it('US shows psig, °F, lb/h, Btu/h, MMBtu, Btu/lb, in, ft, US gal and lb', () => {
		const labels = QUANTITIES.map((q) => unitLabel(displayUnit(q, 'US')));
		for (const label of [
			'psig',
			'°F',
			'lb/h',
			'Btu/h',
			'MMBtu',
			'Btu/lb',
			'in',
			'ft',
			'US gal',
			'lb'
		]) {
			expect(labels).toContain(label);
		}
		expect(displayUnit('shortLength', 'US')).toBe('in');
		expect(displayUnit('length', 'US')).toBe('ft');
	});

	it('rejects an unknown system', () => {
		expect(isUnitSystemId('SI')).toBe(true);
		expect(isUnitSystemId('metric')).toBe(false);
		expect(() => displayUnit('pressure', 'metric' as never)).toThrow(
			'Unknown unit system "metric"'
		);
	});
});

describe('labels and names', () => {
	it('every unit has a label and a name, labels distinct within a quantity', () => {
		for (const quantity of QUANTITIES) {
			const labels = unitsOf(quantity).map((u) => unitLabel(u as Unit));
			expect(new Set(labels).size).toBe(labels.length);
			for (const unit of unitsOf(quantity)) {
				expect(unitLabel(unit as Unit).length).toBeGreaterThan(0);
				expect(unitName(unit as Unit).length).toBeGreaterThan(unitLabel(unit as Unit).length - 1);
			}
		}
	});

	it('labels read as people write them', () => {
		expect(unitLabel('bar_g')).toBe('bar g');
		expect(unitLabel('bar_a')).toBe('bar a');
		expect(unitLabel('MPa')).toBe('MPa a');
		expect(unitLabel('degC')).toBe('°C');
		expect(unitLabel('degF')).toBe('°F');
		expect(unitLabel('m3')).toBe('m³');
		expect(unitLabel('gal_US')).toBe('US gal');
		expect(unitLabel('kJ/(kg K)')).toBe('kJ/(kg·K)');
		expect(unitLabel('Btu/(lb degF)')).toBe('Btu/(lb·°F)');
		expect(unitName('psig')).toBe('pounds per square inch (gauge)');
	});

	it('rejects an unknown unit', () => {
		expect(() => unitLabel('furlong' as never)).toThrow('Unknown unit "furlong"');
	});
});
