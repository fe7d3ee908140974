import type { FindingKind } from '$lib/schemas/finding-vocabulary';
import type { Area } from '$lib/schemas/snapshot';
import type { FindingEvaluation } from '$lib/steam/losses/evaluate';
import { fromMinorUnits, type Money } from '$lib/steam/losses/money';
import type { DeviceAsset, DeviceFinding, FindingFilter } from './db';

/**
 * The round, worked out from what is on the device: pure functions over plain lists (no
 * database), fast enough to run on every keystroke. Deleted findings never count.
 */

/** `FindingFilter.areaId` value for findings recorded without an area. */
export const NO_AREA = 'no-area';

/** Area id → name, for the free-text search (build it once per survey, not per keystroke). */
export function areaNames(areas: readonly Area[]): ReadonlyMap<string, string> {
	return new Map(areas.map((a) => [a.id, a.name]));
}

const ASCII = /^[\x20-\x7e]*$/;

/** Lower case without accents, so "kuhler" finds "Kühler" (plain ASCII skips the slow path). */
function fold(text: string): string {
	if (ASCII.test(text)) return text.toLowerCase();
	return text.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase();
}

interface Searchable {
	capture: DeviceFinding['capture'];
	areaName: string;
	tag: string;
	text: string;
}

// One folded search string per finding object, made the first time it is searched: a
// keystroke is then one pass of substring tests. A changed finding is a new object (Dexie
// reads make new ones; a new capture object is noticed too), so the cache serves no stale
// text as long as findings are replaced rather than edited in place.
const searchCache = new WeakMap<DeviceFinding, Searchable>();

function searchable(finding: DeviceFinding, names: ReadonlyMap<string, string>): Searchable {
	const c = finding.capture;
	const areaName = c.areaId === undefined ? '' : (names.get(c.areaId) ?? '');
	let s = searchCache.get(finding);
	if (s === undefined || s.capture !== c || s.areaName !== areaName) {
		const tag = fold(c.assetTag ?? '');
		s = {
			capture: c,
			areaName,
			tag,
			text: [fold(c.location), fold(c.notes), tag, fold(areaName)].join('\n')
		};
		searchCache.set(finding, s);
	}
	return s;
}

const NO_NAMES: ReadonlyMap<string, string> = new Map();

/**
 * Builds every finding's search string ahead of the first keystroke (call it when a list is
 * shown), so no keystroke pays for building them.
 */
export function prepareSearch(
	list: readonly DeviceFinding[],
	names: ReadonlyMap<string, string> = NO_NAMES
): void {
	for (const f of list) searchable(f, names);
}

/**
 * The findings that match every given part of the filter, in the list's order.
 * `tag` is a case-insensitive prefix of the asset tag; `text` is split into words, each of
 * which must appear in the location, notes, tag or area name (the names come from
 * `areaNames(areas)`). Empty strings match everything.
 */
export function filterFindings<T extends DeviceFinding>(
	list: readonly T[],
	filter: FindingFilter,
	names: ReadonlyMap<string, string> = NO_NAMES
): T[] {
	const words = fold(filter.text ?? '')
		.split(/\s+/)
		.filter((w) => w !== '');
	const tag = fold(filter.tag?.trim() ?? '');
	const { areaId, kind, condition } = filter;
	const out: T[] = [];
	for (const f of list) {
		if (f.deleted === 1) continue;
		const c = f.capture;
		if (kind && c.kind !== kind) continue;
		if (areaId && (areaId === NO_AREA ? c.areaId !== undefined : c.areaId !== areaId)) continue;
		if (condition && (c.kind !== 'trap' || c.inputs.condition !== condition)) continue;
		if (tag !== '' || words.length > 0) {
			const s = searchable(f, names);
			if (tag !== '' && !s.tag.startsWith(tag)) continue;
			if (!words.every((w) => s.text.includes(w))) continue;
		}
		out.push(f);
	}
	return out;
}

