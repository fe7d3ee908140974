/**
 * One finding at the Desk against the real MariaDB: a consultant's correction becomes the next
 * version (figures recomputed and stamped, version and change_seq moved, audit row); a stale or
 * bad form writes nothing and says which field; sync conflicts settled by keeping the server's
 * finding, the device's edit or a merge, with the device's data kept on the conflict row; the
 * auditor's device pulls the answer; another firm's ids find nothing.
 */
import { and, count, eq, inArray, like } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FindingCapture, TrapCapture } from '../../src/lib/schemas/capture';
import type { FindingEditForm } from '../../src/lib/schemas/desk-finding';
import { findingsQuerySchema } from '../../src/lib/schemas/desk-findings';
import { pullResponseSchema, pushResponseSchema } from '../../src/lib/schemas/sync';
import * as schema from '../../src/lib/server/db/schema';
import { findingsPage, surveyPricing } from '../../src/lib/server/desk/findings-query';
import {
	listConflicts,
	openConflict,
	openFinding,
	saveFindingEdit,
	settleConflict
} from '../../src/lib/server/desk/finding-pages';
import { pricingContext } from '../../src/lib/server/pricing/context';
import { demoSites } from '../../src/lib/server/seed/demo';
import { captureOf, demoFindings } from '../../src/lib/server/seed/findings';
import { evaluateFinding } from '../../src/lib/steam/index';
import { ENGINE_VERSION } from '../../src/lib/steam/version';
import { testDatabase } from './db';
import { auditorA, consultantA, consultantB } from './demo-people';
import {
	batch,
	fieldSurveyId,
	getPull,
	postPush,
	remove,
	setFieldStage,
	trapCapture,
	upsert
} from './sync-api';

const { pool, db } = testDatabase();
const TAG = 'HDETAIL-';
const mine: string[] = [];

const row = async (id: string) =>
	(await db.select().from(schema.findings).where(eq(schema.findings.id, id)))[0];

/** The finding's row as the review table's API answers it (its kept pages included). */
async function tableRow(id: string) {
	const survey = await surveyPricing(db, fieldSurveyId);
	const page = await findingsPage(db, survey!, findingsQuerySchema.parse({ q: TAG, size: '200' }));
	return page.items.find((i) => i.id === id);
}
const auditRows = async (id: string) =>
	db.select().from(schema.auditLog).where(eq(schema.auditLog.entityId, id));

async function pushed(capture: FindingCapture, baseVersion = 0) {
	const r = await postPush(auditorA, batch(upsert(capture, baseVersion)));
	expect(r.status, JSON.stringify(r.body)).toBe(200);
	return pushResponseSchema.parse(r.body).results[0];
}

/** The edit form exactly as the page opens it for this finding. */
async function openedForm(id: string): Promise<FindingEditForm> {
	const page = await openFinding(consultantA, fieldSurveyId, id, db);
	expect(page).not.toBeNull();
	const { values, layers } = page!.form;
	const { repairCost, ...fields } = values;
	return { fields, version: String(page!.finding.version), repairCost, layers };
}

function newTrap(n: string): TrapCapture {
	const c = trapCapture(`${TAG}${n}`);
	mine.push(c.id);
	return c as TrapCapture;
}

const insulationTemplate = demoFindings.find(
	(f) => f.surveyId === fieldSurveyId && f.kind === 'insulation'
)!;

function newPipe(): FindingCapture {
	const c = {
		...(captureOf(insulationTemplate) as FindingCapture),
		id: randomUUID(),
		location: `${TAG} bare pipe`,
		createdAt: '2026-11-20T10:00:00.000Z',
		updatedAt: '2026-11-20T10:00:00.000Z'
	} as FindingCapture;
	if (c.kind !== 'insulation') throw new Error('template is no insulation');
	c.inputs = { ...c.inputs, item: 'pipe', dn: 50, length: 10, count: undefined };
	delete c.inputs.count;
	mine.push(c.id);
	return c;
}

beforeAll(async () => {
	await setFieldStage(db);
});

afterAll(async () => {
	// Findings on this spec's tags too (a run stopped before its clean-up leaves some).
	const tagged = await db
		.select({ id: schema.findings.id })
		.from(schema.findings)
		.innerJoin(schema.assets, eq(schema.assets.id, schema.findings.assetId))
		.where(like(schema.assets.tag, `${TAG}%`));
	mine.push(...tagged.map((t) => t.id));
	const conflicts = await db
		.select({ id: schema.findingConflicts.id })
		.from(schema.findingConflicts)
		.where(inArray(schema.findingConflicts.findingId, mine));
	const ids = [...mine, ...conflicts.map((c) => c.id)];
	await db.delete(schema.findingConflicts).where(inArray(schema.findingConflicts.findingId, mine));
	await db.delete(schema.auditLog).where(inArray(schema.auditLog.entityId, ids));
	await db.delete(schema.findings).where(inArray(schema.findings.id, mine));
	await db.delete(schema.assets).where(like(schema.assets.tag, `${TAG}%`));
	await pool.end();
});

