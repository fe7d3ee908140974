/**
 * Publishing a survey to its client (docs/publishing.md): the forms of the Desk's publish page.
 * Shared by the server and the page (limits and messages in one place).
 */
import { z } from 'zod';

/** Longest "what changed" note of a revision. */
export const REVISION_NOTE_MAX = 2000;

export const publishFormSchema = z.strictObject({
	/** What changed since the revision before; required from revision 2 on (checked with it). */
	note: z
		.string()
		.trim()
		.max(REVISION_NOTE_MAX, `Keep the note under ${REVISION_NOTE_MAX} characters.`)
		.default('')
});
export type PublishForm = z.output<typeof publishFormSchema>;

export const NOTE_REQUIRED =
	'Say what changed since the revision before: the client sees it beside the new figures.';
