/**
 * The sync protocol between a device and the server (docs/sync.md): the push batch, its
 * answers, the pull page and the photo upload headers. One contract for the sync client
 * (src/lib/offline) and the routes (src/routes/api/sync, src/routes/api/photos).
 */
import { z } from 'zod';
import { uuidSchema } from './common';
import { findingCaptureSchema } from './capture';
import { receivedStatusSchema } from './finding-status';
import { surveySummarySchema } from './snapshot';

/** Mutations one push may carry; a device with more sends several batches, in order. */
export const MAX_PUSH_MUTATIONS = 100;
/** Bytes one push body may have (a capture is a few kB at most). */
export const MAX_PUSH_BYTES = 2 * 1024 * 1024;
/** Changes one pull page may carry; `limit` above this is refused. */
export const MAX_PULL_LIMIT = 1000;
export const DEFAULT_PULL_LIMIT = 500;
/** Bytes one photo may have (devices send ≤ 400 kB; this leaves room for a camera original). */
export const MAX_PHOTO_BYTES = 8 * 1024 * 1024;
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;

const baseVersion = z
	.number({ error: 'baseVersion must be a whole number' })
	.int({ error: 'baseVersion must be a whole number' })
	.nonnegative({ error: 'baseVersion cannot be negative' });

export const upsertMutationSchema = z.strictObject({
	mutationId: uuidSchema,
	entity: z.literal('finding', { error: 'Only findings are synced: entity must be "finding"' }),
	op: z.literal('upsert'),
	id: uuidSchema,
	baseVersion,
	data: findingCaptureSchema
});

export const deleteMutationSchema = z.strictObject({
	mutationId: uuidSchema,
	entity: z.literal('finding', { error: 'Only findings are synced: entity must be "finding"' }),
	op: z.literal('delete'),
	id: uuidSchema,
	baseVersion,
	/** The survey the finding is on (for authorization before the row is read). */
	data: z.strictObject({ surveyId: uuidSchema })
});

export type UpsertMutation = z.infer<typeof upsertMutationSchema>;
export type DeleteMutation = z.infer<typeof deleteMutationSchema>;

export const mutationSchema = z
	.discriminatedUnion('op', [upsertMutationSchema, deleteMutationSchema], {
		error: 'op must be "upsert" or "delete"'
	})
	.superRefine((m, ctx) => {
		if (m.op === 'upsert' && m.data.id !== m.id) {
			ctx.addIssue({ code: 'custom', path: ['data', 'id'], message: 'data.id must equal id' });
		}
	});
export type Mutation = z.infer<typeof mutationSchema>;

export const pushRequestSchema = z.strictObject({
	deviceId: uuidSchema,
	mutations: z
		.array(mutationSchema, { error: 'mutations must be a list' })
		.min(1, { error: 'A push carries at least one mutation' })
		.max(MAX_PUSH_MUTATIONS, {
			error: `A push carries at most ${MAX_PUSH_MUTATIONS} mutations: send the rest in another`
		})
});
export type PushRequest = z.infer<typeof pushRequestSchema>;

export const MUTATION_STATUSES = ['applied', 'duplicate', 'conflict', 'rejected'] as const;
export type MutationStatus = (typeof MUTATION_STATUSES)[number];

export const mutationResultSchema = z.object({
	mutationId: uuidSchema,
	status: z.enum(MUTATION_STATUSES),
	/** The server's version of the finding after this mutation (applied, duplicate, conflict). */
	version: z.number().int().nonnegative().optional(),
	/** Plain words for conflict and rejected. */
	reason: z.string().optional()
});
export type MutationResult = z.infer<typeof mutationResultSchema>;

export const pushResponseSchema = z.object({ results: z.array(mutationResultSchema) });
export type PushResponse = z.infer<typeof pushResponseSchema>;

/** What the server computed for a finding (never taken from a device). */
export const serverResultsSchema = z.object({
	engine: z.string(),
	steamLoss: z.number().nullable(),
	heatLoss: z.number(),
	fuelEnergy: z.number(),
	cost: z.number(),
	currency: z.string(),
	co2: z.number(),
	water: z.number()
});
export type ServerResults = z.infer<typeof serverResultsSchema>;

export const findingChangeSchema = z.object({
	entity: z.literal('finding'),
	id: uuidSchema,
	version: z.number().int().nonnegative(),
	deleted: z.boolean(),
	/** null for a tombstone. */
	data: z
		.object({
			capture: findingCaptureSchema,
			status: receivedStatusSchema,
			results: serverResultsSchema.nullable()
		})
		.nullable()
});

export const surveyChangeSchema = z.object({
	entity: z.literal('survey'),
	id: uuidSchema,
	version: z.number().int().nonnegative(),
	/** true: unassigned from this person, withdrawn or closed to recording. */
	deleted: z.boolean(),
	data: surveySummarySchema.nullable()
});

export const changeSchema = z.discriminatedUnion('entity', [
	findingChangeSchema,
	surveyChangeSchema
]);
export type Change = z.infer<typeof changeSchema>;

export const pullResponseSchema = z.object({
	changes: z.array(changeSchema),
	cursor: z.number().int().nonnegative(),
	more: z.boolean()
});
export type PullResponse = z.infer<typeof pullResponseSchema>;

/** Headers of `PUT /api/photos/[id]`. */
export const PHOTO_HEADERS = {
	finding: 'x-steamwisp-finding',
	survey: 'x-steamwisp-survey',
	sha256: 'x-steamwisp-sha256'
} as const;
