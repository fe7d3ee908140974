/**
 * What the policy and the writers decide a finding or measure on (docs/decisions.md): its
 * survey, firm and client company, whether the survey is published, and whether the item is in
 * what the client is shown — the last published revision's snapshot, or for a survey published
 * before revisions were kept the live findings its lock has frozen (publish/choose.ts, as a
 * client reads). A writer reads them with the survey row share-locked, so no publication or
 * correction moves them before it commits.
 */
import { and, desc, eq, min, sql } from 'drizzle-orm';
import type { ItemRef } from '../../schemas/decisions';
import {
	findings,
	measures,
	sites,
	surveyRevisionFindings,
	surveyRevisionMeasures,
	surveyRevisions,
	surveys
} from '../db/schema';
import type { Executor } from '../db/types';
import { chooseFigures } from '../publish/choose';

export interface ShownRevision {
	id: string;
	number: number;
	costBasisId: string | null;
	publishedAt: Date;
}

export interface ItemFacts {
	ref: ItemRef;
	surveyId: string;
	firmId: string;
	clientCompanyId: string;
	/** surveys.status */
	stage: string;
	published: boolean;
	/** The revision the client is shown; null: none (or the live, frozen findings). */
	revision: ShownRevision | null;
	/** What the client is shown of the survey: a revision, the frozen live findings, or nothing. */
	source: 'revision' | 'live' | 'none';
	/** Whether the item is in what the client is shown. */
	shown: boolean;
	/** The UTC day the survey first went to the client, or null. */
	publishedOn: string | null;
}

const utcDay = (at: Date | null) => (at === null ? null : at.toISOString().slice(0, 10));

/** The item's survey (another firm's item or an unknown id: null), and whether it is live. */
async function itemSurvey(db: Executor, firmId: string, ref: ItemRef) {
	const table = ref.kind === 'finding' ? findings : measures;
	const [row] = await db
		.select({ surveyId: table.surveyId, live: sql<number>`${table.deletedAt} IS NULL` })
		.from(table)
		.innerJoin(surveys, eq(surveys.id, table.surveyId))
		.where(and(eq(table.id, ref.id), eq(surveys.firmId, firmId)))
		.limit(1);
	return row ? { surveyId: row.surveyId, live: Number(row.live) === 1 } : null;
}

/** Shared lock on the survey row (MariaDB's LOCK IN SHARE MODE; it has no FOR SHARE). */
async function lockSurvey(db: Executor, surveyId: string): Promise<void> {
	await db.execute(sql`SELECT ${surveys.id} FROM ${surveys} WHERE ${surveys.id} = ${surveyId}
		LOCK IN SHARE MODE`);
}

async function inRevision(db: Executor, revisionId: string, ref: ItemRef): Promise<boolean> {
	const rows =
		ref.kind === 'finding'
			? await db
					.select({ one: sql`1` })
					.from(surveyRevisionFindings)
					.where(
						and(
							eq(surveyRevisionFindings.revisionId, revisionId),
							eq(surveyRevisionFindings.findingId, ref.id)
						)
					)
					.limit(1)
			: await db
					.select({ one: sql`1` })
					.from(surveyRevisionMeasures)
					.where(
						and(
							eq(surveyRevisionMeasures.revisionId, revisionId),
							eq(surveyRevisionMeasures.measureId, ref.id)
						)
					)
					.limit(1);
	return rows.length > 0;
}

/**
 * The facts of one finding or measure of the firm, or null when the firm has no such item.
 * `lock`: share-lock the survey row first (writers, inside their transaction).
 */
export async function itemFacts(
	db: Executor,
	firmId: string,
	ref: ItemRef,
	{ lock = false }: { lock?: boolean } = {}
): Promise<ItemFacts | null> {
	const item = await itemSurvey(db, firmId, ref);
	if (!item) return null;
	if (lock) await lockSurvey(db, item.surveyId);
	const [[survey], revisions, [first]] = await Promise.all([
		db
			.select({
				firmId: surveys.firmId,
				stage: surveys.status,
				publishedAt: surveys.publishedAt,
				clientCompanyId: sites.clientCompanyId
			})
			.from(surveys)
			.innerJoin(sites, eq(sites.id, surveys.siteId))
			.where(eq(surveys.id, item.surveyId))
			.limit(1),
		db
			.select({
				id: surveyRevisions.id,
				number: surveyRevisions.number,
				costBasisId: surveyRevisions.costBasisId,
				publishedAt: surveyRevisions.publishedAt
			})
			.from(surveyRevisions)
			.where(eq(surveyRevisions.surveyId, item.surveyId))
			.orderBy(desc(surveyRevisions.number)),
		db
			.select({ at: min(surveyRevisions.publishedAt) })
			.from(surveyRevisions)
			.where(eq(surveyRevisions.surveyId, item.surveyId))
	]);
	const chosen = chooseFigures({
		reader: 'client',
		stage: survey.stage,
		publishedAt: survey.publishedAt,
		revisions: revisions.map((r) => r.number)
	});
	const source = !chosen.ok ? 'none' : chosen.choice.kind === 'revision' ? 'revision' : 'live';
	const revision = source === 'revision' ? revisions[0] : null;
	const shown =
		source === 'revision'
			? await inRevision(db, revision!.id, ref)
			: source === 'live' && item.live;
	return {
		ref,
		surveyId: item.surveyId,
		firmId: survey.firmId,
		clientCompanyId: survey.clientCompanyId,
		stage: survey.stage,
		published: survey.publishedAt !== null,
		revision,
		source,
		shown,
		publishedOn: utcDay(first?.at ?? survey.publishedAt)
	};
}
