/**
 * `rankedSavings`: a survey's ranked savings list with its totals and breakdown, as
 * `GET /api/surveys/[id]/savings` answers it (docs/savings.md). Three statements, all SQL over
 * the typed figure columns: the ranking (window sums, cut to MAX_SAVINGS_ITEMS), the grouped
 * totals, and the basis's life and discount rate for the economics of the whole.
 */
import { eq } from 'drizzle-orm';
import { measureEconomics } from '../../economics/measure';
import { MAX_SAVINGS_ITEMS, type SavingsRank } from '../../schemas/savings';
import { costBases } from '../db/schema';
import type { Executor } from '../db/types';
import { rankedItems, type SavingsItem } from './ranked-list';
import { savingsTotals, type SavingsBreakdown, type SavingsTotals } from './totals';

export type { SavingsItem, SavingsBreakdown, SavingsTotals };
export type { SavingsGroup } from './totals';

/** NPV and IRR of the whole list over the cost basis's life and discount rate. */
export interface WholeEconomics {
	/** The basis's discount rate, a fraction per year. */
	discountRate: number;
	/** The basis's life, whole years. */
	lifeYears: number;
	/** NPV of the known repair costs against the total saving, minor units (not rounded). */
	npvMinor: number;
	/** IRR, a fraction per year; null when no single rate exists (nothing to repay, or free). */
	irr: number | null;
}

export interface RankedSavings {
	rank: SavingsRank;
	items: SavingsItem[];
	totals: SavingsTotals & { economics: WholeEconomics | null };
	breakdown: SavingsBreakdown;
	/** More saving findings than MAX_SAVINGS_ITEMS: only the first are listed (totals are of all). */
	truncated: boolean;
	/** Live findings left out because their figures are out of date (as totals.outOfDate). */
	outOfDate: number;
}

/** The survey as the list needs it (SurveyPricing, $lib/server/desk/findings-query). */
export interface SavingsSurvey {
	id: string;
	basisId: string | null;
	currency: string;
}

async function lifeTerms(db: Executor, basisId: string | null) {
	if (basisId === null) return null;
	const [row] = await db
		.select({ basis: costBases.basis })
		.from(costBases)
		.where(eq(costBases.id, basisId))
		.limit(1);
	const { discountRate, lifeYears } = row?.basis ?? {};
	return discountRate === undefined || lifeYears === undefined ? null : { discountRate, lifeYears };
}

/** NPV and IRR of a list's totals on a basis's life and discount rate; null without them. */
export async function wholeEconomics(
	db: Executor,
	basisId: string | null,
	totals: Pick<SavingsTotals, 'count' | 'withoutRepairCost' | 'repairCostMinor' | 'costMinor'>
): Promise<WholeEconomics | null> {
	const terms = await lifeTerms(db, basisId);
	const priced = totals.count > 0 && totals.withoutRepairCost < totals.count;
	if (!terms || !priced) return null;
	return {
		...terms,
		...measureEconomics(
			{ costMinor: totals.repairCostMinor, annualSavingMinor: totals.costMinor },
			terms
		)
	};
}

export async function rankedSavings(
	db: Executor,
	survey: SavingsSurvey,
	{ rank }: { rank: SavingsRank }
): Promise<RankedSavings> {
	const [items, { totals, breakdown }] = await Promise.all([
		rankedItems(db, survey, rank, MAX_SAVINGS_ITEMS),
		savingsTotals(db, survey)
	]);
	const economics = await wholeEconomics(db, survey.basisId, totals);
	return {
		rank,
		items,
		totals: { ...totals, economics },
		breakdown,
		truncated: totals.count > items.length,
		outOfDate: totals.outOfDate
	};
}
