import { describe, expect, it } from 'vitest';
import type { FindingCapture } from '$lib/schemas/capture';
import type { Area } from '$lib/schemas/snapshot';
import type { FindingEvaluation } from '$lib/steam/losses/evaluate';
import type { DeviceAsset, DeviceFinding } from './db';
import {
	areaCounts,
	areaNames,
	filterFindings,
	NO_AREA,
	prepareSearch,
	roundTotals,
	trapsToTest
} from './round';
import {
	AREA_BOILER,
	AREA_DRYER,
	leakCapture,
	SITE_ID,
	snapshot,
	trapCapture
} from './spec-fixtures';

function device(capture: FindingCapture, deleted: 0 | 1 = 0): DeviceFinding {
	return {
		id: capture.id,
		surveyId: capture.surveyId,
		kind: capture.kind,
		capture,
		version: 1,
		status: 'draft',
		pending: 0,
		deleted,
		updatedAt: capture.updatedAt
	};
}

const areas: Area[] = snapshot().areas;
const names = areaNames(areas);

const failed = device(trapCapture({ assetTag: 'ST-101', location: 'Feed pump drip leg' }));
const working = device(
	trapCapture({
		assetTag: 'st-120',
		areaId: AREA_DRYER,
		location: 'Dryer 1 outlet',
		notes: 'Kühler side, hot to touch',
		inputs: { trapType: 'inverted-bucket', dn: 20, condition: 'working', discharge: 'atmosphere' }
	})
);
const leak = device(leakCapture({ location: 'Dryer 2 inlet valve', notes: 'Plume from the stem' }));
const loose = device(leakCapture({ areaId: undefined, location: 'Yard', notes: '' }));
const gone = device(leakCapture({ location: 'Dryer 2 inlet valve' }), 1);
const all = [failed, working, leak, loose, gone];

describe('filterFindings', () => {
	const ids = (list: DeviceFinding[]) => list.map((f) => f.id);

	it('with no filter lists every finding not deleted, in order', () => {
		expect(ids(filterFindings(all, {}))).toEqual(ids([failed, working, leak, loose]));
		expect(ids(filterFindings(all, { text: '  ', tag: '', areaId: '' }))).toHaveLength(4);
	});

	it('narrows by area (or no area), kind and trap condition', () => {
		expect(ids(filterFindings(all, { areaId: AREA_DRYER }))).toEqual(ids([working, leak]));
		expect(ids(filterFindings(all, { areaId: NO_AREA }))).toEqual(ids([loose]));
		expect(ids(filterFindings(all, { kind: 'trap' }))).toEqual(ids([failed, working]));
		expect(ids(filterFindings(all, { condition: 'failed-open' }))).toEqual(ids([failed]));
		expect(ids(filterFindings(all, { kind: 'leak', areaId: AREA_BOILER }))).toEqual([]);
	});

	it('matches a tag by its start, whatever the case', () => {
		expect(ids(filterFindings(all, { tag: 'st-1' }))).toEqual(ids([failed, working]));
		expect(ids(filterFindings(all, { tag: 'ST-12' }))).toEqual(ids([working]));
		expect(ids(filterFindings(all, { tag: '101' }))).toEqual([]);
	});

	it('finds every word of the text in location, notes, tag or area name', () => {
		expect(ids(filterFindings(all, { text: 'dryer' }, names))).toEqual(ids([working, leak]));
		expect(ids(filterFindings(all, { text: 'DRYER stem' }, names))).toEqual(ids([leak]));
		// The area's name, not only what was typed on the finding.
		expect(ids(filterFindings(all, { text: 'boiler house' }, names))).toEqual(ids([failed]));
		expect(ids(filterFindings(all, { text: 'boiler house' }))).toEqual([]);
		expect(ids(filterFindings(all, { text: 'st-120' }, names))).toEqual(ids([working]));
		expect(ids(filterFindings(all, { text: 'kuhler' }, names))).toEqual(ids([working]));
	});

	it('finds the same after the search strings were prepared ahead, area names included', () => {
		const fresh = all.map((f) => ({ ...f }));
		prepareSearch(fresh, names);
		expect(ids(filterFindings(fresh, { text: 'boiler house' }, names))).toEqual(ids([failed]));
		// Prepared without the area names, a search with them still sees the names.
		const bare = all.map((f) => ({ ...f }));
		prepareSearch(bare);
		expect(ids(filterFindings(bare, { text: 'dryer' }, names))).toEqual(ids([working, leak]));
	});

	it('sees a changed finding’s new text (a changed finding is a new object)', () => {
		expect(filterFindings([leak], { text: 'flange' })).toEqual([]);
		const changed = { ...leak, capture: { ...leak.capture, notes: 'Flange gasket' } };
		expect(filterFindings([changed], { text: 'flange' })).toEqual([changed]);
	});
});

