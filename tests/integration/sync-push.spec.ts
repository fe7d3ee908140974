/**
 * `POST /api/sync/push` against the real MariaDB (docs/sync.md): applied, duplicate, conflict
 * and rejected answers; the server's own prices; the audit log with the device; whole-batch
 * refusals for bad input and for surveys hidden from the person, with nothing written.
 */
import { and, count, eq, inArray, like } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pushResponseSchema, type PushResponse } from '../../src/lib/schemas/sync';
import * as schema from '../../src/lib/server/db/schema';
import { demoSites, demoSurveys } from '../../src/lib/server/seed/demo';
import { demoFindings } from '../../src/lib/server/seed/findings';
import { evaluateFinding } from '../../src/lib/steam/index';
import { ENGINE_VERSION } from '../../src/lib/steam/version';
import { testDatabase } from './db';
import { auditorA, auditorB, clientA, consultantA } from './demo-people';
import {
	batch,
	fieldSurveyId,
	postPush,
	remove,
	trapCapture,
	upsert,
	setFieldStage
} from './sync-api';

const { pool, db } = testDatabase();
const TAG = 'SYNC-PUSH-';
const mine: string[] = [];

const answers = (r: { status: number; body: unknown }): PushResponse['results'] => {
	expect(r.status, JSON.stringify(r.body)).toBe(200);
	return pushResponseSchema.parse(r.body).results;
};

const findingRow = async (id: string) =>
	(await db.select().from(schema.findings).where(eq(schema.findings.id, id)))[0];

async function written() {
	const [f] = await db.select({ n: count() }).from(schema.findings);
	const [a] = await db.select({ n: count() }).from(schema.auditLog);
	const [m] = await db.select({ n: count() }).from(schema.appliedMutations);
	const [c] = await db.select({ n: count() }).from(schema.findingConflicts);
	const [k] = await db.select({ v: schema.changeCounters.value }).from(schema.changeCounters);
	return { findings: f.n, audit: a.n, mutations: m.n, conflicts: c.n, counter: k?.v ?? 0 };
}

const capture = (n: string) => {
	const c = trapCapture(`${TAG}${n}`);
	mine.push(c.id);
	return c;
};

beforeAll(async () => {
	// The survey in the field must be open for recording (another spec may have moved it).
	await setFieldStage(db);
});

afterAll(async () => {
	if (mine.length > 0) {
		await db
			.delete(schema.findingConflicts)
			.where(inArray(schema.findingConflicts.findingId, mine));
		await db.delete(schema.auditLog).where(inArray(schema.auditLog.entityId, mine));
		await db.delete(schema.findings).where(inArray(schema.findings.id, mine));
	}
	await db.delete(schema.assets).where(like(schema.assets.tag, `${TAG}%`));
	await pool.end();
});

