/**
 * Demo findings for the invented Larkspindle Creamery: a spring survey published to the client
 * (a trap test of every tagged trap, a leak and two insulation gaps) and the winter survey
 * still in the field with the first dozen findings from the auditor's phone. Inputs are in the
 * engine's base units (MPa absolute, K, m); results are computed by the same evaluateFinding
 * the server uses for synced findings.
 */
import type { TrapCondition, TrapTestMethod } from '../../schemas/finding-vocabulary';
import type { CostBasis } from '../../schemas/site';
import { atmosphericPressureAtElevation, toBase } from '../../units/index';
import { creameryAreas } from './areas';
import { demoSites, demoSurveys } from './demo';
import { captureOf, findingId, type DemoFinding } from './demo-finding';
import { publishedSurveyId, springTrapFindings } from './spring';
import { registerTrap } from './traps';

export { publishedSurveyId, captureOf };

const K = (celsius: number) => toBase('temperature', celsius, 'degC');
const mm = (millimetres: number) => toBase('shortLength', millimetres, 'mm');
const barg = (bar: number) =>
	toBase('pressure', bar, 'bar_g', {
		atmosphericPressure: atmosphericPressureAtElevation(demoSites[0].elevation)
	});

export const creameryCostBasis: CostBasis = {
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

export const paperMillCostBasis: CostBasis = {
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

const [hp, processHeader, cip] = demoSites[0].headers.map((h) => h.id);
const { boilerHouse, evaporatorHall, cipRoom } = creameryAreas;
const fieldSurveyId = demoSurveys[0].id;

export const demoPublishedSurvey = {
	id: publishedSurveyId,
	firmId: demoSites[0].firmId,
	siteId: demoSites[0].id,
	name: 'Larkspindle Creamery — spring steam survey',
	startsOn: '2026-04-13',
	endsOn: '2026-04-15',
	status: 'published',
	publishedAt: new Date('2026-05-04T09:00:00Z')
};

const spring = (at: string) => ({
	surveyId: publishedSurveyId,
	notes: '',
	photoIds: [],
	status: 'published' as const,
	reviewed: true,
	version: 1,
	deleted: false,
	createdAt: at,
	updatedAt: at
});
const field = (at: string) => ({
	...spring(at),
	surveyId: fieldSurveyId,
	status: 'draft' as const,
	reviewed: false
});

const insulation = {
	windSpeed: 0,
	layers: [{ thickness: mm(50), material: 'mineral-wool' }],
	jacketEmissivity: 0.1,
	bareEmissivity: 0.85
};

const springOthers: DemoFinding[] = [
	{
		...spring('2026-04-13T11:20:00Z'),
		id: findingId(4),
		kind: 'leak',
		headerId: processHeader,
		areaId: evaporatorHall.id,
		location: 'Evaporator gallery, globe valve gland',
		repairCost: 30_000,
		inputs: { sizeClass: 'small' }
	},
	{
		...spring('2026-04-13T09:10:00Z'),
		id: findingId(5),
		kind: 'insulation',
		headerId: hp,
		areaId: boilerHouse.id,
		location: 'Boiler house to dryer, pipe rack',
		repairCost: 210_000,
		inputs: {
			...insulation,
			item: 'pipe',
			dn: 100,
			length: 14,
			ambientTemperature: K(18),
			windSpeed: 0.5,
			layers: [{ thickness: mm(80), material: 'mineral-wool' }]
		}
	},
	{
		...spring('2026-04-13T11:45:00Z'),
		id: findingId(6),
		kind: 'insulation',
		headerId: processHeader,
		areaId: evaporatorHall.id,
		location: 'Evaporator feed, bare gate valves',
		repairCost: 64_000,
		inputs: { ...insulation, item: 'valve', dn: 80, count: 4, ambientTemperature: K(22) }
	}
];

/** A winter trap test of a register trap: its details, today's condition. */
function fieldTrap(
	n: number,
	tag: string,
	condition: TrapCondition,
	testMethod: TrapTestMethod | undefined,
	at: string,
	notes = ''
): DemoFinding {
	const trap = registerTrap(tag);
	return {
		...field(at),
		id: findingId(n),
		kind: 'trap',
		headerId: trap.headerId,
		areaId: creameryAreas[trap.area].id,
		assetTag: tag,
		location: trap.location,
		notes,
		inputs: { ...trap.details, condition, ...(testMethod ? { testMethod } : {}) }
	};
}

const fieldFindings: DemoFinding[] = [
	fieldTrap(
		11,
		'ST-E1-04',
		'working',
		'ultrasound',
		'2026-11-17T09:12:00Z',
		'Replaced since spring.'
	),
	fieldTrap(12, 'ST-BH-14', 'failed-open', 'ultrasound', '2026-11-17T08:40:00Z'),
	fieldTrap(15, 'ST-BH-11', 'leaking', 'combined', '2026-11-17T08:25:00Z'),
	fieldTrap(16, 'ST-BH-02', 'working', 'ultrasound', '2026-11-17T08:05:00Z'),
	// Edited at the desk after the phone last had it (version 2): the phone's own edit of it
	// waits as a conflict (seed-desk.ts).
	{
		...fieldTrap(
			17,
			'ST-BH-06',
			'failed-open',
			'combined',
			'2026-11-17T08:15:00Z',
			'Still blowing: vent plume seen from the yard.'
		),
		version: 2
	},
	fieldTrap(18, 'ST-E1-01', 'working', 'ultrasound', '2026-11-17T09:00:00Z'),
	fieldTrap(19, 'ST-E2-08', 'not-accessible', undefined, '2026-11-17T09:55:00Z', 'Gallery closed.'),
	{
		...field('2026-11-17T08:50:00Z'),
		id: findingId(13),
		kind: 'leak',
		headerId: hp,
		areaId: boilerHouse.id,
		location: 'Boiler house, header flange by PRV station',
		inputs: { holeDiameter: mm(2.5) }
	},
	{
		...field('2026-11-17T09:40:00Z'),
		id: findingId(20),
		kind: 'leak',
		headerId: processHeader,
		areaId: evaporatorHall.id,
		// Corrected at the desk (version 2) after the phone deleted it: that delete waits.
		version: 2,
		location: 'Evaporator 2 gallery, globe valve gland (east end)',
		inputs: { sizeClass: 'medium' }
	},
	{
		...field('2026-11-17T10:45:00Z'),
		id: findingId(21),
		kind: 'insulation',
		headerId: cip,
		areaId: cipRoom.id,
		location: 'CIP room, flange pairs at the heater inlet',
		inputs: {
			...insulation,
			item: 'flange-pair',
			dn: 50,
			count: 3,
			ambientTemperature: K(24),
			layers: [{ thickness: mm(40), material: 'mineral-wool' }]
		}
	},
	{
		...field('2026-11-17T08:00:00Z'),
		id: findingId(22),
		kind: 'header',
		headerId: hp,
		areaId: boilerHouse.id,
		location: 'Boiler house, header gauge PG-01',
		inputs: { measuredPressure: barg(10.2), measuredTemperature: K(186) }
	},
	{
		...field('2026-11-17T10:30:00Z'),
		id: findingId(14),
		kind: 'header',
		headerId: processHeader,
		areaId: evaporatorHall.id,
		location: 'Process header gauge PG-07',
		inputs: { measuredPressure: 0.78, measuredTemperature: K(169) }
	}
];

/** Every demo finding, earlier survey first (the order the seed writes them in). */
export const demoFindings: DemoFinding[] = [
	...springTrapFindings,
	...springOthers,
	...fieldFindings.sort((a, b) => a.createdAt.localeCompare(b.createdAt))
];
