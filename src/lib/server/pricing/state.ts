/**
 * Whether a finding's stored figures are current: made by this engine, on the cost basis its
 * survey is priced on now. Anything else is shown as out of date (never as a current figure)
 * until the site's figures are brought up to date.
 */
import { sql, type SQL } from 'drizzle-orm';
import { ENGINE_VERSION } from '../../steam/version';
import { findings, sites, surveys } from '../db/schema';

/** current | engine (made by another engine) | basis (priced on another basis) | none (no figures). */
export type FigureState = 'current' | 'engine' | 'basis' | 'none';

export interface StampedFigures {
	physicsEngine: string | null;
	resultsEngine: string | null;
	pricedBasisId: string | null;
}

/**
 * @param basisId the basis the finding's survey is priced on now (frozen, else the site's)
 * A finding without money figures (the engine refused its inputs, or the site had no basis when
 * it was priced — pricing_note says which) is 'none': there is no figure to mistake for current.
 */
export function figureState(f: StampedFigures, basisId: string | null): FigureState {
	if (f.physicsEngine !== ENGINE_VERSION) return 'engine';
	if (f.resultsEngine === null) return 'none';
	if (f.resultsEngine !== ENGINE_VERSION) return 'engine';
	return f.pricedBasisId === basisId ? 'current' : 'basis';
}

/** The basis a survey is priced on now, in SQL (the query must join surveys and sites). */
export const surveyBasisSql: SQL<string | null> =
	sql`COALESCE(${surveys.costBasisId}, ${sites.costBasisId})`;

/**
 * 1 when the row's figures are current, in SQL — figureState's 'current'. `basis` is the basis
 * in force: a value when the caller knows it (one survey), else surveyBasisSql (joins as above).
 * Reads only columns of findings_desk_idx, so a survey's totals come from the index.
 */
export const figuresCurrentSql = (basis: SQL | string | null = surveyBasisSql): SQL<number> =>
	sql`(${findings.physicsEngine} <=> ${ENGINE_VERSION} AND ${findings.resultsEngine} <=> ${ENGINE_VERSION} AND ${findings.pricedBasisId} <=> ${basis})`;

/** 1 when the row has figures that are out of date — figureState's 'engine' or 'basis'. */
export const figuresOutOfDateSql = (basis: SQL | string | null = surveyBasisSql): SQL<number> =>
	sql`(NOT (${findings.physicsEngine} <=> ${ENGINE_VERSION}) OR (${findings.resultsEngine} IS NOT NULL AND NOT ${figuresCurrentSql(basis)}))`;