describe('a new finding, its edits and its deletion', () => {
	const c = capture('1');
	const first = upsert(c, 0);

	it('is applied at version 1, priced by the server, audited with the device', async () => {
		const before = await written();
		const body = batch(first);
		const [a] = answers(await postPush(auditorA, body));
		expect(a).toEqual({ mutationId: first.mutationId, status: 'applied', version: 1 });

		const row = await findingRow(c.id);
		expect(row.version).toBe(1);
		expect(row.surveyId).toBe(fieldSurveyId);
		expect(row.recordedBy).toBe(auditorA.id);
		expect(row.changeSeq).toBeGreaterThan(Number(before.counter));
		// The server's figures are the engine's on the site's current basis (whichever version
		// other tests left it at), whatever a device sent.
		const site = demoSites[0];
		const [current] = await db
			.select({ id: schema.costBases.id, basis: schema.costBases.basis })
			.from(schema.sites)
			.innerJoin(schema.costBases, eq(schema.costBases.id, schema.sites.costBasisId))
			.where(eq(schema.sites.id, site.id));
		const expected = evaluateFinding(c, {
			costBasis: { ...current.basis, elevation: site.elevation },
			headers: site.headers.map(({ id, name, pressure }) => ({ id, name, pressure }))
		});
		expect(row.resultsEngine).toBe(ENGINE_VERSION);
		expect(row.steamLoss).toBeCloseTo(expected.steamLoss!, 9);
		expect(row.cost).toBe(expected.cost.minor);
		expect(row.pricedBasisId).toBe(current.id);
		// The trap's tag became an asset of the site, and the finding points at it.
		const [asset] = await db
			.select()
			.from(schema.assets)
			.where(and(eq(schema.assets.siteId, site.id), eq(schema.assets.tag, c.assetTag!)));
		expect(row.assetId).toBe(asset.id);

		const audit = await db.select().from(schema.auditLog).where(eq(schema.auditLog.entityId, c.id));
		expect(audit).toHaveLength(1);
		expect(audit[0]).toMatchObject({
			action: 'create',
			actorId: auditorA.id,
			deviceId: body.deviceId,
			firmId: auditorA.firmId
		});
		const [applied] = await db
			.select()
			.from(schema.appliedMutations)
			.where(eq(schema.appliedMutations.id, first.mutationId));
		expect(applied).toMatchObject({ userId: auditorA.id, deviceId: body.deviceId });
	});

	it('a replayed mutation id changes nothing and answers duplicate with its first version', async () => {
		const before = await written();
		const [a] = answers(await postPush(auditorA, batch(first)));
		expect(a).toEqual({ mutationId: first.mutationId, status: 'duplicate', version: 1 });
		expect(await written()).toEqual(before);
	});

	it('an edit on the current version is applied at the next one', async () => {
		const edited = { ...c, notes: 'Blowing steam to drain', updatedAt: '2026-11-20T10:05:00.000Z' };
		const [a] = answers(await postPush(auditorA, batch(upsert(edited, 1))));
		expect(a).toMatchObject({ status: 'applied', version: 2 });
		expect((await findingRow(c.id)).notes).toBe('Blowing steam to drain');
	});

	it('an edit on an older version is kept as a conflict and the server row stays', async () => {
		const stale = upsert({ ...c, notes: 'Other device', updatedAt: '2026-11-20T10:06:00.000Z' }, 1);
		const [a] = answers(await postPush(consultantA, batch(stale)));
		expect(a).toMatchObject({ mutationId: stale.mutationId, status: 'conflict', version: 2 });
		expect(a.reason).toMatch(/kept their version/);
		expect((await findingRow(c.id)).notes).toBe('Blowing steam to drain');
		const conflicts = await db
			.select()
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.findingId, c.id));
		expect(conflicts).toHaveLength(1);
		expect(conflicts[0]).toMatchObject({
			baseVersion: 1,
			serverVersion: 2,
			userId: consultantA.id
		});
		expect((conflicts[0].data as { notes: string }).notes).toBe('Other device');
		// Its replay is the same conflict again, not a second record and not "duplicate".
		const [again] = answers(await postPush(consultantA, batch(stale)));
		expect(again).toMatchObject({ status: 'conflict', version: 2 });
		const [{ n }] = await db
			.select({ n: count() })
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.findingId, c.id));
		expect(n).toBe(1);
	});

	it('the same content again under a new mutation id (base 0) is no conflict', async () => {
		const row = await findingRow(c.id);
		const same = {
			...c,
			notes: 'Blowing steam to drain',
			updatedAt: '2026-11-20T10:05:00.000Z'
		};
		const [a] = answers(await postPush(auditorA, batch(upsert(same, 0))));
		expect(a).toMatchObject({ status: 'applied', version: row.version });
		expect((await findingRow(c.id)).changeSeq).toBe(row.changeSeq);
	});

	it('a deletion on the current version keeps the row, marked deleted, at the next version', async () => {
		const del = remove(c.id, fieldSurveyId, 2);
		const [a] = answers(await postPush(auditorA, batch(del)));
		expect(a).toMatchObject({ status: 'applied', version: 3 });
		const row = await findingRow(c.id);
		expect(row.deletedAt).not.toBeNull();
		expect(row.version).toBe(3);
	});

	it('an edit of a finding deleted since is kept as a conflict', async () => {
		const [a] = answers(await postPush(auditorA, batch(upsert({ ...c, notes: 'late' }, 2))));
		expect(a).toMatchObject({ status: 'conflict', version: 3 });
		expect((await findingRow(c.id)).deletedAt).not.toBeNull();
	});

	it('a deletion of a finding the server never had is applied at version 0, nothing written', async () => {
		const before = await written();
		const [a] = answers(await postPush(auditorA, batch(remove(randomUUID(), fieldSurveyId, 0))));
		expect(a).toMatchObject({ status: 'applied', version: 0 });
		const after = await written();
		expect({ ...after, mutations: before.mutations }).toEqual(before);
	});
});

