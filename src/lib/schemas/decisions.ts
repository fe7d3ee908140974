/**
 * A client's decisions on published findings and measures, and the comments on them
 * (docs/decisions.md): the words, the limits and the forms' schemas, shared by the Ladder's and
 * the Desk's pages and the server. Dates are calendar days (YYYY-MM-DD); the rules that need
 * today or the publication date are `decisionDateProblem`, run by the server with both.
 */
import { z } from 'zod';
import { uuidSchema } from './common';

export const DECISIONS = ['approved', 'scheduled', 'repaired', 'declined'] as const;
export type Decision = (typeof DECISIONS)[number];

export const DECISION_LABELS: Record<Decision, string> = {
	approved: 'Approved for repair',
	scheduled: 'Repair booked',
	repaired: 'Repaired',
	declined: 'Not going ahead'
};

/** What the client does, as the form's choices say it. */
export const DECISION_ACTIONS: Record<Decision, string> = {
	approved: 'Approve the repair',
	scheduled: 'Book the repair for a day',
	repaired: 'Mark it repaired',
	declined: 'Decline it'
};

/** What a later survey found of a repaired item (confirmed savings). */
export const REPAIR_OUTCOMES = ['verified', 'still-failing'] as const;
export type RepairOutcome = (typeof REPAIR_OUTCOMES)[number];

export const REPAIR_OUTCOME_LABELS: Record<RepairOutcome, string> = {
	verified: 'Confirmed working by a later survey',
	'still-failing': 'Still failing at a later survey'
};

export const ITEM_KINDS = ['finding', 'measure'] as const;
export type ItemKind = (typeof ITEM_KINDS)[number];
/** A finding or a measure: what a decision or comment is about. */
export interface ItemRef {
	kind: ItemKind;
	id: string;
}

/** Longest comment, decline reason and "who" (characters as the browser's maxlength counts). */
export const COMMENT_MAX = 4000;
export const REASON_MAX = 1000;
export const WHO_MAX = 160;

const count = (n: number) => n.toLocaleString('en-US');
const limited = (max: number, what: string) =>
	z
		.string()
		.trim()
		.max(max, {
			error: (issue) =>
				`Keep ${what} to ${count(max)} characters: this one has ${count(String(issue.input).length)}.`
		});

const calendarDay = /^\d{4}-\d{2}-\d{2}$/;
/** A real calendar day written YYYY-MM-DD. */
export function isCalendarDay(text: string): boolean {
	if (!calendarDay.test(text)) return false;
	const d = new Date(`${text}T00:00:00Z`);
	return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === text;
}

const commentField = limited(COMMENT_MAX, 'a comment').default('');

export const decisionFormSchema = z
	.strictObject({
		decision: z.enum(DECISIONS, {
			error: 'Choose what you decide: approve, book a day, mark it repaired or decline it.'
		}),
		date: z.string().trim().default(''),
		who: limited(WHO_MAX, 'who does it').default(''),
		reason: limited(REASON_MAX, 'the reason').default(''),
		comment: commentField,
		/** The reader's own date, set by the page (docs/decisions.md, "Dates"). */
		today: z.string().trim().default('')
	})
	.superRefine((v, ctx) => {
		if (v.decision === 'scheduled' || v.decision === 'repaired') {
			if (v.date === '') {
				ctx.addIssue({
					code: 'custom',
					path: ['date'],
					message:
						v.decision === 'scheduled'
							? 'Give the day the repair is booked for.'
							: 'Give the day it was repaired.'
				});
			} else if (!isCalendarDay(v.date)) {
				ctx.addIssue({
					code: 'custom',
					path: ['date'],
					message: 'Give the date as a day that exists, written year-month-day (2027-03-15).'
				});
			}
		}
		if (v.decision === 'declined' && v.reason === '') {
			ctx.addIssue({
				code: 'custom',
				path: ['reason'],
				message: 'Say why it is not going ahead: your consultant reads it.'
			});
		}
	})
	.transform((v): DecisionInput => {
		const comment = v.comment === '' ? null : v.comment;
		switch (v.decision) {
			case 'approved':
				return { decision: v.decision, comment, today: v.today };
			case 'scheduled':
				return { decision: v.decision, date: v.date, who: v.who || null, comment, today: v.today };
			case 'repaired':
				return { decision: v.decision, date: v.date, comment, today: v.today };
			case 'declined':
				return { decision: v.decision, reason: v.reason, comment, today: v.today };
		}
	});

