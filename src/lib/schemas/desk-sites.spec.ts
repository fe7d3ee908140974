import { describe, expect, it } from 'vitest';
import { costBasisFormSchema, costBasisFormValues } from './desk-cost-basis';
import { headerFormSchema, headerFormValues } from './desk-headers';
import { clientFormSchema, isoCurrencySchema, readNumber, siteFormSchema } from './desk-sites';

const STANDARD = 0.101325; // MPa, the standard atmosphere (ISO 2533)

describe('typed numbers', () => {
	it('reads plain and comma decimals, and says when text is no number', () => {
		expect(readNumber(' 12.5 ')).toBe(12.5);
		expect(readNumber('12,5')).toBe(12.5);
		expect(readNumber('')).toBeUndefined();
		expect(readNumber('1e3')).toBeNaN();
		expect(readNumber('12 bar')).toBeNaN();
	});
});

describe('currency', () => {
	it('takes ISO 4217 codes in any case and refuses made-up ones', () => {
		expect(isoCurrencySchema.parse('eur')).toBe('EUR');
		expect(isoCurrencySchema.safeParse('XYZ').error?.issues[0].message).toContain('ISO 4217');
		expect(isoCurrencySchema.safeParse('EURO').success).toBe(false);
	});
});

describe('client and site forms', () => {
	it('makes blank optional fields null and refuses a bad e-mail', () => {
		expect(clientFormSchema.parse({ name: ' Maltings ', contactEmail: '', notes: '' })).toEqual({
			name: 'Maltings',
			contactEmail: null,
			notes: null
		});
		expect(clientFormSchema.safeParse({ name: 'x', contactEmail: 'nope' }).success).toBe(false);
	});

	it('reads a measured atmosphere in mbar or psia and an elevation in ft', () => {
		const si = siteFormSchema('SI').parse({
			name: 'A',
			atmosphericPressure: '1000',
			unitSystem: 'SI',
			currency: 'EUR'
		});
		// 1000 mbar = 1 bar = 0.1 MPa (NIST SP 811 B.8).
		expect(si.atmosphericPressure).toBeCloseTo(0.1, 12);
		const us = siteFormSchema('US').parse({
			name: 'B',
			elevation: '1000',
			atmosphericPressure: '14.5',
			unitSystem: 'US',
			currency: 'USD'
		});
		// 1 ft = 0.3048 m exactly; 1 psi = 6894.757 Pa (NIST SP 811 B.8).
		expect(us.elevation).toBeCloseTo(304.8, 9);
		expect(us.atmosphericPressure).toBeCloseTo(14.5 * 0.006894757, 6);
		const low = siteFormSchema('SI').safeParse({
			name: 'C',
			atmosphericPressure: '300',
			unitSystem: 'SI',
			currency: 'EUR'
		});
		expect(low.error?.issues[0].message).toBe(
			'Measured atmospheric pressure must be from 500 mbar to 1100 mbar'
		);
	});
});

describe('header form', () => {
	it('stores gauge pressure as absolute and superheat above saturation', () => {
		const h = headerFormSchema('SI', STANDARD).parse({
			name: 'HP',
			pressure: '10',
			steam: 'superheat',
			superheat: '20'
		});
		expect(h.pressure).toBeCloseTo(1.101325, 12);
		// Tsat at 1.101325 MPa is 457.4 K (IAPWS-IF97 region 4, about 184.3 °C).
		expect(h.designTemperature! - 20).toBeCloseTo(457.4, 0);
		expect(h.operatingHours).toBeNull();
	});

	it('refuses a temperature below saturation and names the saturation temperature', () => {
		const r = headerFormSchema('US', STANDARD).safeParse({
			name: 'HP',
			pressure: '150',
			steam: 'temperature',
			temperature: '300'
		});
		// 150 psig ≈ 164.7 psia: saturation about 366 °F (IAPWS-IF97 region 4).
		expect(r.error?.issues[0].path).toEqual(['temperature']);
		expect(r.error?.issues[0].message).toMatch(/saturation temperature, 36[5-7]\.\d °F/);
	});

	it('gives back what it stored, in the person’s units', () => {
		const stored = {
			name: 'LP',
			pressure: 0.401325,
			designTemperature: null,
			operatingHours: 4000
		};
		expect(headerFormValues(stored, 'SI', STANDARD)).toMatchObject({
			pressure: '3',
			steam: 'saturated',
			operatingHours: '4000'
		});
	});
});

describe('cost basis form', () => {
	const form = {
		fuel: { kind: 'natural-gas', price: '4.10', unit: 'MMBtu' },
		currency: 'USD',
		boilerEfficiency: '81',
		feedwaterTemperature: '221',
		condensateReturnFraction: '70',
		makeupWaterPrice: '5.30',
		waterTreatmentPrice: '3.60',
		operatingHours: '8400'
	};

	it('turns percentages, °F and per-1000-gallon prices into the stored basis', () => {
		const { basis } = costBasisFormSchema('US').parse(form);
		expect(basis.boilerEfficiency).toBeCloseTo(0.81, 12);
		// 221 °F = 105 °C = 378.15 K.
		expect(basis.feedwaterTemperature).toBeCloseTo(378.15, 9);
		// 1000 US gal = 3.785411784 m³ (NIST SP 811 B.8): 5.30 per 1000 gal = 1.400112 per m³.
		expect(basis.makeupWaterPrice).toBe('1.400112');
		expect(costBasisFormValues(basis, 'US')).toMatchObject({
			boilerEfficiency: '81',
			feedwaterTemperature: '221',
			makeupWaterPrice: '5.3'
		});
	});

	it('refuses 150 % and a unit that makes no sense for the fuel, under their field names', () => {
		const r = costBasisFormSchema('SI').safeParse({ ...form, boilerEfficiency: '150' });
		expect(r.error?.issues.map((i) => i.path.join('.'))).toEqual(['boilerEfficiency']);
		const coalByLitre = costBasisFormSchema('SI').safeParse({
			...form,
			fuel: { kind: 'coal', price: '1', unit: 'L' }
		});
		expect(coalByLitre.error?.issues.map((i) => i.path.join('.'))).toContain('fuel.unit');
	});
});
