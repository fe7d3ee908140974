/**
 * `GET /api/sync/pull` against the real MariaDB (docs/sync.md): changes after a cursor in
 * counter order, paginated, with the server's figures; deletions, unassignments and closed
 * surveys as tombstones; nothing of another firm or of a survey the person does not record on.
 */
import { eq, inArray, like } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pullResponseSchema, type PullResponse } from '../../src/lib/schemas/sync';
import * as schema from '../../src/lib/server/db/schema';
import { nextChangeSeq, unassignAuditor } from '../../src/lib/server/sync/counter';
import { currentCursor } from '../../src/lib/server/walk/snapshot';
import { testDatabase } from './db';
import { auditorA, auditorB, clientA } from './demo-people';
import {
	batch,
	fieldSurveyId,
	getPull,
	postPush,
	remove,
	trapCapture,
	upsert,
	setFieldStage
} from './sync-api';

const { pool, db } = testDatabase();
const TAG = 'SYNC-PULL-';
const made: string[] = [];

// A second auditor of the firm on the survey in the field (test data, removed afterwards).
const helper: SessionUser = {
	...auditorA,
	id: 'a11d0002-0000-4000-8000-000000000002',
	email: 'second.auditor@sync-pull-spec.example',
	name: 'Second Auditor'
};

const page = async (user: SessionUser, query: string): Promise<PullResponse> => {
	const r = await getPull(user, query);
	expect(r.status, JSON.stringify(r.body)).toBe(200);
	expect(r.headers.get('cache-control')).toBe('private, no-store');
	return pullResponseSchema.parse(r.body);
};

let start = 0;

beforeAll(async () => {
	await setFieldStage(db);
	await db.insert(schema.users).values({ ...helper, unitSystem: 'SI' });
	await db.insert(schema.surveyAuditors).values({ surveyId: fieldSurveyId, userId: helper.id });
	start = await currentCursor(db, auditorA.firmId);
	const captures = [1, 2, 3, 4, 5].map((n) => trapCapture(`${TAG}${n}`));
	made.push(...captures.map((c) => c.id));
	const r = await postPush(auditorA, batch(...captures.map((c) => upsert(c, 0))));
	expect(r.status).toBe(200);
	const del = await postPush(auditorA, batch(remove(captures[4].id, fieldSurveyId, 1)));
	expect(del.status).toBe(200);
});

afterAll(async () => {
	await db.delete(schema.auditLog).where(inArray(schema.auditLog.entityId, made));
	await db.delete(schema.findings).where(inArray(schema.findings.id, made));
	await db.delete(schema.assets).where(like(schema.assets.tag, `${TAG}%`));
	await db.delete(schema.syncTombstones).where(eq(schema.syncTombstones.userId, helper.id));
	await db.delete(schema.surveyAuditors).where(eq(schema.surveyAuditors.userId, helper.id));
	await db.delete(schema.users).where(eq(schema.users.id, helper.id));
	await pool.end();
});

