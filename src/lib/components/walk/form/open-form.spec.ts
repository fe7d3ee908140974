import { describe, expect, it } from 'vitest';
import type { AssetSnapshot } from '$lib/schemas/snapshot';
import { lastResultText } from './defaults';
import { openForm } from './open-form';
import { AREA_ID, formContext, HEADER_ID, LOW_HEADER_ID } from './spec-fixtures';
import { toCapture } from './to-capture';

const asset: AssetSnapshot = {
	id: '1b2c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
	siteId: '2b2c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
	kind: 'trap',
	tag: 'ST-104',
	location: 'Dryer 3 inlet',
	areaId: AREA_ID,
	headerId: LOW_HEADER_ID,
	details: { trapType: 'inverted-bucket', dn: 20, orificeDiameter: 0.004, discharge: 'atmosphere' },
	lastResult: {
		surveyId: '3b2c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
		surveyName: 'Spring round',
		findingId: '4b2c3d4e-5f60-4a7b-8c9d-0e1f2a3b4c5d',
		testedAt: '2026-04-14T10:00:00.000Z',
		condition: 'failed-open'
	}
};
const base = {
	kind: 'trap' as const,
	findings: [],
	assets: [asset],
	drafts: [],
	ctx: formContext('SI'),
	now: '2026-11-02T08:00:00.000Z',
	newId: () => 'new-id'
};

describe('openForm', () => {
	it('a known tag fills in the asset’s details and shows its last result', () => {
		const opened = openForm({ ...base, tag: 'st-104' });
		expect(opened.findingId).toBe('new-id');
		expect(opened.values).toMatchObject({
			tag: 'ST-104',
			trapType: 'inverted-bucket',
			size: '20',
			orifice: '4',
			headerId: LOW_HEADER_ID,
			areaId: AREA_ID,
			location: 'Dryer 3 inlet',
			createdAt: base.now
		});
		expect(lastResultText(asset)).toBe('Last tested 14 Apr 2026: failed open');
	});

	it('carries header, area and test method from the previous trap on the survey', () => {
		const ctx = formContext('SI');
		const previous = toCapture(
			'trap',
			{
				trapType: 'thermodynamic',
				size: '15',
				headerId: HEADER_ID,
				areaId: AREA_ID,
				discharge: 'atmosphere',
				testMethod: 'ultrasound',
				condition: 'working'
			},
			ctx
		);
		if (!('capture' in previous)) throw new Error('capture');
		const opened = openForm({
			...base,
			findings: [{ id: ctx.id, kind: 'trap', capture: previous.capture }]
		});
		expect(opened.values).toMatchObject({
			headerId: HEADER_ID,
			areaId: AREA_ID,
			testMethod: 'ultrasound'
		});
		expect(opened.values.condition).toBeUndefined();
	});

	it('a draft left on the device wins, with its own finding id', () => {
		const draft = {
			findingId: 'draft-id',
			kind: 'trap' as const,
			values: { tag: 'ST-9', notes: 'half' }
		};
		const opened = openForm({ ...base, drafts: [draft] });
		expect(opened).toEqual({ findingId: 'draft-id', values: draft.values, restored: true });
		// A draft for another tag is not this form's.
		expect(openForm({ ...base, drafts: [draft], tag: 'ST-104' }).restored).toBe(false);
	});

	it('an existing finding opens as recorded unless a draft of it is waiting', () => {
		const ctx = formContext('SI');
		const built = toCapture('header', { headerId: HEADER_ID, pressure: '9' }, ctx);
		if (!('capture' in built)) throw new Error('capture');
		const findings = [{ id: ctx.id, kind: 'header' as const, capture: built.capture }];
		const opened = openForm({ ...base, kind: 'header', findingId: ctx.id, findings });
		expect(opened.values).toMatchObject({ pressure: '9', createdAt: ctx.createdAt });
		const draft = { findingId: ctx.id, kind: 'header' as const, values: { pressure: '9,4' } };
		expect(
			openForm({ ...base, kind: 'header', findingId: ctx.id, findings, drafts: [draft] }).values
		).toEqual({
			pressure: '9,4'
		});
	});
});

describe('cold inlet hint', () => {
	it('shows when the inlet reads well below saturation at the header', async () => {
		const { coldInletHint } = await import('./hints');
		const ctx = formContext('SI');
		// 10 bar g at 0.095 MPa: saturation 184 °C (IAPWS-IF97 region 4)
		expect(coldInletHint({ headerId: HEADER_ID, inletTemperature: '120' }, ctx)).toMatch(
			/^The inlet reads 120 °C, well below the 184 °C of steam at this header/
		);
		expect(coldInletHint({ headerId: HEADER_ID, inletTemperature: '180' }, ctx)).toBeNull();
		expect(coldInletHint({ headerId: HEADER_ID, inletTemperature: '' }, ctx)).toBeNull();
	});
});
