/**
 * `rankedSavings`: a survey's ranked savings list with its totals, breakdown and measures, as
 * `GET /api/surveys/[id]/savings` answers it (docs/savings.md), on the figures the reader is
 * shown (publish/figures.ts): a client the last published revision's frozen snapshot, staff the
 * live findings until the survey is published. All SQL over typed figure columns: the ranking
 * (window sums, cut to MAX_SAVINGS_ITEMS), the grouped totals, the measures' sums.
 */
import {
	DEFAULT_SAVINGS_ITEMS,
	SAVINGS_PARETO_POINTS,
	type SavingsRank
} from '../../schemas/savings';
import type { Executor } from '../db/types';
import type { MeasureRow } from '../measures/sums';
import { choiceWords, type FigureChoice } from '../publish/choose';
import type { ChosenFigures } from '../publish/figures';
import {
	liveSource,
	rankedItems,
	rankedRevisionItems,
	revisionSource,
	sampledRunningSums,
	type ParetoSample,
	type SavingsItem
} from './ranked-list';
import type { SavingsBreakdown, SavingsTotals, WholeEconomics } from './totals';

export type { SavingsItem, SavingsBreakdown, SavingsTotals, WholeEconomics };
export type { SavingsGroup } from './totals';

/** Which figures the list is of, for the reader to see. */
export interface FiguresShown {
	choice: FigureChoice;
	/** choiceWords: "Revision 2, as published to the client.", "DRAFT — …". */
	words: string;
	/** The published revision listed, or null for live figures. */
	revision: { number: number; publishedAt: Date; note: string | null } | null;
}

/** A measure in the list's order, with its place (1-based). */
export type RankedMeasure = MeasureRow & { rank: number };

export interface RankedSavings {
	rank: SavingsRank;
	figures: FiguresShown;
	items: SavingsItem[];
	/** The running sums at most SAVINGS_PARETO_POINTS places of the whole ranking, and its last. */
	pareto: ParetoSample[];
	/** The measures (jobs of several findings) in the same order: saving, payback or CO2. */
	measures: RankedMeasure[];
	totals: SavingsTotals & { economics: WholeEconomics | null };
	breakdown: SavingsBreakdown;
	/** More saving findings than listed (`limit`): only the first are (totals are of all). */
	truncated: boolean;
	/** Live findings left out because their figures are out of date (as totals.outOfDate). */
	outOfDate: number;
}

/** Null last; otherwise `a` before `b` when `better`. */
const nullsLast = (a: number | null, b: number | null, ascending: boolean) =>
	a === null ? (b === null ? 0 : 1) : b === null ? -1 : ascending ? a - b : b - a;

/** The measures' order for a rank, total (ties by id), as the findings' (rankOrder). */
export function rankMeasures(measures: MeasureRow[], rank: SavingsRank): RankedMeasure[] {
	const order: Record<SavingsRank, (a: MeasureRow, b: MeasureRow) => number> = {
		savings: (a, b) => b.annualSaving - a.annualSaving,
		payback: (a, b) => nullsLast(a.paybackYears, b.paybackYears, true),
		co2: (a, b) => b.co2Kg - a.co2Kg
	};
	return [...measures]
		.sort((a, b) => order[rank](a, b) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0))
		.map((m, i) => ({ ...m, rank: i + 1 }));
}

/** The ranked list of the chosen figures (live findings or a revision's snapshot). */
export async function rankedSavings(
	db: Executor,
	figures: ChosenFigures,
	rank: SavingsRank,
	limit = DEFAULT_SAVINGS_ITEMS
): Promise<RankedSavings> {
	const { choice, revision, totals, currency } = figures;
	const source = revision ? revisionSource(revision.id) : liveSource(figures.pricing);
	const [items, pareto] = await Promise.all([
		revision
			? rankedRevisionItems(db, { id: revision.id, currency }, rank, limit)
			: rankedItems(db, figures.pricing, rank, limit),
		sampledRunningSums(db, source, rank, totals.count, SAVINGS_PARETO_POINTS)
	]);
	return {
		rank,
		figures: {
			choice,
			words: choiceWords(choice),
			revision: revision
				? { number: revision.number, publishedAt: revision.publishedAt, note: revision.note }
				: null
		},
		items,
		pareto,
		measures: rankMeasures(figures.measures, rank),
		totals,
		breakdown: figures.breakdown,
		truncated: totals.count > items.length,
		outOfDate: revision ? 0 : totals.outOfDate
	};
}
