/**
 * Rows for the Desk's benchmark: many findings of an invented mix (traps of several types and
 * conditions, leaks of every size, insulation gaps), each template priced through figureColumns
 * on its site's context, then copied with its own id, place, tag, notes and repair cost.
 */
import { randomUUID } from 'node:crypto';
import type { FindingInput } from '../src/lib/steam/index';
import * as schema from '../src/lib/server/db/schema';
import type { Db } from '../src/lib/server/db/types';
import { pricingContext } from '../src/lib/server/pricing/context';
import { saveCostBasis } from '../src/lib/server/pricing/cost-basis';
import { figureColumns } from '../src/lib/server/pricing/figures';
import { creameryCostBasis } from '../src/lib/server/seed/findings';

const TRAP_TYPES = ['thermodynamic', 'inverted-bucket', 'float-thermostatic'] as const;
// Mostly working traps, as a real round finds them; a quarter failed or leaking.
const TRAP_CONDITIONS = [
	'working',
	'working',
	'working',
	'failed-open',
	'leaking',
	'failed-closed'
];
const LEAK_SIZES = ['pinhole', 'small', 'medium', 'large'] as const;
const insulation = (dn: number, length: number) => ({
	item: 'pipe',
	dn,
	length,
	ambientTemperature: 293.15,
	windSpeed: 0,
	layers: [{ thickness: 0.05, material: 'mineral-wool' }],
	jacketEmissivity: 0.1,
	bareEmissivity: 0.85
});

/** The mix: 60 % trap tests, 25 % leaks, 15 % insulation gaps. */
function template(k: number): { kind: FindingInput['kind']; inputs: Record<string, unknown> } {
	const slot = k % 20;
	if (slot < 12) {
		return {
			kind: 'trap',
			inputs: {
				trapType: TRAP_TYPES[k % 3],
				dn: [15, 20, 25][Math.floor(k / 3) % 3],
				condition: TRAP_CONDITIONS[k % TRAP_CONDITIONS.length],
				// A return at about 1 bar g (MPa absolute); the rest drain to atmosphere.
				...(k % 4 === 0
					? { discharge: 'condensate-return', backPressure: 0.2 }
					: { discharge: 'atmosphere' })
			}
		};
	}
	if (slot < 17) return { kind: 'leak', inputs: { sizeClass: LEAK_SIZES[k % 4] } };
	return { kind: 'insulation', inputs: insulation([50, 80, 100][k % 3], 3 + (k % 5) * 2) };
}

export interface BenchPlace {
	siteId: string;
	surveyId: string;
	headerIds: string[];
	areaIds: string[];
	/** Trap tags get assets of their own (the table searches and sorts by tag). */
	tags: boolean;
	/** Tag prefix: assets' tags are unique per site. */
	prefix: string;
}

const conditionOf = (t: ReturnType<typeof template>) =>
	t.kind === 'trap'
		? String(t.inputs.condition)
		: t.kind === 'leak'
			? String(t.inputs.sizeClass)
			: null;

/** Inserts `n` findings into the place's survey, in batches of 1,000. */
export async function insertBenchFindings(db: Db, place: BenchPlace, n: number): Promise<void> {
	const ctx = await pricingContext(db, place.siteId);
	const TEMPLATES = 240;
	const priced = Array.from({ length: TEMPLATES }, (_, k) => {
		const t = template(k);
		const headerId = place.headerIds[k % place.headerIds.length];
		const input = {
			id: randomUUID(),
			surveyId: place.surveyId,
			kind: t.kind,
			headerId,
			location: '',
			notes: '',
			photoIds: [],
			createdAt: '2026-11-20T08:00:00.000Z',
			updatedAt: '2026-11-20T08:00:00.000Z',
			inputs: t.inputs
		} as unknown as FindingInput;
		return { t, headerId, figures: figureColumns(ctx, input) };
	});
	const start = Date.parse('2026-11-16T06:00:00Z');
	for (let at = 0; at < n; at += 1000) {
		const count = Math.min(1000, n - at);
		const assets: (typeof schema.assets.$inferInsert)[] = [];
		const rows = Array.from({ length: count }, (_, j) => {
			const i = at + j;
			const { t, headerId, figures } = priced[(i * 7) % TEMPLATES];
			const tag =
				place.tags && t.kind === 'trap' ? `${place.prefix}-${String(i).padStart(6, '0')}` : null;
			const assetId = tag ? randomUUID() : null;
			if (tag && assetId) assets.push({ id: assetId, siteId: place.siteId, tag, headerId });
			const when = new Date(start + i * 45_000);
			return {
				id: randomUUID(),
				surveyId: place.surveyId,
				kind: t.kind,
				assetId,
				headerId,
				areaId: place.areaIds[Math.floor(i / 25) % place.areaIds.length],
				location: `Gallery ${i % 40}, line ${Math.floor(i / 40)}`,
				notes: i % 9 === 0 ? 'Plume visible from the walkway' : '',
				photoIds: i % 3 === 0 ? [randomUUID()] : [],
				inputs: t.inputs,
				condition: conditionOf(t),
				...figures,
				repairCost: t.kind === 'trap' ? 30_000 + (i % 7) * 2_500 : 12_000 + (i % 5) * 9_000,
				status: i % 10 === 0 ? 'reviewed' : 'draft',
				recordedAt: when,
				capturedAt: when
			};
		});
		if (assets.length > 0) await db.insert(schema.assets).values(assets);
		await db.insert(schema.findings).values(rows);
	}
}

export interface BenchSite {
	firmId: string;
	clientCompanyId: string;
	/** Saves the site's cost basis. */
	actorId: string;
	siteId: string;
	surveyId: string;
	/** Two headers: 10 bar and 3 bar. */
	headerIds: [string, string];
	siteName: string;
	prefix: string;
}

/**
 * A site of its own with two headers, the creamery's cost basis and one survey in review of
 * `n` findings without tags or areas (the Desk's and the reports' benchmarks at 100,000).
 */
export async function insertBenchSite(db: Db, s: BenchSite, n: number): Promise<void> {
	await db.insert(schema.sites).values({
		id: s.siteId,
		firmId: s.firmId,
		clientCompanyId: s.clientCompanyId,
		name: s.siteName,
		elevation: 120
	});
	await db.insert(schema.headers).values([
		{ id: s.headerIds[0], siteId: s.siteId, name: 'HP 10 bar', pressure: 1.1 },
		{ id: s.headerIds[1], siteId: s.siteId, name: 'LP 3 bar', pressure: 0.4 }
	]);
	await saveCostBasis(db, {
		firmId: s.firmId,
		siteId: s.siteId,
		actorId: s.actorId,
		basis: creameryCostBasis,
		note: 'bench'
	});
	await db.insert(schema.surveys).values({
		id: s.surveyId,
		firmId: s.firmId,
		siteId: s.siteId,
		name: 'Benchmark works survey',
		status: 'in-review'
	});
	await insertBenchFindings(
		db,
		{
			siteId: s.siteId,
			surveyId: s.surveyId,
			headerIds: s.headerIds,
			areaIds: [],
			tags: false,
			prefix: s.prefix
		},
		n
	);
}
