/**
 * Measures against the real MariaDB (docs/costs.md): a measure's cost is its findings' repair
 * costs plus its own extra costs, its saving their savings, its payback the one over the other,
 * with NPV and IRR over the basis's life and rate (checked against $lib/economics, itself
 * checked against a published worked example in its own specs); findings of another survey or
 * firm refused with nothing written; a published survey's measures frozen. Then the findings
 * table's "Add to measure" (moves counted, bad input refused) and the measure form's version
 * check, through the route actions as SvelteKit calls them.
 */
import { isHttpError } from '@sveltejs/kit';
import { and, desc, eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { measureEconomics } from '../../src/lib/economics';
import { pool as appPool } from '../../src/lib/server/db';
import * as schema from '../../src/lib/server/db/schema';
import {
	MEASURE_MOVED_MESSAGE,
	MEASURE_NOT_HERE_MESSAGE
} from '../../src/lib/server/measures/desk';
import { surveyMeasures } from '../../src/lib/server/measures/sums';
import { DESK_LOCKED_MESSAGE } from '../../src/lib/server/publish/lock';
import { actions as tableActions } from '../../src/routes/(desk)/desk/surveys/[surveyId]/findings/+page.server';
import { actions as measureActions } from '../../src/routes/(desk)/desk/surveys/[surveyId]/measures/[measureId]/+page.server';
import {
	changeMembers,
	createMeasure,
	deleteMeasure,
	updateMeasure
} from '../../src/lib/server/measures/write';
import {
	actor,
	cleanUp,
	F,
	firm,
	otherFirm,
	otherSurvey,
	rows,
	setUp,
	survey
} from './costs-fixture';
import { testDatabase } from './db';
import { routeEvent } from './walk-api';

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
	await appPool.end();
});

const publish = (published: boolean) =>
	db
		.update(schema.surveys)
		.set(
			published
				? { status: 'published', publishedAt: new Date() }
				: { status: 'in-review', publishedAt: null }
		)
		.where(eq(schema.surveys.id, survey));

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
		const extras = { access: 1_000, scaffold: 50_000, shutdown: 2_000, other: 3_000 };
		const changed = { ...details(50_000), extras, otherLabel: 'Lagging removal' };
		expect(await updateMeasure(db, t, measureId, changed, 1)).toMatchObject({ kind: 'done' });
		const [m] = await surveyMeasures(db, survey);
		expect(m.version).toBe(2);
		expect(m.extraCost).toBe(56_000);
		// Saved over a version someone else has since changed: refused, nothing written.
		expect(await updateMeasure(db, t, measureId, details(7), 1)).toEqual({
			kind: 'moved',
			version: 2
		});
		expect((await surveyMeasures(db, survey))[0]).toMatchObject({ version: 2, extraCost: 56_000 });
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
		await publish(true);
		try {
			const before = await members();
			expect(await changeMembers(db, t, measureId, 'add', [F.leak])).toEqual({ kind: 'frozen' });
			expect(await updateMeasure(db, t, measureId, details(9), 2)).toEqual({ kind: 'frozen' });
			expect(await deleteMeasure(db, t, measureId)).toEqual({ kind: 'frozen' });
			expect(await members()).toEqual(before);
			expect((await surveyMeasures(db, survey))[0].extraCost).toBe(56_000);
		} finally {
			await publish(false);
		}
	});

	it('deletes it: its findings stay, no longer grouped', async () => {
		expect(await deleteMeasure(db, t, measureId)).toMatchObject({ kind: 'done' });
		expect(await surveyMeasures(db, survey)).toEqual([]);
		expect((await members()).every((r) => r.measureId === null)).toBe(true);
	});
});

/** The fixture's consultant as the app sees them signed in. */
const person: SessionUser = {
	id: actor,
	firmId: firm,
	email: 'costs.spec@quillmoor.example',
	name: 'Costs spec consultant',
	role: 'consultant',
	clientCompanyId: null
};

type Posted = { status?: number; data?: Record<string, unknown> } & Record<string, unknown>;