describe('changes after a cursor', () => {
	it('come in counter order with the capture, status and the server’s figures', async () => {
		const p = await page(auditorA, `since=${start}`);
		expect(p.more).toBe(false);
		const ours = p.changes.filter((c) => made.includes(c.id));
		// Five pushed, the fifth then deleted: it comes once, as a tombstone, at its last change.
		expect(ours.map((c) => c.id)).toEqual(made.slice(0, 5));
		for (const change of ours.slice(0, 4)) {
			expect(change).toMatchObject({ entity: 'finding', version: 1, deleted: false });
			if (change.entity !== 'finding' || !change.data) throw new Error('expected data');
			expect(change.data.capture.id).toBe(change.id);
			expect(change.data.status).toBe('draft');
			expect(change.data.results?.steamLoss).toBeGreaterThan(0);
			expect(change.data.results?.currency).toBe('EUR');
		}
		expect(ours[4]).toMatchObject({ deleted: true, data: null, version: 2 });
		expect(p.cursor).toBe(await currentCursor(db, auditorA.firmId));
	});

	it('nothing after the latest cursor; the cursor stays where it was', async () => {
		const now = await currentCursor(db, auditorA.firmId);
		expect(await page(auditorA, `since=${now}`)).toEqual({ changes: [], cursor: now, more: false });
	});

	it('pages of `limit` changes follow on from each other with no gap and no repeat', async () => {
		const seen: string[] = [];
		let cursor = start;
		let pages = 0;
		for (;;) {
			const p = await page(auditorA, `since=${cursor}&limit=2`);
			expect(p.changes.length).toBeLessThanOrEqual(2);
			seen.push(...p.changes.map((c) => c.id));
			expect(p.cursor).toBeGreaterThanOrEqual(cursor);
			cursor = p.cursor;
			pages++;
			if (!p.more) break;
		}
		expect(pages).toBeGreaterThanOrEqual(3);
		const whole = await page(auditorA, `since=${start}`);
		expect(seen).toEqual(whole.changes.map((c) => c.id));
	});
});

describe('who sees what', () => {
	it('another firm’s auditor sees none of it', async () => {
		const p = await page(auditorB, 'since=0&limit=1000');
		expect(p.changes.filter((c) => made.includes(c.id))).toEqual([]);
		expect(p.changes.some((c) => c.id === fieldSurveyId)).toBe(false);
	});

	it('an auditor unassigned from the survey gets its tombstone, and no more of its findings', async () => {
		const before = await currentCursor(db, auditorA.firmId);
		await db.transaction((tx) => unassignAuditor(tx, auditorA.firmId, fieldSurveyId, helper.id));
		const p = await page(helper, `since=${before}`);
		expect(p.changes).toContainEqual({
			entity: 'survey',
			id: fieldSurveyId,
			version: 0,
			deleted: true,
			data: null
		});
		const after = await page(helper, `since=${start}`);
		expect(after.changes.filter((c) => c.entity === 'finding')).toEqual([]);
		// The auditor still assigned gets no such tombstone.
		const still = await page(auditorA, `since=${before}`);
		expect(still.changes.filter((c) => c.entity === 'survey' && c.deleted)).toEqual([]);
	});

	it('a changed survey comes as its summary; a closed one as a tombstone', async () => {
		const before = await currentCursor(db, auditorA.firmId);
		const bump = async (status: string) =>
			db.transaction(async (tx) => {
				const changeSeq = await nextChangeSeq(tx, auditorA.firmId);
				await tx
					.update(schema.surveys)
					.set({ status, changeSeq })
					.where(eq(schema.surveys.id, fieldSurveyId));
			});
		try {
			await bump('in-review');
			const open = await page(auditorA, `since=${before}`);
			const s = open.changes.find((c) => c.id === fieldSurveyId);
			expect(s).toMatchObject({ entity: 'survey', deleted: false, data: { stage: 'in-review' } });
			await bump('closed');
			const closed = await page(auditorA, `since=${open.cursor}`);
			expect(closed.changes.find((c) => c.id === fieldSurveyId)).toMatchObject({
				deleted: true,
				data: null
			});
		} finally {
			await setFieldStage(db);
		}
	});
});

describe('refusals', () => {
	it('a cursor or limit that is not a whole number in range is a 400 in words', async () => {
		for (const q of [
			'',
			'since=-1',
			'since=abc',
			'since=1.5',
			'since=0&limit=0',
			'since=0&limit=1001'
		]) {
			const r = await getPull(auditorA, q);
			expect(r.status, q).toBe(400);
			expect((r.body as { message: string }).message).toMatch(/since|limit/);
		}
	});

	it('a client’s device and nobody may not pull', async () => {
		expect((await getPull(clientA, 'since=0')).status).toBe(403);
		expect((await getPull(null, 'since=0')).status).toBe(401);
	});
});
