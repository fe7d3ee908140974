/**
 * A survey's stage, in stored ids and in the words people read. Stored as short strings
 * (`surveys.status`); the Desk moves a survey along, the Walk only shows where it is.
 */
import { z } from 'zod';

export const SURVEY_STAGES = ['planned', 'in-field', 'in-review', 'published', 'closed'] as const;
export type SurveyStage = (typeof SURVEY_STAGES)[number];

export const SURVEY_STAGE_LABELS: Record<SurveyStage, string> = {
	planned: 'Not started',
	'in-field': 'Out on the walk',
	'in-review': 'Being checked at the desk',
	published: 'With the client',
	closed: 'Closed'
};

export const surveyStageSchema = z.enum(SURVEY_STAGES, { error: 'Choose the survey’s stage' });
