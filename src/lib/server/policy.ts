/**
 * Authorization, in one place. hooks.server.ts calls `guardRoute` for every request (page
 * groups, API, actions alike); every load, form action and +server.ts that touches data calls
 * `requireRole` and, for one object, `requireSiteAccess` / `requireSurveyAccess` /
 * `requirePerson` again, and lists through `surveyScope` / `siteScope`. The rules themselves
 * are the pure table in ./policy/table.ts and the decisions in ./policy/decide.ts.
 *
 * Objects of another tenant (or hidden from this person) answer 404, never 403, so nobody can
 * probe which ids exist.
 */
import { error, redirect, type RequestEvent } from '@sveltejs/kit';
import { and, eq, exists, inArray, isNotNull, sql, type Placeholder, type SQL } from 'drizzle-orm';
import { uuidSchema } from '$lib/schemas/common';
import type { Role } from '$lib/schemas/roles';
import { db } from './db';
import { sites, surveyAuditors, surveys, users } from './db/schema';
import { personColumns } from './auth/person-columns';
import type { ItemRef } from '$lib/schemas/decisions';
import { itemFacts } from './decisions/facts';
import {
	type Access,
	ladderItemAccess,
	personAccess,
	siteAccess,
	surveyAccess
} from './policy/decide';
import { gate, roleCan, type Capability } from './policy/table';

export * from './policy/table';
export * from './policy/decide';

type GuardEvent = Pick<RequestEvent, 'locals' | 'url' | 'request' | 'route'>;

/** The sign-in page, returning here afterwards. */
export function signInUrl(url: URL): string {
	return `/signin?next=${encodeURIComponent(url.pathname + url.search)}`;
}

/**
 * The hooks-level gate: throws a redirect to sign-in (a page opened without a session), 401
 * (API, form posts), or 403 (a role with no business in this area).
 */
export function guardRoute(event: GuardEvent): void {
	const verdict = gate(event.locals.user, event.route.id);
	if (verdict.ok) return;
	if (verdict.status === 401) {
		if (!verdict.machine && event.request.method === 'GET') redirect(303, signInUrl(event.url));
		error(401, 'Sign in to continue.');
	}
	error(403, verdict.message);
}

/** The signed-in person, or a redirect to sign-in (page loads) / 401 (actions, API). */
export function requireUser(event: GuardEvent): SessionUser {
	const user = event.locals.user;
	if (user) return user;
	const machine = event.route.id?.startsWith('/api/') ?? false;
	if (!machine && event.request.method === 'GET') redirect(303, signInUrl(event.url));
	error(401, 'Sign in to continue.');
}

/** The signed-in person if their role has the capability; 401/403 otherwise. */
export function requireRole(event: GuardEvent, capability: Capability): SessionUser {
	const user = requireUser(event);
	if (!roleCan(user.role, capability)) error(403, 'Your role does not allow this.');
	return user;
}

function hide(): never {
	error(404, 'Not found.');
}

function demand(access: Access, need: 'read' | 'write'): void {
	if (access === 'none') hide();
	if (need === 'write' && access !== 'write') error(403, 'You may look at this but not change it.');
}

const assignedTo = (userId: string | Placeholder, surveyId: SQL | typeof surveys.id) =>
	exists(
		db
			.select({ one: sql`1` })
			.from(surveyAuditors)
			.where(and(eq(surveyAuditors.surveyId, surveyId), eq(surveyAuditors.userId, userId)))
	);

/**
 * What a survey's access is decided on, for one person: prepared once (most API requests and
 * pages ask it first, so its SQL is not written again on each).
 */
const surveyAccessRow = db
	.select({
		id: surveys.id,
		firmId: surveys.firmId,
		siteId: surveys.siteId,
		clientCompanyId: sites.clientCompanyId,
		publishedAt: surveys.publishedAt,
		assigned: sql<number>`${assignedTo(sql.placeholder('userId'), surveys.id)}`
	})
	.from(surveys)
	.innerJoin(sites, eq(sites.id, surveys.siteId))
	// Firm filter in the query too: a bug in the decision below still cannot cross tenants.
	.where(
		and(eq(surveys.id, sql.placeholder('surveyId')), eq(surveys.firmId, sql.placeholder('firmId')))
	)
	.limit(1)
	.prepare();

/** One survey the person may see (read) or change (write); 404 when hidden, 403 read-only. */
export async function requireSurveyAccess(
	user: SessionUser,
	surveyId: string,
	need: 'read' | 'write' = 'read'
) {
	if (!uuidSchema.safeParse(surveyId).success) hide();
	const [row] = await surveyAccessRow.execute({
		surveyId,
		firmId: user.firmId,
		userId: user.id
	});
	if (!row) hide();
	const access = surveyAccess(user, {
		firmId: row.firmId,
		clientCompanyId: row.clientCompanyId,
		published: row.publishedAt !== null,
		actorAssigned: Number(row.assigned) === 1
	});
	demand(access, need);
	return { id: row.id, firmId: row.firmId, siteId: row.siteId, access };
}

