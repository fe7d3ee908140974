import { describe, expect, it } from 'vitest';
import { costBasisSchema, headerListSchema, headerSchema, siteBasisSchema } from './site';

const validBasis = {
	fuel: { kind: 'natural-gas', price: '8.50', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.82,
	feedwaterTemperature: 378.15,
	condensateReturnFraction: 0.6,
	makeupWaterPrice: '1.85',
	waterTreatmentPrice: '0.75',
	operatingHours: 8000
};

/** All messages of a failed parse, keyed by path, so a test names the one it expects. */
function messages(result: {
	success: boolean;
	error?: { issues: { path: PropertyKey[]; message: string }[] };
}) {
	expect(result.success).toBe(false);
	return result.error!.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('costBasisSchema', () => {
	it('accepts a complete natural-gas basis and keeps prices as strings', () => {
		const parsed = costBasisSchema.parse(validBasis);
		expect(parsed.fuel.price).toBe('8.50');
		expect(parsed.makeupWaterPrice).toBe('1.85');
	});

	it('accepts fuels priced per quantity where the unit suits the fuel', () => {
		for (const fuel of [
			{ kind: 'natural-gas', price: '0.35', unit: 'm3' },
			{ kind: 'fuel-oil-2', price: '3.10', unit: 'US-gal' },
			{ kind: 'lpg', price: '0.9', unit: 'L' },
			{ kind: 'coal', price: '120', unit: 't', energyContent: 25.8 },
			{ kind: 'biomass', price: '55.5', unit: 'short-ton', energyContent: 15.3 },
			{ kind: 'coal', price: '4.1', unit: 'MMBtu' },
			{ kind: 'natural-gas', price: '1.2', unit: 'therm' }
		]) {
			expect(costBasisSchema.safeParse({ ...validBasis, fuel }).success).toBe(true);
		}
	});

	it('rejects a price unit that does not suit the fuel, naming the allowed ones', () => {
		const result = costBasisSchema.safeParse({
			...validBasis,
			fuel: { kind: 'coal', price: '3', unit: 'L' }
		});
		expect(messages(result)).toContain(
			'fuel.unit: Coal (bituminous) cannot be priced per litre: choose GJ, MMBtu, therm, kWh, MWh, kg, tonne or short ton'
		);
	});

	it('rejects electricity priced per cubic metre', () => {
		const result = costBasisSchema.safeParse({
			...validBasis,
			fuel: { kind: 'electricity', price: '0.12', unit: 'm3' },
			emissionFactor: 60
		});
		expect(messages(result)[0]).toMatch(
			/^fuel.unit: Electricity cannot be priced per m³: choose GJ, MMBtu, therm, kWh or MWh$/
		);
	});

	it('rejects float, negative and over-precise prices with a plain message', () => {
		for (const price of ['-1', '1e3', '1,50', '', '0.1234567', 'abc']) {
			const result = costBasisSchema.safeParse({ ...validBasis, makeupWaterPrice: price });
			expect(messages(result)).toContain(
				'makeupWaterPrice: Enter a price as a plain number with up to 6 decimals, e.g. 12.50 (no sign, no commas)'
			);
		}
		const asNumber = costBasisSchema.safeParse({
			...validBasis,
			fuel: { ...validBasis.fuel, price: 8.5 }
		});
		expect(messages(asNumber)).toContain('fuel.price: Enter a price as a number, e.g. 12.50');
	});

	it('requires a heating value for a custom fuel priced per quantity', () => {
		const base = { ...validBasis, emissionFactor: 70 };
		const without = costBasisSchema.safeParse({
			...base,
			fuel: { kind: 'custom', price: '40', unit: 'kg' }
		});
		expect(messages(without)).toContain(
			'fuel.energyContent: There is no standard energy content for custom fuel per kg: enter it in GJ per kg'
		);
		const withContent = costBasisSchema.safeParse({
			...base,
			fuel: { kind: 'custom', price: '40', unit: 'kg', energyContent: 0.03 }
		});
		expect(withContent.success).toBe(true);
	});

	it('requires an energy content for coal per tonne, where rank and moisture vary too much', () => {
		const coal = costBasisSchema.safeParse({
			...validBasis,
			fuel: { kind: 'coal', price: '120', unit: 't' }
		});
		expect(messages(coal)).toContain(
			'fuel.energyContent: There is no standard energy content for coal (bituminous) per tonne: enter it in GJ per tonne'
		);
	});

	it('requires an emission factor for electricity and custom fuels only', () => {
		const electricity = costBasisSchema.safeParse({
			...validBasis,
			fuel: { kind: 'electricity', price: '0.12', unit: 'kWh' }
		});
		expect(messages(electricity)).toContain(
			'emissionFactor: Enter an emission factor for electricity (your grid or supplier factor), in kg CO2 per GJ'
		);
		expect(costBasisSchema.safeParse(validBasis).success).toBe(true);
	});

	it('keeps boiler efficiency in (0, 1] with messages that show how to enter 80 %', () => {
		expect(messages(costBasisSchema.safeParse({ ...validBasis, boilerEfficiency: 0 }))).toContain(
			'boilerEfficiency: Boiler efficiency must be greater than 0 (e.g. 0.8 for 80 %)'
		);
		expect(messages(costBasisSchema.safeParse({ ...validBasis, boilerEfficiency: 80 }))).toContain(
			'boilerEfficiency: Boiler efficiency cannot exceed 1 (100 %); enter 0.8 for 80 %'
		);
		expect(costBasisSchema.safeParse({ ...validBasis, boilerEfficiency: 1 }).success).toBe(true);
	});

	it('bounds operating hours by a leap year and refuses zero', () => {
		expect(messages(costBasisSchema.safeParse({ ...validBasis, operatingHours: 8785 }))).toContain(
			'operatingHours: Operating hours cannot exceed 8784 h per year (a leap year)'
		);
		expect(messages(costBasisSchema.safeParse({ ...validBasis, operatingHours: 0 }))).toContain(
			'operatingHours: Operating hours must be greater than 0 h per year'
		);
		expect(costBasisSchema.safeParse({ ...validBasis, operatingHours: 8784 }).success).toBe(true);
	});

	it('checks fractions, temperatures, currency and non-finite numbers', () => {
		expect(
			messages(costBasisSchema.safeParse({ ...validBasis, condensateReturnFraction: 1.2 }))
		).toContain('condensateReturnFraction: Condensate return fraction must be between 0 and 1');
		expect(
			messages(costBasisSchema.safeParse({ ...validBasis, feedwaterTemperature: 105 }))
		).toContain(
			'feedwaterTemperature: Feedwater temperature must be between 273.15 K (0 °C) and 523.15 K (250 °C)'
		);
		expect(messages(costBasisSchema.safeParse({ ...validBasis, currency: 'euro' }))).toContain(
			'currency: Currency must be a three-letter ISO 4217 code, e.g. USD or EUR'
		);
		expect(costBasisSchema.safeParse({ ...validBasis, boilerEfficiency: NaN }).success).toBe(false);
		expect(costBasisSchema.safeParse({ ...validBasis, operatingHours: Infinity }).success).toBe(
			false
		);
	});

	it('accepts atmospheric pressure or elevation and bounds them', () => {
		expect(costBasisSchema.safeParse({ ...validBasis, atmosphericPressure: 0.0985 }).success).toBe(
			true
		);
		expect(costBasisSchema.safeParse({ ...validBasis, elevation: 1600 }).success).toBe(true);
		expect(
			messages(costBasisSchema.safeParse({ ...validBasis, atmosphericPressure: 101.325 }))
		).toContain('atmosphericPressure: Atmospheric pressure must be at most 0.11 MPa (1100 mbar)');
	});

	it('accepts trap factor overrides and NPV settings within range', () => {
		const parsed = costBasisSchema.parse({
			...validBasis,
			trapFactors: { failedOpen: 0.5, leaking: 0.2 },
			discountRate: 0.08,
			lifeYears: 5
		});
		expect(parsed.trapFactors).toEqual({ failedOpen: 0.5, leaking: 0.2 });
		expect(
			messages(costBasisSchema.safeParse({ ...validBasis, trapFactors: { leaking: 2 } }))
		).toContain('trapFactors.leaking: Leaking-trap fraction must be between 0 and 1');
		expect(messages(costBasisSchema.safeParse({ ...validBasis, lifeYears: 2.5 }))).toContain(
			'lifeYears: Life must be a whole number of years'
		);
	});
});

describe('headerSchema and headerListSchema', () => {
	const header = {
		id: '0b7c4c6e-3f0e-4c43-9d0a-2f1c5f3b7a11',
		name: 'HP 10 bar',
		pressure: 1.101325
	};

	it('accepts a saturated header and a superheated one', () => {
		expect(headerSchema.parse(header)).toEqual(header);
		expect(headerSchema.safeParse({ ...header, designTemperature: 573.15 }).success).toBe(true);
	});

	it('rejects a bad id, an empty name and a pressure above critical', () => {
		expect(messages(headerSchema.safeParse({ ...header, id: 'hp-1' }))).toContain(
			'id: Must be a UUID'
		);
		expect(messages(headerSchema.safeParse({ ...header, name: '  ' }))).toContain(
			'name: Give the header a name'
		);
		expect(messages(headerSchema.safeParse({ ...header, pressure: 25 }))).toContain(
			'pressure: Header pressure must be at most 22 MPa absolute'
		);
		expect(messages(headerSchema.safeParse({ ...header, pressure: -0.1 }))).toContain(
			'pressure: Header pressure must be greater than 0 MPa absolute'
		);
	});

	it('rejects a list with a repeated id or name', () => {
		const second = { ...header, id: '5f1d2a34-8b6e-4e0f-a2c1-9d8e7f6a5b4c', name: 'hp 10 BAR' };
		expect(messages(headerListSchema.safeParse([header, second]))).toContain(
			'1.name: Another header is already called “hp 10 BAR”'
		);
		expect(messages(headerListSchema.safeParse([header, { ...header, name: 'LP' }]))).toContain(
			'1.id: Two headers share one id'
		);
	});

	it('validates a whole site basis', () => {
		expect(siteBasisSchema.safeParse({ costBasis: validBasis, headers: [header] }).success).toBe(
			true
		);
		expect(siteBasisSchema.safeParse({ headers: [header] }).success).toBe(false);
	});
});
