/**
 * A second client of the first firm, so the Desk opens full: the invented Brackenford Maltings,
 * its four steam headers and seven areas, and an autumn survey of 320 findings that a
 * consultant has already checked (at the desk stage, every finding reviewed). The findings are
 * drawn from a fixed pseudo-random stream, so every seed writes the same ones. Every figure here
 * is invented demo data; repair costs are illustrative, not quotes.
 */
import type { DemoFinding } from './demo-finding';
import type { CostBasis } from '../../schemas/site';
import { atmosphericPressureAtElevation, toBase } from '../../units/index';
import { demoFirms, demoUsers } from './demo';

const elevation = 40;
const atmosphere = atmosphericPressureAtElevation(elevation);
const barg = (bar: number) => toBase('pressure', bar, 'bar_g', { atmosphericPressure: atmosphere });
const K = (celsius: number) => toBase('temperature', celsius, 'degC');
const mm = (millimetres: number) => toBase('shortLength', millimetres, 'mm');
const uuid = (group: string, n: number) =>
	`5e7a${group}-0000-4000-8000-${String(n).padStart(12, '0')}`;

export const maltingsClient = {
	id: uuid('0002', 3),
	firmId: demoFirms[0].id,
	name: 'Brackenford Maltings Ltd',
	contactEmail: 'works.engineer@brackenford-maltings.example'
};

/** The maltings' works engineer, who gets the report-ready e-mail and reads the Ladder. */
export const maltingsClientUser = {
	id: uuid('0003', 21),
	firmId: demoFirms[0].id,
	email: 'works.engineer@brackenford-maltings.example',
	name: 'Oona Haverkamp',
	role: 'client' as const,
	clientCompanyId: maltingsClient.id
};

export const maltingsHeaders = [
	{
		id: uuid('0005', 21),
		name: 'Kiln main',
		pressure: barg(12),
		designTemperature: K(230),
		sortOrder: 1
	},
	{ id: uuid('0005', 22), name: 'Germination', pressure: barg(6), sortOrder: 2 },
	{
		id: uuid('0005', 23),
		name: 'Steep house',
		pressure: barg(3),
		sortOrder: 3,
		operatingHours: 5200
	},
	{ id: uuid('0005', 24), name: 'Condensate flash', pressure: barg(0.5), sortOrder: 4 }
];

export const maltingsSite = {
	id: uuid('0004', 3),
	firmId: demoFirms[0].id,
	clientCompanyId: maltingsClient.id,
	name: 'Brackenford Maltings',
	address: 'Kiln Street 12, Brackenford (invented)',
	elevation,
	unitSystem: 'SI',
	currency: 'EUR'
};

export const maltingsAreas = [
	'Boiler house',
	'Kiln 1',
	'Kiln 2',
	'Germination hall',
	'Steep house',
	'Roasting plant',
	'Dispatch'
].map((name, i) => ({ id: uuid('0009', 21 + i), siteId: maltingsSite.id, name, sortOrder: i + 1 }));

export const maltingsCostBasis: CostBasis = {
	fuel: { kind: 'fuel-oil-2', price: '0.92', unit: 'L' },
	currency: 'EUR',
	boilerEfficiency: 0.82,
	feedwaterTemperature: K(102),
	makeupWaterTemperature: K(12),
	condensateReturnFraction: 0.55,
	makeupWaterPrice: '1.90',
	waterTreatmentPrice: '0.60',
	operatingHours: 7200,
	discountRate: 0.08,
	lifeYears: 10
};
export const maltingsCostBasisId = uuid('000b', 3);

const consultant = demoUsers.find((u) => u.email === 'consultant@cinderbrook.example')!;
const auditor = demoUsers.find((u) => u.email === 'auditor@cinderbrook.example')!;

export const maltingsSurvey = {
	id: uuid('0006', 4),
	firmId: demoFirms[0].id,
	siteId: maltingsSite.id,
	name: 'Brackenford Maltings — autumn steam survey',
	startsOn: '2026-10-19',
	endsOn: '2026-10-23',
	status: 'in-review',
	reviewedAt: new Date('2026-11-06T15:30:00Z'),
	reviewedBy: consultant.id,
	createdBy: consultant.id
};
export const maltingsRecordedBy = auditor.id;
export const maltingsReviewedBy = consultant.id;

/** mulberry32: a small fixed stream, so the demo is the same on every machine. */
function stream(seed: number) {
	let a = seed >>> 0;
	const next = () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
	const pick = <T>(items: readonly T[]) => items[Math.floor(next() * items.length)];
	/** An item by weight: [[item, weight], …]. */
	const weighted = <T>(items: readonly (readonly [T, number])[]) => {
		let r = next() * items.reduce((s, [, w]) => s + w, 0);
		for (const [item, w] of items) if ((r -= w) < 0) return item;
		return items[items.length - 1][0];
	};
	return { next, pick, weighted };
}