describe('trapsToTest', () => {
	const asset = (tag: string, areaId: string | null): DeviceAsset => ({
		...snapshot().assets[0],
		id: crypto.randomUUID(),
		siteId: SITE_ID,
		tag,
		areaId
	});

	it('lists tagged traps not yet tested, by area in site order, unassigned last', () => {
		const assets = [
			asset('ST-10', AREA_BOILER),
			asset('ST-9', AREA_BOILER),
			asset('ST-101', AREA_BOILER),
			asset('ST-120', AREA_DRYER),
			asset('ST-200', null),
			asset('ST-300', '5e1f0000-0000-4000-8000-00000000dead')
		];
		const groups = trapsToTest(assets, [failed, working], [...areas].reverse());
		expect(groups.map((g) => [g.area?.name ?? null, g.assets.map((a) => a.tag)])).toEqual([
			['Boiler house', ['ST-9', 'ST-10']],
			[null, ['ST-200', 'ST-300']]
		]);
	});

	it('counts a deleted trap test as not done', () => {
		const deleted = { ...failed, deleted: 1 as const };
		expect(trapsToTest([asset('ST-101', AREA_BOILER)], [deleted], areas)).toHaveLength(1);
		expect(trapsToTest([asset('ST-101', AREA_BOILER)], [failed], areas)).toEqual([]);
	});
});

describe('areaCounts', () => {
	it('counts findings per area and kind, leaving deleted ones out', () => {
		const counts = areaCounts(all);
		expect(counts.get(AREA_BOILER)).toEqual({
			trap: 1,
			leak: 0,
			insulation: 0,
			header: 0,
			total: 1
		});
		expect(counts.get(AREA_DRYER)).toEqual({
			trap: 1,
			leak: 1,
			insulation: 0,
			header: 0,
			total: 2
		});
		expect(counts.get(null)?.total).toBe(1);
	});
});

describe('roundTotals', () => {
	function evaluation(
		over: Partial<FindingEvaluation> & Pick<FindingEvaluation, 'cost'>
	): FindingEvaluation {
		// Only the summed fields matter here; the rest of an evaluation is not read.
		return {
			findingId: crypto.randomUUID(),
			kind: 'trap',
			steamLoss: null,
			heatLoss: 0,
			fuelEnergy: 0,
			co2: 0,
			water: 0,
			...over
		} as FindingEvaluation;
	}
	const eur = (minor: number) => ({ amount: minor / 100, minor, currency: 'EUR' });

	it('sums steam, heat, fuel, cost in minor units, CO2 and water', () => {
		const totals = roundTotals([
			evaluation({
				steamLoss: 12.5,
				heatLoss: 8,
				fuelEnergy: 300,
				co2: 16_800,
				water: 90,
				cost: eur(31_001)
			}),
			evaluation({ kind: 'insulation', heatLoss: 2.5, fuelEnergy: 95, co2: 5_300, cost: eur(99) })
		]);
		expect(totals).toEqual({
			findings: 2,
			steamLoss: 12.5,
			heatLoss: 10.5,
			fuelEnergy: 395,
			cost: { amount: 311, minor: 31_100, currency: 'EUR' },
			co2: 22_100,
			water: 90
		});
	});

	it('adds money exactly, in whole minor units', () => {
		const totals = roundTotals([evaluation({ cost: eur(10) }), evaluation({ cost: eur(20) })]);
		expect(totals.cost).toEqual({ amount: 0.3, minor: 30, currency: 'EUR' });
	});

	it('is zero with no cost for an empty round, and refuses two currencies', () => {
		expect(roundTotals([])).toMatchObject({ findings: 0, steamLoss: 0, cost: null });
		const usd = { amount: 1, minor: 100, currency: 'USD' };
		expect(() => roundTotals([evaluation({ cost: eur(1) }), evaluation({ cost: usd })])).toThrow(
			'priced in EUR and USD'
		);
	});
});
