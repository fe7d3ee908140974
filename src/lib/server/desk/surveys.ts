/**
 * What the Desk's survey pages read: the firm's sites and recording people for the forms, and
 * one survey with its auditors' sync state, its findings by status and its waiting conflicts.
 * Callers have passed requireRole / requireSurveyAccess; every query still filters by firm.
 * The changes are in ./survey-changes.ts.
 */
import { and, asc, count, eq, inArray, isNotNull, isNull, sql } from 'drizzle-orm';
import { roles } from '../../schemas/roles';
import { db } from '../db';
import {
	clientCompanies,
	findingConflicts,
	findings,
	sites,
	surveyAuditors,
	surveys,
	users
} from '../db/schema';
import type { Executor } from '../db/types';
import { devicesOf, type DeviceState } from '../sync/devices';

/** Roles that record in the field and so may be assigned to a survey. */
export const ASSIGNABLE_ROLES = roles.filter((r) => r === 'auditor' || r === 'consultant');

/** The firm's active auditors and consultants (only those of `ids` when given), by name. */
export function assignablePeople(firmId: string, ids?: string[], tx: Executor = db) {
	return tx
		.select({ id: users.id, name: users.name, role: users.role })
		.from(users)
		.where(
			and(
				eq(users.firmId, firmId),
				inArray(users.role, ASSIGNABLE_ROLES),
				isNull(users.disabledAt),
				ids ? inArray(users.id, ids) : undefined
			)
		)
		.orderBy(asc(users.name));
}

/** The firm's sites with their client, for choosing where a new survey goes. */
export function siteChoices(firmId: string) {
	return db
		.select({ id: sites.id, name: sites.name, client: clientCompanies.name })
		.from(sites)
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.where(eq(sites.firmId, firmId))
		.orderBy(asc(clientCompanies.name), asc(sites.name));
}

export interface AuditorState {
	id: string;
	name: string;
	role: string;
	assignedAt: Date;
	devices: Omit<DeviceState, 'userId'>[];
}

/** One survey as its Desk page shows it; null when it is not the firm's. */
export async function surveyOverview(firmId: string, surveyId: string) {
	const [survey] = await db
		.select({
			id: surveys.id,
			name: surveys.name,
			stage: surveys.status,
			startsOn: surveys.startsOn,
			endsOn: surveys.endsOn,
			publishedAt: surveys.publishedAt,
			reviewedAt: surveys.reviewedAt,
			reviewedBy: users.name,
			siteId: sites.id,
			site: sites.name,
			clientId: clientCompanies.id,
			client: clientCompanies.name
		})
		.from(surveys)
		.innerJoin(sites, eq(sites.id, surveys.siteId))
		.innerJoin(clientCompanies, eq(clientCompanies.id, sites.clientCompanyId))
		.leftJoin(users, eq(users.id, surveys.reviewedBy))
		.where(and(eq(surveys.id, surveyId), eq(surveys.firmId, firmId)));
	if (!survey) return null;
	const [assigned, byStatus, [checked], [conflicts]] = await Promise.all([
		db
			.select({
				id: users.id,
				name: users.name,
				role: users.role,
				assignedAt: surveyAuditors.assignedAt
			})
			.from(surveyAuditors)
			.innerJoin(users, eq(users.id, surveyAuditors.userId))
			.where(and(eq(surveyAuditors.surveyId, survey.id), eq(users.firmId, firmId)))
			.orderBy(asc(users.name)),
		db
			.select({ status: findings.status, n: count() })
			.from(findings)
			.where(and(eq(findings.surveyId, survey.id), isNull(findings.deletedAt)))
			.groupBy(findings.status)
			.orderBy(asc(findings.status)),
		db
			.select({ n: count() })
			.from(findings)
			.where(
				and(
					eq(findings.surveyId, survey.id),
					isNull(findings.deletedAt),
					isNotNull(findings.reviewedAt)
				)
			),
		db
			.select({ n: count() })
			.from(findingConflicts)
			.where(
				and(
					eq(findingConflicts.surveyId, survey.id),
					eq(findingConflicts.firmId, firmId),
					isNull(findingConflicts.resolvedAt)
				)
			)
	]);
	const devices = await devicesOf(
		db,
		firmId,
		assigned.map((a) => a.id)
	);
	const auditors: AuditorState[] = assigned.map((a) => ({
		...a,
		devices: devices
			.filter((d) => d.userId === a.id)
			.map(({ deviceId, lastPushAt, lastPullAt }) => ({ deviceId, lastPushAt, lastPullAt }))
	}));
	const findingCounts = byStatus.map((s) => ({ status: s.status, count: Number(s.n) }));
	return {
		survey,
		auditors,
		findingCounts,
		findingTotal: findingCounts.reduce((sum, s) => sum + s.count, 0),
		checked: Number(checked?.n ?? 0),
		waitingConflicts: Number(conflicts?.n ?? 0)
	};
}

export type SurveyOverview = NonNullable<Awaited<ReturnType<typeof surveyOverview>>>;

/** Waiting conflicts per survey of the firm, for the Desk's list (a SQL expression). */
export const waitingConflictsSql = sql<number>`(SELECT COUNT(*) FROM ${findingConflicts}
	WHERE ${findingConflicts.surveyId} = ${surveys.id} AND ${findingConflicts.resolvedAt} IS NULL)`;