/** Posts a form to a page's action as SvelteKit would; an HTTP error comes back as its status. */
async function post(
	action: (event: never) => unknown,
	route: string,
	path: string,
	params: Record<string, string>,
	pairs: [string, string][],
	user: SessionUser = person
): Promise<Posted> {
	const request = new Request(`http://127.0.0.1${path}`, {
		method: 'POST',
		headers: { 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams(pairs)
	});
	try {
		return (await action(routeEvent(user, route, request, params) as never)) as Posted;
	} catch (e) {
		if (isHttpError(e)) return { status: e.status };
		throw e;
	}
}

const addToMeasure = (measure: string, ids: string[], user?: SessionUser) =>
	post(
		tableActions.addToMeasure,
		'/(desk)/desk/surveys/[surveyId]/findings',
		`/desk/surveys/${survey}/findings?/addToMeasure`,
		{ surveyId: survey },
		[['measureId', measure], ...ids.map((id): [string, string] => ['findingIds', id])],
		user
	);

describe('adding ticked findings to an existing measure (the findings table)', () => {
	const ids: Record<'traps' | 'lagging' | 'valves' | 'spring', string> = {
		traps: '',
		lagging: '',
		valves: '',
		spring: ''
	};
	const made = async (target: typeof t, name: string, findingIds: string[]) => {
		const out = await createMeasure(db, target, { ...details(), name }, findingIds);
		if (out.kind !== 'done') throw new Error(`measure ${name} not made: ${out.kind}`);
		return out.measureId;
	};

	beforeAll(async () => {
		ids.traps = await made(t, 'Dryer traps', [F.leakingTrap, F.failedTrap]);
		ids.lagging = await made(t, 'Header lagging', [F.pipe]);
		ids.valves = await made(t, 'Valve covers', [F.valves]);
		ids.spring = await made({ ...t, surveyId: otherSurvey }, 'Spring traps', [F.otherSurveys]);
	});

	it('offers the survey’s own measures on the table page, in the consultant’s order', async () => {
		const { load } =
			await import('../../src/routes/(desk)/desk/surveys/[surveyId]/findings/+page.server');
		const request = new Request(`http://127.0.0.1/desk/surveys/${survey}/findings`);
		const page = (await load(
			routeEvent(person, '/(desk)/desk/surveys/[surveyId]/findings', request, {
				surveyId: survey
			}) as never
		)) as { measures: { id: string; name: string }[] };
		expect(page.measures).toEqual([
			{ id: ids.traps, name: 'Dryer traps' },
			{ id: ids.lagging, name: 'Header lagging' },
			{ id: ids.valves, name: 'Valve covers' }
		]);
	});

	it('adds them, says how many moved from which measure and which were in it already', async () => {
		const out = await addToMeasure(ids.valves, [
			F.leakingTrap,
			F.failedTrap,
			F.pipe,
			F.valves,
			F.leak
		]);
		expect(out).toEqual({
			added: {
				measureId: ids.valves,
				name: 'Valve covers',
				findings: 5,
				note: ' (2 moved from Dryer traps, 1 from Header lagging; 1 was in it already).'
			}
		});
		const grouped = Object.fromEntries((await members()).map((r) => [r.id, r.measureId]));
		for (const f of [F.leakingTrap, F.failedTrap, F.pipe, F.valves, F.leak]) {
			expect(grouped[f]).toBe(ids.valves);
		}
		expect(grouped[F.otherSurveys]).toBe(ids.spring);
		const sums = Object.fromEntries((await surveyMeasures(db, survey)).map((m) => [m.name, m]));
		expect(sums['Valve covers'].findings).toBe(5);
		expect(sums['Dryer traps'].findings).toBe(0);
		expect(sums['Header lagging'].findings).toBe(0);
		const [audit] = await db
			.select({ action: schema.auditLog.action, after: schema.auditLog.after })
			.from(schema.auditLog)
			.where(and(eq(schema.auditLog.entity, 'measure'), eq(schema.auditLog.entityId, ids.valves)))
			.orderBy(desc(schema.auditLog.id))
			.limit(1);
		expect(audit.action).toBe('add-findings');
		expect((audit.after as { moved: { name: string; count: number }[] }).moved).toEqual([
			{ measureId: ids.traps, name: 'Dryer traps', count: 2 },
			{ measureId: ids.lagging, name: 'Header lagging', count: 1 }
		]);
	});

	it('a single finding moved from one measure reads "1 moved from …"', async () => {
		const out = await addToMeasure(ids.traps, [F.leakingTrap]);
		expect(out.added).toMatchObject({ findings: 1, note: ' (1 moved from Valve covers).' });
		const fresh = await addToMeasure(ids.lagging, [F.surface]);
		expect(fresh.added).toMatchObject({ name: 'Header lagging', findings: 1, note: '.' });
	});

	it('refuses bad input with a clear message and writes nothing', async () => {
		const before = await members();
		const refused = async (measure: string, findingIds: string[], message: RegExp | string) => {
			const out = await addToMeasure(measure, findingIds);
			expect(out.status).toBe(400);
			expect(out.data?.error).toEqual(
				typeof message === 'string' ? message : expect.stringMatching(message)
			);
			expect(await members()).toEqual(before);
		};
		await refused(ids.traps, [], 'Tick at least one finding. Nothing was changed.');
		await refused('', [F.leak], 'Choose the measure to add the findings to. Nothing was changed.');
		await refused(
			'not-a-measure',
			[F.leak],
			'Choose one of this survey’s measures. Nothing was changed.'
		);
		await refused(
			ids.traps,
			[F.leak, 'not-a-finding'],
			'One of the ticked findings is not a finding id: reload the table and tick again. Nothing was changed.'
		);
		// Another survey's measure, and a well-formed id that is no measure at all.
		await refused(ids.spring, [F.leak], MEASURE_NOT_HERE_MESSAGE);
		await refused('00000000-0000-4000-8000-0000000000aa', [F.leak], MEASURE_NOT_HERE_MESSAGE);
		// Another survey's finding among this survey's: the whole change is refused.
		await refused(
			ids.traps,
			[F.leak, F.otherSurveys],
			/^One of the picked findings is not a finding of this survey.*nothing was changed/
		);
		const out = await addToMeasure(ids.traps, [F.leak]);
		expect(out.added).toMatchObject({ findings: 1 });
		await addToMeasure(ids.valves, [F.leak]);
	});

	it('refuses a published survey with the lock message, and another firm with 404', async () => {
		const before = await members();
		await publish(true);
		try {
			const out = await addToMeasure(ids.traps, [F.leak]);
			expect(out.status).toBe(409);
			expect(out.data?.error).toBe(DESK_LOCKED_MESSAGE);
		} finally {
			await publish(false);
		}
		const stranger = { ...person, id: otherFirm, firmId: otherFirm };
		expect((await addToMeasure(ids.traps, [F.leak], stranger)).status).toBe(404);
		expect(await members()).toEqual(before);
	});
});

describe('the measure form’s version check', () => {
	let id = '';
	const form = (version: string, name: string): [string, string][] => [
		['version', version],
		['name', name],
		['description', ''],
		['access', ''],
		['scaffold', '250'],
		['shutdown', ''],
		['other', ''],
		['otherLabel', '']
	];
	const update = (pairs: [string, string][]) =>
		post(
			measureActions.update,
			'/(desk)/desk/surveys/[surveyId]/measures/[measureId]',
			`/desk/surveys/${survey}/measures/${id}?/update`,
			{ surveyId: survey, measureId: id },
			pairs
		);
	const stored = async () =>
		(
			await db
				.select({
					name: schema.measures.name,
					version: schema.measures.version,
					scaffold: schema.measures.scaffoldCost
				})
				.from(schema.measures)
				.where(eq(schema.measures.id, id))
		)[0];

	beforeAll(async () => {
		const out = await createMeasure(db, t, { ...details(), name: 'Flash vessel' }, []);
		id = out.kind === 'done' ? out.measureId : '';
	});

	it('saves at the version the form was opened at, as the next version', async () => {
		expect(await stored()).toMatchObject({ version: 1 });
		expect(await update(form('1', 'Flash vessel and vent'))).toEqual({ updated: true });
		expect(await stored()).toEqual({
			name: 'Flash vessel and vent',
			version: 2,
			scaffold: 25_000
		});
	});

	it('refuses a save over someone else’s change, keeps what was typed, writes nothing', async () => {
		const out = await update(form('1', 'Flash vessel, my words'));
		expect(out.status).toBe(409);
		expect(out.data?.error).toBe(MEASURE_MOVED_MESSAGE);
		expect(out.data?.values).toMatchObject({ name: 'Flash vessel, my words', scaffold: '250' });
		expect(await stored()).toEqual({
			name: 'Flash vessel and vent',
			version: 2,
			scaffold: 25_000
		});
	});

	it('refuses a form without its version (or a broken one) with words, nothing written', async () => {
		for (const version of ['', 'two', '0']) {
			const out = await update(form(version, 'Flash vessel, no version'));
			expect(out.status).toBe(400);
			expect(out.data?.error).toBe(
				'This form lost track of the measure’s version: open the measure again'
			);
			expect(out.data?.values).toMatchObject({ name: 'Flash vessel, no version' });
		}
		expect(await stored()).toMatchObject({ name: 'Flash vessel and vent', version: 2 });
	});

	it('on a published survey answers the lock message before the version', async () => {
		await publish(true);
		try {
			const out = await update(form('1', 'Flash vessel, frozen'));
			expect(out.status).toBe(409);
			expect(out.data?.error).toBe(DESK_LOCKED_MESSAGE);
		} finally {
			await publish(false);
		}
		expect(await stored()).toMatchObject({ name: 'Flash vessel and vent', version: 2 });
	});
});
