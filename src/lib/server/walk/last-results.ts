/**
 * The last result of each tagged trap: its most recent test on an earlier survey of the same
 * site. "Earlier" is by the surveys' start dates (their creation date when a survey has none),
 * so a later survey's findings never show up as history, and the survey being walked never
 * counts as its own history.
 */
import { and, desc, eq, isNotNull, isNull, lt, ne, sql } from 'drizzle-orm';
import { TRAP_CONDITIONS, type TrapCondition } from '../../schemas/finding-vocabulary';
import type { LastResult } from '../../schemas/snapshot';
import { findings, surveys } from '../db/schema';
import type { Executor } from '../db/types';

const conditions = new Set<string>(TRAP_CONDITIONS);
const startOf = (s: typeof surveys) => sql`COALESCE(${s.startsOn}, DATE(${s.createdAt}))`;

interface ThisSurvey {
	id: string;
	siteId: string;
	startsOn: string | null;
	createdAt: Date;
}

/** Asset id → last result, for the given assets of `survey`'s site. */
export async function lastResults(
	tx: Executor,
	survey: ThisSurvey,
	assetIds: string[]
): Promise<Map<string, LastResult>> {
	const out = new Map<string, LastResult>();
	if (assetIds.length === 0) return out;
	const thisStart = survey.startsOn ?? survey.createdAt.toISOString().slice(0, 10);
	const rows = await tx
		.select({
			assetId: findings.assetId,
			findingId: findings.id,
			surveyId: surveys.id,
			surveyName: surveys.name,
			recordedAt: findings.recordedAt,
			createdAt: findings.createdAt,
			condition: sql<string | null>`JSON_UNQUOTE(JSON_EXTRACT(${findings.inputs}, '$.condition'))`
		})
		.from(findings)
		.innerJoin(surveys, eq(surveys.id, findings.surveyId))
		.where(
			and(
				// The whole site's tagged tests, not an IN list that grows with the plant.
				isNotNull(findings.assetId),
				eq(findings.kind, 'trap'),
				isNull(findings.deletedAt),
				eq(surveys.siteId, survey.siteId),
				ne(surveys.id, survey.id),
				lt(startOf(surveys), thisStart)
			)
		)
		// Newest first: the first row seen for an asset is its last result.
		.orderBy(
			desc(startOf(surveys)),
			desc(sql`COALESCE(${findings.recordedAt}, ${findings.createdAt})`)
		);
	const wanted = new Set(assetIds);
	for (const r of rows) {
		if (
			!r.assetId ||
			!wanted.has(r.assetId) ||
			out.has(r.assetId) ||
			!r.condition ||
			!conditions.has(r.condition)
		)
			continue;
		out.set(r.assetId, {
			surveyId: r.surveyId,
			surveyName: r.surveyName,
			findingId: r.findingId,
			testedAt: (r.recordedAt ?? r.createdAt).toISOString(),
			condition: r.condition as TrapCondition
		});
	}
	return out;
}
