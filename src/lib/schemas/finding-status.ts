/**
 * A finding's status as the device reads it from the server (pull changes, snapshots): one of
 * the lifecycle statuses; a former decision word (a status of before migration 0012, still in
 * a reply or on a device of that time) reads as published, so such a reply is never refused.
 */
import { z } from 'zod';
import { FINDING_STATUSES, lifecycleStatus, type FindingStatus } from './finding-vocabulary';

export const receivedStatusSchema = z.string().transform((status, ctx): FindingStatus => {
	const read = lifecycleStatus(status);
	if (read !== null) return read;
	ctx.addIssue({
		code: 'custom',
		message: `Choose where this finding stands (${FINDING_STATUSES.join(', ')})`
	});
	return z.NEVER;
});
