/**
 * The invented creamery's trap register: 62 tagged steam traps across its six areas, each
 * with its details, and the result of its test on the spring survey (mostly working, some
 * leaking or failed, a few that could not be reached). Tags follow the plant's own scheme,
 * ST-<area>-<number>. Every figure here is invented demo data.
 */
import type { TrapCondition, TrapTestMethod } from '../../schemas/finding-vocabulary';
import type { TrapAssetDetails } from '../../schemas/snapshot';
import { atmosphericPressureAtElevation, toBase } from '../../units/index';
import { creameryAreas, type CreameryArea } from './areas';
import { demoSites } from './demo';

const site = demoSites[0];
const [hp, processHeader, cip, flash] = site.headers.map((h) => h.id);
const mm = (millimetres: number) => toBase('shortLength', millimetres, 'mm');
/** The condensate return runs at about 0.5 bar g (invented). */
const returnPressure = toBase('pressure', 0.5, 'bar_g', {
	atmosphericPressure: atmosphericPressureAtElevation(site.elevation)
});

export interface RegisterTrap {
	assetId: string;
	tag: string;
	area: CreameryArea;
	headerId: string;
	location: string;
	details: TrapAssetDetails;
}

type Kind = 'drip' | 'evaporator' | 'heater' | 'tracer' | 'unit-heater';

/** Trap type, size and orifice by duty; every third trap has its orifice on record. */
function detailsFor(kind: Kind, n: number): TrapAssetDetails {
	const known = n % 3 === 0;
	const toReturn = { discharge: 'condensate-return', backPressure: returnPressure } as const;
	switch (kind) {
		case 'drip':
			return n % 4 === 1
				? { trapType: 'thermodynamic', dn: 20, discharge: 'atmosphere' }
				: { trapType: 'thermodynamic', dn: 15, discharge: 'atmosphere', ...orifice(known, 3.2) };
		case 'evaporator':
			return n % 4 === 2
				? { trapType: 'inverted-bucket', dn: 20, ...toReturn, ...orifice(known, 4.8) }
				: { trapType: 'float-thermostatic', dn: 40, ...toReturn, ...orifice(known, 9.5) };
		case 'heater':
			return n % 2 === 0
				? { trapType: 'float-thermostatic', dn: 50, ...toReturn, ...orifice(known, 12.7) }
				: { trapType: 'float-thermostatic', dn: 25, ...toReturn, ...orifice(known, 6.4) };
		case 'tracer':
			return n % 3 === 1
				? { trapType: 'bimetallic', dn: 15, discharge: 'atmosphere', ...orifice(known, 2.5) }
				: { trapType: 'thermostatic', dn: 15, ...toReturn, ...orifice(known, 3) };
		case 'unit-heater':
			return { trapType: 'float-thermostatic', dn: 20, ...toReturn, ...orifice(known, 4.8) };
	}
}

function orifice(known: boolean, millimetres: number) {
	return known ? { orificeDiameter: mm(millimetres) } : {};
}

/** [area, tag prefix, header, duty, locations in tag order] */
const groups: [CreameryArea, string, string, Kind, string[]][] = [
	[
		'boilerHouse',
		'BH',
		hp,
		'drip',
		[
			'Boiler 1 crown valve drip',
			'Boiler 2 crown valve drip',
			'Steam separator drain',
			'Main header, east end drip',
			'Main header, west end drip',
			'PRV station inlet drip',
			'PRV station outlet drip',
			'Deaerator heating coil',
			'Feedwater tank heating coil',
			'Sampling cooler drain',
			'Main header drip',
			'Blowdown vessel vent line drip',
			'Fuel oil tank tracer',
			'Economiser drain'
		]
	],
	[
		'evaporatorHall',
		'E1',
		processHeader,
		'evaporator',
		[
			'Evaporator 1, preheater',
			'Evaporator 1, first effect',
			'Evaporator 1, second effect',
			'Evaporator 1, condensate leg',
			'Evaporator 1, thermocompressor drip',
			'Evaporator 1, supply line drip',
			'Evaporator 1, finisher',
			'Evaporator 1, CIP heater'
		]
	],
	[
		'evaporatorHall',
		'E2',
		processHeader,
		'evaporator',
		[
			'Evaporator 2, preheater',
			'Evaporator 2, first effect',
			'Evaporator 2, second effect',
			'Evaporator 2, condensate leg',
			'Evaporator 2, thermocompressor drip',
			'Evaporator 2, supply line drip',
			'Evaporator 2, finisher',
			'Evaporator 2, gallery drip'
		]
	],
	[
		'dryerTower',
		'SD',
		hp,
		'heater',
		[
			'Air heater battery A1',
			'Air heater battery A2',
			'Air heater battery A3',
			'Air heater battery B1',
			'Air heater battery B2',
			'Air heater battery B3',
			'Fluid bed heater 1',
			'Fluid bed heater 2',
			'Supply riser drip, level 2',
			'Supply riser drip, level 4',
			'Cone jacket',
			'Supply riser drip, roof'
		]
	],
	[
		'cipRoom',
		'CIP',
		cip,
		'heater',
		[
			'CIP set 1, heater outlet',
			'CIP set 2, heater outlet',
			'CIP set 3, heater outlet',
			'Caustic tank coil',
			'Acid tank coil',
			'Hot water set',
			'Header drip',
			'Return line drip'
		]
	],
	[
		'milkReception',
		'MR',
		cip,
		'tracer',
		[
			'Tanker bay wash heater',
			'Silo 1 outlet tracer',
			'Silo 2 outlet tracer',
			'Raw milk line tracer',
			'Reception office heater',
			'Drain line tracer'
		]
	],
	[
		'packing',
		'PK',
		flash,
		'unit-heater',
		[
			'Filling hall unit heater 1',
			'Filling hall unit heater 2',
			'Filling hall unit heater 3',
			'Bag store unit heater',
			'Dispatch dock air curtain',
			'Workshop unit heater'
		]
	]
];

