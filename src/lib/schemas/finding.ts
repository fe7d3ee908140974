/**
 * A finding as the server stores it: the device's capture (./capture.ts), the Desk's review
 * fields (./review.ts), the server's version and the deleted flag. One observation on a survey
 * (a trap test, a leak, an insulation gap, a header reading); `inputs` are in the engine's base
 * units (p MPa absolute, T K, lengths m, mass flow kg/s). The server recomputes every loss
 * itself from these inputs with the engine's evaluateFinding.
 */
import { z } from 'zod';
import {
	checkCapture,
	headerCaptureSchema,
	insulationCaptureSchema,
	leakCaptureSchema,
	trapCaptureSchema
} from './capture';
import { findingReviewSchema } from './review';

export * from './finding-vocabulary';
export * from './finding-inputs';

/** What the server adds to a capture and a review: its version and the deleted flag. */
const storedFields = {
	...findingReviewSchema.shape,
	version: z
		.number({ error: 'Version must be a whole number' })
		.int({ error: 'Version must be a whole number' })
		.nonnegative({ error: 'Version cannot be negative' }),
	deleted: z.boolean({ error: 'Deleted must be yes or no' })
};

export const trapFindingSchema = trapCaptureSchema.extend(storedFields);
export const leakFindingSchema = leakCaptureSchema.extend(storedFields);
export const insulationFindingSchema = insulationCaptureSchema.extend(storedFields);
export const headerFindingSchema = headerCaptureSchema.extend(storedFields);

export const findingSchema = z
	.discriminatedUnion(
		'kind',
		[trapFindingSchema, leakFindingSchema, insulationFindingSchema, headerFindingSchema],
		{
			error:
				'Choose what the finding is: a trap test, a leak, an insulation gap or a header reading'
		}
	)
	.superRefine(checkCapture);

export type TrapFinding = z.infer<typeof trapFindingSchema>;
export type LeakFinding = z.infer<typeof leakFindingSchema>;
export type InsulationFinding = z.infer<typeof insulationFindingSchema>;
export type HeaderFinding = z.infer<typeof headerFindingSchema>;
export type Finding = z.infer<typeof findingSchema>;
