/**
 * Which cost-library entry prices a finding, and how many units of it (docs/costs.md). Pure:
 * the same rules run on the server when a survey is priced and in tests. An entry's identity
 * inside the firm is its key, made from what a finding records: trap type and connection size,
 * pipe size and proposed insulation thickness, fitting kind and size, leak size class.
 */
import type { InsulationItem, LeakSizeClass, TrapType } from '../steam/vocabulary';

export const COST_ENTRY_KINDS = [
	'trap-repair',
	'trap-replacement',
	'insulation',
	'fitting-cover',
	'leak-repair',
	'labour'
] as const;
export type CostEntryKind = (typeof COST_ENTRY_KINDS)[number];

/** The fittings a cover is made for (the insulation items other than a pipe run or a surface). */
export const FITTING_KINDS = ['valve', 'flange-pair'] as const satisfies readonly InsulationItem[];
export type FittingKind = (typeof FITTING_KINDS)[number];

export type EntryIdentity =
	| { kind: 'trap-repair' | 'trap-replacement'; trapType: TrapType; dn: number }
	| { kind: 'insulation'; dn: number; thicknessMm: number }
	| { kind: 'fitting-cover'; fittingKind: FittingKind; dn: number }
	| { kind: 'leak-repair'; sizeClass: LeakSizeClass }
	| { kind: 'labour' };

/** The entry's key: unique per firm, what a finding is matched on. */
export function entryKey(e: EntryIdentity): string {
	switch (e.kind) {
		case 'trap-repair':
		case 'trap-replacement':
			return `${e.kind}:${e.trapType}:${e.dn}`;
		case 'insulation':
			return `insulation:${e.dn}:${e.thicknessMm}`;
		case 'fitting-cover':
			return `fitting-cover:${e.fittingKind}:${e.dn}`;
		case 'leak-repair':
			return `leak-repair:${e.sizeClass}`;
		case 'labour':
			return 'labour';
	}
}

/** What is read of a finding to match it (its kind and stored inputs). */
export interface MatchedFinding {
	kind: string;
	inputs: Record<string, unknown>;
}

/** Why a finding has no library cost (the words the Desk shows, grouped by reason). */
export const NO_MATCH_REASONS = {
	'no-repair':
		'needs no repair (a working trap, one out of service or not reached, a header reading)',
	surface: 'is a flat surface: priced by quote, the library has no entry per square metre',
	'no-size': 'was recorded by outer diameter or hole size rather than a nominal size or size class',
	'no-length': 'is a pipe run without a length',
	'no-entry': 'has no library entry for its type and size',
	currency: 'has a library entry in another currency than the site’s',
	'no-labour': 'has an entry with labour hours but the library has no labour rate in that currency'
} as const;
export type NoMatchReason = keyof typeof NO_MATCH_REASONS;

export type Match =
	| { ok: true; key: string; quantity: number; unit: 'each' | 'm' }
	| { ok: false; reason: NoMatchReason };

const TRAP_REPAIRED = new Set(['leaking', 'flooded']);
const TRAP_REPLACED = new Set(['failed-open', 'failed-closed']);

const num = (v: unknown): number | undefined =>
	typeof v === 'number' && Number.isFinite(v) ? v : undefined;

/** Total proposed insulation thickness of the layers, whole mm (inputs hold metres). */
export function layersThicknessMm(layers: unknown): number | undefined {
	if (!Array.isArray(layers) || layers.length === 0) return undefined;
	let m = 0;
	for (const layer of layers) {
		const t = num((layer as { thickness?: unknown })?.thickness);
		if (t === undefined) return undefined;
		m += t;
	}
	return Math.round(m * 1000);
}

/** The entry key a finding is priced from and its quantity, or why there is none. */
export function matchFinding(f: MatchedFinding): Match {
	const i = f.inputs;
	if (f.kind === 'trap') {
		const condition = String(i.condition);
		const kind = TRAP_REPLACED.has(condition)
			? 'trap-replacement'
			: TRAP_REPAIRED.has(condition)
				? 'trap-repair'
				: null;
		const dn = num(i.dn);
		if (!kind) return { ok: false, reason: 'no-repair' };
		if (dn === undefined) return { ok: false, reason: 'no-size' };
		const key = entryKey({ kind, trapType: i.trapType as TrapType, dn });
		return { ok: true, key, quantity: 1, unit: 'each' };
	}
	if (f.kind === 'leak') {
		if (typeof i.sizeClass !== 'string') return { ok: false, reason: 'no-size' };
		const key = entryKey({ kind: 'leak-repair', sizeClass: i.sizeClass as LeakSizeClass });
		return { ok: true, key, quantity: 1, unit: 'each' };
	}
	if (f.kind === 'insulation') {
		const item = String(i.item);
		if (item === 'surface') return { ok: false, reason: 'surface' };
		const dn = num(i.dn);
		if (dn === undefined) return { ok: false, reason: 'no-size' };
		if (item === 'pipe') {
			const length = num(i.length);
			const thicknessMm = layersThicknessMm(i.layers);
			if (length === undefined || length <= 0) return { ok: false, reason: 'no-length' };
			if (thicknessMm === undefined) return { ok: false, reason: 'no-size' };
			return {
				ok: true,
				key: entryKey({ kind: 'insulation', dn, thicknessMm }),
				quantity: length,
				unit: 'm'
			};
		}
		const fittingKind = item as FittingKind;
		const count = num(i.count) ?? 1;
		return {
			ok: true,
			key: entryKey({ kind: 'fitting-cover', fittingKind, dn }),
			quantity: count,
			unit: 'each'
		};
	}
	return { ok: false, reason: 'no-repair' };
}

/** A library entry as pricing reads it. */
export interface PricedEntry {
	id: string;
	version: number;
	currency: string;
	/** Per unit (or per hour, for labour), minor units. */
	unitCost: number;
	labourHours: number | null;
}

export type Priced =
	{ ok: true; entry: PricedEntry; costMinor: number } | { ok: false; reason: NoMatchReason };

/**
 * The repair cost of a matched finding, whole minor units of the site's currency:
 * quantity × (unit cost + labour hours × the labour rate), rounded half up. An entry or labour
 * rate in another currency is never converted (no exchange rate is guessed).
 */
export function priceMatch(
	match: Match,
	entries: ReadonlyMap<string, PricedEntry>,
	currency: string
): Priced {
	if (!match.ok) return match;
	const entry = entries.get(match.key);
	if (!entry) return { ok: false, reason: 'no-entry' };
	if (entry.currency !== currency) return { ok: false, reason: 'currency' };
	let perUnit = entry.unitCost;
	if (entry.labourHours !== null && entry.labourHours > 0) {
		const labour = entries.get('labour');
		if (!labour || labour.currency !== currency) return { ok: false, reason: 'no-labour' };
		perUnit += entry.labourHours * labour.unitCost;
	}
	return { ok: true, entry, costMinor: Math.round(match.quantity * perUnit) };
}
