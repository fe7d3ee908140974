/**
 * The ranked savings list on the app's database, for the route file and the Desk's savings page
 * (which make no queries): kept between requests like the review table's views
 * ($lib/server/desk/findings-cache). The figures are chosen first (publish/figures.ts: two
 * small reads), and the key is that choice — a revision's frozen snapshot never changes, so its
 * key is its number; live figures are keyed on the basis they count as current and the firm's
 * change counter as read before the queries ran (every write the list can show moves it).
 */
import { DEFAULT_SAVINGS_ITEMS, type SavingsRank } from '../../schemas/savings';
import { db } from '../db';
import { viewCache } from '../desk/findings-cache';
import type { Reader } from '../publish/choose';
import { figureChoice, readFigures } from '../publish/figures';
import { rankedSavings, type RankedSavings } from './ranked-savings';

/** Items kept at most over every kept list (a list holds up to 5,000). */
export const SAVINGS_CACHE_ITEMS = 50_000;

/**
 * A kept list and its JSON body, written and encoded once: a list of 5,000 items is megabytes
 * of text, and twenty readers of one list would otherwise serialize and encode it twenty times.
 */
interface Kept {
	list: RankedSavings;
	body: Uint8Array<ArrayBuffer>;
}

const encoder = new TextEncoder();

const kept = viewCache<Kept>({
	maxSize: SAVINGS_CACHE_ITEMS,
	size: (k) => k.list.items.length + k.list.measures.length + 1
});

export type KeptOutcome = { ok: true; kept: Kept } | { ok: false; message: string };

/** What a list is asked for: the order, an earlier revision, how many items. */
export interface SavingsAsk {
	rank: SavingsRank;
	revision?: number;
	limit?: number;
}

async function keptSavings(
	surveyId: string,
	reader: Reader,
	{ rank, revision: asked, limit = DEFAULT_SAVINGS_ITEMS }: SavingsAsk
): Promise<KeptOutcome | null> {
	const chosen = await figureChoice(db, surveyId, reader, asked);
	if (!chosen?.ok) return chosen;
	const { choice, pricing } = chosen;
	const key = JSON.stringify(
		choice.kind === 'revision'
			? [surveyId, choice, rank, limit]
			: [surveyId, choice, pricing.basisId, pricing.revision, rank, limit]
	);
	const value = await kept(key, async () => {
		const list = await rankedSavings(db, await readFigures(db, surveyId, chosen), rank, limit);
		return { list, body: encoder.encode(JSON.stringify(list)) };
	});
	return { ok: true, kept: value };
}

export type ListOutcome = { ok: true; list: RankedSavings } | { ok: false; message: string };

/** The survey's ranked savings list for this reader; null when the survey is gone. */
export async function surveySavings(
	surveyId: string,
	reader: Reader,
	ask: SavingsAsk
): Promise<ListOutcome | null> {
	const out = await keptSavings(surveyId, reader, ask);
	return out?.ok ? { ok: true, list: out.kept.list } : out;
}

/** The same list as the API's JSON body, UTF-8 (serialized once per kept list). */
export async function surveySavingsJson(
	surveyId: string,
	reader: Reader,
	ask: SavingsAsk
): Promise<{ ok: true; body: Uint8Array<ArrayBuffer> } | { ok: false; message: string } | null> {
	const out = await keptSavings(surveyId, reader, ask);
	return out?.ok ? { ok: true, body: out.kept.body } : out;
}
