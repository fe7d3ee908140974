import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import {
	headerInputsSchema,
	insulationInputsSchema,
	leakInputsSchema,
	trapInputsSchema
} from './finding-inputs';
import { INPUT_LIMITS, limitedNumber } from './ranges';

const trap = { trapType: 'thermodynamic', dn: 15, condition: 'working', discharge: 'atmosphere' };
const pipe = {
	item: 'pipe',
	dn: 50,
	length: 5,
	ambientTemperature: 293.15,
	windSpeed: 0,
	layers: [{ thickness: 0.03, material: 'mineral-wool' }],
	jacketEmissivity: 0.1,
	bareEmissivity: 0.9
};

/** The schema and a valid object for each kind of INPUT_LIMITS, to probe a field's bounds. */
const cases = {
	trap: { schema: trapInputsSchema, valid: trap },
	leak: { schema: leakInputsSchema, valid: { sizeClass: 'small' } },
	insulation: { schema: insulationInputsSchema, valid: pipe },
	header: { schema: headerInputsSchema, valid: { measuredPressure: 1 } }
} as const;

describe('INPUT_LIMITS', () => {
	for (const [kind, { schema, valid }] of Object.entries(cases)) {
		const limits = INPUT_LIMITS[kind as keyof typeof cases];
		for (const [field, limit] of Object.entries(limits)) {
			it(`${kind}.${field}: the schema takes its bounds from the table`, () => {
				const parse = (value: number) =>
					(schema as z.ZodType).safeParse({ ...valid, [field]: value }).success;
				// Process temperature must also stay above ambient: probe it with a cold ambient.
				expect(parse(limit.max)).toBe(true);
				expect(parse(limit.max * 1.001 + 1e-9)).toBe(false);
				if (!('exclusiveMin' in limit)) {
					if (field !== 'processTemperature') expect(parse(limit.min)).toBe(true);
				} else expect(parse(limit.min)).toBe(false);
				expect(parse(limit.min - Math.max(1e-6, Math.abs(limit.min) * 0.001))).toBe(false);
			});
		}
	}

	it('holds the layer thickness and custom conductivity too', () => {
		const layer = (thickness: number, conductivity: number) =>
			insulationInputsSchema.safeParse({
				...pipe,
				layers: [{ thickness, material: { conductivity } }]
			}).success;
		const { thickness, conductivity } = INPUT_LIMITS.layer;
		expect(layer(thickness.max, conductivity.max)).toBe(true);
		expect(layer(thickness.max + 0.001, 0.04)).toBe(false);
		expect(layer(0.05, conductivity.max + 0.01)).toBe(false);
		expect(layer(0.05, conductivity.min)).toBe(false);
	});

	it('keeps every bound in base units', () => {
		expect(INPUT_LIMITS.trap.orificeDiameter).toMatchObject({ min: 0, max: 0.05, unit: 'm' });
		expect(INPUT_LIMITS.header.measuredPressure.quantity).toBe('pressure');
		expect(INPUT_LIMITS.insulation.ambientTemperature).toMatchObject({ min: 223.15, unit: 'K' });
	});
});

describe('limitedNumber', () => {
	const count = limitedNumber('Count', {
		min: 1,
		max: 10,
		integer: true,
		quantity: null,
		unit: ''
	});

	it('words each refusal plainly', () => {
		const issue = (value: unknown) => count.safeParse(value).error?.issues[0].message;
		expect(issue(2.5)).toBe('Count must be a whole number');
		expect(issue(0)).toBe('Count must be at least 1');
		expect(issue(11)).toBe('Count must be at most 10');
		expect(issue('three')).toBe('Count must be a whole number');
		expect(count.safeParse(10).success).toBe(true);
	});
});

describe('enum messages', () => {
	it('ask a person to choose rather than list stored ids', () => {
		const wrong = { trapType: 'x', dn: 17, condition: 'x', discharge: 'x', testMethod: 'x' };
		const all = [
			...trapInputsSchema.safeParse(wrong).error!.issues,
			...leakInputsSchema.safeParse({ sizeClass: 'x', component: 'x' }).error!.issues,
			...insulationInputsSchema.safeParse({ ...pipe, item: 'x', surfaceState: 'x' }).error!.issues
		].map((i) => i.message);
		expect(all.length).toBeGreaterThanOrEqual(9);
		for (const message of all) {
			expect(message).toMatch(/^Choose /);
			expect(message).not.toMatch(/one of|failed-open|inverted-bucket|valve-stem/);
		}
	});
});
