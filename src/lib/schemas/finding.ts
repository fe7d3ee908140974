/**
 * A finding: one observation on a survey (a trap test, a leak, an insulation gap, a header
 * reading). Common fields plus kind-specific `inputs`, in the engine's base units
 * (p MPa absolute, T K, lengths m, mass flow kg/s). The engine prices it; the server
 * recomputes every loss itself from these inputs.
 */
import { z } from 'zod';
import { minorUnitsSchema, oneOf, uuidSchema } from './common';
import {
	headerInputsSchema,
	insulationInputsSchema,
	leakInputsSchema,
	trapInputsSchema
} from './finding-inputs';
import { FINDING_KINDS, FINDING_STATUSES } from './finding-vocabulary';

export * from './finding-vocabulary';
export * from './finding-inputs';

const isoDateTime = (label: string) =>
	z.iso.datetime({ offset: true, error: `${label} must be an ISO 8601 date-time` });

const findingBase = z.object({
	/** Generated on the device, so a finding has its identity before it ever syncs. */
	id: uuidSchema,
	surveyId: uuidSchema,
	/** The site header it draws steam from; optional only for insulation with its own temperature. */
	headerId: uuidSchema.optional(),
	location: z
		.string({ error: 'Location must be text' })
		.trim()
		.max(200, { error: 'Location must be at most 200 characters' }),
	notes: z
		.string({ error: 'Notes must be text' })
		.max(4000, { error: 'Notes must be at most 4000 characters' }),
	/** The plant's tag on the asset (traps); it carries the asset across surveys. */
	assetTag: z
		.string({ error: 'Asset tag must be text' })
		.trim()
		.min(1, { error: 'Asset tag cannot be empty; leave it out instead' })
		.max(64, { error: 'Asset tag must be at most 64 characters' })
		.optional(),
	status: z.enum(FINDING_STATUSES, oneOf('Status', FINDING_STATUSES)),
	/** Repair cost in integer minor units of the site's currency. */
	repairCost: minorUnitsSchema.optional(),
	version: z
		.number({ error: 'Version must be a whole number' })
		.int({ error: 'Version must be a whole number' })
		.nonnegative({ error: 'Version cannot be negative' }),
	createdAt: isoDateTime('Created at'),
	updatedAt: isoDateTime('Updated at'),
	deleted: z.boolean({ error: 'Deleted must be true or false' })
});

export const trapFindingSchema = findingBase.extend({
	kind: z.literal('trap'),
	inputs: trapInputsSchema
});
export const leakFindingSchema = findingBase.extend({
	kind: z.literal('leak'),
	inputs: leakInputsSchema
});
export const insulationFindingSchema = findingBase.extend({
	kind: z.literal('insulation'),
	inputs: insulationInputsSchema
});
export const headerFindingSchema = findingBase.extend({
	kind: z.literal('header'),
	inputs: headerInputsSchema
});

export const findingSchema = z
	.discriminatedUnion(
		'kind',
		[trapFindingSchema, leakFindingSchema, insulationFindingSchema, headerFindingSchema],
		{ error: `Kind must be one of: ${FINDING_KINDS.join(', ')}` }
	)
	.superRefine((finding, ctx) => {
		if (finding.headerId !== undefined) return;
		if (finding.kind === 'insulation') {
			if (finding.inputs.processTemperature === undefined) {
				ctx.addIssue({
					code: 'custom',
					path: ['headerId'],
					message: 'Choose the header this item carries, or give its process temperature'
				});
			}
			return;
		}
		ctx.addIssue({
			code: 'custom',
			path: ['headerId'],
			message: `Choose the header this ${finding.kind} is on`
		});
	})
	.superRefine((finding, ctx) => {
		if (Date.parse(finding.updatedAt) < Date.parse(finding.createdAt)) {
			ctx.addIssue({
				code: 'custom',
				path: ['updatedAt'],
				message: 'Updated at cannot be before created at'
			});
		}
	});

export type TrapFinding = z.infer<typeof trapFindingSchema>;
export type LeakFinding = z.infer<typeof leakFindingSchema>;
export type InsulationFinding = z.infer<typeof insulationFindingSchema>;
export type HeaderFinding = z.infer<typeof headerFindingSchema>;
export type Finding = z.infer<typeof findingSchema>;
