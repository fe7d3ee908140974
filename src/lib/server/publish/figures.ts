/**
 * The figures a reader is shown of a survey (docs/publishing.md, "Who sees which figures"):
 * chooseFigures' decision carried out — a published revision's frozen snapshot, or the live
 * findings — with the totals, breakdown and measures of those figures. The ranked savings list
 * (`GET /api/surveys/[id]/savings`, the Desk's savings page) and the reports all start here, so
 * a client never sees live figures by one route and frozen ones by another.
 */
import { desc, eq } from 'drizzle-orm';
import { surveyRevisions, surveys } from '../db/schema';
import type { Executor } from '../db/types';
import { surveyPricing, type SurveyPricing } from '../desk/findings-query';
import { revisionMeasures, surveyMeasures, type MeasureRow } from '../measures/sums';
import {
	wholeEconomics,
	type WholeEconomics,
	revisionBreakdown,
	savingsTotals,
	type SavingsBreakdown,
	type SavingsTotals
} from '../savings/totals';
import { chooseFigures, type FigureChoice, type Reader } from './choose';

export interface ChosenRevision {
	id: string;
	number: number;
	publishedAt: Date;
	note: string | null;
	costBasisId: string | null;
}

export interface ChosenFigures {
	choice: FigureChoice;
	/** The revision shown (choice.kind 'revision'), else null. */
	revision: ChosenRevision | null;
	/** The survey's pricing now (its live basis and the firm's change counter). */
	pricing: SurveyPricing;
	/** The cost basis the figures shown are priced on. */
	basisId: string | null;
	currency: string;
	totals: SavingsTotals & { economics: WholeEconomics | null };
	breakdown: SavingsBreakdown;
	/** The measures of those figures, in the consultant's order. */
	measures: MeasureRow[];
}

export type ChosenOutcome = { ok: true; figures: ChosenFigures } | { ok: false; message: string };

/** Which figures, without reading them: the survey's stage and revisions (two small reads). */
export async function figureChoice(db: Executor, surveyId: string, reader: Reader, asked?: number) {
	const [[survey], revisions, pricing] = await Promise.all([
		db
			.select({ stage: surveys.status, publishedAt: surveys.publishedAt })
			.from(surveys)
			.where(eq(surveys.id, surveyId))
			.limit(1),
		db
			.select({
				id: surveyRevisions.id,
				number: surveyRevisions.number,
				publishedAt: surveyRevisions.publishedAt,
				note: surveyRevisions.note,
				costBasisId: surveyRevisions.costBasisId
			})
			.from(surveyRevisions)
			.where(eq(surveyRevisions.surveyId, surveyId))
			.orderBy(desc(surveyRevisions.number)),
		surveyPricing(db, surveyId)
	]);
	if (!survey || !pricing) return null;
	const chosen = chooseFigures({
		reader,
		stage: survey.stage,
		publishedAt: survey.publishedAt,
		revisions: revisions.map((r) => r.number),
		...(asked === undefined ? {} : { asked })
	});
	if (!chosen.ok) return chosen;
	const { choice } = chosen;
	const revision =
		choice.kind === 'revision' ? revisions.find((r) => r.number === choice.number)! : null;
	return { ok: true as const, choice, revision, pricing };
}

/**
 * The figures this reader is shown of the survey (the caller has checked read access), or why
 * there are none to show (a revision it does not have; a client while a survey published before
 * revisions were kept is being corrected). Null when the survey is gone.
 */
export async function chosenFigures(
	db: Executor,
	surveyId: string,
	reader: Reader,
	asked?: number
): Promise<ChosenOutcome | null> {
	const chosen = await figureChoice(db, surveyId, reader, asked);
	if (!chosen?.ok) return chosen;
	return { ok: true, figures: await readFigures(db, surveyId, chosen) };
}

export type Choice = Extract<NonNullable<Awaited<ReturnType<typeof figureChoice>>>, { ok: true }>;

/** The totals, breakdown and measures of the figures chosen. */
export async function readFigures(
	db: Executor,
	surveyId: string,
	{ choice, revision, pricing }: Choice
): Promise<ChosenFigures> {
	if (revision) {
		const [[row], breakdown, measures] = await Promise.all([
			db
				.select({ totals: surveyRevisions.totals })
				.from(surveyRevisions)
				.where(eq(surveyRevisions.id, revision.id)),
			revisionBreakdown(db, revision.id),
			revisionMeasures(db, revision)
		]);
		// Revisions from before measures' own costs were counted got them in migration 0011.
		const frozen = row.totals;
		const economics = await wholeEconomics(db, revision.costBasisId, frozen);
		return {
			choice,
			revision,
			pricing,
			basisId: revision.costBasisId,
			currency: frozen.currency,
			totals: { ...frozen, economics },
			breakdown,
			measures
		};
	}
	const [{ totals, breakdown }, measures] = await Promise.all([
		savingsTotals(db, pricing),
		surveyMeasures(db, surveyId)
	]);
	const economics = await wholeEconomics(db, pricing.basisId, totals);
	return {
		choice,
		revision: null,
		pricing,
		basisId: pricing.basisId,
		currency: pricing.currency,
		totals: { ...totals, economics },
		breakdown,
		measures
	};
}
