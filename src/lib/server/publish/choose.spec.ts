import { describe, expect, it } from 'vitest';
import { chooseFigures, choiceWords, type ChoiceFacts } from './choose';

const at = new Date('2026-05-04T09:00:00Z');
const facts = (f: Partial<ChoiceFacts>): ChoiceFacts => ({
	reader: 'staff',
	stage: 'in-review',
	publishedAt: null,
	revisions: [],
	...f
});

describe('chooseFigures', () => {
	it('gives a client the last published revision, also while a correction is open', () => {
		for (const stage of ['published', 'in-review', 'closed']) {
			const c = chooseFigures(
				facts({ reader: 'client', stage, publishedAt: at, revisions: [1, 3, 2] })
			);
			expect(c).toEqual({ ok: true, choice: { kind: 'revision', number: 3, latest: true } });
		}
	});

	it('gives staff the published revision while published, the live draft otherwise', () => {
		expect(
			chooseFigures(facts({ stage: 'published', publishedAt: at, revisions: [1, 2] }))
		).toEqual({
			ok: true,
			choice: { kind: 'revision', number: 2, latest: true }
		});
		expect(chooseFigures(facts({ stage: 'closed', publishedAt: at, revisions: [1] }))).toEqual({
			ok: true,
			choice: { kind: 'revision', number: 1, latest: true }
		});
		expect(
			chooseFigures(facts({ stage: 'in-review', publishedAt: at, revisions: [1, 2] }))
		).toEqual({
			ok: true,
			choice: { kind: 'live', marker: { state: 'correction', revision: 3 } }
		});
		for (const stage of ['planned', 'in-field', 'in-review']) {
			expect(chooseFigures(facts({ stage }))).toEqual({
				ok: true,
				choice: { kind: 'live', marker: { state: 'draft' } }
			});
		}
	});

	it('reads a survey published before revisions were kept from its locked live findings', () => {
		for (const reader of ['client', 'staff'] as const) {
			expect(chooseFigures(facts({ reader, stage: 'published', publishedAt: at }))).toEqual({
				ok: true,
				choice: { kind: 'live', marker: { state: 'published' } }
			});
		}
		// …but a client gets no report while such a survey is being corrected.
		const c = chooseFigures(facts({ reader: 'client', stage: 'in-review', publishedAt: at }));
		expect(c.ok).toBe(false);
	});

	it('gives an earlier revision when asked, and says which revisions exist otherwise', () => {
		expect(
			chooseFigures(facts({ reader: 'client', stage: 'published', revisions: [1, 2], asked: 1 }))
		).toEqual({
			ok: true,
			choice: { kind: 'revision', number: 1, latest: false }
		});
		expect(chooseFigures(facts({ revisions: [1, 2], asked: 5 }))).toEqual({
			ok: false,
			message: 'This survey has no published revision 5: its revisions are 1 to 2.'
		});
		expect(chooseFigures(facts({ asked: 1 }))).toEqual({
			ok: false,
			message: 'This survey has no published revision yet.'
		});
	});
});

describe('choiceWords', () => {
	it('says plainly on the cover when figures are a draft or a correction', () => {
		expect(choiceWords({ kind: 'live', marker: { state: 'draft' } })).toMatch(
			/^DRAFT — not yet published/
		);
		expect(choiceWords({ kind: 'live', marker: { state: 'correction', revision: 3 } })).toMatch(
			/correction in progress, revision 3, not yet published.*still sees revision 2/
		);
		expect(choiceWords({ kind: 'revision', number: 2, latest: true })).toBe(
			'Revision 2, as published to the client.'
		);
	});
});