describe('a batch is applied in order, one answer per mutation', () => {
	it('create, edit on the answered version and delete of one finding in one batch', async () => {
		const c = capture('2');
		const m1 = upsert(c, 0);
		const m2 = upsert({ ...c, notes: 'second' }, 1);
		const m3 = remove(c.id, fieldSurveyId, 2);
		const results = answers(await postPush(auditorA, batch(m1, m2, m3)));
		expect(results.map((r) => [r.mutationId, r.status, r.version])).toEqual([
			[m1.mutationId, 'applied', 1],
			[m2.mutationId, 'applied', 2],
			[m3.mutationId, 'applied', 3]
		]);
	});

	it('concurrent repeats of one mutation apply it once', async () => {
		const c = capture('3');
		const m = upsert(c, 0);
		const body = batch(m);
		const all = await Promise.all([1, 2, 3, 4].map(() => postPush(auditorA, body)));
		const statuses = all.map((r) => answers(r)[0].status).sort();
		expect(statuses).toEqual(['applied', 'duplicate', 'duplicate', 'duplicate']);
		const [{ n }] = await db
			.select({ n: count() })
			.from(schema.auditLog)
			.where(eq(schema.auditLog.entityId, c.id));
		expect(n).toBe(1);
		expect((await findingRow(c.id)).version).toBe(1);
	});

	it('two devices editing the same version at once: one applied, one conflict', async () => {
		const c = capture('4');
		answers(await postPush(auditorA, batch(upsert(c, 0))));
		const [x, y] = await Promise.all([
			postPush(auditorA, batch(upsert({ ...c, notes: 'device X' }, 1))),
			postPush(consultantA, batch(upsert({ ...c, notes: 'device Y' }, 1)))
		]);
		const both = [answers(x)[0], answers(y)[0]].map((r) => r.status).sort();
		expect(both).toEqual(['applied', 'conflict']);
		const row = await findingRow(c.id);
		expect(row.version).toBe(2);
		const [kept] = await db
			.select()
			.from(schema.findingConflicts)
			.where(eq(schema.findingConflicts.findingId, c.id));
		// Both edits are readable: the winner in the row, the other in the conflict record.
		expect(new Set([row.notes, (kept.data as { notes: string }).notes])).toEqual(
			new Set(['device X', 'device Y'])
		);
	});
});