export interface TrapGroup {
	/** null: traps with no area, or an area the site no longer lists. */
	area: Area | null;
	/** By tag, numbers in natural order (ST-9 before ST-10). */
	assets: DeviceAsset[];
}

const byTag = (a: DeviceAsset, b: DeviceAsset) =>
	a.tag.localeCompare(b.tag, undefined, { numeric: true, sensitivity: 'base' });

/**
 * The site's tagged traps with no trap test on this survey yet, grouped by area in the site's
 * order, traps without an area last. `findings` are the survey's own; a tag matches
 * whatever its case ("st-101" is the trap tagged "ST-101").
 */
export function trapsToTest(
	assets: readonly DeviceAsset[],
	findings: readonly DeviceFinding[],
	areas: readonly Area[]
): TrapGroup[] {
	const tested = new Set<string>();
	for (const f of findings) {
		if (f.deleted === 0 && f.capture.kind === 'trap' && f.capture.assetTag !== undefined) {
			tested.add(f.capture.assetTag.toLowerCase());
		}
	}
	const ordered = [...areas].sort((a, b) => a.sortOrder - b.sortOrder);
	const known = new Set(ordered.map((a) => a.id));
	const groups = new Map<string | null, DeviceAsset[]>();
	for (const asset of assets) {
		if (asset.kind !== 'trap' || tested.has(asset.tag.toLowerCase())) continue;
		const key = asset.areaId !== null && known.has(asset.areaId) ? asset.areaId : null;
		let group = groups.get(key);
		if (!group) groups.set(key, (group = []));
		group.push(asset);
	}
	const out: TrapGroup[] = [];
	for (const area of [...ordered, null]) {
		const group = groups.get(area?.id ?? null);
		if (group) out.push({ area, assets: group.sort(byTag) });
	}
	return out;
}

export type KindCounts = Record<FindingKind, number> & { total: number };

/** Findings per area (key null: no area) and kind. */
export function areaCounts(findings: readonly DeviceFinding[]): Map<string | null, KindCounts> {
	const counts = new Map<string | null, KindCounts>();
	for (const f of findings) {
		if (f.deleted === 1) continue;
		const key = f.capture.areaId ?? null;
		let c = counts.get(key);
		if (!c) counts.set(key, (c = { trap: 0, leak: 0, insulation: 0, header: 0, total: 0 }));
		c[f.capture.kind]++;
		c.total++;
	}
	return counts;
}

export interface RoundTotals {
	/** Evaluations summed. */
	findings: number;
	/** Steam lost, kg/h (findings that lose no steam as such add nothing). */
	steamLoss: number;
	/** Heat the boiler must replace, kW. */
	heatLoss: number;
	/** Fuel energy per year, GJ. */
	fuelEnergy: number;
	/** Fuel plus water cost per year, summed in whole minor units; null when nothing was priced. */
	cost: Money | null;
	/** CO2 per year, kg. */
	co2: number;
	/** Makeup water per year, m³. */
	water: number;
}

/**
 * Sums per-finding evaluations (made by the caller with evaluateFinding).
 * @throws Error when the evaluations are priced in more than one currency.
 */
export function roundTotals(evaluations: readonly FindingEvaluation[]): RoundTotals {
	let steamLoss = 0;
	let heatLoss = 0;
	let fuelEnergy = 0;
	let co2 = 0;
	let water = 0;
	let minor = 0;
	let currency: string | null = null;
	for (const e of evaluations) {
		steamLoss += e.steamLoss ?? 0;
		heatLoss += e.heatLoss;
		fuelEnergy += e.fuelEnergy;
		co2 += e.co2;
		water += e.water;
		if (currency !== null && e.cost.currency !== currency) {
			throw new Error(
				`These findings are priced in ${currency} and ${e.cost.currency}: a round adds up in one currency`
			);
		}
		currency = e.cost.currency;
		minor += e.cost.minor;
	}
	const cost =
		currency === null ? null : { amount: fromMinorUnits(minor, currency), minor, currency };
	return { findings: evaluations.length, steamLoss, heatLoss, fuelEnergy, cost, co2, water };
}
