/**
 * The demo firm's cost library and the Maltings survey priced from it, with three measures
 * (docs/costs.md). EVERY FIGURE HERE IS INVENTED demo data — not a supplier's price, not a
 * survey of market rates — and the rows carry `demo: true`, which the Desk shows as "demo
 * values" until a person saves the entry. Idempotent: entries are inserted only where missing,
 * and the survey is priced and grouped only the first time (while it has no measure).
 */
import { and, eq, inArray, isNull, sql } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { entryKey, type EntryIdentity } from '../../costs/match';
import type { TrapType } from '../../steam/vocabulary';
import { applyLibraryCosts } from '../costs/apply';
import * as schema from '../db/schema';
import type { Db } from '../db/types';
import { createMeasure } from '../measures/write';
import { demoFirms, demoUsers } from './demo';
import { maltingsSurvey } from './maltings';

const firmId = demoFirms[0].id;
const consultant = demoUsers.find((u) => u.email === 'consultant@cinderbrook.example')!;

/** Invented: parts per trap by type, EUR cents (a replacement trap; a repair kit is ~40 %). */
const TRAP_PRICE: Partial<Record<TrapType, number>> = {
	thermodynamic: 14_000,
	'float-thermostatic': 42_000,
	'inverted-bucket': 36_000,
	thermostatic: 16_000,
	bimetallic: 19_000
};
const TRAP_DNS = [15, 20, 25];
const PIPE_DNS = [25, 50, 80, 100, 150];

type Entry = { identity: EntryIdentity; unitCost: number; labourHours: number | null };

/** The invented library: what one repair costs in EUR cents, and the labour hours it takes. */
export function demoLibrary(): Entry[] {
	const out: Entry[] = [{ identity: { kind: 'labour' }, unitCost: 6_800, labourHours: null }];
	for (const [trapType, price] of Object.entries(TRAP_PRICE) as [TrapType, number][]) {
		for (const dn of TRAP_DNS) {
			const size = 1 + (dn - 15) / 25;
			out.push({
				identity: { kind: 'trap-replacement', trapType, dn },
				unitCost: Math.round(price * size),
				labourHours: 2.5
			});
			out.push({
				identity: { kind: 'trap-repair', trapType, dn },
				unitCost: Math.round(price * size * 0.4),
				labourHours: 1
			});
		}
	}
	for (const dn of PIPE_DNS) {
		for (const thicknessMm of [50, 80]) {
			out.push({
				identity: { kind: 'insulation', dn, thicknessMm },
				unitCost: Math.round(1_800 + dn * 45 + thicknessMm * 20),
				labourHours: 0.4
			});
		}
		for (const fittingKind of ['valve', 'flange-pair'] as const) {
			out.push({
				identity: { kind: 'fitting-cover', fittingKind, dn },
				unitCost: Math.round((fittingKind === 'valve' ? 9_000 : 6_000) + dn * 90),
				labourHours: 0.5
			});
		}
	}
	// Parts for a leak's repair (packing, gasket, a valve or a section of pipe), growing with it.
	const leaks = {
		pinhole: 4_500,
		small: 11_000,
		medium: 26_000,
		large: 62_000,
		'very-large': 140_000
	};
	const leakHours = { pinhole: 1, small: 2, medium: 3.5, large: 6, 'very-large': 10 };
	for (const [sizeClass, unitCost] of Object.entries(leaks)) {
		out.push({
			identity: { kind: 'leak-repair', sizeClass: sizeClass as keyof typeof leaks },
			unitCost,
			labourHours: leakHours[sizeClass as keyof typeof leaks]
		});
	}
	return out;
}

async function findingIds(db: Db, where: ReturnType<typeof and>) {
	const rows = await db
		.select({ id: schema.findings.id })
		.from(schema.findings)
		.where(
			and(eq(schema.findings.surveyId, maltingsSurvey.id), isNull(schema.findings.deletedAt), where)
		);
	return rows.map((r) => r.id);
}

export async function seedCosts(db: Db): Promise<void> {
	const { costEntries, measures, findings } = schema;
	for (const e of demoLibrary()) {
		const i = e.identity as Record<string, unknown>;
		await db
			.insert(costEntries)
			.values({
				id: randomUUID(),
				firmId,
				kind: e.identity.kind,
				entryKey: entryKey(e.identity),
				trapType: (i.trapType as string) ?? null,
				dn: (i.dn as number) ?? null,
				thicknessMm: (i.thicknessMm as number) ?? null,
				fittingKind: (i.fittingKind as string) ?? null,
				sizeClass: (i.sizeClass as string) ?? null,
				currency: 'EUR',
				unitCost: e.unitCost,
				labourHours: e.labourHours,
				demo: true,
				note: 'Invented demo figure'
			})
			.onDuplicateKeyUpdate({ set: { id: sql`id` } });
	}
	const [{ n }] = await db
		.select({ n: sql<number>`COUNT(*)` })
		.from(measures)
		.where(eq(measures.surveyId, maltingsSurvey.id));
	if (Number(n) > 0) return;
	await applyLibraryCosts(db, firmId, consultant.id, maltingsSurvey.id, true);
	const t = { firmId, actorId: consultant.id, surveyId: maltingsSurvey.id };
	const none = { access: 0, scaffold: 0, shutdown: 0, other: 0 };
	const groups = [
		{
			name: 'Replace the failed traps',
			description: 'Every trap found failed open or failed closed, replaced like for like.',
			extras: { ...none, access: 45_000 },
			ids: await findingIds(
				db,
				and(
					eq(findings.kind, 'trap'),
					inArray(findings.condition, ['failed-open', 'failed-closed'])
				)
			)
		},
		{
			name: 'Re-lag the bare pipe runs',
			description: 'Mineral-wool sections with aluminium cladding on every bare run found.',
			extras: { ...none, scaffold: 240_000 },
			ids: await findingIds(db, eq(findings.kind, 'insulation'))
		},
		{
			name: 'Leak and trap-kit round in the autumn stop',
			description: 'Steam leaks and leaking traps, done during the planned shutdown.',
			extras: { ...none, shutdown: 120_000 },
			ids: await findingIds(
				db,
				sql`(${findings.kind} = 'leak' OR (${findings.kind} = 'trap' AND ${findings.condition} = 'leaking'))`
			)
		}
	];
	for (const g of groups) {
		if (g.ids.length === 0) continue;
		await createMeasure(
			db,
			t,
			{ name: g.name, description: g.description, extras: g.extras, otherLabel: null },
			g.ids
		);
	}
}
