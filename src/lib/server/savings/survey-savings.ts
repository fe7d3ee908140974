/**
 * The ranked savings list on the app's database, for the route file (which makes no queries):
 * kept between requests like the review table's views ($lib/server/desk/findings-cache), keyed
 * on the survey, the basis it counts as current, the firm's change counter as read before the
 * queries ran, and the order — every write the list can show moves that counter.
 */
import type { SavingsRank } from '../../schemas/savings';
import { db } from '../db';
import { viewCache } from '../desk/findings-cache';
import { surveyPricing } from '../desk/findings-query';
import { rankedSavings, type RankedSavings } from './ranked-savings';

/** Items kept at most over every kept list (a list holds up to 5,000). */
export const SAVINGS_CACHE_ITEMS = 50_000;

/** A kept list and its JSON, written once: a list of 5,000 items is megabytes of text. */
interface Kept {
	list: RankedSavings;
	json: string;
}

const kept = viewCache<Kept>({
	maxSize: SAVINGS_CACHE_ITEMS,
	size: (k) => k.list.items.length + 1
});

async function keptSavings(surveyId: string, rank: SavingsRank): Promise<Kept | null> {
	const survey = await surveyPricing(db, surveyId);
	if (!survey) return null;
	const key = JSON.stringify([survey.id, survey.basisId, survey.revision, rank]);
	return kept(key, async () => {
		const list = await rankedSavings(db, survey, { rank });
		return { list, json: JSON.stringify(list) };
	});
}

/** The survey's ranked savings list; null when the survey is gone. */
export async function surveySavings(
	surveyId: string,
	rank: SavingsRank
): Promise<RankedSavings | null> {
	return (await keptSavings(surveyId, rank))?.list ?? null;
}

/** The same list as the API's JSON body (serialized once per kept list); null when gone. */
export async function surveySavingsJson(
	surveyId: string,
	rank: SavingsRank
): Promise<string | null> {
	return (await keptSavings(surveyId, rank))?.json ?? null;
}
