/**
 * The cost library against the real MariaDB (docs/costs.md): entries saved, changed and retired
 * with a version and an audit row each (a change is traceable); a survey priced from the library
 * in one go, leaving edited and quoted costs alone unless asked, counting what had no entry and
 * why, the payback moving with the cost; one finding's source set by hand; a published survey
 * and another firm's ids refused with nothing written. Figures are this file's invented ones.
 */
import { and, eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { costEntryFormSchema } from '../../src/lib/schemas/costs';
import { applyLibraryCosts } from '../../src/lib/server/costs/apply';
import { setFindingCost } from '../../src/lib/server/costs/finding-cost';
import {
	listCostEntries,
	retireCostEntry,
	saveCostEntry
} from '../../src/lib/server/costs/library';
import * as schema from '../../src/lib/server/db/schema';
import { actor, cleanUp, F, firm, otherFirm, setUp, survey } from './costs-fixture';
import { testDatabase } from './db';

const { pool, db } = testDatabase();

const entry = (form: Record<string, string>) => {
	const parsed = costEntryFormSchema.safeParse({
		currency: 'EUR',
		labourHours: '',
		note: '',
		...form
	});
	if (!parsed.success) throw new Error(parsed.error.issues[0].message);
	return parsed.data;
};

async function findingsOf(ids: string[]) {
	const rows = await db
		.select({
			id: schema.findings.id,
			repairCost: schema.findings.repairCost,
			source: schema.findings.repairCostSource,
			note: schema.findings.repairCostNote,
			entryId: schema.findings.costEntryId,
			entryVersion: schema.findings.costEntryVersion,
			payback: schema.findings.paybackYears
		})
		.from(schema.findings)
		.where(inArray(schema.findings.id, ids));
	return Object.fromEntries(rows.map((r) => [r.id, r]));
}

const counter = async () => {
	const [row] = await db
		.select({ value: schema.changeCounters.value })
		.from(schema.changeCounters)
		.where(eq(schema.changeCounters.firmId, firm));
	return Number(row?.value ?? 0);
};

let trapRepair = { entryId: '', version: 0 };

beforeAll(async () => {
	await setUp(db);
	const made: Record<string, string>[] = [
		{ kind: 'trap-repair', trapType: 'thermodynamic', dn: '15', unitCost: '80', labourHours: '1' },
		{
			kind: 'trap-replacement',
			trapType: 'thermodynamic',
			dn: '15',
			unitCost: '250',
			labourHours: '1.5'
		},
		{ kind: 'insulation', dn: '50', thicknessMm: '50', unitCost: '30', labourHours: '0.25' },
		{ kind: 'fitting-cover', fittingKind: 'valve', dn: '50', unitCost: '90' },
		{ kind: 'leak-repair', sizeClass: 'medium', unitCost: '50', labourHours: '2' },
		{ kind: 'labour', unitCost: '65' }
	];
	for (const form of made) {
		const saved = await saveCostEntry(db, firm, actor, entry(form), null);
		expect(saved.kind).toBe('saved');
		if (form.kind === 'trap-repair' && saved.kind === 'saved') {
			trapRepair = { entryId: saved.id, version: saved.version };
		}
	}
});
afterAll(async () => {
	await cleanUp(db);
	await pool.end();
});

describe('the cost library', () => {
	it('refuses a second entry for the same type and size, and another firm’s entry', async () => {
		const again = entry({ kind: 'leak-repair', sizeClass: 'medium', unitCost: '1' });
		expect(await saveCostEntry(db, firm, actor, again, null)).toEqual({ kind: 'duplicate' });
		const form = entry({ kind: 'trap-repair', trapType: 'thermodynamic', dn: '15', unitCost: '1' });
		expect(await saveCostEntry(db, otherFirm, actor, form, trapRepair)).toEqual({
			kind: 'missing'
		});
		expect((await listCostEntries(db, otherFirm)).length).toBe(0);
	});

	it('keeps every change traceable: a new version and an audit row with before and after', async () => {
		const form = entry({
			kind: 'trap-repair',
			trapType: 'thermodynamic',
			dn: '15',
			unitCost: '80',
			labourHours: '1',
			note: 'kit price 2026'
		});
		const saved = await saveCostEntry(db, firm, actor, form, trapRepair);
		expect(saved).toMatchObject({ kind: 'saved', version: 2 });
		// The form opened at version 1 is now stale: refused, nothing changed.
		expect(
			await saveCostEntry(
				db,
				firm,
				actor,
				entry({ kind: 'trap-repair', trapType: 'thermodynamic', dn: '15', unitCost: '1' }),
				trapRepair
			)
		).toEqual({ kind: 'moved' });
		trapRepair = { ...trapRepair, version: 2 };
		const audit = await db
			.select()
			.from(schema.auditLog)
			.where(
				and(
					eq(schema.auditLog.entity, 'cost-entry'),
					eq(schema.auditLog.entityId, trapRepair.entryId)
				)
			);
		expect(audit.map((a) => a.action)).toEqual(['create', 'update']);
		expect(audit[1].before).toMatchObject({ version: 1, unitCost: 8000, note: null });
		expect(audit[1].after).toMatchObject({ version: 2, unitCost: 8000, note: 'kit price 2026' });
	});
});

describe('pricing a survey from the library', () => {
	it('prices what matches, keeps edited and quoted costs, says why the rest has none', async () => {
		const before = await counter();
		const out = await applyLibraryCosts(db, firm, actor, survey);
		expect(out).toEqual({
			kind: 'applied',
			summary: { priced: 5, keptEdited: 1, keptQuote: 1, unmatched: { 'no-repair': 1, surface: 1 } }
		});
		expect(await counter()).toBeGreaterThan(before);
		const rows = await findingsOf(Object.values(F));
		// Invented entries above: 80 + 1 h × 65; 250 + 1.5 h × 65; 12 m × (30 + 0.25 h × 65) …
		expect(rows[F.leakingTrap]).toMatchObject({
			repairCost: 14_500,
			source: 'library',
			entryId: trapRepair.entryId,
			entryVersion: 2
		});
		expect(rows[F.leakingTrap].payback).toBeCloseTo(14_500 / 40_000, 12);
		expect(rows[F.failedTrap].repairCost).toBe(34_750);
		expect(rows[F.pipe].repairCost).toBe(55_500);
		expect(rows[F.valves].repairCost).toBe(27_000);
		expect(rows[F.leak].repairCost).toBe(18_000);
		expect(rows[F.workingTrap]).toMatchObject({ repairCost: null, source: null });
		expect(rows[F.editedTrap]).toMatchObject({ repairCost: 77_700, source: 'edited' });
		expect(rows[F.quotedTrap]).toMatchObject({
			repairCost: 55_500,
			source: 'quote',
			note: 'Valvewright quote 2211'
		});
		// Another survey's finding of the same firm is not touched.
		expect(rows[F.otherSurveys]).toMatchObject({ repairCost: null, source: null });
	});

	it('replaces edited and quoted costs only when asked', async () => {
		const out = await applyLibraryCosts(db, firm, actor, survey, true);
		expect(out).toMatchObject({
			kind: 'applied',
			summary: { priced: 7, keptEdited: 0, keptQuote: 0 }
		});
		const rows = await findingsOf([F.editedTrap, F.quotedTrap]);
		expect(rows[F.editedTrap]).toMatchObject({ repairCost: 34_750, source: 'library' });
		expect(rows[F.quotedTrap]).toMatchObject({ repairCost: 34_750, source: 'library', note: null });
	});

	it('takes a quote for one finding, with its reference, and the payback follows', async () => {
		const target = { firmId: firm, actorId: actor, surveyId: survey, findingId: F.failedTrap };
		const out = await setFindingCost(db, target, { source: 'quote', amount: '600', note: 'Q-118' });
		expect(out).toEqual({ kind: 'saved', costMinor: 60_000 });
		const rows = await findingsOf([F.failedTrap]);
		expect(rows[F.failedTrap]).toMatchObject({
			repairCost: 60_000,
			source: 'quote',
			note: 'Q-118',
			entryId: null
		});
		expect(rows[F.failedTrap].payback).toBeCloseTo(0.5, 12);
		const surface = { ...target, findingId: F.surface };
		const none = await setFindingCost(db, surface, { source: 'library' });
		expect(none.kind).toBe('unmatched');
	});

	it('refuses another firm’s survey and finding ids, writing nothing', async () => {
		const before = await findingsOf(Object.values(F));
		expect(await applyLibraryCosts(db, otherFirm, actor, survey, true)).toEqual({
			kind: 'missing'
		});
		const target = { firmId: otherFirm, actorId: actor, surveyId: survey, findingId: F.leak };
		expect(await setFindingCost(db, target, { source: 'none' })).toEqual({ kind: 'missing' });
		expect(await findingsOf(Object.values(F))).toEqual(before);
	});

	it('refuses a published survey, writing nothing', async () => {
		await db
			.update(schema.surveys)
			.set({ status: 'published', publishedAt: new Date() })
			.where(eq(schema.surveys.id, survey));
		try {
			const before = await findingsOf(Object.values(F));
			expect(await applyLibraryCosts(db, firm, actor, survey, true)).toEqual({ kind: 'frozen' });
			const target = { firmId: firm, actorId: actor, surveyId: survey, findingId: F.leak };
			expect(
				await setFindingCost(db, target, { source: 'edited', amount: '1', note: null })
			).toEqual({ kind: 'frozen' });
			expect(await findingsOf(Object.values(F))).toEqual(before);
		} finally {
			await db
				.update(schema.surveys)
				.set({ status: 'in-review', publishedAt: null })
				.where(eq(schema.surveys.id, survey));
		}
	});

	it('retires an entry: findings keep their figure, the next pricing finds no entry', async () => {
		expect(await retireCostEntry(db, firm, actor, trapRepair)).toBe('retired');
		const out = await applyLibraryCosts(db, firm, actor, survey);
		expect(out).toMatchObject({ summary: { unmatched: { 'no-entry': 1 } } });
		expect((await findingsOf([F.leakingTrap]))[F.leakingTrap].repairCost).toBe(14_500);
	});
});
