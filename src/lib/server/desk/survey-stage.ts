/**
 * Which stage moves the Desk makes here, and why the others make no sense. Pure, so the rule is
 * read (and tested) in one place; the write in survey-changes.ts checks it under a row lock.
 */
import { SURVEY_STAGE_LABELS, type SurveyStage } from '../../schemas/survey';

export interface StageFacts {
	from: SurveyStage;
	/** Findings recorded (deleted ones not counted). */
	findings: number;
	/** The survey went to the client at some point (surveys.published_at). */
	published: boolean;
}

/** The stages a survey may move to from `from` (published is the publishing step's). */
export const STAGE_MOVES: Record<SurveyStage, readonly SurveyStage[]> = {
	planned: ['in-field', 'closed'],
	'in-field': ['planned', 'in-review'],
	'in-review': ['in-field', 'closed'],
	published: ['closed'],
	closed: ['in-review']
};

/** null when the move may be made, else why not in plain words. */
export function stageMoveProblem(facts: StageFacts, to: SurveyStage): string | null {
	const { from } = facts;
	if (to === from) return `The survey is already “${SURVEY_STAGE_LABELS[to]}”.`;
	if (to === 'published') {
		return 'Sending a survey to the client is done in the publishing step, not here.';
	}
	if (!STAGE_MOVES[from].includes(to)) {
		return `A survey cannot go from “${SURVEY_STAGE_LABELS[from]}” straight to “${SURVEY_STAGE_LABELS[to]}”.`;
	}
	if (to === 'planned' && facts.findings > 0) {
		const n = facts.findings === 1 ? '1 finding was' : `${facts.findings} findings were`;
		return `It cannot go back to “${SURVEY_STAGE_LABELS.planned}”: ${n} already recorded.`;
	}
	if (from === 'closed' && facts.published) {
		return 'This survey went to the client, so it stays closed; start a new survey for a new visit.';
	}
	return null;
}

/** The next step for the page to offer, publishing included (shown, not done, here). */
export function nextStage(from: SurveyStage): SurveyStage | null {
	switch (from) {
		case 'planned':
			return 'in-field';
		case 'in-field':
			return 'in-review';
		case 'in-review':
			return 'published';
		case 'published':
			return 'closed';
		case 'closed':
			return null;
	}
}
