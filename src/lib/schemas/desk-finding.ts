/**
 * The Desk's forms on one finding and on a sync conflict, as posted (every value text; the
 * capture itself is then built in the person's units and checked by findingCaptureSchema).
 * Field names: the Walk's field keys (`condition`, `orifice`, `headerId`…), insulation layers
 * as numbered rows (`layers[0].thickness`, `layers[0].material`, `layers[0].conductivity`),
 * `version` (the finding's version when the page was opened), `repairCost` in major units.
 */
import { z } from 'zod';

/** The version a form was opened at: an edit on an older one is refused, never merged blind. */
export const openedVersionSchema = z.coerce
	.number({ error: 'This form lost track of the finding’s version: open the finding again' })
	.int({ error: 'This form lost track of the finding’s version: open the finding again' })
	.positive({ error: 'This form lost track of the finding’s version: open the finding again' });

/** A repair cost as typed: empty (none yet) or a plain amount with up to 3 decimals. */
export const repairCostTextSchema = z
	.string({ error: 'Enter the repair cost as an amount' })
	.trim()
	.regex(/^(\d{1,12}(\.\d{1,3})?)?$/, {
		error: 'Enter the repair cost as a plain amount, e.g. 1200 or 1200.50 (no sign, no commas)'
	});

export const layerRowSchema = z.object({
	thickness: z.string().default(''),
	material: z.string().default(''),
	/** Only for material `custom`: the conductivity in W/(m K). */
	conductivity: z.string().default('')
});
export type LayerRow = z.infer<typeof layerRowSchema>;

/** Layers a form may carry (the schema allows at most 4; one more is refused with words). */
export const MAX_FORM_LAYERS = 4;

export const findingEditFormSchema = z
	.object({
		// Both read after the form is taken apart, so a refusal keeps every typed value.
		version: z.string().default(''),
		repairCost: z.string().default(''),
		layers: z
			.array(layerRowSchema, { error: 'Layers must be rows' })
			.max(MAX_FORM_LAYERS, { error: `At most ${MAX_FORM_LAYERS} insulation layers` })
			.default([])
	})
	// The kind's own fields (the Walk's keys) as text; the capture builder reads them.
	.catchall(z.string({ error: 'Each field must be text' }).max(4000, { error: 'Too long' }))
	.transform(({ version, repairCost, layers, ...fields }) => ({
		version,
		repairCost,
		layers,
		fields: fields as Record<string, string>
	}));
export type FindingEditForm = z.output<typeof findingEditFormSchema>;

export const reviewFormSchema = z.object({
	reviewed: z.enum(['yes', 'no'], { error: 'Say whether the finding is reviewed' })
});

export const CHOICES = ['server', 'device'] as const;

export const conflictFormSchema = z.object({
	version: openedVersionSchema
});

export const mergeFormSchema = z.object({
	version: openedVersionSchema,
	/** One per field that differs: `choice.<field>` = server | device. */
	choice: z
		.record(
			z.string().regex(/^[A-Za-z]{1,40}$/, { error: 'Unknown field' }),
			z.enum(CHOICES, { error: 'Choose the server’s value or the device’s for this field' })
		)
		.default({})
});
export type MergeForm = z.infer<typeof mergeFormSchema>;
