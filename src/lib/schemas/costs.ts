/**
 * The Desk's forms for the cost library, a finding's repair cost and measures (docs/costs.md),
 * as posted (every value text). Money is typed in major units of the entry's (or the site's)
 * currency and becomes integer minor units here; nothing is a float once stored.
 */
import { z } from 'zod';
import { COST_ENTRY_KINDS, FITTING_KINDS, entryKey, type EntryIdentity } from '../costs/match';
import { toMinorUnits } from '../steam/losses/money';
import { LEAK_SIZE_CLASSES, NOMINAL_DNS, TRAP_TYPES } from '../steam/vocabulary';
import { uuidSchema } from './common';
import { isoCurrencySchema, optionalText, readNumber } from './desk-sites';
import { nameSchema } from './names';

const AMOUNT = /^\d{1,12}(\.\d{1,3})?$/;

/** An amount typed in major units ("1200", "1200.50"); `blank` is what an empty field means. */
const amountText = (label: string, blank: 'zero' | 'missing') =>
	z
		.string()
		.trim()
		.refine((t) => (t === '' ? blank === 'zero' : AMOUNT.test(t)), {
			error:
				blank === 'missing'
					? `Enter ${label} as a plain amount, e.g. 1200 or 1200.50 (no sign, no commas)`
					: `${label} must be a plain amount, e.g. 1200 or 1200.50 (no sign, no commas), or blank`
		});

const sizeText = (label: string, max: number) =>
	z
		.string()
		.trim()
		.transform((t, ctx) => {
			const n = readNumber(t);
			if (n === undefined || !Number.isInteger(n) || n <= 0 || n > max) {
				ctx.addIssue({ code: 'custom', message: `${label}: a whole number from 1 to ${max}` });
				return z.NEVER;
			}
			return n;
		});

const dnText = z
	.string()
	.trim()
	.transform((t, ctx) => {
		const n = Number(t);
		if (!(NOMINAL_DNS as readonly number[]).includes(n)) {
			ctx.addIssue({ code: 'custom', message: 'Choose a standard nominal size (DN)' });
			return z.NEVER;
		}
		return n;
	});

const entryCommon = {
	currency: isoCurrencySchema,
	unitCost: amountText('the cost', 'missing'),
	labourHours: z
		.string()
		.trim()
		.transform((t, ctx) => {
			const n = readNumber(t);
			if (n === undefined) return null;
			if (!Number.isFinite(n) || n < 0 || n > 1000) {
				ctx.addIssue({ code: 'custom', message: 'Labour hours: from 0 to 1000, or blank' });
				return z.NEVER;
			}
			return n;
		}),
	note: optionalText(255, 'The note')
};

/** A library entry as the form posts it: its identity by kind, then the figures. */
export const costEntryFormSchema = z
	.discriminatedUnion(
		'kind',
		[
			z.object({
				kind: z.enum(['trap-repair', 'trap-replacement']),
				trapType: z.enum(TRAP_TYPES, { error: 'Choose the trap type' }),
				dn: dnText,
				...entryCommon
			}),
			z.object({
				kind: z.literal('insulation'),
				dn: dnText,
				thicknessMm: sizeText('Thickness in mm', 500),
				...entryCommon
			}),
			z.object({
				kind: z.literal('fitting-cover'),
				fittingKind: z.enum(FITTING_KINDS, { error: 'Choose a valve or a flange pair' }),
				dn: dnText,
				...entryCommon
			}),
			z.object({
				kind: z.literal('leak-repair'),
				sizeClass: z.enum(LEAK_SIZE_CLASSES, { error: 'Choose the leak size class' }),
				...entryCommon
			}),
			z.object({ kind: z.literal('labour'), ...entryCommon })
		],
		{ error: `Choose what the entry prices: ${COST_ENTRY_KINDS.join(', ')}` }
	)
	.transform((form) => {
		const { currency, unitCost, labourHours, note, ...identity } = form;
		return {
			identity: identity as EntryIdentity,
			key: entryKey(identity as EntryIdentity),
			currency,
			unitCost: toMinorUnits(Number(unitCost), currency),
			// Labour is the rate itself: hours per unit mean nothing on it.
			labourHours: form.kind === 'labour' ? null : labourHours,
			note
		};
	});
