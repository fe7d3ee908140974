import { describe, expect, it } from 'vitest';
import {
	findingSchema,
	headerInputsSchema,
	insulationInputsSchema,
	leakInputsSchema,
	trapInputsSchema
} from './finding';

const common = {
	id: '3d6f1a9e-2b4c-4e8f-9a1b-7c5d3e2f1a0b',
	surveyId: '8a2b4c6d-1e3f-4a5b-8c7d-9e0f1a2b3c4d',
	headerId: 'c1d2e3f4-a5b6-4c7d-8e9f-0a1b2c3d4e5f',
	location: 'Dryer hall, column B4',
	notes: '',
	photoIds: [],
	status: 'draft',
	reviewed: false,
	version: 1,
	createdAt: '2025-03-04T09:15:00.000Z',
	updatedAt: '2025-03-04T09:15:00.000Z',
	deleted: false
};

const trap = {
	trapType: 'inverted-bucket',
	dn: 15,
	condition: 'failed-open',
	discharge: 'atmosphere'
};

const insulation = {
	item: 'pipe',
	dn: 100,
	length: 12,
	ambientTemperature: 293.15,
	windSpeed: 0,
	layers: [{ thickness: 0.05, material: 'mineral-wool' }],
	jacketEmissivity: 0.1,
	bareEmissivity: 0.9
};

