/**
 * Whether a survey may be published now, and why not in words (pure: the facts are read by
 * publish.ts inside its transaction, so the check and the write see the same rows).
 */
import { NOTE_REQUIRED } from '../../schemas/publish';

export interface PublishFacts {
	/** surveys.status */
	stage: string;
	/** Live (not deleted) findings of the survey. */
	findings: number;
	/** Live findings not yet checked at the Desk (reviewed_at null). */
	unreviewed: number;
	/** Devices' edits waiting for a decision (finding_conflicts unresolved). */
	conflicts: number;
	/** The basis the figures are priced on (frozen, else the site's); null: none. */
	basisId: string | null;
	/** The number the new revision would get (1 for the first publication). */
	nextRevision: number;
	/** The note given (trimmed). */
	note: string;
}

export type Problem = { message: string; field: 'form' | 'note' };

const many = (n: number, one: string, more: string) => `${n} ${n === 1 ? one : more}`;

/** The first reason the survey cannot be published, or null when it may. */
export function publishProblem(f: PublishFacts): Problem | null {
	const form = (message: string): Problem => ({ message, field: 'form' });
	if (f.stage === 'published') {
		return form(
			`This survey is published already (revision ${f.nextRevision - 1}): open a correction to change it.`
		);
	}
	if (f.stage !== 'in-review') {
		return form(
			'A survey is published from review: move it to “In review” once the field work is done.'
		);
	}
	if (f.findings === 0) return form('This survey has no findings to publish.');
	if (f.unreviewed > 0) {
		return form(
			`${many(f.unreviewed, 'finding is', 'findings are')} not checked yet: check every finding at the Desk before publishing.`
		);
	}
	if (f.conflicts > 0) {
		return form(
			`${many(f.conflicts, 'change from a device waits', 'changes from devices wait')} for a decision: settle the conflicts before publishing.`
		);
	}
	if (f.basisId === null) {
		return form('The site has no cost basis, so nothing is priced: give it one before publishing.');
	}
	if (f.nextRevision > 1 && f.note === '') return { message: NOTE_REQUIRED, field: 'note' };
	return null;
}
