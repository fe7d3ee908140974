/**
 * Hand-built records for the offline specs (invented, not from any real plant). Not imported
 * by app code.
 */
import type { FindingCapture, LeakCapture, TrapCapture } from '$lib/schemas/capture';
import type { CostBasis } from '$lib/schemas/site';
import type { SurveySnapshot } from '$lib/schemas/snapshot';
import { DeviceDatabase } from './db';

export const SITE_ID = '5e1f0000-0000-4000-8000-000000000001';
export const SURVEY_ID = '5e1f0000-0000-4000-8000-000000000002';
export const HEADER_ID = '5e1f0000-0000-4000-8000-000000000003';
export const AREA_BOILER = '5e1f0000-0000-4000-8000-000000000004';
export const AREA_DRYER = '5e1f0000-0000-4000-8000-000000000005';

/** An invented natural-gas cost basis. */
export const COST_BASIS: CostBasis = {
	fuel: { kind: 'natural-gas', price: '8.50', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.82,
	feedwaterTemperature: 378.15,
	condensateReturnFraction: 0.6,
	makeupWaterPrice: '1.85',
	waterTreatmentPrice: '0.75',
	operatingHours: 8000
};

/** A fresh, uniquely named database; delete it after the test. */
export function testDb(): DeviceDatabase {
	return new DeviceDatabase(`t-${crypto.randomUUID()}`);
}

export function trapCapture(over: Partial<TrapCapture> = {}): TrapCapture {
	return {
		id: crypto.randomUUID(),
		surveyId: SURVEY_ID,
		kind: 'trap',
		headerId: HEADER_ID,
		areaId: AREA_BOILER,
		location: 'Boiler house, feed pump drip leg',
		assetTag: 'ST-101',
		notes: '',
		photoIds: [],
		createdAt: '2025-03-04T09:00:00.000Z',
		updatedAt: '2025-03-04T09:00:00.000Z',
		inputs: {
			trapType: 'thermodynamic',
			dn: 15,
			condition: 'failed-open',
			discharge: 'atmosphere'
		},
		...over
	};
}

export function leakCapture(over: Partial<LeakCapture> = {}): LeakCapture {
	return {
		id: crypto.randomUUID(),
		surveyId: SURVEY_ID,
		kind: 'leak',
		headerId: HEADER_ID,
		areaId: AREA_DRYER,
		location: 'Dryer 2 inlet valve',
		notes: 'Plume visible from the walkway',
		photoIds: [],
		createdAt: '2025-03-04T10:00:00.000Z',
		updatedAt: '2025-03-04T10:00:00.000Z',
		inputs: { sizeClass: 'small' },
		...over
	};
}

/** A valid snapshot of one survey with two areas, one tagged trap and the given findings. */
export function snapshot(
	findings: { capture: FindingCapture; version: number }[] = [],
	over: Partial<SurveySnapshot> = {}
): SurveySnapshot {
	return {
		cursor: 42,
		takenAt: '2025-03-04T08:00:00.000Z',
		unitSystem: 'SI',
		survey: {
			id: SURVEY_ID,
			name: 'Spring walk 2025',
			stage: 'in-field',
			startsOn: '2025-03-04',
			endsOn: null,
			siteId: SITE_ID,
			siteName: 'Riverside Dairy',
			clientName: 'Riverside Dairy Co-op',
			findingCount: findings.length,
			updatedAt: '2025-03-01T12:00:00.000Z'
		},
		site: {
			id: SITE_ID,
			name: 'Riverside Dairy',
			address: null,
			elevation: 1500,
			clientName: 'Riverside Dairy Co-op'
		},
		costBasis: null,
		headers: [{ id: HEADER_ID, name: 'HP main', pressure: 1.1, sortOrder: 0 }],
		areas: [
			{ id: AREA_BOILER, siteId: SITE_ID, name: 'Boiler house', sortOrder: 0 },
			{ id: AREA_DRYER, siteId: SITE_ID, name: 'Dryer hall', sortOrder: 1 }
		],
		assets: [
			{
				id: '5e1f0000-0000-4000-8000-0000000000a1',
				siteId: SITE_ID,
				kind: 'trap',
				tag: 'ST-101',
				location: 'Feed pump drip leg',
				areaId: AREA_BOILER,
				headerId: HEADER_ID,
				details: { trapType: 'thermodynamic', dn: 15 },
				lastResult: null
			}
		],
		findings: findings.map((f) => ({ ...f, status: 'draft' as const })),
		...over
	};
}