const trapDuties = [
	{ where: 'drip leg', types: ['thermodynamic'], dns: [15, 20] },
	{ where: 'kiln heater battery', types: ['float-thermostatic', 'inverted-bucket'], dns: [20, 25] },
	{ where: 'tracer line', types: ['thermostatic', 'bimetallic'], dns: [15] },
	{ where: 'unit heater', types: ['float-thermostatic', 'thermodynamic'], dns: [20, 25] }
] as const;

const leakPlaces = [
	'valve gland',
	'flange joint',
	'union on a drain line',
	'pipe weld',
	'strainer cap'
];
const insulationPlaces = ['pipe rack', 'valve station', 'riser', 'header drop', 'meter run'];

function at(day: number, minute: number) {
	return new Date(Date.parse(`2026-10-${19 + day}T07:00:00Z`) + minute * 60_000).toISOString();
}

/** The 320 findings of the autumn survey, all reviewed at the desk. */
export function maltingsFindings(): DemoFinding[] {
	const r = stream(20261019);
	const out: DemoFinding[] = [];
	const base = (n: number, areaIndex: number, headerIndex: number) => {
		const when = at(Math.min(4, Math.floor(n / 70)), (n % 70) * 6);
		return {
			id: uuid('00f1', n + 1),
			surveyId: maltingsSurvey.id,
			headerId: maltingsHeaders[headerIndex].id,
			areaId: maltingsAreas[areaIndex].id,
			notes: '',
			photoIds: [],
			createdAt: when,
			updatedAt: when,
			status: 'reviewed' as const,
			reviewed: true,
			version: 1,
			deleted: false
		};
	};
	for (let n = 0; n < 320; n++) {
		const areaIndex = Math.floor(r.next() * maltingsAreas.length);
		const headerIndex = r.weighted([
			[0, 3],
			[1, 4],
			[2, 2],
			[3, 1]
		] as const);
		const area = maltingsAreas[areaIndex].name;
		const kind = r.weighted([
			['trap', 220],
			['leak', 45],
			['insulation', 40],
			['header', 15]
		] as const);
		if (kind === 'trap') {
			const duty = r.pick(trapDuties);
			const condition = r.weighted([
				['working', 70],
				['leaking', 9],
				['failed-open', 4],
				['failed-closed', 6],
				['flooded', 3],
				['out-of-service', 4],
				['not-accessible', 4]
			] as const);
			const dn = r.pick(duty.dns);
			const tag = `ST-BM-${String(out.filter((f) => f.kind === 'trap').length + 1).padStart(3, '0')}`;
			const toReturn = headerIndex < 3 && r.next() < 0.6;
			out.push({
				...base(n, areaIndex, headerIndex),
				kind: 'trap',
				assetTag: tag,
				location: `${area}, ${duty.where}`,
				inputs: {
					trapType: r.pick(duty.types),
					dn,
					condition,
					...(toReturn
						? { discharge: 'condensate-return', backPressure: barg(0.5) }
						: { discharge: 'atmosphere' }),
					...(condition === 'not-accessible'
						? {}
						: { testMethod: r.pick(['ultrasound', 'temperature', 'combined'] as const) })
				},
				...(['leaking', 'failed-open', 'failed-closed', 'flooded'].includes(condition)
					? { repairCost: 28_000 + dn * 700 }
					: {}),
				...(condition === 'not-accessible'
					? { notes: 'Behind the kiln fans: needs a permit to reach.' }
					: {})
			});
		} else if (kind === 'leak') {
			const sizeClass = r.weighted([
				['pinhole', 16],
				['small', 18],
				['medium', 6],
				['large', 2]
			] as const);
			out.push({
				...base(n, areaIndex, headerIndex),
				kind: 'leak',
				location: `${area}, ${r.pick(leakPlaces)}`,
				inputs: { sizeClass },
				repairCost: {
					pinhole: 9_000,
					small: 18_000,
					medium: 32_000,
					large: 65_000,
					'very-large': 140_000
				}[sizeClass]
			});
		} else if (kind === 'insulation') {
			const dn = r.pick([25, 50, 80, 100, 150] as const);
			const length = 2 + Math.floor(r.next() * 16);
			out.push({
				...base(n, areaIndex, headerIndex),
				kind: 'insulation',
				location: `${area}, ${r.pick(insulationPlaces)}`,
				inputs: {
					item: 'pipe',
					dn,
					length,
					ambientTemperature: K(8 + Math.floor(r.next() * 16)),
					windSpeed: area === 'Dispatch' ? 2 : 0,
					layers: [{ thickness: mm(dn >= 100 ? 80 : 50), material: 'mineral-wool' }],
					jacketEmissivity: 0.1,
					bareEmissivity: 0.85
				},
				repairCost: length * (6_500 + dn * 60)
			});
		} else {
			const header = maltingsHeaders[headerIndex];
			const drop = 0.85 + r.next() * 0.15;
			out.push({
				...base(n, areaIndex, headerIndex),
				kind: 'header',
				location: `${area}, gauge on the ${header.name.toLowerCase()} header`,
				inputs: { measuredPressure: atmosphere + (header.pressure - atmosphere) * drop }
			});
		}
	}
	return out;
}