describe('editing a finding at the Desk', () => {
	const trap = newTrap('1');

	it('writes the correction as the next version with recomputed, stamped figures and an audit row', async () => {
		expect((await pushed(trap)).status).toBe('applied');
		const before = await row(trap.id);
		expect(before.condition).toBe('failed-open');
		const form = await openedForm(trap.id);
		expect(form.fields.condition).toBe('failed-open');
		const outcome = await saveFindingEdit(
			consultantA,
			fieldSurveyId,
			trap.id,
			{ ...form, fields: { ...form.fields, condition: 'leaking' }, repairCost: '180.50' },
			db
		);
		expect(outcome).toMatchObject({ kind: 'written', version: 2 });
		const after = await row(trap.id);
		expect(after).toMatchObject({ version: 2, condition: 'leaking', repairCost: 18050 });
		expect((after.inputs as { condition: string }).condition).toBe('leaking');
		expect(after.changeSeq).toBeGreaterThan(before.changeSeq);
		expect(after.physicsEngine).toBe(ENGINE_VERSION);
		expect(after.resultsEngine).toBe(ENGINE_VERSION);
		const [site] = await db
			.select({ basisId: schema.sites.costBasisId })
			.from(schema.sites)
			.where(eq(schema.sites.id, demoSites[0].id));
		expect(after.pricedBasisId).toBe(site.basisId);
		// A leaking trap loses less than a failed-open one: the typed column moved, and it is
		// what the engine gives for the corrected capture on the site's basis.
		expect(after.steamLoss!).toBeLessThan(before.steamLoss!);
		const ctx = await pricingContext(db, demoSites[0].id);
		const corrected = { ...trap, inputs: { ...trap.inputs, condition: 'leaking' as const } };
		const engine = evaluateFinding(corrected, { costBasis: ctx.costBasis, headers: ctx.headers });
		expect(after.steamLoss).toBeCloseTo(engine.steamLoss!, 9);
		const audit = (await auditRows(trap.id)).filter((a) => a.actorId === consultantA.id);
		expect(audit).toHaveLength(1);
		expect(audit[0]).toMatchObject({ entity: 'finding', action: 'update' });
		const b = audit[0].before as { capture: FindingCapture; version: number };
		const a = audit[0].after as { capture: FindingCapture; version: number };
		expect(b.version).toBe(1);
		expect(a.version).toBe(2);
		expect((b.capture.inputs as { condition: string }).condition).toBe('failed-open');
		expect((a.capture.inputs as { condition: string }).condition).toBe('leaking');
	});

	it('refuses a form opened at an older version and writes nothing', async () => {
		const form = await openedForm(trap.id);
		const before = await row(trap.id);
		const auditBefore = (await auditRows(trap.id)).length;
		const outcome = await saveFindingEdit(
			consultantA,
			fieldSurveyId,
			trap.id,
			{ ...form, version: '1', fields: { ...form.fields, condition: 'working' } },
			db
		);
		expect(outcome).toEqual({ kind: 'moved', version: 2 });
		const after = await row(trap.id);
		expect(after.version).toBe(2);
		expect(after.condition).toBe('leaking');
		expect(after.changeSeq).toBe(before.changeSeq);
		expect((await auditRows(trap.id)).length).toBe(auditBefore);
	});

	it('refuses bad input, names the field path, and writes nothing', async () => {
		const pipe = newPipe();
		expect((await pushed(pipe)).status).toBe('applied');
		const form = await openedForm(pipe.id);
		expect(form.layers).toHaveLength(1);
		const before = await row(pipe.id);
		const northgaleHeader = (
			await db
				.select({ id: schema.headers.id })
				.from(schema.headers)
				.where(eq(schema.headers.siteId, demoSites[1].id))
		)[0].id;
		const bad = await saveFindingEdit(
			consultantA,
			fieldSurveyId,
			pipe.id,
			{
				...form,
				fields: { ...form.fields, length: '-3', headerId: northgaleHeader },
				layers: [form.layers[0], { thickness: '30', material: 'unobtainium', conductivity: '' }]
			},
			db
		);
		expect(bad.kind).toBe('problems');
		const problems = (bad as { problems: Record<string, string> }).problems;
		expect(Object.keys(problems).sort()).toEqual(['headerId', 'layers.1.material', 'length']);
		expect(problems.length).toMatch(/length/i);
		const after = await row(pipe.id);
		expect(after.version).toBe(before.version);
		expect(after.changeSeq).toBe(before.changeSeq);
		expect(after.inputs).toEqual(before.inputs);
	});

	it('keeps two insulation layers, innermost first', async () => {
		const pipe = newPipe();
		await pushed(pipe);
		const form = await openedForm(pipe.id);
		const outcome = await saveFindingEdit(
			consultantA,
			fieldSurveyId,
			pipe.id,
			{
				...form,
				layers: [
					{ thickness: '40', material: 'calcium-silicate', conductivity: '' },
					{ thickness: '25', material: 'custom', conductivity: '0.05' }
				]
			},
			db
		);
		expect(outcome.kind).toBe('written');
		const after = await row(pipe.id);
		expect((after.inputs as { layers: unknown }).layers).toEqual([
			{ thickness: 0.04, material: 'calcium-silicate' },
			{ thickness: 0.025, material: { conductivity: 0.05 } }
		]);
	});

	it('finds nothing of another firm', async () => {
		expect(await openFinding(consultantB, fieldSurveyId, trap.id, db)).toBeNull();
		const form = await openedForm(trap.id);
		expect(await saveFindingEdit(consultantB, fieldSurveyId, trap.id, form, db)).toEqual({
			kind: 'missing'
		});
		expect((await row(trap.id)).version).toBe(2);
	});
});

