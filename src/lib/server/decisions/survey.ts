/**
 * What the Ladder's page of a survey adds to its ranked findings (docs/decisions.md): the
 * current decision of each finding shown, and the measures of the revision shown with theirs,
 * each linking to its item page.
 */
import { desc, eq } from 'drizzle-orm';
import { surveyRevisions } from '../db/schema';
import { db as appDb } from '../db';
import type { Executor } from '../db/types';
import { revisionMeasures } from '../measures/sums';
import { currentDecisions } from './read';

export interface DecidedWords {
	decision: string;
	words: string;
}

export async function ladderSurveyDecisions(
	surveyId: string,
	findingIds: string[],
	db: Executor = appDb
) {
	const [revision] = await db
		.select({ id: surveyRevisions.id, costBasisId: surveyRevisions.costBasisId })
		.from(surveyRevisions)
		.where(eq(surveyRevisions.surveyId, surveyId))
		.orderBy(desc(surveyRevisions.number))
		.limit(1);
	const measures = revision ? await revisionMeasures(db, revision) : [];
	const current = await currentDecisions(db, [...findingIds, ...measures.map((m) => m.id)]);
	const decided: Record<string, DecidedWords> = {};
	for (const [id, d] of current) decided[id] = { decision: d.decision, words: d.words };
	return {
		decided,
		measures: measures.map((m) => ({
			id: m.id,
			name: m.name,
			findings: m.findings,
			annualSaving: m.annualSaving,
			cost: m.cost
		}))
	};
}