function messages(result: {
	success: boolean;
	error?: { issues: { path: PropertyKey[]; message: string }[] };
}) {
	expect(result.success).toBe(false);
	return result.error!.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('findingSchema', () => {
	it('accepts one finding of each kind', () => {
		const findings = [
			{ ...common, kind: 'trap', assetTag: 'ST-0412', inputs: trap },
			{ ...common, kind: 'leak', inputs: { holeDiameter: 0.003 } },
			{ ...common, kind: 'insulation', inputs: insulation },
			{ ...common, kind: 'header', inputs: { measuredPressure: 1.1, measuredTemperature: 460 } }
		];
		for (const finding of findings) {
			const parsed = findingSchema.parse(finding);
			expect(parsed.kind).toBe(finding.kind);
		}
	});

	it('narrows inputs by kind', () => {
		const parsed = findingSchema.parse({ ...common, kind: 'trap', inputs: trap });
		if (parsed.kind !== 'trap') throw new Error('expected a trap');
		expect(parsed.inputs.condition).toBe('failed-open');
	});

	it('rejects inputs that belong to another kind', () => {
		const result = findingSchema.safeParse({ ...common, kind: 'leak', inputs: trap });
		expect(messages(result)).toContain(
			'inputs.holeDiameter: Give the leak’s equivalent hole diameter or choose a size class'
		);
	});

	it('rejects an unknown kind and an unknown status', () => {
		expect(messages(findingSchema.safeParse({ ...common, kind: 'valve', inputs: {} }))).toContain(
			'kind: Choose what the finding is: a trap test, a leak, an insulation gap or a header reading'
		);
		const status = findingSchema.safeParse({
			...common,
			status: 'fixed',
			kind: 'trap',
			inputs: trap
		});
		expect(messages(status)).toEqual(['status: Choose where this finding stands']);
	});

	it('needs a header except for insulation with its own process temperature', () => {
		const { headerId: _omit, ...noHeader } = common;
		expect(
			messages(findingSchema.safeParse({ ...noHeader, kind: 'trap', inputs: trap }))
		).toContain('headerId: Choose the header this trap is on');
		expect(
			messages(findingSchema.safeParse({ ...noHeader, kind: 'insulation', inputs: insulation }))
		).toContain('headerId: Choose the header this item carries, or give its surface temperature');
		const own = { ...insulation, processTemperature: 453.15 };
		expect(findingSchema.safeParse({ ...noHeader, kind: 'insulation', inputs: own }).success).toBe(
			true
		);
	});

	it('keeps repair cost in whole non-negative minor units', () => {
		const base = { ...common, kind: 'trap', inputs: trap };
		expect(findingSchema.parse({ ...base, repairCost: 45000 }).repairCost).toBe(45000);
		expect(messages(findingSchema.safeParse({ ...base, repairCost: 450.5 }))).toContain(
			'repairCost: Money is stored in whole minor units (e.g. cents): no fractions'
		);
		expect(messages(findingSchema.safeParse({ ...base, repairCost: -1 }))).toContain(
			'repairCost: An amount of money cannot be negative'
		);
	});

	it('checks ids, timestamps and version', () => {
		const base = { ...common, kind: 'trap', inputs: trap };
		expect(messages(findingSchema.safeParse({ ...base, id: '12345' }))).toContain(
			'id: Must be a UUID'
		);
		expect(messages(findingSchema.safeParse({ ...base, createdAt: '4 March 2025' }))).toContain(
			'createdAt: Recorded at must be a date and time'
		);
		expect(
			messages(findingSchema.safeParse({ ...base, updatedAt: '2025-03-03T09:15:00.000Z' }))
		).toContain('updatedAt: A finding cannot be changed before it was recorded');
		expect(
			findingSchema.safeParse({ ...base, updatedAt: '2025-03-04T10:15:00.000+01:00' }).success
		).toBe(true);
		expect(messages(findingSchema.safeParse({ ...base, version: 1.5 }))).toContain(
			'version: Version must be a whole number'
		);
	});
});

describe('trapInputsSchema', () => {
	it('needs a back pressure when the trap discharges to a condensate return', () => {
		const result = trapInputsSchema.safeParse({ ...trap, discharge: 'condensate-return' });
		expect(messages(result)).toContain(
			'backPressure: A trap discharging to a condensate return needs the return’s back pressure'
		);
		const ok = trapInputsSchema.safeParse({
			...trap,
			discharge: 'condensate-return',
			backPressure: 0.2
		});
		expect(ok.success).toBe(true);
	});

	it('rejects negative orifices, non-standard sizes and unknown conditions', () => {
		expect(messages(trapInputsSchema.safeParse({ ...trap, orificeDiameter: -0.004 }))).toContain(
			'orificeDiameter: Orifice diameter must be greater than 0 m'
		);
		expect(messages(trapInputsSchema.safeParse({ ...trap, dn: 17 }))).toEqual([
			'dn: Choose a standard nominal size'
		]);
		expect(messages(trapInputsSchema.safeParse({ ...trap, condition: 'broken' }))).toEqual([
			'condition: Choose the trap’s condition'
		]);
	});

	it('bounds the operating-hours override', () => {
		expect(messages(trapInputsSchema.safeParse({ ...trap, operatingHours: 9000 }))).toContain(
			'operatingHours: Operating hours must be at most 8784 h per year'
		);
	});
});

describe('leakInputsSchema', () => {
	it('accepts a diameter or a size class and refuses neither', () => {
		expect(leakInputsSchema.safeParse({ sizeClass: 'small' }).success).toBe(true);
		expect(leakInputsSchema.safeParse({ holeDiameter: 0.002 }).success).toBe(true);
		expect(messages(leakInputsSchema.safeParse({}))).toContain(
			'holeDiameter: Give the leak’s equivalent hole diameter or choose a size class'
		);
		expect(messages(leakInputsSchema.safeParse({ holeDiameter: 0 }))).toContain(
			'holeDiameter: Hole diameter must be greater than 0 m'
		);
	});
});

describe('insulationInputsSchema', () => {
	it('needs what each item is measured by', () => {
		expect(
			messages(insulationInputsSchema.safeParse({ ...insulation, length: undefined }))
		).toContain('length: A bare pipe needs its length in metres');
		expect(
			messages(
				insulationInputsSchema.safeParse({ ...insulation, item: 'valve', length: undefined })
			)
		).toContain('count: Give the number of bare valves');
		expect(
			messages(
				insulationInputsSchema.safeParse({
					...insulation,
					item: 'flange-pair',
					dn: undefined,
					count: 2
				})
			)
		).toContain('dn: A flange pair needs a nominal size (DN) or an outer diameter');
		expect(
			messages(insulationInputsSchema.safeParse({ ...insulation, item: 'surface' }))
		).toContain('area: A flat surface needs its bare area in m²');
		expect(
			messages(insulationInputsSchema.safeParse({ ...insulation, item: 'surface' }))
		).toContain('height: A flat surface needs its height in metres');
		expect(messages(insulationInputsSchema.safeParse({ ...insulation, dn: 10 }))).toContain(
			'dn: Pipe sizes for insulation start at DN 15 (NPS 1/2); give the outer diameter'
		);
		const tank = {
			...insulation,
			item: 'surface',
			dn: undefined,
			length: undefined,
			area: 12,
			height: 2.5
		};
		expect(insulationInputsSchema.safeParse(tank).success).toBe(true);
	});

	it('accepts a custom conductivity and rejects an unknown material or bad layer', () => {
		const custom = {
			...insulation,
			layers: [{ thickness: 0.04, material: { conductivity: 0.045 } }]
		};
		expect(insulationInputsSchema.safeParse(custom).success).toBe(true);
		const unknown = { ...insulation, layers: [{ thickness: 0.04, material: 'straw' }] };
		expect(messages(insulationInputsSchema.safeParse(unknown))).toContain(
			'layers.0.material: Choose the insulation material, or give its conductivity in W/(m K)'
		);
		const negative = { ...insulation, layers: [{ thickness: -0.01, material: 'mineral-wool' }] };
		expect(messages(insulationInputsSchema.safeParse(negative))).toContain(
			'layers.0.thickness: Layer thickness must be greater than 0 m'
		);
		expect(messages(insulationInputsSchema.safeParse({ ...insulation, layers: [] }))).toContain(
			'layers: Propose at least one insulation layer'
		);
	});

	it('checks emissivities, wind and a process temperature above ambient', () => {
		expect(
			messages(insulationInputsSchema.safeParse({ ...insulation, bareEmissivity: 1.2 }))
		).toContain('bareEmissivity: Bare-surface emissivity must be at most 1');
		expect(messages(insulationInputsSchema.safeParse({ ...insulation, windSpeed: -2 }))).toContain(
			'windSpeed: Wind speed cannot be negative'
		);
		expect(
			messages(insulationInputsSchema.safeParse({ ...insulation, processTemperature: 290 }))
		).toContain('processTemperature: Process temperature must be above the ambient temperature');
	});
});

describe('headerInputsSchema', () => {
	it('stores absolute pressure and an optional temperature', () => {
		expect(headerInputsSchema.parse({ measuredPressure: 0.8 })).toEqual({ measuredPressure: 0.8 });
		expect(messages(headerInputsSchema.safeParse({ measuredPressure: 0 }))).toContain(
			'measuredPressure: Measured pressure must be greater than 0 MPa absolute'
		);
		expect(
			messages(headerInputsSchema.safeParse({ measuredPressure: 1, measuredTemperature: 100 }))
		).toContain(
			'measuredTemperature: Measured temperature must be between 273.16 K (0.01 °C) and 1073.15 K (800 °C)'
		);
	});
});