/** The four traps the first demo seed already had keep their asset ids and details. */
const fixedDetails: Record<string, TrapAssetDetails> = {
	'ST-E1-04': { trapType: 'inverted-bucket', dn: 20, discharge: 'atmosphere' },
	'ST-BH-11': { trapType: 'thermodynamic', dn: 15, discharge: 'atmosphere' },
	'ST-CIP-02': {
		trapType: 'float-thermostatic',
		dn: 25,
		discharge: 'condensate-return',
		backPressure: 0.13
	},
	'ST-BH-14': { trapType: 'thermodynamic', dn: 15, discharge: 'atmosphere' }
};
/** The four traps the first demo seed already had keep their asset ids. */
const fixedAssetIds: Record<string, string> = {
	'ST-E1-04': '5e7a0008-0000-4000-8000-000000000001',
	'ST-BH-11': '5e7a0008-0000-4000-8000-000000000002',
	'ST-CIP-02': '5e7a0008-0000-4000-8000-000000000003',
	'ST-BH-14': '5e7a0008-0000-4000-8000-000000000004'
};

export const trapRegister: RegisterTrap[] = groups
	.flatMap(([area, prefix, headerId, kind, places]) =>
		places.map((place, i) => ({ area, prefix, headerId, kind, place, n: i + 1 }))
	)
	.map(({ area, prefix, headerId, kind, place, n }, index) => {
		const tag = `ST-${prefix}-${String(n).padStart(2, '0')}`;
		return {
			assetId:
				fixedAssetIds[tag] ?? `5e7a0008-0000-4000-8000-${String(100 + index).padStart(12, '0')}`,
			tag,
			area,
			headerId,
			location: `${creameryAreas[area].name}, ${lowerFirst(place)}`,
			details: fixedDetails[tag] ?? detailsFor(kind, n)
		};
	});

/** 'Main header drip' → 'main header drip'; 'CIP set 1' stays. */
function lowerFirst(text: string): string {
	return /^[A-Z][a-z]/.test(text) ? text.charAt(0).toLowerCase() + text.slice(1) : text;
}

export function registerTrap(tag: string): RegisterTrap {
	const trap = trapRegister.find((t) => t.tag === tag);
	if (!trap) throw new Error(`No trap ${tag} in the demo register`);
	return trap;
}

/** What the spring survey found where it was not "working" (invented). */
export const springResults: Record<string, TrapCondition> = {
	'ST-E1-04': 'failed-open',
	'ST-BH-06': 'failed-open',
	'ST-SD-03': 'failed-open',
	'ST-SD-09': 'failed-open',
	'ST-E2-05': 'failed-open',
	'ST-BH-11': 'leaking',
	'ST-BH-14': 'leaking',
	'ST-E1-07': 'leaking',
	'ST-SD-06': 'leaking',
	'ST-CIP-05': 'leaking',
	'ST-MR-02': 'leaking',
	'ST-PK-04': 'leaking',
	'ST-CIP-02': 'failed-closed',
	'ST-SD-11': 'failed-closed',
	'ST-PK-02': 'failed-closed',
	'ST-SD-12': 'not-accessible',
	'ST-E2-08': 'not-accessible',
	'ST-BH-09': 'not-accessible',
	'ST-MR-06': 'out-of-service'
};

/** How a trap in that condition was tested (none when it could not be reached). */
export function testMethodFor(condition: TrapCondition): TrapTestMethod | undefined {
	if (condition === 'not-accessible' || condition === 'out-of-service') return undefined;
	if (condition === 'failed-closed') return 'temperature';
	return condition === 'working' ? 'ultrasound' : 'combined';
}
