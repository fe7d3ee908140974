/**
 * What a survey's report says, before it is drawn (docs/reports.md): the survey, its site,
 * client and firm, which figures with their totals, breakdown and measures (publish/figures.ts, shared with the
 * ranked savings list), and — paged from SQL, never all at once — its ranked rows (rows.ts).
 * The PDF, the XLSX and the CSV all read this, so their totals are the same by construction.
 */
import { eq } from 'drizzle-orm';
import type { UnitSystemId } from '../../units';
import { isUnitSystemId } from '../../units';
import { clientCompanies, firms, sites, surveys } from '../db/schema';
import type { Executor } from '../db/types';
import { atmosphereOf } from '../desk/finding-detail';
import type { MeasureRow } from '../measures/sums';
import type { FigureChoice, Reader } from '../publish/choose';
import { chosenFigures, type ChosenRevision } from '../publish/figures';
import type { WholeEconomics } from '../savings/ranked-savings';
import type { SavingsBreakdown, SavingsTotals } from '../savings/totals';

export interface ReportSurvey {
	id: string;
	name: string;
	stage: string;
	publishedAt: Date | null;
	startsOn: string | null;
	endsOn: string | null;
	firmId: string;
	firm: string;
	siteId: string;
	site: string;
	client: string;
	/** The site's unit system: every figure of the report is in it. */
	unitSystem: UnitSystemId;
	/** MPa absolute, for gauge pressures in the calculation steps. */
	atmosphere: number;
}

export type ReportRevision = ChosenRevision;

export interface ReportContent {
	survey: ReportSurvey;
	choice: FigureChoice;
	/** The revision reported on (choice.kind 'revision'), else null. */
	revision: ReportRevision | null;
	/** The cost basis the figures are priced on. */
	basisId: string | null;
	currency: string;
	totals: SavingsTotals & { economics: WholeEconomics | null };
	breakdown: SavingsBreakdown;
	/** The measures of those figures (their findings, own costs, sums, payback). */
	measures: MeasureRow[];
	generatedAt: Date;
}

export type ContentOutcome = { ok: true; content: ReportContent } | { ok: false; message: string };

async function reportSurvey(db: Executor, surveyId: string): Promise<ReportSurvey | null> {
	const [row] = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			stage: surveys.status,
			publishedAt: surveys.publishedAt,
			startsOn: surveys.startsOn,
			endsOn: surveys.endsOn,
			firmId: surveys.firmId,
			firm: firms.name,
			siteId: sites.id,
			site: sites.name,
			client: clientCompanies.name,
			unitSystem: sites.unitSystem,
			elevation: sites.elevation,
			atmosphericPressure: sites.atmosphericPressure
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(firms, eq(firms.id, surveys.firmId))
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.where(eq(surveys.id, surveyId))
		.limit(1);
	if (!row) return null;
	const { elevation, atmosphericPressure, unitSystem, ...rest } = row;
	return {
		...rest,
		unitSystem: isUnitSystemId(unitSystem) ? unitSystem : 'SI',
		atmosphere: atmosphereOf({ elevation, atmosphericPressure })
	};
}

/**
 * The report of one survey for a reader who may read it (the route has checked access), or
 * why there is none (a revision that does not exist; a client while a survey published before
 * revisions were kept is being corrected). Null when the survey is gone.
 */
export async function reportContent(
	db: Executor,
	surveyId: string,
	reader: Reader,
	asked?: number
): Promise<ContentOutcome | null> {
	const [survey, chosen] = await Promise.all([
		reportSurvey(db, surveyId),
		chosenFigures(db, surveyId, reader, asked)
	]);
	if (!survey || !chosen) return null;
	if (!chosen.ok) return chosen;
	const { choice, revision, basisId, currency, totals, breakdown, measures } = chosen.figures;
	return {
		ok: true,
		content: {
			survey,
			choice,
			revision,
			basisId,
			currency,
			totals,
			breakdown,
			measures,
			generatedAt: new Date()
		}
	};
}

/** "Larkspindle spring survey" → "larkspindle-spring-survey" (ASCII, for a file name). */
export function fileSlug(name: string): string {
	const slug = name
		.normalize('NFKD')
		.replace(/[\u0300-\u036f]/g, '')
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, 80)
		.replace(/-+$/, '');
	return slug || 'survey';
}
