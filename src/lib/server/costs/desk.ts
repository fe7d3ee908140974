/**
 * The Desk's cost-library page and a survey's "price repairs" action, on the app's pool: what
 * the route files call (they hold no query). Forms are read once and checked by the shared
 * schemas ($lib/schemas/costs); a refusal names the field and keeps what was typed.
 */
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { costEntryFormSchema, costEntryRefSchema } from '../../schemas/costs';
import { NO_MATCH_REASONS, type NoMatchReason } from '../../costs/match';
import { db } from '../db';
import { firms } from '../db/schema';
import { fieldErrors, formProblem } from '../forms';
import { DESK_LOCKED_MESSAGE } from '../publish/lock';
import { applyLibraryCosts, type ApplySummary } from './apply';
import { setFindingCost, type CostChoice } from './finding-cost';
import { listCostEntries, retireCostEntry, saveCostEntry } from './library';

export const COST_FIELDS = [
	'entryId',
	'version',
	'kind',
	'trapType',
	'dn',
	'thicknessMm',
	'fittingKind',
	'sizeClass',
	'currency',
	'unitCost',
	'labourHours',
	'note'
];

export async function costsPage(firmId: string) {
	const [entries, [firm]] = await Promise.all([
		listCostEntries(db, firmId),
		db.select({ currency: firms.defaultCurrency }).from(firms).where(eq(firms.id, firmId))
	]);
	return { entries, currency: firm?.currency ?? 'EUR' };
}

const keep = (fields: Record<string, string>) =>
	Object.fromEntries(COST_FIELDS.map((k) => [k, fields[k] ?? '']));

/** Saves a posted entry (new when it carries no entryId). */
export async function saveEntryForm(
	user: { firmId: string; id: string },
	fields: Record<string, string>
) {
	const values = keep(fields);
	const isNew = !fields.entryId;
	const ref = isNew ? null : costEntryRefSchema.safeParse(fields);
	const form = costEntryFormSchema.safeParse(fields);
	if (!form.success || (ref && !ref.success)) {
		const errors = {
			...(ref && !ref.success ? fieldErrors(ref.error.issues) : {}),
			...(!form.success ? fieldErrors(form.error.issues) : {})
		};
		return formProblem(400, Object.values(errors)[0] ?? 'Check the entry.', { values, errors });
	}
	const outcome = await saveCostEntry(
		db,
		user.firmId,
		user.id,
		form.data,
		ref && ref.success ? ref.data : null
	);
	if (outcome.kind === 'duplicate') {
		const message =
			'The library already has an entry for this type and size: change that one instead.';
		return formProblem(400, message, { values, errors: { kind: message } });
	}
	if (outcome.kind === 'moved' || outcome.kind === 'missing') {
		const message =
			'Someone changed or retired this entry after you opened the page: nothing was saved. ' +
			'Open the library again to see theirs.';
		return formProblem(409, message, { values, errors: { form: message } });
	}
	return { saved: form.data.key, isNew };
}

export async function retireEntryForm(
	user: { firmId: string; id: string },
	fields: Record<string, string>
) {
	const ref = costEntryRefSchema.safeParse(fields);
	if (!ref.success) return formProblem(400, 'Open the library again: this form lost its entry.');
	const outcome = await retireCostEntry(db, user.firmId, user.id, ref.data);
	if (outcome === 'missing') return null;
	if (outcome === 'moved') {
		return formProblem(409, 'Someone changed this entry after you opened the page: open it again.');
	}
	return { retired: true };
}

/** The summary in words: priced, kept, and why the rest had no library cost. */
export function applySummaryLines(s: ApplySummary): string[] {
	const lines = [`${s.priced} finding${s.priced === 1 ? '' : 's'} priced from the library.`];
	if (s.keptEdited || s.keptQuote) {
		lines.push(
			`Kept as they were: ${s.keptEdited} with an edited figure, ${s.keptQuote} with a quote.`
		);
	}
	for (const [reason, n] of Object.entries(s.unmatched)) {
		lines.push(
			`${n} not priced: ${n === 1 ? 'it' : 'each'} ${NO_MATCH_REASONS[reason as NoMatchReason]}.`
		);
	}
	return lines;
}

const overwriteSchema = z.object({ overwrite: z.enum(['', 'yes']).default('') });

export async function applyLibraryForm(
	user: { firmId: string; id: string },
	surveyId: string,
	fields: Record<string, string>
) {
	const parsed = overwriteSchema.safeParse(fields);
	if (!parsed.success)
		return formProblem(400, 'Choose whether to replace edited and quoted costs.');
	const out = await applyLibraryCosts(
		db,
		user.firmId,
		user.id,
		surveyId,
		parsed.data.overwrite === 'yes'
	);
	if (out.kind === 'frozen') return formProblem(409, DESK_LOCKED_MESSAGE);
	if (out.kind === 'missing') return null;
	return { priced: applySummaryLines(out.summary) };
}

export async function findingCostForm(
	target: { firmId: string; actorId: string; surveyId: string; findingId: string },
	choice: CostChoice
) {
	return setFindingCost(db, target, choice);
}
