/**
 * The Desk's measures pages on the app's pool (docs/costs.md): a survey's measures with their
 * sums, one measure with its findings, and the forms that write them. Route files call these;
 * refusals come back with the field named and what was typed kept.
 */
import { and, asc, eq, isNull } from 'drizzle-orm';
import {
	addToMeasureSchema,
	findingPickSchema,
	measureExtrasMinor,
	measureFormSchema,
	measureVersionSchema,
	type MeasureForm
} from '../../schemas/costs';
import { uuidSchema } from '../../schemas/common';
import { db } from '../db';
import { findings, measures, sites, surveys } from '../db/schema';
import { fieldErrors, formProblem, type FormObject } from '../forms';
import { DESK_LOCKED_MESSAGE, lockedStage } from '../publish/lock';
import { unitSystemOf } from '../walk/person';
import { surveyMeasures } from './sums';
import {
	changeMembers,
	createMeasure,
	deleteMeasure,
	updateMeasure,
	type Attached,
	type MeasureOutcome,
	type MeasureTarget
} from './write';

export const MEASURE_MOVED_MESSAGE =
	'Someone changed this measure after you opened it: nothing was saved. Your values are still ' +
	'in the form — open the measure again to see theirs.';

export const MEASURE_NOT_HERE_MESSAGE =
	'That measure is not one of this survey’s measures (or was deleted): nothing was changed.';

export const MEASURE_FIELDS = [
	'name',
	'description',
	'access',
	'scaffold',
	'shutdown',
	'other',
	'otherLabel'
];

async function surveyHead(surveyId: string) {
	const [row] = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			stage: surveys.status,
			publishedAt: surveys.publishedAt,
			currency: sites.currency
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.where(eq(surveys.id, surveyId))
		.limit(1);
	if (!row) return null;
	const { publishedAt, ...head } = row;
	// What the page says; every write reads the lock again in its own transaction.
	return { ...head, frozen: lockedStage(row.stage, publishedAt !== null) };
}

export async function measuresPage(userId: string, surveyId: string) {
	const [survey, measures, unitSystem] = await Promise.all([
		surveyHead(surveyId),
		surveyMeasures(db, surveyId),
		unitSystemOf(db, userId)
	]);
	return survey ? { survey, measures, unitSystem } : null;
}

export async function measurePage(userId: string, surveyId: string, measureId: string) {
	const [survey, [measure], unitSystem, members] = await Promise.all([
		surveyHead(surveyId),
		surveyMeasures(db, surveyId, measureId),
		unitSystemOf(db, userId),
		db
			.select({
				id: findings.id,
				kind: findings.kind,
				location: findings.location,
				condition: findings.condition,
				repairCost: findings.repairCost,
				source: findings.repairCostSource,
				cost: findings.cost,
				paybackYears: findings.paybackYears
			})
			.from(findings)
			.where(
				and(
					eq(findings.measureId, measureId),
					eq(findings.surveyId, surveyId),
					isNull(findings.deletedAt)
				)
			)
			.orderBy(asc(findings.location), asc(findings.id))
	]);
	return survey && measure ? { survey, measure, members, unitSystem } : null;
}

/** The survey's live measures by name, in the consultant's order (the findings table's choice). */
export function measureChoices(surveyId: string) {
	return db
		.select({ id: measures.id, name: measures.name })
		.from(measures)
		.where(and(eq(measures.surveyId, surveyId), isNull(measures.deletedAt)))
		.orderBy(asc(measures.sortOrder), asc(measures.createdAt));
}

/** A refusal's words, or null when it worked (missing: the caller answers 404). */
function refusal(out: MeasureOutcome): string | 'missing' | null {
	if (out.kind === 'frozen') return DESK_LOCKED_MESSAGE;
	if (out.kind === 'moved') return MEASURE_MOVED_MESSAGE;
	if (out.kind === 'missing') return 'missing';
	if (out.kind === 'foreign') {
		const which =
			out.count === 1
				? 'One of the picked findings is not a finding of this survey (or was deleted)'
				: `${out.count} of the picked findings are not findings of this survey (or were deleted)`;
		return `${which}: nothing was changed.`;
	}
	return null;
}

function details(form: MeasureForm, currency: string) {
	return {
		name: form.name,
		description: form.description,
		extras: measureExtrasMinor(form, currency),
		otherLabel: form.otherLabel
	};
}

const pick = (fields: FormObject) => {
	const ids = fields.findingIds;
	return findingPickSchema.safeParse({ findingIds: Array.isArray(ids) ? ids : [] });
};

const keep = (fields: FormObject) =>
	Object.fromEntries(
		MEASURE_FIELDS.map((k) => [k, typeof fields[k] === 'string' ? (fields[k] as string) : ''])
	);

type Answer = ReturnType<typeof formProblem> | { missing: true } | Record<string, unknown>;

