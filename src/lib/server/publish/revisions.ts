/**
 * Reads of publications: the Desk's publish page (readiness, revisions, who is told) and the
 * Ladder's page of one survey (the last published revision's frozen figures, never the live
 * findings).
 */
import { and, asc, count, desc, eq, isNull, sql } from 'drizzle-orm';
import {
	findingConflicts,
	findings,
	sites,
	surveyRevisionFindings,
	surveyRevisions
} from '../db/schema';
import { clientCompanies, surveys, users, type RevisionTotals } from '../db/schema';
import { db as appDb } from '../db';
import type { Executor } from '../db/types';
import { surveyPricing } from '../desk/findings-query';
import { conditionWords, kindWords } from '../finding-words';
import { mailOn } from '../mail/send';
import type { UnitSystemId } from '../../units';
import { unitSystemOf } from '../walk/person';
import { clientRecipients, type Recipient } from './notify';
import { publishProblem } from './readiness';
import { savingSnapshotSql } from './snapshot';

export interface Revision {
	number: number;
	publishedAt: Date;
	publishedBy: string | null;
	note: string | null;
	totals: RevisionTotals;
	findingCount: number;
	mailSent: number;
	mailFailed: number;
}

export async function revisionsOf(db: Executor, surveyId: string): Promise<Revision[]> {
	return db
		.select({
			number: surveyRevisions.number,
			publishedAt: surveyRevisions.publishedAt,
			publishedBy: users.name,
			note: surveyRevisions.note,
			totals: surveyRevisions.totals,
			findingCount: surveyRevisions.findingCount,
			mailSent: surveyRevisions.mailSent,
			mailFailed: surveyRevisions.mailFailed
		})
		.from(surveyRevisions)
		.leftJoin(users, eq(users.id, surveyRevisions.publishedBy))
		.where(eq(surveyRevisions.surveyId, surveyId))
		.orderBy(desc(surveyRevisions.number));
}

export interface PublishPage {
	survey: { id: string; name: string; stage: string; publishedAt: Date | null; client: string };
	revisions: Revision[];
	/** The number publishing now would give. */
	nextRevision: number;
	/** Why it cannot be published now (the note aside: the form asks for it), or null. */
	problem: string | null;
	facts: { findings: number; unreviewed: number; conflicts: number };
	recipients: Recipient[];
	mailOn: boolean;
	/** The reader's unit system, for the revisions' totals. */
	unitSystem: UnitSystemId;
}

export async function publishPage(
	reader: { id: string; firmId: string },
	surveyId: string,
	db: Executor = appDb
): Promise<PublishPage | null> {
	const [survey] = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			stage: surveys.status,
			publishedAt: surveys.publishedAt,
			client: clientCompanies.name
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.where(and(eq(surveys.id, surveyId), eq(surveys.firmId, reader.firmId)));
	if (!survey) return null;
	const [revisions, pricing, [f], [c], recipients, unitSystem] = await Promise.all([
		revisionsOf(db, surveyId),
		surveyPricing(db, surveyId),
		db
			.select({
				all: count(),
				unreviewed: sql<string | number | null>`SUM(${findings.reviewedAt} IS NULL)`
			})
			.from(findings)
			.where(and(eq(findings.surveyId, surveyId), isNull(findings.deletedAt))),
		db
			.select({ n: count() })
			.from(findingConflicts)
			.where(and(eq(findingConflicts.surveyId, surveyId), isNull(findingConflicts.resolvedAt))),
		clientRecipients(db, reader.firmId, surveyId),
		unitSystemOf(db, reader.id)
	]);
	const facts = {
		findings: Number(f?.all ?? 0),
		unreviewed: Number(f?.unreviewed ?? 0),
		conflicts: Number(c?.n ?? 0)
	};
	const nextRevision = (revisions[0]?.number ?? 0) + 1;
	const problem = publishProblem({
		stage: survey.stage,
		...facts,
		basisId: pricing?.basisId ?? null,
		nextRevision,
		note: 'the form asks for it'
	});
	return {
		survey,
		revisions,
		nextRevision,
		problem: problem?.message ?? null,
		facts,
		recipients,
		mailOn: mailOn(),
		unitSystem
	};
}

/** One finding of a published revision, as the client sees it. */
export interface PublishedFinding {
	findingId: string;
	kindWords: string;
	conditionWords: string | null;
	tag: string | null;
	location: string;
	area: string | null;
	steamKgH: number | null;
	heatKw: number | null;
	fuelGjYear: number | null;
	costMinor: number;
	currency: string;
	repairCostMinor: number | null;
	paybackYears: number | null;
	co2KgYear: number | null;
	waterM3Year: number | null;
}

export interface LadderSurvey {
	survey: { id: string; name: string; site: string; client: string };
	/** The last published revision; null for a survey published before revisions were kept. */
	revision: (Revision & { currency: string }) | null;
	/** Its saving findings, biggest saving first (at most `limit`). */
	findings: PublishedFinding[];
}

/** A survey's name with its site's and client company's, for a page's heading; null if none. */
export async function surveyNames(db: Executor, surveyId: string) {
	const [survey] = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			stage: surveys.status,
			site: sites.name,
			client: clientCompanies.name
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.where(eq(surveys.id, surveyId));
	return survey ?? null;
}

/** The survey as the Ladder shows it: its last published revision's frozen figures. */
export async function ladderSurvey(
	surveyId: string,
	limit = 50,
	db: Executor = appDb
): Promise<LadderSurvey | null> {
	const named = await surveyNames(db, surveyId);
	if (!named) return null;
	const { stage: _stage, ...survey } = named;
	const [latest] = await revisionsOf(db, surveyId);
	if (!latest) return { survey, revision: null, findings: [] };
	const [rev] = await db
		.select({ id: surveyRevisions.id })
		.from(surveyRevisions)
		.where(and(eq(surveyRevisions.surveyId, surveyId), eq(surveyRevisions.number, latest.number)));
	const S = surveyRevisionFindings;
	const rows = await db
		.select({
			findingId: S.findingId,
			kind: S.kind,
			condition: S.condition,
			tag: S.tag,
			location: S.location,
			area: S.areaName,
			steamKgH: S.steamLoss,
			heatKw: S.heatLoss,
			fuelGjYear: S.fuelEnergy,
			waterM3Year: S.water,
			costMinor: S.cost,
			repairCostMinor: S.repairCost,
			paybackYears: S.paybackYears,
			co2KgYear: S.co2
		})
		.from(S)
		.where(savingSnapshotSql(rev.id))
		.orderBy(desc(S.cost), asc(S.findingId))
		.limit(limit);
	return {
		survey,
		revision: { ...latest, currency: latest.totals.currency },
		findings: rows.map((r) => ({
			findingId: r.findingId,
			kindWords: kindWords(r.kind),
			conditionWords: conditionWords(r.condition),
			tag: r.tag,
			location: r.location ?? '',
			area: r.area,
			steamKgH: r.steamKgH,
			heatKw: r.heatKw,
			fuelGjYear: r.fuelGjYear,
			waterM3Year: r.waterM3Year,
			costMinor: Number(r.costMinor),
			currency: latest.totals.currency,
			repairCostMinor: r.repairCostMinor === null ? null : Number(r.repairCostMinor),
			paybackYears: r.paybackYears,
			co2KgYear: r.co2KgYear
		}))
	};
}
