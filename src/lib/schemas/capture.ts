/**
 * What a device owns of a finding: the capture. Kind, inputs (engine base units: p MPa
 * absolute, T K, lengths m, mass flow kg/s), header, area, location, tag, notes, photos and
 * timestamps. Nothing else: a device can never set a lifecycle status, a repair cost or a
 * review flag (those are the Desk's, ./review.ts), and the objects are strict, so a payload
 * that tries is refused rather than quietly trimmed. The same schema checks the Walk's forms,
 * the device's outbox and the server's sync route.
 */
import { z } from 'zod';
import { uuidSchema } from './common';
import {
	headerInputsSchema,
	insulationInputsSchema,
	leakInputsSchema,
	trapInputsSchema
} from './finding-inputs';
import type { FindingInput } from '../steam/losses/inputs';

/** Photos one finding may carry. */
export const MAX_PHOTOS_PER_FINDING = 12;

export const isoDateTime = (label: string) =>
	z.iso.datetime({ offset: true, error: `${label} must be a date and time` });

export const assetTagSchema = z
	.string({ error: 'The tag must be text' })
	.trim()
	.min(1, { error: 'Give the tag, or leave it out' })
	.max(64, { error: 'A tag is at most 64 characters' });

export const captureBaseSchema = z.strictObject({
	/** Generated on the device, so a finding has its identity before it ever syncs. */
	id: uuidSchema,
	surveyId: uuidSchema,
	/** The site header it draws steam from; optional only for insulation with its own temperature. */
	headerId: uuidSchema.optional(),
	/** One of the site's areas (the plant's own names for where things are). */
	areaId: uuidSchema.optional(),
	location: z
		.string({ error: 'Location must be text' })
		.trim()
		.max(200, { error: 'Keep the location under 200 characters' }),
	/** The plant's tag on the asset (traps); it carries the asset across surveys. */
	assetTag: assetTagSchema.optional(),
	notes: z
		.string({ error: 'Notes must be text' })
		.max(4000, { error: 'Keep the notes under 4000 characters' }),
	/** Device-made ids of the photos taken for this finding, in the order taken. */
	photoIds: z
		.array(uuidSchema, { error: 'Photos must be a list' })
		.max(MAX_PHOTOS_PER_FINDING, { error: `At most ${MAX_PHOTOS_PER_FINDING} photos per finding` }),
	createdAt: isoDateTime('Recorded at'),
	updatedAt: isoDateTime('Last changed at')
});

export const trapCaptureSchema = captureBaseSchema.extend({
	kind: z.literal('trap'),
	inputs: trapInputsSchema
});
export const leakCaptureSchema = captureBaseSchema.extend({
	kind: z.literal('leak'),
	inputs: leakInputsSchema
});
export const insulationCaptureSchema = captureBaseSchema.extend({
	kind: z.literal('insulation'),
	inputs: insulationInputsSchema
});
export const headerCaptureSchema = captureBaseSchema.extend({
	kind: z.literal('header'),
	inputs: headerInputsSchema
});

/** Rules that span fields, shared by the capture and the full stored finding (./finding.ts). */
export function checkCapture(
	finding: FindingInput & { createdAt: string; updatedAt: string },
	ctx: z.RefinementCtx
): void {
	if (finding.headerId === undefined) {
		if (finding.kind !== 'insulation') {
			ctx.addIssue({
				code: 'custom',
				path: ['headerId'],
				message: `Choose the header this ${finding.kind === 'header' ? 'reading is on' : `${finding.kind} is on`}`
			});
		} else if (finding.inputs.processTemperature === undefined) {
			ctx.addIssue({
				code: 'custom',
				path: ['headerId'],
				message: 'Choose the header this item carries, or give its surface temperature'
			});
		}
	}
	if (Date.parse(finding.updatedAt) < Date.parse(finding.createdAt)) {
		ctx.addIssue({
			code: 'custom',
			path: ['updatedAt'],
			message: 'A finding cannot be changed before it was recorded'
		});
	}
}

export const findingCaptureSchema = z
	.discriminatedUnion(
		'kind',
		[trapCaptureSchema, leakCaptureSchema, insulationCaptureSchema, headerCaptureSchema],
		{
			error:
				'Choose what you are recording: a trap test, a leak, an insulation gap or a header reading'
		}
	)
	.superRefine(checkCapture);

export type TrapCapture = z.infer<typeof trapCaptureSchema>;
export type LeakCapture = z.infer<typeof leakCaptureSchema>;
export type InsulationCapture = z.infer<typeof insulationCaptureSchema>;
export type HeaderCapture = z.infer<typeof headerCaptureSchema>;
export type FindingCapture = z.infer<typeof findingCaptureSchema>;
