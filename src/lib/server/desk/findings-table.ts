/**
 * The review table's data on the app's database, for its route files (which make no queries
 * and hold no database handle): one page of findings, the page's filter choices, bulk review.
 */
import { and, asc, eq, inArray, isNull, sql } from 'drizzle-orm';
import type { FindingsQuery, FindingStage } from '../../schemas/desk-findings';
import { FINDING_CONDITIONS, FINDING_STAGES, NO_PLACE } from '../../schemas/desk-findings';
import {
	FINDING_KINDS,
	FINDING_KIND_LABELS,
	FINDING_STATUS_LABELS,
	LEAK_SIZE_CLASS_LABELS,
	TRAP_CONDITION_LABELS
} from '../../schemas/finding-vocabulary';
import type { UnitSystemId } from '../../schemas/roles';
import { db } from '../db';
import { areas, findings, headers } from '../db/schema';
import type { Executor } from '../db/types';
import { unitSystemOf } from '../walk/person';
import { findingsPage, surveyPricing, type FindingsPage } from './findings-query';
import { markReviewed, type ReviewInput, type ReviewOutcome } from './review';

export interface Choice {
	value: string;
	label: string;
	count: number;
}

export interface TableFacts {
	survey: { id: string; name: string };
	unitSystem: UnitSystemId;
	currency: string;
	choices: {
		kind: Choice[];
		area: Choice[];
		header: Choice[];
		condition: Choice[];
		stage: Choice[];
	};
}

const STAGE_LABELS: Record<FindingStage, string> = {
	...FINDING_STATUS_LABELS,
	unreviewed: 'Not yet checked',
	'desk-checked': 'Checked (any stage)'
};
const CONDITION_LABELS: Record<string, string> = {
	...TRAP_CONDITION_LABELS,
	...LEAK_SIZE_CLASS_LABELS
};

/** In a fixed order (the vocabulary's), only what the survey has. */
const ordered = (
	order: readonly string[],
	counts: Map<string, number>,
	label: (v: string) => string
) =>
	order
		.filter((v) => counts.has(v))
		.map((v) => ({ value: v, label: label(v), count: counts.get(v)! }));

const add = (m: Map<string, number>, k: string | null, n: number) => {
	if (k !== null) m.set(k, (m.get(k) ?? 0) + n);
};

/** The filter choices present in a survey's findings (kinds, areas, headers, conditions, stages). */
export async function filterChoices(
	tx: Executor,
	surveyId: string
): Promise<TableFacts['choices']> {
	const groups = await tx
		.select({
			kind: findings.kind,
			areaId: findings.areaId,
			headerId: findings.headerId,
			condition: findings.condition,
			status: findings.status,
			checked: sql<number>`${findings.reviewedAt} IS NOT NULL`,
			n: sql<number>`COUNT(*)`
		})
		.from(findings)
		.where(and(eq(findings.surveyId, surveyId), isNull(findings.deletedAt)))
		.groupBy(
			findings.kind,
			findings.areaId,
			findings.headerId,
			findings.condition,
			findings.status,
			sql`${findings.reviewedAt} IS NOT NULL`
		);
	const kind = new Map<string, number>();
	const area = new Map<string, number>();
	const header = new Map<string, number>();
	const condition = new Map<string, number>();
	const stage = new Map<string, number>();
	for (const g of groups) {
		const n = Number(g.n);
		add(kind, g.kind, n);
		add(area, g.areaId ?? NO_PLACE, n);
		add(header, g.headerId ?? NO_PLACE, n);
		add(condition, g.condition, n);
		add(stage, g.status, n);
		add(stage, Number(g.checked) === 1 ? 'desk-checked' : 'unreviewed', n);
	}
	const placeIds = (m: Map<string, number>) => [...m.keys()].filter((k) => k !== NO_PLACE);
	const [areaRows, headerRows] = await Promise.all([
		placeIds(area).length
			? tx
					.select({ id: areas.id, name: areas.name })
					.from(areas)
					.where(inArray(areas.id, placeIds(area)))
					.orderBy(asc(areas.sortOrder), asc(areas.name))
			: [],
		placeIds(header).length
			? tx
					.select({ id: headers.id, name: headers.name })
					.from(headers)
					.where(inArray(headers.id, placeIds(header)))
					.orderBy(asc(headers.sortOrder), asc(headers.name))
			: []
	]);
	const places = (rows: { id: string; name: string }[], m: Map<string, number>, none: string) => [
		...rows.map((r) => ({ value: r.id, label: r.name, count: m.get(r.id)! })),
		...(m.has(NO_PLACE) ? [{ value: NO_PLACE, label: none, count: m.get(NO_PLACE)! }] : [])
	];
	return {
		kind: ordered(
			FINDING_KINDS,
			kind,
			(v) => FINDING_KIND_LABELS[v as keyof typeof FINDING_KIND_LABELS]
		),
		area: places(areaRows, area, 'No area'),
		header: places(headerRows, header, 'No header'),
		condition: ordered(FINDING_CONDITIONS, condition, (v) => CONDITION_LABELS[v] ?? v),
		stage: ordered(FINDING_STAGES, stage, (v) => STAGE_LABELS[v as FindingStage])
	};
}

/** What the page's load returns (the rows themselves come from the API). */
export async function tableFacts(user: SessionUser, surveyId: string): Promise<TableFacts | null> {
	const survey = await surveyPricing(db, surveyId);
	if (!survey) return null;
	const [choices, unitSystem] = await Promise.all([
		filterChoices(db, surveyId),
		unitSystemOf(db, user.id)
	]);
	return {
		survey: { id: survey.id, name: survey.name },
		unitSystem,
		currency: survey.currency,
		choices
	};
}

/** One page of the table for the API route; null when the survey is gone. */
export async function surveyFindings(
	surveyId: string,
	query: FindingsQuery
): Promise<FindingsPage | null> {
	const survey = await surveyPricing(db, surveyId);
	return survey ? findingsPage(db, survey, query) : null;
}

/** markReviewed on the app's database (for form actions). */
export const reviewFindings = (input: ReviewInput): Promise<ReviewOutcome> =>
	markReviewed(db, input);
