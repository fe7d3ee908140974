/**
 * Measures against the real MariaDB (docs/costs.md): a measure's cost is its findings' repair
 * costs plus its own extra costs, its saving their savings, its payback the one over the other,
 * with NPV and IRR over the basis's life and rate (checked against $lib/economics, itself
 * checked against a published worked example in its own specs); findings of another survey or
 * firm refused with nothing written; a published survey's measures frozen.
 */
import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { measureEconomics } from '../../src/lib/economics';
import * as schema from '../../src/lib/server/db/schema';
import { surveyMeasures } from '../../src/lib/server/measures/sums';
import {
	changeMembers,
	createMeasure,
	deleteMeasure,
	updateMeasure
} from '../../src/lib/server/measures/write';
import { actor, cleanUp, F, firm, otherFirm, rows, setUp, survey } from './costs-fixture';
import { testDatabase } from './db';

const { pool, db } = testDatabase();
const t = { firmId: firm, actorId: actor, surveyId: survey };
const details = (scaffold = 0) => ({
	name: 'Replace the dryer hall traps',
	description: null,
	extras: { access: 0, scaffold, shutdown: 0, other: 0 },
	otherLabel: null
});
const REPAIR = { [F.leakingTrap]: 14_500, [F.failedTrap]: 34_750, [F.pipe]: 55_500 };
const members = () =>
	db
		.select({ id: schema.findings.id, measureId: schema.findings.measureId })
		.from(schema.findings)
		.where(inArray(schema.findings.id, Object.values(F)));

beforeAll(async () => {
	await setUp(db);
	for (const [id, repairCost] of Object.entries(REPAIR)) {
		await db
			.update(schema.findings)
			.set({ repairCost, repairCostSource: 'library' })
			.where(eq(schema.findings.id, id));
	}
});
afterAll(async () => {
	await cleanUp(db);
	await pool.end();
});

let measureId = '';

describe('a measure', () => {
	it('sums its findings and its own extra costs; payback, NPV and IRR over the basis', async () => {
		const out = await createMeasure(db, t, details(120_000), [F.leakingTrap, F.failedTrap, F.pipe]);
		expect(out).toMatchObject({ kind: 'done', findings: 3 });
		measureId = out.kind === 'done' ? out.measureId : '';
		const [m] = await surveyMeasures(db, survey);
		const saving = rows
			.filter((r) => [F.leakingTrap, F.failedTrap, F.pipe].includes(r.id as never))
			.reduce((s, r) => s + (r.cost ?? 0), 0);
		expect(m).toMatchObject({
			findings: 3,
			repairCost: 14_500 + 34_750 + 55_500,
			extraCost: 120_000,
			cost: 14_500 + 34_750 + 55_500 + 120_000,
			annualSaving: saving,
			withoutRepairCost: 0
		});
		expect(m.paybackYears).toBeCloseTo(m.cost! / saving, 12);
		expect(m.steamKgH).toBeCloseTo(saving / 1000, 9);
		const expected = measureEconomics(
			{ costMinor: m.cost!, annualSavingMinor: saving },
			{ discountRate: 0.08, lifeYears: 10 }
		);
		expect(m.economics).toMatchObject({ lifeYears: 10, discountRate: 0.08 });
		expect(m.economics!.npvMinor).toBeCloseTo(expected.npvMinor, 6);
		expect(m.economics!.irr).toBeCloseTo(expected.irr!, 9);
	});

	it('counts a finding without a repair cost and leaves it out of the cost', async () => {
		expect(await changeMembers(db, t, measureId, 'add', [F.workingTrap])).toMatchObject({
			kind: 'done',
			findings: 1
		});
		const [m] = await surveyMeasures(db, survey);
		expect(m).toMatchObject({ findings: 4, withoutRepairCost: 1, cost: 224_750 });
		await changeMembers(db, t, measureId, 'remove', [F.workingTrap]);
		expect((await surveyMeasures(db, survey))[0].findings).toBe(3);
	});

	it('changes its extra costs, and refuses another survey’s findings with nothing written', async () => {
		await updateMeasure(db, t, measureId, {
			...details(50_000),
			extras: { access: 1_000, scaffold: 50_000, shutdown: 2_000, other: 3_000 },
			otherLabel: 'Lagging removal'
		});
		const [m] = await surveyMeasures(db, survey);
		expect(m.extraCost).toBe(56_000);
		expect(m.cost).toBe(104_750 + 56_000);
		const before = await members();
		const out = await changeMembers(db, t, measureId, 'add', [F.leak, F.otherSurveys]);
		expect(out).toEqual({ kind: 'foreign', count: 1 });
		expect(await members()).toEqual(before);
		const made = await createMeasure(db, t, details(), [F.otherSurveys]);
		expect(made).toEqual({ kind: 'foreign', count: 1 });
		expect((await surveyMeasures(db, survey)).length).toBe(1);
	});

	it('refuses another firm’s survey and a published survey, writing nothing', async () => {
		const other = { ...t, firmId: otherFirm };
		expect(await createMeasure(db, other, details(), [F.leak])).toEqual({ kind: 'missing' });
		expect(await deleteMeasure(db, other, measureId)).toEqual({ kind: 'missing' });
		await db
			.update(schema.surveys)
			.set({ status: 'published', publishedAt: new Date() })
			.where(eq(schema.surveys.id, survey));
		try {
			const before = await members();
			expect(await changeMembers(db, t, measureId, 'add', [F.leak])).toEqual({ kind: 'frozen' });
			expect(await updateMeasure(db, t, measureId, details(9))).toEqual({ kind: 'frozen' });
			expect(await deleteMeasure(db, t, measureId)).toEqual({ kind: 'frozen' });
			expect(await members()).toEqual(before);
			expect((await surveyMeasures(db, survey))[0].extraCost).toBe(56_000);
		} finally {
			await db
				.update(schema.surveys)
				.set({ status: 'in-review', publishedAt: null })
				.where(eq(schema.surveys.id, survey));
		}
	});

	it('deletes it: its findings stay, no longer grouped', async () => {
		expect(await deleteMeasure(db, t, measureId)).toMatchObject({ kind: 'done' });
		expect(await surveyMeasures(db, survey)).toEqual([]);
		expect((await members()).every((r) => r.measureId === null)).toBe(true);
	});
});
