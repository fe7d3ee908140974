/**
 * The sync routes called in-process (as SvelteKit would after its hooks), and captures to push:
 * trap tests on the demo survey in the field, made from one of its seeded captures so every
 * field passes the shared capture schema, with new ids and tags of this spec's own.
 */
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { FindingCapture } from '../../src/lib/schemas/capture';
import type { Mutation } from '../../src/lib/schemas/sync';
import { demoSurveys } from '../../src/lib/server/seed/demo';
import { captureOf, demoFindings } from '../../src/lib/server/seed/findings';
import { POST as pushHandler } from '../../src/routes/api/sync/push/+server';
import { GET as pullHandler } from '../../src/routes/api/sync/pull/+server';
import * as schema from '../../src/lib/server/db/schema';
import type { testDatabase } from './db';
import { call } from './walk-api';

export const postPush = (user: SessionUser | null, body: unknown, raw?: string) =>
	call(
		pushHandler as never,
		'/api/sync/push',
		user,
		'/api/sync/push',
		{},
		{
			method: 'POST',
			headers: { 'content-type': 'application/json' },
			body: raw ?? JSON.stringify(body)
		}
	);

export const getPull = (user: SessionUser | null, query: string) =>
	call(pullHandler as never, '/api/sync/pull', user, `/api/sync/pull?${query}`);

export const fieldSurveyId = demoSurveys[0].id;

type TestDb = ReturnType<typeof testDatabase>['db'];

/** Moves the demo survey in the field to `stage` (specs open it for recording, or close it). */
export async function setFieldStage(db: TestDb, stage = 'in-field'): Promise<void> {
	await db
		.update(schema.surveys)
		.set({ status: stage })
		.where(eq(schema.surveys.id, fieldSurveyId));
}

const template = demoFindings.find(
	(f) => f.surveyId === fieldSurveyId && f.kind === 'trap' && f.inputs.condition === 'failed-open'
)!;

/** A failed-open trap test on the survey in the field, tag `tag`, recorded at `at`. */
export function trapCapture(tag: string, at = '2026-11-20T10:00:00.000Z'): FindingCapture {
	return {
		...(captureOf(template) as FindingCapture),
		id: randomUUID(),
		surveyId: fieldSurveyId,
		assetTag: tag,
		location: `Test line ${tag}`,
		notes: '',
		photoIds: [],
		createdAt: at,
		updatedAt: at
	};
}

export const upsert = (capture: FindingCapture, baseVersion: number): Mutation => ({
	mutationId: randomUUID(),
	entity: 'finding',
	op: 'upsert',
	id: capture.id,
	baseVersion,
	data: capture
});

export const remove = (id: string, surveyId: string, baseVersion: number): Mutation => ({
	mutationId: randomUUID(),
	entity: 'finding',
	op: 'delete',
	id,
	baseVersion,
	data: { surveyId }
});

export const batch = (...mutations: Mutation[]) => ({ deviceId: randomUUID(), mutations });
