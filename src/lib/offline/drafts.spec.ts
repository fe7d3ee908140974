import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import type { DeviceDatabase } from './db';
import { discardDraft, draftKey, loadDraft, saveDraft, surveyDrafts } from './drafts';
import { SURVEY_ID, testDb } from './spec-fixtures';

const OTHER_SURVEY = '5e1f0000-0000-4000-8000-0000000000ee';

describe('draftKey', () => {
	it('keys a draft by survey, kind and finding', () => {
		expect(draftKey('s', 'trap', 'f')).toBe('s/trap/f');
		expect(draftKey('s', 'trap', 'f')).not.toBe(draftKey('s', 'leak', 'f'));
	});
});

describe('drafts', () => {
	let db: DeviceDatabase;
	afterEach(async () => {
		await db.delete();
	});

	it('keeps the form as typed and overwrites it on the next keystroke', async () => {
		db = testDb();
		const input = { surveyId: SURVEY_ID, kind: 'trap' as const, findingId: 'f1' };
		const first = await saveDraft(db, { ...input, values: { pressure: '1' } });
		const second = await saveDraft(db, { ...input, values: { pressure: '10,', tag: 'ST-1' } });
		expect(second.key).toBe(first.key);
		expect(second.updatedAt >= first.updatedAt).toBe(true);
		expect(await db.drafts.count()).toBe(1);
		expect((await loadDraft(db, first.key))?.values).toEqual({ pressure: '10,', tag: 'ST-1' });
	});

	it('lists a survey’s drafts newest first, and forgets a discarded one', async () => {
		db = testDb();
		await db.drafts.bulkPut([
			{
				key: draftKey(SURVEY_ID, 'leak', 'old'),
				surveyId: SURVEY_ID,
				kind: 'leak',
				findingId: 'old',
				values: {},
				updatedAt: '2025-03-04T09:00:00.000Z'
			},
			{
				key: draftKey(SURVEY_ID, 'trap', 'new'),
				surveyId: SURVEY_ID,
				kind: 'trap',
				findingId: 'new',
				values: {},
				updatedAt: '2025-03-04T10:00:00.000Z'
			},
			{
				key: draftKey(OTHER_SURVEY, 'trap', 'x'),
				surveyId: OTHER_SURVEY,
				kind: 'trap',
				findingId: 'x',
				values: {},
				updatedAt: '2025-03-04T11:00:00.000Z'
			}
		]);
		expect((await surveyDrafts(db, SURVEY_ID)).map((d) => d.findingId)).toEqual(['new', 'old']);
		await discardDraft(db, draftKey(SURVEY_ID, 'trap', 'new'));
		expect((await surveyDrafts(db, SURVEY_ID)).map((d) => d.findingId)).toEqual(['old']);
		expect(await loadDraft(db, draftKey(SURVEY_ID, 'trap', 'new'))).toBeNull();
	});
});