describe('refusals', () => {
	const refusedWithNothingWritten = async (
		user: SessionUser,
		body: unknown,
		status: number,
		raw?: string
	) => {
		const before = await written();
		const r = await postPush(user, body, raw);
		expect(r.status, JSON.stringify(r.body)).toBe(status);
		expect(typeof (r.body as { message?: unknown }).message).toBe('string');
		expect(await written()).toEqual(before);
		return r.body as { message: string; issues?: { path: string; message: string }[] };
	};

	it('bad input is a 400 in plain words and nothing is written', async () => {
		const good = upsert(capture('5'), 0);
		await refusedWithNothingWritten(auditorA, null, 400, '{"deviceId": ');
		await refusedWithNothingWritten(auditorA, { mutations: [good] }, 400);
		await refusedWithNothingWritten(auditorA, batch(), 400);
		const entity = await refusedWithNothingWritten(
			auditorA,
			batch(good, { ...good, mutationId: randomUUID(), entity: 'survey' } as never),
			400
		);
		expect(entity.message).toMatch(/entity must be "finding"/);
		await refusedWithNothingWritten(auditorA, batch({ ...good, op: 'merge' } as never), 400);
		// A device may not bring a status, a price or results: captures are strict.
		for (const extra of [{ status: 'approved' }, { repairCost: 100 }, { results: { cost: 1 } }]) {
			const body = batch({ ...good, data: { ...good.data, ...extra } } as never);
			const refused = await refusedWithNothingWritten(auditorA, body, 400);
			expect(refused.issues?.length).toBeGreaterThan(0);
		}
		await refusedWithNothingWritten(auditorA, batch({ ...good, id: randomUUID() }), 400);
		const many = Array.from({ length: 101 }, () => upsert(trapCapture(`${TAG}x`), 0));
		expect((await refusedWithNothingWritten(auditorA, batch(...many), 400)).message).toMatch(
			/at most 100/
		);
		await refusedWithNothingWritten(auditorA, null, 413, 'x'.repeat(2 * 1024 * 1024 + 1));
	});

	it('a survey hidden from the person makes the whole batch 404, nothing written', async () => {
		const ok = upsert(capture('6'), 0);
		// Another firm's auditor, even mixed with their own survey.
		const theirs = { ...trapCapture(`${TAG}b`), surveyId: demoSurveys[1].id };
		await refusedWithNothingWritten(auditorB, batch(upsert(theirs, 0), ok), 404);
		// An auditor of the firm not assigned to the survey.
		const [other] = await db
			.select({ id: schema.surveys.id })
			.from(schema.surveys)
			.where(
				and(eq(schema.surveys.firmId, auditorA.firmId), eq(schema.surveys.status, 'published'))
			);
		const onOther = upsert({ ...trapCapture(`${TAG}c`), surveyId: other.id }, 0);
		await refusedWithNothingWritten(auditorA, batch(onOther), 404);
		// An unknown survey id.
		const nowhere = upsert({ ...trapCapture(`${TAG}d`), surveyId: randomUUID() }, 0);
		await refusedWithNothingWritten(auditorA, batch(nowhere), 404);
	});

	it('a client may not push at all', async () => {
		await refusedWithNothingWritten(clientA, batch(upsert(capture('7'), 0)), 403);
		await refusedWithNothingWritten(null as never, batch(upsert(capture('8'), 0)), 401);
	});

	it('another tenant’s finding id on one’s own survey is rejected and left alone', async () => {
		const seeded = demoFindings.find((f) => f.surveyId === fieldSurveyId)!;
		const before = await findingRow(seeded.id);
		const hijack = {
			...trapCapture(`${TAG}e`),
			id: seeded.id,
			surveyId: demoSurveys[1].id,
			headerId: demoSites[1].headers[0].id,
			areaId: undefined
		};
		const [a] = answers(await postPush(auditorB, batch(upsert(hijack, before.version))));
		expect(a.status).toBe('rejected');
		expect(a.reason).toMatch(/another survey/);
		expect(await findingRow(seeded.id)).toEqual(before);
	});

	it('a header of another site is rejected', async () => {
		const c = { ...capture('9'), headerId: demoSites[1].headers[0].id };
		const [a] = answers(await postPush(auditorA, batch(upsert(c, 0))));
		expect(a).toMatchObject({ status: 'rejected' });
		expect(a.reason).toMatch(/header/);
		expect(await findingRow(c.id)).toBeUndefined();
	});

	it('a survey closed to recording rejects the change, which applies once it reopens', async () => {
		const m = upsert(capture('10'), 0);
		await setFieldStage(db, 'closed');
		try {
			const [a] = answers(await postPush(auditorA, batch(m)));
			expect(a.status).toBe('rejected');
			expect(a.reason).toMatch(/no longer open for recording/);
		} finally {
			await setFieldStage(db);
		}
		const [b] = answers(await postPush(auditorA, batch(m)));
		expect(b).toMatchObject({ status: 'applied', version: 1 });
	});
});
