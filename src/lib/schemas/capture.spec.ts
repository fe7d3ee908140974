import { describe, expect, it } from 'vitest';
import { lossSite, mainsHeader } from '../../../tests/fixtures/loss-site';
import { evaluateFinding } from '../steam/losses/evaluate';
import { findingCaptureSchema } from './capture';
import { findingSchema } from './finding';

const header = 'c1d2e3f4-a5b6-4c7d-8e9f-0a1b2c3d4e5f';
const base = {
	id: '3d6f1a9e-2b4c-4e8f-9a1b-7c5d3e2f1a0b',
	surveyId: '8a2b4c6d-1e3f-4a5b-8c7d-9e0f1a2b3c4d',
	headerId: header,
	areaId: '0b1c2d3e-4f5a-4b6c-8d7e-9f0a1b2c3d4e',
	location: 'Boiler house, feed pump side',
	notes: '',
	photoIds: ['9e8d7c6b-5a4f-4e3d-8c2b-1a0f9e8d7c6b'],
	createdAt: '2026-11-30T08:00:00Z',
	updatedAt: '2026-11-30T08:05:00Z'
};

const captures = {
	trap: {
		...base,
		kind: 'trap',
		assetTag: 'ST-B1-07',
		inputs: {
			trapType: 'float-thermostatic',
			dn: 25,
			condition: 'leaking',
			discharge: 'condensate-return',
			backPressure: 0.2,
			testMethod: 'combined',
			inletTemperature: 440,
			outletTemperature: 385
		}
	},
	leak: { ...base, kind: 'leak', inputs: { sizeClass: 'small', component: 'valve-stem' } },
	insulation: {
		...base,
		kind: 'insulation',
		inputs: {
			item: 'valve',
			dn: 80,
			count: 2,
			ambientTemperature: 288.15,
			windSpeed: 1.5,
			layers: [{ thickness: 0.05, material: 'calcium-silicate' }],
			jacketEmissivity: 0.1,
			bareEmissivity: 0.8,
			surfaceState: 'wet'
		}
	},
	header: { ...base, kind: 'header', inputs: { measuredPressure: 0.95, measuredTemperature: 451 } }
} as const;

function messages(result: {
	success: boolean;
	error?: { issues: { path: PropertyKey[]; message: string }[] };
}) {
	expect(result.success).toBe(false);
	return result.error!.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('findingCaptureSchema', () => {
	it('accepts a valid capture of each kind, new field readings included', () => {
		for (const capture of Object.values(captures)) {
			expect(findingCaptureSchema.parse(capture)).toEqual(capture);
		}
	});

	it('refuses a capture carrying a status, a repair cost or a review flag', () => {
		for (const extra of [{ status: 'draft' }, { repairCost: 45_000 }, { reviewed: true }]) {
			const result = findingCaptureSchema.safeParse({ ...captures.trap, ...extra });
			const key = Object.keys(extra)[0];
			expect(result.success, key).toBe(false);
			expect(result.error!.issues.some((i) => i.code === 'unrecognized_keys')).toBe(true);
		}
	});

	it('refuses an unknown leak component and surface state in plain words', () => {
		const leak = { ...captures.leak, inputs: { sizeClass: 'small', component: 'gasket' } };
		expect(messages(findingCaptureSchema.safeParse(leak))).toEqual([
			'inputs.component: Choose where the leak is'
		]);
		const wet = {
			...captures.insulation,
			inputs: { ...captures.insulation.inputs, surfaceState: 'soggy' }
		};
		expect(messages(findingCaptureSchema.safeParse(wet))).toEqual([
			'inputs.surfaceState: Choose what the surface is like today'
		]);
	});

	it('bounds the trap’s temperature readings', () => {
		const cold = { ...captures.trap, inputs: { ...captures.trap.inputs, inletTemperature: 200 } };
		expect(messages(findingCaptureSchema.safeParse(cold))).toEqual([
			'inputs.inletTemperature: Inlet temperature must be between 233.15 K (−40 °C) and 1073.15 K (800 °C)'
		]);
	});
});

describe('a capture and a stored finding', () => {
	it('both go straight into the engine’s evaluateFinding', () => {
		const capture = findingCaptureSchema.parse({ ...captures.leak, headerId: mainsHeader.id });
		const stored = findingSchema.parse({
			...capture,
			status: 'reviewed',
			repairCost: 20_000,
			reviewed: true,
			version: 3,
			deleted: false
		});
		const fromCapture = evaluateFinding(capture, lossSite);
		const fromStored = evaluateFinding(stored, lossSite);
		expect(fromCapture.steamLoss).toBeGreaterThan(0);
		expect(fromStored.cost).toEqual(fromCapture.cost);
		expect(fromCapture.repairCost).toBeNull();
		expect(fromStored.repairCost?.minor).toBe(20_000);
	});
});

describe('findingSchema (stored)', () => {
	const stored = {
		...captures.trap,
		photoIds: [],
		status: 'published',
		repairCost: 48_000,
		reviewed: true,
		version: 1,
		deleted: false
	};

	it('accepts a seed-like stored finding: the capture plus review, version and deleted', () => {
		const parsed = findingSchema.parse(stored);
		expect(parsed.status).toBe('published');
		expect(parsed.repairCost).toBe(48_000);
		expect(parsed.reviewed).toBe(true);
	});

	it('shares the capture’s rules (header needed, no change before recording)', () => {
		const { headerId: _omit, ...noHeader } = stored;
		expect(messages(findingSchema.safeParse(noHeader))).toContain(
			'headerId: Choose the header this trap is on'
		);
		expect(
			messages(findingSchema.safeParse({ ...stored, updatedAt: '2026-11-29T08:00:00Z' }))
		).toContain('updatedAt: A finding cannot be changed before it was recorded');
	});

	it('needs the review fields and the server’s version', () => {
		const { reviewed: _r, version: _v, ...bare } = stored;
		const issues = messages(findingSchema.safeParse(bare));
		expect(issues).toContain('reviewed: Reviewed must be yes or no');
		expect(issues).toContain('version: Version must be a whole number');
	});
});
