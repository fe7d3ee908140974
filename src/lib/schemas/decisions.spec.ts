import { describe, expect, it } from 'vitest';
import {
	COMMENT_MAX,
	answerFormSchema,
	commentFormSchema,
	decisionDateProblem,
	decisionDetail,
	decisionFormSchema,
	isCalendarDay,
	readerToday
} from './decisions';

const firstIssue = (r: {
	success: boolean;
	error?: { issues: { path: PropertyKey[]; message: string }[] };
}) => r.error?.issues.map((i) => [i.path.join('.'), i.message])[0];

describe('the decision form', () => {
	it('reads each decision into what the server records, a blank comment as none', () => {
		expect(decisionFormSchema.parse({ decision: 'approved', comment: '  ' })).toEqual({
			decision: 'approved',
			comment: null,
			today: ''
		});
		expect(
			decisionFormSchema.parse({ decision: 'scheduled', date: '2027-03-15', who: ' Fitters ' })
		).toEqual({
			decision: 'scheduled',
			date: '2027-03-15',
			who: 'Fitters',
			comment: null,
			today: ''
		});
		expect(decisionFormSchema.parse({ decision: 'scheduled', date: '2027-03-15' })).toMatchObject({
			who: null
		});
		expect(
			decisionFormSchema.parse({
				decision: 'declined',
				reason: 'Line goes next year',
				comment: 'ok'
			})
		).toEqual({ decision: 'declined', reason: 'Line goes next year', comment: 'ok', today: '' });
	});

	it('asks for what each decision needs, beside its field', () => {
		expect(firstIssue(decisionFormSchema.safeParse({}))).toEqual([
			'decision',
			'Choose what you decide: approve, book a day, mark it repaired or decline it.'
		]);
		expect(firstIssue(decisionFormSchema.safeParse({ decision: 'scheduled' }))).toEqual([
			'date',
			'Give the day the repair is booked for.'
		]);
		expect(
			firstIssue(decisionFormSchema.safeParse({ decision: 'repaired', date: '2027-02-30' }))
		).toEqual(['date', 'Give the date as a day that exists, written year-month-day (2027-03-15).']);
		expect(firstIssue(decisionFormSchema.safeParse({ decision: 'declined' }))).toEqual([
			'reason',
			'Say why it is not going ahead: your consultant reads it.'
		]);
		// Nothing but the form's own fields.
		expect(decisionFormSchema.safeParse({ decision: 'approved', status: 'approved' }).success).toBe(
			false
		);
	});

	it('refuses a comment over the limit, saying the limit and its length', () => {
		const long = 'é'.repeat(COMMENT_MAX + 12);
		expect(firstIssue(commentFormSchema.safeParse({ body: long }))).toEqual([
			'body',
			'Keep a comment to 4,000 characters: this one has 4,012.'
		]);
		expect(commentFormSchema.safeParse({ body: 'x'.repeat(COMMENT_MAX) }).success).toBe(true);
		expect(firstIssue(commentFormSchema.safeParse({ body: '   ' }))).toEqual([
			'body',
			'Write something first.'
		]);
		expect(
			firstIssue(decisionFormSchema.safeParse({ decision: 'approved', comment: long }))?.[0]
		).toBe('comment');
	});

	it('names the item an answer is on', () => {
		expect(answerFormSchema.safeParse({ body: 'Yes', kind: 'site', itemId: 'x' }).success).toBe(
			false
		);
	});
});

describe('dates', () => {
	const now = new Date('2027-03-15T23:30:00Z');

	it('knows a calendar day from a look-alike', () => {
		expect(isCalendarDay('2028-02-29')).toBe(true);
		expect(isCalendarDay('2027-02-29')).toBe(false);
		expect(isCalendarDay('15/03/2027')).toBe(false);
	});

	it('takes the reader’s today within a day of the server’s, else the server’s UTC day', () => {
		expect(readerToday('2027-03-16', now)).toBe('2027-03-16');
		expect(readerToday('2027-03-14', now)).toBe('2027-03-14');
		expect(readerToday('2027-03-18', now)).toBe('2027-03-15');
		expect(readerToday('', now)).toBe('2027-03-15');
	});

	it('books today or later, marks a repair done by today and since the publication', () => {
		const facts = { today: '2027-03-15', publishedOn: '2027-03-01' };
		const book = (date: string) =>
			decisionDateProblem(
				{ decision: 'scheduled', date, who: null, comment: null, today: '' },
				facts
			);
		const repaired = (date: string) =>
			decisionDateProblem({ decision: 'repaired', date, comment: null, today: '' }, facts);
		expect(book('2027-03-15')).toBeNull();
		expect(book('2027-03-14')).toBe(
			'A repair cannot be booked for a day that has passed: choose 15 March 2027 or a later day.'
		);
		expect(repaired('2027-03-15')).toBeNull();
		expect(repaired('2027-03-01')).toBeNull();
		expect(repaired('2027-03-16')).toMatch(/day still to come/);
		expect(repaired('2027-02-28')).toBe(
			'This survey was first published on 1 March 2027: give the day of a repair done since then.'
		);
	});
});

describe('a decision in words', () => {
	const d = {
		words: '',
		scheduledFor: '2027-04-02',
		assignee: 'Site fitters',
		repairedOn: '2027-04-03',
		reason: 'Too dear',
		outcomeWords: null
	};
	it('says the day, who and why', () => {
		expect(decisionDetail({ ...d, decision: 'scheduled' })).toBe(
			'Booked for 2 April 2027, by Site fitters'
		);
		expect(decisionDetail({ ...d, decision: 'repaired' })).toBe('Repaired on 3 April 2027');
		expect(decisionDetail({ ...d, decision: 'declined' })).toBe('Why: Too dear');
		expect(decisionDetail({ ...d, decision: 'approved' })).toBeNull();
	});
});