/** Creates a measure from the picked findings (the findings table's "Group into a measure"). */
export async function createMeasureForm(
	t: MeasureTarget,
	currency: string,
	fields: FormObject
): Promise<Answer> {
	const values = keep(fields);
	const form = measureFormSchema.safeParse(values);
	const ids = pick(fields);
	if (!form.success || !ids.success) {
		const errors = {
			...(form.success ? {} : fieldErrors(form.error.issues)),
			...(ids.success ? {} : fieldErrors(ids.error.issues))
		};
		return formProblem(400, Object.values(errors)[0] ?? 'Check the measure.', { values, errors });
	}
	const out = await createMeasure(db, t, details(form.data, currency), ids.data.findingIds);
	const why = refusal(out);
	if (why === 'missing') return { missing: true };
	if (why) return formProblem(409, why, { values, errors: { form: why } });
	return { created: out.kind === 'done' ? out.measureId : '' };
}

export async function updateMeasureForm(
	t: MeasureTarget,
	currency: string,
	measureId: string,
	fields: FormObject
): Promise<Answer> {
	const values = keep(fields);
	const form = measureFormSchema.safeParse(values);
	const version = measureVersionSchema.safeParse(fields.version);
	if (!form.success || !version.success) {
		const errors = {
			...(version.success ? {} : { form: version.error.issues[0].message }),
			...(form.success ? {} : fieldErrors(form.error.issues))
		};
		return formProblem(400, Object.values(errors)[0] ?? 'Check the measure.', { values, errors });
	}
	const out = await updateMeasure(db, t, measureId, details(form.data, currency), version.data);
	const why = refusal(out);
	if (why === 'missing') return { missing: true };
	if (why) return formProblem(409, why, { values, errors: { form: why } });
	return { updated: true };
}

export async function membersForm(
	t: MeasureTarget,
	measureId: string,
	op: 'add' | 'remove',
	fields: FormObject
): Promise<Answer> {
	const ids = pick(fields);
	if (!ids.success) {
		const errors = fieldErrors(ids.error.issues);
		return formProblem(400, Object.values(errors)[0] ?? 'Tick at least one finding', { errors });
	}
	const why = refusal(await changeMembers(db, t, measureId, op, ids.data.findingIds));
	if (why === 'missing') return { missing: true };
	if (why) return formProblem(409, why);
	return { members: op };
}

/** What adding findings did, in words after the measure's name: moves and ones already in it. */
export function addedNote(a: Attached): string {
	const moved = a.moved.map((m, i) => `${m.count}${i === 0 ? ' moved' : ''} from ${m.name}`);
	const parts = [
		...(moved.length ? [moved.join(', ')] : []),
		...(a.already ? [`${a.already} ${a.already === 1 ? 'was' : 'were'} in it already`] : [])
	];
	return parts.length ? ` (${parts.join('; ')}).` : '.';
}

/**
 * The findings table's "Add to measure": the ticked findings into one of the survey's existing
 * measures (a finding in another measure moves). Refusals keep the choice and change nothing.
 */
export async function addToMeasureForm(t: MeasureTarget, fields: FormObject) {
	const ids = fields.findingIds;
	const measureId = typeof fields.measureId === 'string' ? fields.measureId : '';
	const values = { measureId };
	const form = addToMeasureSchema.safeParse({
		measureId,
		findingIds: Array.isArray(ids) ? ids : []
	});
	if (!form.success) {
		const errors = fieldErrors(form.error.issues);
		const first = Object.values(errors)[0] ?? 'Check the ticked findings';
		return formProblem(400, `${first}. Nothing was changed.`, { values, errors });
	}
	const out = await changeMembers(db, t, form.data.measureId, 'add', form.data.findingIds);
	if (out.kind === 'missing') {
		return formProblem(400, MEASURE_NOT_HERE_MESSAGE, {
			values,
			errors: { measureId: MEASURE_NOT_HERE_MESSAGE }
		});
	}
	if (out.kind !== 'done') {
		// Frozen is the survey's state (409); a finding of another survey is bad input (400).
		return formProblem(out.kind === 'frozen' ? 409 : 400, refusal(out) ?? '', { values });
	}
	const { findings: count = 0, already = 0, moved = [] } = out;
	return {
		added: {
			measureId: out.measureId,
			name: out.name ?? '',
			findings: count,
			note: addedNote({ findings: count, already, moved })
		}
	};
}

export async function deleteMeasureForm(t: MeasureTarget, measureId: string): Promise<Answer> {
	const why = refusal(await deleteMeasure(db, t, measureId));
	if (why === 'missing') return { missing: true };
	if (why) return formProblem(409, why);
	return { deleted: true };
}

/** A measure id from the address (anything else is no measure: 404). */
export const measureIdOk = (id: string) => uuidSchema.safeParse(id).success;