describe('settling sync conflicts', () => {
	const trap = newTrap('2');
	let version = 1;

	/** A consultant's edit on the server, then the auditor's stale edit: one conflict. */
	async function conflict(notes: string, condition: 'working' | 'failed-open' = 'working') {
		const current = (await row(trap.id)).version;
		const stale = upsert(
			{
				...trap,
				notes,
				inputs: { ...trap.inputs, condition },
				updatedAt: `2026-11-20T11:0${current}:00.000Z`
			},
			current - 1
		);
		const r = await postPush(auditorA, batch(stale));
		expect(pushResponseSchema.parse(r.body).results[0].status).toBe('conflict');
		const [c] = await db
			.select()
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.mutationId, stale.mutationId));
		return c;
	}

	it('keepServer keeps the server finding as its next version and the device data on record', async () => {
		await pushed(trap);
		const form = await openedForm(trap.id);
		await saveFindingEdit(
			consultantA,
			fieldSurveyId,
			trap.id,
			{ ...form, fields: { ...form.fields, notes: 'Desk note' } },
			db
		);
		version = 2;
		// The review table's page is read (and kept) before the device's stale edit arrives…
		expect((await tableRow(trap.id))?.conflictWaiting).toBe(false);
		const c = await conflict('Device note A');
		// …and shows the conflict waiting at once: recording it moved the firm's counter.
		expect((await tableRow(trap.id))?.conflictWaiting).toBe(true);
		const listed = await listConflicts(consultantA, fieldSurveyId, db);
		expect(listed!.waiting.map((w) => w.id)).toContain(c.id);
		const page = await openConflict(consultantA, fieldSurveyId, c.id, db);
		const notes = page!.fields.find((f) => f.key === 'notes')!;
		expect(notes).toMatchObject({ server: 'Desk note', device: 'Device note A', differs: true });

		const outcome = await settleConflict(
			consultantA,
			{ surveyId: fieldSurveyId, conflictId: c.id, openedVersion: version, how: 'kept-server' },
			db
		);
		expect(outcome).toEqual({ kind: 'resolved', version: 3 });
		version = 3;
		expect((await tableRow(trap.id))?.conflictWaiting).toBe(false);
		const after = await row(trap.id);
		expect(after).toMatchObject({ version: 3, notes: 'Desk note' });
		const [settled] = await db
			.select()
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.id, c.id));
		expect(settled.resolutionKind).toBe('kept-server');
		expect(settled.resolvedBy).toBe(consultantA.id);
		expect(settled.resolvedAt).not.toBeNull();
		expect((settled.data as FindingCapture).notes).toBe('Device note A');
		const resolve = await db
			.select()
			.from(schema.auditLog)
			.where(and(eq(schema.auditLog.entityId, c.id), eq(schema.auditLog.action, 'resolve')));
		expect(resolve).toHaveLength(1);
		// Settled ones are listed apart.
		const again = await listConflicts(consultantA, fieldSurveyId, db);
		expect(again!.waiting.map((w) => w.id)).not.toContain(c.id);
		expect(again!.resolved.map((w) => w.id)).toContain(c.id);
	});

	it('refuses to settle on a version the finding has moved past, and leaves it waiting', async () => {
		const c = await conflict('Device note B');
		const outcome = await settleConflict(
			consultantA,
			{ surveyId: fieldSurveyId, conflictId: c.id, openedVersion: version - 1, how: 'kept-device' },
			db
		);
		expect(outcome).toEqual({ kind: 'moved' });
		const [still] = await db
			.select()
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.id, c.id));
		expect(still.resolvedAt).toBeNull();
		expect((await row(trap.id)).version).toBe(version);

		const [{ cursor }] = [{ cursor: (await row(trap.id)).changeSeq }];
		const kept = await settleConflict(
			consultantA,
			{ surveyId: fieldSurveyId, conflictId: c.id, openedVersion: version, how: 'kept-device' },
			db
		);
		expect(kept).toEqual({ kind: 'resolved', version: version + 1 });
		version += 1;
		const after = await row(trap.id);
		expect(after).toMatchObject({ version, notes: 'Device note B', condition: 'working' });
		// The auditor's device pulls the answer at the new version.
		const pull = await getPull(auditorA, `since=${cursor}`);
		expect(pull.status).toBe(200);
		const change = pullResponseSchema
			.parse(pull.body)
			.changes.find((ch) => ch.entity === 'finding' && ch.id === trap.id);
		expect(change).toMatchObject({ version, deleted: false });
		expect((change as { data: { capture: FindingCapture } }).data.capture.notes).toBe(
			'Device note B'
		);
	});

	it('merges field by field: the chosen side of each field, checked and priced', async () => {
		const c = await conflict('Device note C', 'failed-open');
		const page = await openConflict(consultantA, fieldSurveyId, c.id, db);
		const differing = page!.fields.filter((f) => f.differs).map((f) => f.key);
		expect(differing.sort()).toEqual(['condition', 'notes']);
		const missing = await settleConflict(
			consultantA,
			{
				surveyId: fieldSurveyId,
				conflictId: c.id,
				openedVersion: version,
				how: 'merged',
				choices: { notes: 'device' }
			},
			db
		);
		expect(missing).toMatchObject({
			kind: 'refused',
			errors: { 'choice.condition': expect.any(String) }
		});
		const outcome = await settleConflict(
			consultantA,
			{
				surveyId: fieldSurveyId,
				conflictId: c.id,
				openedVersion: version,
				how: 'merged',
				choices: { notes: 'server', condition: 'device' }
			},
			db
		);
		expect(outcome).toEqual({ kind: 'resolved', version: version + 1 });
		version += 1;
		const after = await row(trap.id);
		expect(after).toMatchObject({ version, notes: 'Device note B', condition: 'failed-open' });
		expect(after.physicsEngine).toBe(ENGINE_VERSION);
		const [settled] = await db
			.select()
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.id, c.id));
		expect(settled.resolutionKind).toBe('merged');
		expect(settled.resolution).toMatchObject({
			choices: { notes: 'server', condition: 'device' },
			version
		});
		expect((settled.data as FindingCapture).notes).toBe('Device note C');
	});

	it('keepDevice of a device’s deletion deletes the finding (kept as a tombstone)', async () => {
		const r = await postPush(auditorA, batch(remove(trap.id, fieldSurveyId, version - 1)));
		expect(pushResponseSchema.parse(r.body).results[0].status).toBe('conflict');
		const [c] = await db
			.select()
			.from(schema.findingConflicts)
			.where(
				and(
					eq(schema.findingConflicts.findingId, trap.id),
					eq(schema.findingConflicts.baseVersion, version - 1)
				)
			);
		expect(c.data).toBeNull();
		const outcome = await settleConflict(
			consultantA,
			{ surveyId: fieldSurveyId, conflictId: c.id, openedVersion: version, how: 'kept-device' },
			db
		);
		expect(outcome).toEqual({ kind: 'resolved', version: version + 1 });
		const after = await row(trap.id);
		expect(after.deletedAt).not.toBeNull();
		expect(after.version).toBe(version + 1);
	});

	it('another firm’s conflict is not found, and nothing changes', async () => {
		const [c] = await db
			.select()
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.findingId, trap.id));
		expect(await openConflict(consultantB, fieldSurveyId, c.id, db)).toBeNull();
		expect(await listConflicts(consultantB, fieldSurveyId, db)).toBeNull();
		const [{ n }] = await db
			.select({ n: count() })
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.findingId, trap.id));
		const outcome = await settleConflict(
			consultantB,
			{ surveyId: fieldSurveyId, conflictId: c.id, openedVersion: version + 1, how: 'kept-server' },
			db
		);
		expect(outcome).toEqual({ kind: 'missing' });
		expect(n).toBeGreaterThan(0);
	});
});
