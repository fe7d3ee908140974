/**
 * Demo findings for the invented Millbeck Creamery: one survey still in the field and an earlier
 * one published to the client, so every surface has something real to show. Inputs are in the
 * engine's base units (MPa absolute, K, m); results are computed by the same evaluateFinding the
 * server uses for synced findings.
 */
import type { CostBasis } from '../../schemas/site';
import { toBase } from '../../units/index';
import { demoSites } from './demo';

const K = (celsius: number) => toBase('temperature', celsius, 'degC');
const mm = (millimetres: number) => toBase('shortLength', millimetres, 'mm');

export const millbeckCostBasis: CostBasis = {
	fuel: { kind: 'natural-gas', price: '11.20', unit: 'GJ' },
	currency: 'EUR',
	boilerEfficiency: 0.84,
	feedwaterTemperature: K(95),
	condensateReturnFraction: 0.6,
	makeupWaterPrice: '2.10',
	waterTreatmentPrice: '0.85',
	operatingHours: 7800,
	elevation: demoSites[0].elevation,
	discountRate: 0.07,
	lifeYears: 8
};

export const orrinCostBasis: CostBasis = {
	fuel: { kind: 'natural-gas', price: '4.10', unit: 'MMBtu' },
	currency: 'USD',
	boilerEfficiency: 0.81,
	feedwaterTemperature: K(105),
	condensateReturnFraction: 0.7,
	makeupWaterPrice: '1.40',
	waterTreatmentPrice: '0.95',
	operatingHours: 8400,
	elevation: demoSites[1].elevation
};

const [hp, process, cip] = demoSites[0].headers.map((h) => h.id);

export const publishedSurveyId = '5e7a0006-0000-4000-8000-000000000003';
const fieldSurveyId = '5e7a0006-0000-4000-8000-000000000001';

export const demoPublishedSurvey = {
	id: publishedSurveyId,
	firmId: demoSites[0].firmId,
	siteId: demoSites[0].id,
	name: 'Millbeck Creamery — spring steam survey',
	startsOn: '2026-04-13',
	endsOn: '2026-04-15',
	status: 'published',
	publishedAt: new Date('2026-05-04T09:00:00Z')
};

const common = {
	notes: '',
	version: 1,
	deleted: false,
	createdAt: '2026-04-14T08:00:00Z',
	updatedAt: '2026-04-14T08:00:00Z'
};
const fid = (n: number) => `5e7a0007-0000-4000-8000-${String(n).padStart(12, '0')}`;

