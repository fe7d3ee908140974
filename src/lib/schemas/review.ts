/**
 * What the Desk owns of a finding: its lifecycle status, repair cost and review flags. Never
 * part of a device's capture (./capture.ts); the sync route refuses a capture carrying them.
 */
import { z } from 'zod';
import { minorUnitsSchema, uuidSchema } from './common';
import { isoDateTime } from './capture';
import { FINDING_STATUSES } from './finding-vocabulary';

export const findingReviewSchema = z.strictObject({
	status: z.enum(FINDING_STATUSES, { error: 'Choose where this finding stands' }),
	/** Repair cost in integer minor units of the site's currency. */
	repairCost: minorUnitsSchema.optional(),
	/** A consultant has checked the capture and its figures. */
	reviewed: z.boolean({ error: 'Reviewed must be yes or no' }),
	reviewedAt: isoDateTime('Reviewed at').optional(),
	reviewedBy: uuidSchema.optional()
});
export type FindingReview = z.infer<typeof findingReviewSchema>;