/** A decision as the server records it. */
export type DecisionInput = { comment: string | null; today: string } & (
	| { decision: 'approved' }
	| { decision: 'scheduled'; date: string; who: string | null }
	| { decision: 'repaired'; date: string }
	| { decision: 'declined'; reason: string }
);

export const commentFormSchema = z.strictObject({
	body: limited(COMMENT_MAX, 'a comment').min(1, 'Write something first.')
});

/** The Desk's answer to the comments on one finding or measure of a survey. */
export const answerFormSchema = commentFormSchema.extend({
	kind: z.enum(ITEM_KINDS, { error: 'Say whether the answer is on a finding or a measure.' }),
	itemId: uuidSchema
});

const dayMs = 86_400_000;
const utcDay = (at: Date) => at.toISOString().slice(0, 10);

/**
 * Today for the reader: the day their page sent (their browser's own calendar) when it is a
 * real day within one day of the server's UTC date — every clock zone's today is — else the
 * server's UTC date.
 */
export function readerToday(sent: string, now: Date): string {
	const server = utcDay(now);
	if (!isCalendarDay(sent)) return server;
	const from = utcDay(new Date(now.getTime() - dayMs));
	const to = utcDay(new Date(now.getTime() + dayMs));
	return sent >= from && sent <= to ? sent : server;
}

/** The reader's calendar day, YYYY-MM-DD in the browser's own clock zone (the form sends it). */
export function localDay(at = new Date()): string {
	const pad = (n: number) => String(n).padStart(2, '0');
	return `${at.getFullYear()}-${pad(at.getMonth() + 1)}-${pad(at.getDate())}`;
}

/** A day for people: "15 March 2027". */
export function dayWords(day: string): string {
	return new Date(`${day}T00:00:00Z`).toLocaleDateString('en-GB', {
		day: 'numeric',
		month: 'long',
		year: 'numeric',
		timeZone: 'UTC'
	});
}

/**
 * What is wrong with a decision's date, or null: a booking must be today or later; a repair
 * cannot be marked done on a day still to come, nor before the survey was first published.
 */
export function decisionDateProblem(
	input: DecisionInput,
	facts: { today: string; publishedOn: string | null }
): string | null {
	if (input.decision === 'scheduled' && input.date < facts.today) {
		return `A repair cannot be booked for a day that has passed: choose ${dayWords(facts.today)} or a later day.`;
	}
	if (input.decision === 'repaired') {
		if (input.date > facts.today) {
			return 'A repair cannot be marked done on a day still to come: give the day it was repaired.';
		}
		if (facts.publishedOn !== null && input.date < facts.publishedOn) {
			return `This survey was first published on ${dayWords(facts.publishedOn)}: give the day of a repair done since then.`;
		}
	}
	return null;
}

export interface DecisionShown {
	decision: string;
	words: string;
	scheduledFor: string | null;
	assignee: string | null;
	repairedOn: string | null;
	reason: string | null;
	outcomeWords: string | null;
}

/** "Booked for 15 March 2027, by the site fitters", "Repaired on 2 May 2027", "Why: …". */
export function decisionDetail(d: DecisionShown): string | null {
	switch (d.decision) {
		case 'scheduled':
			return d.scheduledFor
				? `Booked for ${dayWords(d.scheduledFor)}${d.assignee ? `, by ${d.assignee}` : ''}`
				: null;
		case 'repaired':
			return d.repairedOn ? `Repaired on ${dayWords(d.repairedOn)}` : null;
		case 'declined':
			return d.reason ? `Why: ${d.reason}` : null;
		default:
			return null;
	}
}