export type CostEntryForm = z.output<typeof costEntryFormSchema>;

/** The version a library entry's form was opened at, and which entry. */
export const costEntryRefSchema = z.object({
	entryId: uuidSchema,
	version: z.coerce.number({ error: 'Open the library again' }).int().positive()
});

/** A consultant's own figure for one finding: edited (with a reason) or a quote (a reference). */
export const findingCostFormSchema = z
	.object({
		source: z.enum(['edited', 'quote', 'library', 'none'], {
			error: 'Choose where the figure comes from'
		}),
		amount: z.string().trim().default(''),
		note: optionalText(160, 'The reference')
	})
	.superRefine((f, ctx) => {
		if ((f.source === 'edited' || f.source === 'quote') && !AMOUNT.test(f.amount)) {
			ctx.addIssue({
				code: 'custom',
				path: ['amount'],
				message: 'Enter the repair cost as a plain amount, e.g. 1200 or 1200.50'
			});
		}
		if (f.source === 'quote' && !f.note) {
			ctx.addIssue({
				code: 'custom',
				path: ['note'],
				message: 'Give the quote’s reference (supplier and number or date)'
			});
		}
	});

export const MEASURE_EXTRAS = ['access', 'scaffold', 'shutdown', 'other'] as const;
export type MeasureExtra = (typeof MEASURE_EXTRAS)[number];

export const measureNameSchema = nameSchema(160, 'Give the measure a name', 'The name');

/** The version a measure's form was opened at: a save over a newer one is refused. */
export const measureVersionSchema = z.coerce
	.number({ error: 'This form lost track of the measure’s version: open the measure again' })
	.int({ error: 'This form lost track of the measure’s version: open the measure again' })
	.positive({ error: 'This form lost track of the measure’s version: open the measure again' });

/** A measure's name, description and extra costs (major units of the site's currency). */
export const measureFormSchema = z.object({
	name: measureNameSchema,
	description: optionalText(2000, 'The description'),
	access: amountText('Access', 'zero'),
	scaffold: amountText('Scaffold', 'zero'),
	shutdown: amountText('Shutdown', 'zero'),
	other: amountText('Other', 'zero'),
	otherLabel: optionalText(120, 'What the other cost is for')
});
export type MeasureForm = z.output<typeof measureFormSchema>;

/** The extra costs of a measure form in minor units of the site's currency. */
export function measureExtrasMinor(
	form: MeasureForm,
	currency: string
): Record<MeasureExtra, number> {
	const minor = (t: string) => (t === '' ? 0 : toMinorUnits(Number(t), currency));
	return {
		access: minor(form.access),
		scaffold: minor(form.scaffold),
		shutdown: minor(form.shutdown),
		other: minor(form.other)
	};
}

const findingIdsSchema = z
	.array(
		z.uuid({
			error: 'One of the ticked findings is not a finding id: reload the table and tick again'
		}),
		{ error: 'Pick findings' }
	)
	.min(1, { error: 'Tick at least one finding' })
	.max(5000, { error: 'At most 5000 findings at once' });

/** Findings picked in a table: at least one, each a UUID. */
export const findingPickSchema = z.object({ findingIds: findingIdsSchema });

/** The findings table's "Add to measure": ticked findings and one of the survey's measures. */
export const addToMeasureSchema = z.object({
	measureId: z
		.string()
		.trim()
		.min(1, { error: 'Choose the measure to add the findings to' })
		.pipe(z.uuid({ error: 'Choose one of this survey’s measures' })),
	findingIds: findingIdsSchema
});
