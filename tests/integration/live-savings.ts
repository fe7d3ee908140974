/**
 * The ranked savings list of a survey's live findings, whatever its stage: what the Desk lists
 * while a survey is in review, read past the choice of figures (publish/figures.ts), so a test
 * can compare a published revision's frozen figures with the live ones.
 */
import type { SavingsRank } from '../../src/lib/schemas/savings';
import type { Executor } from '../../src/lib/server/db/types';
import { surveyPricing } from '../../src/lib/server/desk/findings-query';
import { readFigures } from '../../src/lib/server/publish/figures';
import { rankedSavings } from '../../src/lib/server/savings/ranked-savings';

export async function liveSavings(db: Executor, surveyId: string, rank: SavingsRank = 'savings') {
	const pricing = await surveyPricing(db, surveyId);
	if (!pricing) throw new Error(`No survey ${surveyId}`);
	const live = { kind: 'live', marker: { state: 'draft' } } as const;
	const figures = await readFigures(db, surveyId, {
		ok: true,
		choice: live,
		revision: null,
		pricing
	});
	return rankedSavings(db, figures, rank);
}
