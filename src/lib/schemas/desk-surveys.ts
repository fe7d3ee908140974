/**
 * The Desk's survey forms: a new survey, its details, its stage, who records on it and whether
 * every finding was checked. Field names are the form's (parseForm nested, `auditorIds` a list).
 */
import { z } from 'zod';
import { SURVEY_STAGES, type SurveyStage } from './survey';

/** A calendar day as the date input sends it (YYYY-MM-DD), and a real day of the calendar. */
export function isoDaySchema(label: string) {
	return z
		.string({ error: `Enter the ${label}` })
		.trim()
		.min(1, { error: `Enter the ${label}` })
		.regex(/^\d{4}-\d{2}-\d{2}$/, { error: `Enter the ${label} as a date, e.g. 2026-11-20` })
		.refine(
			(s) => {
				const d = new Date(`${s}T00:00:00Z`);
				return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
			},
			{ error: `The ${label} is not a day of the calendar` }
		);
}

export const surveyNameSchema = z
	.string({ error: 'Give the survey a name' })
	.trim()
	.min(1, { error: 'Give the survey a name' })
	.max(160, { error: 'Keep the name to 160 characters' });

/** Most people one survey can have assigned at once: a crew, never a firm. */
export const MAX_ASSIGNED = 50;

/** A choice from a list of ours: empty says `missing`, anything but an id says `unknown`. */
function choiceSchema(missing: string, unknown: string) {
	return z
		.string({ error: missing })
		.trim()
		.min(1, { error: missing })
		.pipe(z.uuid({ error: unknown }));
}

const auditorIdsSchema = z
	.array(z.string(), { error: 'Choose who records on this survey' })
	// An empty option (a select with nothing chosen) is no person; a repeat is one person.
	.transform((ids) => [...new Set(ids.map((id) => id.trim()).filter((id) => id !== ''))])
	.pipe(
		z
			.array(z.uuid({ error: 'Choose people from the list' }))
			.max(MAX_ASSIGNED, { error: `Assign at most ${MAX_ASSIGNED} people at a time` })
	);

const dates = {
	startsOn: isoDaySchema('start date'),
	endsOn: isoDaySchema('end date')
};

/** End not before start, said beside the end date. */
function datesInOrder(v: { startsOn: string; endsOn: string }, ctx: z.RefinementCtx) {
	if (v.endsOn < v.startsOn) {
		ctx.addIssue({
			code: 'custom',
			path: ['endsOn'],
			message: 'The end date cannot be before the start date'
		});
	}
}

export const newSurveySchema = z
	.object({
		siteId: choiceSchema('Choose a site', 'Choose one of the sites in the list'),
		name: surveyNameSchema,
		...dates,
		auditorIds: auditorIdsSchema.default([])
	})
	.superRefine(datesInOrder);
export type NewSurvey = z.output<typeof newSurveySchema>;

export const surveyDetailsSchema = z
	.object({ name: surveyNameSchema, ...dates })
	.superRefine(datesInOrder);
export type SurveyDetails = z.output<typeof surveyDetailsSchema>;

/** The stages the Desk moves a survey between here; publishing is a step of its own. */
export const DESK_STAGES = SURVEY_STAGES.filter(
	(s): s is Exclude<SurveyStage, 'published'> => s !== 'published'
);

export const stageMoveSchema = z.object({
	stage: z.enum(SURVEY_STAGES, { error: 'Choose the stage to move the survey to' })
});

export const assignSchema = z.object({
	auditorIds: auditorIdsSchema.refine((ids) => ids.length > 0, {
		error: 'Choose at least one person to assign'
	})
});

export const unassignSchema = z.object({
	userId: choiceSchema('Choose who to take off the survey', 'Choose a person from the list')
});

export const markReviewedSchema = z.object({
	/** `reviewed`: every finding is checked; `reopen`: checking starts again. */
	mark: z.enum(['reviewed', 'reopen'], { error: 'Say whether checking is finished or reopened' })
});
