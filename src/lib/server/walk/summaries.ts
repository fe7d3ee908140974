/** Survey summaries for the Walk: the list of `GET /api/surveys` and a snapshot's header. */
import { and, asc, desc, eq, isNull, sql, type SQL } from 'drizzle-orm';
import { surveySummarySchema, type SurveySummary } from '../../schemas/snapshot';
import { clientCompanies, findings, sites, surveys } from '../db/schema';
import type { Executor } from '../db/types';

/** Summaries of the surveys matching `where` (a policy scope, or one id), newest first. */
export async function surveySummaries(tx: Executor, where: SQL): Promise<SurveySummary[]> {
	const findingCount = tx
		.select({ n: sql<number>`COUNT(*)` })
		.from(findings)
		.where(and(eq(findings.surveyId, surveys.id), isNull(findings.deletedAt)));
	const rows = await tx
		.select({
			id: surveys.id,
			name: surveys.name,
			stage: surveys.status,
			startsOn: surveys.startsOn,
			endsOn: surveys.endsOn,
			siteId: sites.id,
			siteName: sites.name,
			clientName: clientCompanies.name,
			findingCount: sql<number>`(${findingCount})`,
			updatedAt: surveys.updatedAt
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.where(where)
		.orderBy(desc(surveys.startsOn), asc(surveys.name), asc(surveys.id));
	return rows.map((r) =>
		surveySummarySchema.parse({
			...r,
			findingCount: Number(r.findingCount),
			updatedAt: r.updatedAt.toISOString()
		})
	);
}
