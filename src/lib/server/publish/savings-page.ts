/**
 * What the Desk's savings page loads (`/desk/surveys/[surveyId]/savings`): the survey's name and
 * stage, the person's unit system and the ranked savings list — the same kept list
 * `GET /api/surveys/[id]/savings` answers (surveySavings, docs/savings.md).
 */
import { eq } from 'drizzle-orm';
import { PAGE_SAVINGS_ITEMS, type SavingsRank } from '../../schemas/savings';
import type { UnitSystemId } from '../../units';
import { db } from '../db';
import { surveys } from '../db/schema';
import { surveySavings } from '../savings/survey-savings';
import type { RankedSavings } from '../savings/ranked-savings';
import { unitSystemOf } from '../walk/person';

export interface SavingsPage {
	survey: { id: string; name: string; stage: string; publishedAt: Date | null };
	unitSystem: UnitSystemId;
	list: RankedSavings;
}

/** Null when the survey is gone (the caller answers 404). */
export async function savingsPage(
	userId: string,
	surveyId: string,
	rank: SavingsRank,
	revision?: number
): Promise<SavingsPage | { missing: string } | null> {
	const [[survey], unitSystem, list] = await Promise.all([
		db
			.select({
				id: surveys.id,
				name: surveys.name,
				stage: surveys.status,
				publishedAt: surveys.publishedAt
			})
			.from(surveys)
			.where(eq(surveys.id, surveyId))
			.limit(1),
		unitSystemOf(db, userId),
		surveySavings(surveyId, 'staff', { rank, revision, limit: PAGE_SAVINGS_ITEMS })
	]);
	if (!survey || !list) return null;
	if (!list.ok) return { missing: list.message };
	return { survey, unitSystem, list: list.list };
}
