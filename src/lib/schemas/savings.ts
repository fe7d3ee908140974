/**
 * The ranked savings list: the query string of `GET /api/surveys/[id]/savings` (docs/savings.md)
 * and the orders it ranks by. Shared by the server and the pages that ask for it.
 */
import { z } from 'zod';
import { readQueryString } from './query-string';
import { revisionParam } from './reports';

/** savings: annual saving, biggest first; payback: shortest first; co2: most CO2 avoided first. */
export const SAVINGS_RANKS = ['savings', 'payback', 'co2'] as const;
export type SavingsRank = (typeof SAVINGS_RANKS)[number];

export const SAVINGS_RANK_LABELS: Record<SavingsRank, string> = {
	savings: 'Annual saving',
	payback: 'Payback',
	co2: 'CO2 avoided'
};

/** Most items one answer lists (`limit`); the totals still count every saving finding. */
export const MAX_SAVINGS_ITEMS = 5_000;
/** Items an answer lists unless `limit` asks for more (or fewer). */
export const DEFAULT_SAVINGS_ITEMS = 100;
/** Items the Desk's savings page lists. */
export const PAGE_SAVINGS_ITEMS = 500;
/** Points of the answer's Pareto curve at most: every k-th of the ranking, and the last. */
export const SAVINGS_PARETO_POINTS = 200;

export const savingsQuerySchema = z.strictObject(
	{
		rank: z
			.enum(SAVINGS_RANKS, { error: `rank must be one of: ${SAVINGS_RANKS.join(', ')}` })
			.default('savings'),
		revision: revisionParam,
		limit: z
			.string()
			.regex(/^\d{1,5}$/, {
				error: `limit must be a whole number from 1 to ${MAX_SAVINGS_ITEMS.toLocaleString('en-GB')}`
			})
			.transform(Number)
			.refine((n) => n >= 1 && n <= MAX_SAVINGS_ITEMS, {
				error: `limit must be a whole number from 1 to ${MAX_SAVINGS_ITEMS.toLocaleString('en-GB')}`
			})
			.default(DEFAULT_SAVINGS_ITEMS)
	},
	{
		error: (issue) =>
			issue.code === 'unrecognized_keys'
				? `Unknown parameter ${issue.keys.join(', ')}: the savings list takes only rank, revision and limit`
				: undefined
	}
);
export type SavingsQuery = z.output<typeof savingsQuerySchema>;

/** The query string as the schema reads it; a parameter given twice is refused. */
export const readSavingsQuery = (params: URLSearchParams) =>
	readQueryString(params, savingsQuerySchema);