/** The findings as the device would send them (validated by findingSchema before seeding). */
export const demoFindings = [
	// Spring survey (published): the client sees these ranked on the Ladder.
	{
		...common,
		id: fid(1),
		surveyId: publishedSurveyId,
		kind: 'trap',
		headerId: process,
		assetTag: 'ST-E1-04',
		location: 'Evaporator 1, condensate leg',
		status: 'published',
		repairCost: 48_000,
		inputs: {
			trapType: 'inverted-bucket',
			dn: 20,
			condition: 'failed-open',
			discharge: 'atmosphere',
			testMethod: 'ultrasound'
		}
	},
	{
		...common,
		id: fid(2),
		surveyId: publishedSurveyId,
		kind: 'trap',
		headerId: hp,
		assetTag: 'ST-BH-11',
		location: 'Boiler house, main header drip',
		status: 'published',
		repairCost: 52_000,
		inputs: {
			trapType: 'thermodynamic',
			dn: 15,
			condition: 'leaking',
			discharge: 'atmosphere',
			testMethod: 'combined'
		}
	},
	{
		...common,
		id: fid(3),
		surveyId: publishedSurveyId,
		kind: 'trap',
		headerId: cip,
		assetTag: 'ST-CIP-02',
		location: 'CIP set 2, heater outlet',
		status: 'published',
		repairCost: 36_000,
		inputs: {
			trapType: 'float-thermostatic',
			dn: 25,
			condition: 'failed-closed',
			discharge: 'condensate-return',
			backPressure: 0.13,
			testMethod: 'temperature'
		}
	},
	{
		...common,
		id: fid(4),
		surveyId: publishedSurveyId,
		kind: 'leak',
		headerId: process,
		location: 'Evaporator gallery, globe valve gland',
		status: 'published',
		repairCost: 30_000,
		inputs: { sizeClass: 'small' }
	},
	{
		...common,
		id: fid(5),
		surveyId: publishedSurveyId,
		kind: 'insulation',
		headerId: hp,
		location: 'Boiler house to dryer, pipe rack',
		status: 'published',
		repairCost: 210_000,
		inputs: {
			item: 'pipe',
			dn: 100,
			length: 14,
			ambientTemperature: K(18),
			windSpeed: 0.5,
			layers: [{ thickness: mm(80), material: 'mineral-wool' }],
			jacketEmissivity: 0.1,
			bareEmissivity: 0.85
		}
	},
	{
		...common,
		id: fid(6),
		surveyId: publishedSurveyId,
		kind: 'insulation',
		headerId: process,
		location: 'Evaporator feed, bare gate valves',
		status: 'published',
		repairCost: 64_000,
		inputs: {
			item: 'valve',
			dn: 80,
			count: 4,
			ambientTemperature: K(22),
			windSpeed: 0,
			layers: [{ thickness: mm(50), material: 'mineral-wool' }],
			jacketEmissivity: 0.1,
			bareEmissivity: 0.85
		}
	},
	// Winter survey (in the field): drafts as they arrive from the auditor's phone.
	{
		...common,
		id: fid(11),
		surveyId: fieldSurveyId,
		kind: 'trap',
		headerId: process,
		assetTag: 'ST-E1-04',
		location: 'Evaporator 1, condensate leg',
		status: 'draft',
		inputs: {
			trapType: 'inverted-bucket',
			dn: 20,
			condition: 'working',
			discharge: 'atmosphere',
			testMethod: 'ultrasound'
		},
		createdAt: '2026-11-17T09:12:00Z',
		updatedAt: '2026-11-17T09:12:00Z'
	},
	{
		...common,
		id: fid(12),
		surveyId: fieldSurveyId,
		kind: 'trap',
		headerId: hp,
		assetTag: 'ST-BH-14',
		location: 'Boiler house, economiser drain',
		status: 'draft',
		inputs: {
			trapType: 'thermodynamic',
			dn: 15,
			condition: 'failed-open',
			discharge: 'atmosphere',
			testMethod: 'ultrasound'
		},
		createdAt: '2026-11-17T09:40:00Z',
		updatedAt: '2026-11-17T09:40:00Z'
	},
	{
		...common,
		id: fid(13),
		surveyId: fieldSurveyId,
		kind: 'leak',
		headerId: hp,
		location: 'Header flange by PRV station',
		status: 'draft',
		inputs: { holeDiameter: mm(2.5) },
		createdAt: '2026-11-17T10:05:00Z',
		updatedAt: '2026-11-17T10:05:00Z'
	},
	{
		...common,
		id: fid(14),
		surveyId: fieldSurveyId,
		kind: 'header',
		headerId: process,
		location: 'Process header gauge PG-07',
		status: 'draft',
		inputs: { measuredPressure: 0.78, measuredTemperature: K(169) },
		createdAt: '2026-11-17T10:30:00Z',
		updatedAt: '2026-11-17T10:30:00Z'
	}
] as const;

export const demoAssets = [
	{
		id: '5e7a0008-0000-4000-8000-000000000001',
		tag: 'ST-E1-04',
		location: 'Evaporator 1, condensate leg',
		headerId: process
	},
	{
		id: '5e7a0008-0000-4000-8000-000000000002',
		tag: 'ST-BH-11',
		location: 'Boiler house, main header drip',
		headerId: hp
	},
	{
		id: '5e7a0008-0000-4000-8000-000000000003',
		tag: 'ST-CIP-02',
		location: 'CIP set 2, heater outlet',
		headerId: cip
	},
	{
		id: '5e7a0008-0000-4000-8000-000000000004',
		tag: 'ST-BH-14',
		location: 'Boiler house, economiser drain',
		headerId: hp
	}
].map((a) => ({ ...a, siteId: demoSites[0].id, kind: 'trap' }));
