/**
 * Conversion factors checked against NIST Special Publication 811 (2008 edition), Guide for
 * the Use of the International System of Units (SI), Appendix B.8, "Factors for units listed
 * alphabetically". Each check names the B.8 entry and the factor as printed there: seven
 * significant digits, rounded, unless the table marks it exact (bold), in which case it is
 * checked to floating-point precision. Our factors are built from exact definitions
 * (src/lib/units/constants.ts), so each must round to the printed digits.
 */
import { describe, expect, it } from 'vitest';
import { convert, STANDARD_ATMOSPHERE_MPA, toBase, unitConstants } from '../../src/lib/units/index';

/** The printed factor's own precision: |actual − printed| ≤ half a unit in its last digit. */
function expectPrinted(actual: number, printed: string) {
	const [mantissa, exponent = '0'] = printed.toUpperCase().split('E');
	const decimals = (mantissa.split('.')[1] ?? '').length;
	const halfLastDigit = 0.5 * 10 ** (Number(exponent) - decimals);
	expect(Math.abs(actual - Number(printed))).toBeLessThanOrEqual(halfLastDigit * (1 + 1e-9));
}

/** An exact factor: equal to floating-point precision. */
function expectExact(actual: number, exact: number) {
	expect(Math.abs(actual - exact)).toBeLessThanOrEqual(4 * Number.EPSILON * Math.abs(exact));
}

describe('pressure (NIST SP 811 B.8)', () => {
	it('atmosphere, standard (atm) = 1.013 25 E+05 Pa, exact', () => {
		expectExact(STANDARD_ATMOSPHERE_MPA * 1e6, 101_325);
		expectExact(toBase('pressure', 0, 'kPa_g') * 1e6, 101_325);
	});
	it('bar = 1.0 E+05 Pa, exact', () => {
		expectExact(toBase('pressure', 1, 'bar_a') * 1e6, 1e5);
	});
	it('pound-force per square inch (psi) = 6.894 757 E+03 Pa', () => {
		expectPrinted(toBase('pressure', 1, 'psia') * 1e6, '6.894757E+03');
		expectPrinted(convert(1, 'psia', 'kPa_a'), '6.894757E+00'); // psi → kPa, same entry
	});
	it('pound-force (lbf) = 4.448 222 E+00 N', () => {
		expectPrinted(unitConstants.LBF_N, '4.448222E+00');
	});
});

describe('temperature (NIST SP 811 B.8, degree Celsius and degree Fahrenheit entries)', () => {
	it('T/K = t/°C + 273.15', () => {
		expectExact(toBase('temperature', 20, 'degC'), 293.15);
	});
	it('T/K = (t/°F + 459.67)/1.8 and t/°C = (t/°F − 32)/1.8', () => {
		expectExact(toBase('temperature', 68, 'degF'), (68 + 459.67) / 1.8);
		expect(convert(68, 'degF', 'degC')).toBeCloseTo((68 - 32) / 1.8, 12);
	});
	it('degree Fahrenheit (temperature interval) = 5.555 556 E-01 K', () => {
		expectPrinted(toBase('temperatureDifference', 1, 'delta_degF'), '5.555556E-01');
	});
});

describe('mass and mass flow (NIST SP 811 B.8)', () => {
	it('pound (avoirdupois) = 4.535 924 E-01 kg (exactly 0.453 592 37 kg, footnote)', () => {
		expectPrinted(toBase('mass', 1, 'lb'), '4.535924E-01');
		expectExact(toBase('mass', 1, 'lb'), 0.45359237);
	});
	it('ton, metric (t) = 1.0 E+03 kg, exact', () => {
		expectExact(toBase('mass', 1, 't'), 1000);
	});
	it('pound per hour (lb/h) = 1.259 979 E-04 kg/s', () => {
		expectPrinted(toBase('massFlow', 1, 'lb/h'), '1.259979E-04');
	});
});

describe('energy, power and heat (NIST SP 811 B.8)', () => {
	it('British thermal unit_IT (Btu_IT) = 1.055 056 E+03 J', () => {
		expectPrinted(toBase('energy', 1, 'Btu'), '1.055056E+03');
	});
	it('calorie_IT (cal_IT) = 4.1868 E+00 J, exact', () => {
		expectExact(unitConstants.CAL_IT_J, 4.1868);
	});
	it('British thermal unit_IT per pound (Btu_IT/lb) = 2.326 E+03 J/kg, exact', () => {
		expectExact(toBase('specificEnthalpy', 1, 'Btu/lb') * 1000, 2326);
	});
	it('British thermal unit_IT per pound degree Fahrenheit = 4.1868 E+03 J/(kg·K), exact', () => {
		expectExact(toBase('specificEntropy', 1, 'Btu/(lb degF)') * 1000, 4186.8);
	});
	it('British thermal unit_IT per hour (Btu_IT/h) = 2.930 711 E-01 W', () => {
		expectPrinted(toBase('power', 1, 'Btu/h'), '2.930711E-01');
	});
	it('ton of refrigeration (12 000 Btu_IT/h) = 3.516 853 E+03 W', () => {
		expectPrinted(toBase('power', 12_000, 'Btu/h'), '3.516853E+03');
	});
	it('therm (EC) = 1.055 06 E+08 J', () => {
		expectPrinted(toBase('energy', 1, 'therm'), '1.05506E+08');
	});
	it('our therm (100 000 Btu_IT) is not the therm (U.S.) = 1.054 804 E+08 J', () => {
		const relative = toBase('energy', 1, 'therm') / 1.054804e8 - 1;
		expect(relative).toBeGreaterThan(2.3e-4);
		expect(relative).toBeLessThan(2.5e-4);
	});
	it('quad (10^15 Btu_IT) = 1.055 056 E+18 J, through the MMBtu', () => {
		expectPrinted(toBase('energy', 1e9, 'MMBtu'), '1.055056E+18');
	});
	it('kilowatt hour (kW·h) = 3.6 E+06 J, exact', () => {
		expectExact(toBase('energy', 1, 'kWh'), 3.6e6);
		expectExact(toBase('energy', 1, 'MWh'), 3.6e9);
	});
});

describe('length and volume (NIST SP 811 B.8)', () => {
	it('inch (in) = 2.54 E-02 m, exact', () => {
		expectExact(toBase('length', 1, 'in'), 0.0254);
	});
	it('foot (ft) = 3.048 E-01 m, exact', () => {
		expectExact(toBase('length', 1, 'ft'), 0.3048);
	});
	it('gallon (U.S.) (gal) = 3.785 412 E-03 m³', () => {
		expectPrinted(toBase('volume', 1, 'gal_US'), '3.785412E-03');
		expectPrinted(convert(1, 'gal_US', 'L'), '3.785412E+00'); // gallon → liter, same entry
	});
	it('liter (L) = 1.0 E-03 m³, exact', () => {
		expectExact(toBase('volume', 1, 'L'), 1e-3);
	});
});