/**
 * One finding or measure on the Ladder (policy/decide.ts ladderItemAccess): 404 when hidden; a
 * client of the survey's company asking for one their revision does not hold is told so (404
 * with words); `write` (decide and comment) is the client's, staff read (403 with words).
 */
export async function requireLadderItem(
	user: SessionUser,
	ref: ItemRef,
	need: 'read' | 'write' = 'read'
) {
	if (!uuidSchema.safeParse(ref.id).success) hide();
	const facts = await itemFacts(db, user.firmId, ref);
	if (!facts) hide();
	const survey = {
		firmId: facts.firmId,
		clientCompanyId: facts.clientCompanyId,
		published: facts.published,
		actorAssigned: false
	};
	const access = ladderItemAccess(user, { ...survey, shown: facts.shown });
	if (access === 'none') {
		if (user.role === 'client' && surveyAccess(user, survey) === 'read') {
			error(404, notShownMessage(ref));
		}
		hide();
	}
	if (need === 'write' && access !== 'write') {
		error(403, 'Decisions and comments here are the client’s: answer them at the Desk.');
	}
	return { ...facts, access };
}

/** Why a client's own published survey shows no such finding or measure. */
export function notShownMessage(ref: ItemRef): string {
	const what = ref.kind === 'finding' ? 'finding' : 'measure';
	return `This ${what} is not in the report published to you (a correction your consultant has not published yet may add it), so it cannot be opened or decided on yet.`;
}

/** One site the person may see (read) or change (write); 404 when hidden, 403 read-only. */
export async function requireSiteAccess(
	user: SessionUser,
	siteId: string,
	need: 'read' | 'write' = 'read'
) {
	if (!uuidSchema.safeParse(siteId).success) hide();
	const assigned = exists(
		db
			.select({ one: sql`1` })
			.from(surveys)
			.innerJoin(surveyAuditors, eq(surveyAuditors.surveyId, surveys.id))
			.where(and(eq(surveys.siteId, sites.id), eq(surveyAuditors.userId, user.id)))
	);
	const [row] = await db
		.select({
			id: sites.id,
			firmId: sites.firmId,
			clientCompanyId: sites.clientCompanyId,
			assigned: sql<number>`${assigned}`
		})
		.from(sites)
		.where(and(eq(sites.id, siteId), eq(sites.firmId, user.firmId)))
		.limit(1);
	if (!row) hide();
	const access = siteAccess(user, {
		firmId: row.firmId,
		clientCompanyId: row.clientCompanyId,
		actorAssigned: Number(row.assigned) === 1
	});
	demand(access, need);
	return { id: row.id, firmId: row.firmId, clientCompanyId: row.clientCompanyId, access };
}

/** Another person of the firm, for the people pages; 404 outside the firm. */
export async function requirePerson(
	user: SessionUser,
	personId: string,
	need: 'read' | 'write' = 'read'
) {
	if (!uuidSchema.safeParse(personId).success) hide();
	const [row] = await db
		.select(personColumns)
		.from(users)
		.where(and(eq(users.id, personId), eq(users.firmId, user.firmId)))
		.limit(1);
	if (!row) hide();
	const person = { ...row, role: row.role as Role };
	const access = personAccess(user, person);
	if (access === 'none') hide();
	if (need === 'write' && access !== 'write') {
		error(
			403,
			user.id === row.id
				? 'You cannot change your own role or access here.'
				: 'Only a firm admin can change this.'
		);
	}
	return person;
}

/** WHERE condition for listing surveys (join-free: usable on `surveys` alone). */
export function surveyScope(user: SessionUser): SQL {
	const firm = eq(surveys.firmId, user.firmId);
	switch (user.role) {
		case 'admin':
		case 'consultant':
			return firm;
		case 'auditor':
			return and(firm, assignedTo(user.id, surveys.id))!;
		case 'client':
			return and(
				firm,
				isNotNull(surveys.publishedAt),
				inArray(
					surveys.siteId,
					db
						.select({ id: sites.id })
						.from(sites)
						.where(eq(sites.clientCompanyId, user.clientCompanyId ?? ''))
				)
			)!;
	}
}

/** WHERE condition for listing sites (join-free: usable on `sites` alone). */
export function siteScope(user: SessionUser): SQL {
	const firm = eq(sites.firmId, user.firmId);
	switch (user.role) {
		case 'admin':
		case 'consultant':
			return firm;
		case 'auditor':
			return and(
				firm,
				exists(
					db
						.select({ one: sql`1` })
						.from(surveys)
						.innerJoin(surveyAuditors, eq(surveyAuditors.surveyId, surveys.id))
						.where(and(eq(surveys.siteId, sites.id), eq(surveyAuditors.userId, user.id)))
				)
			)!;
		case 'client':
			return and(firm, eq(sites.clientCompanyId, user.clientCompanyId ?? ''))!;
	}
}
