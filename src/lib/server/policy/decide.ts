/**
 * Tenancy decisions: given who is asking and the facts about one object, may they see it, and
 * may they change it? Pure functions over plain facts, so every rule is unit-tested; the
 * helpers in ../policy.ts load the facts from the database and turn "none" into 404.
 *
 * A firm is the tenant. Consultants and admins see their firm's work; auditors the surveys
 * they are assigned to; client users only published surveys of their own company's sites.
 */
import type { Role } from '../../schemas/roles';

/** The parts of the signed-in person the rules need. */
export interface Actor {
	id: string;
	firmId: string;
	role: Role;
	clientCompanyId: string | null;
}

/** none: pretend it does not exist (404); read: may look; write: may change. */
export type Access = 'none' | 'read' | 'write';

export interface SurveyFacts {
	firmId: string;
	/** The client company owning the survey's site. */
	clientCompanyId: string;
	published: boolean;
	/** Whether the actor is one of the survey's assigned auditors. */
	actorAssigned: boolean;
}

export function surveyAccess(actor: Actor, survey: SurveyFacts): Access {
	if (actor.firmId !== survey.firmId) return 'none';
	switch (actor.role) {
		case 'admin':
		case 'consultant':
			return 'write';
		case 'auditor':
			return survey.actorAssigned ? 'write' : 'none';
		case 'client':
			return survey.published && clientOwns(actor, survey.clientCompanyId) ? 'read' : 'none';
	}
}

export interface ItemFacts extends SurveyFacts {
	/** Whether the finding or measure is in what the client is shown (the last published revision). */
	shown: boolean;
}

/**
 * A finding or measure on the Ladder (docs/decisions.md): a client user of the company whose
 * published survey holds it, in the revision they are shown, may read it and decide on it and
 * comment ("write": their decisions and comments, never its figures); the firm's admins and
 * consultants preview it ("read"; they answer at the Desk); nobody else sees it.
 */
export function ladderItemAccess(actor: Actor, item: ItemFacts): Access {
	if (!item.shown || surveyAccess(actor, item) === 'none') return 'none';
	switch (actor.role) {
		case 'client':
			return 'write';
		case 'admin':
		case 'consultant':
			return 'read';
		case 'auditor':
			return 'none';
	}
}

export interface SiteFacts {
	firmId: string;
	clientCompanyId: string;
	/** Whether the actor is assigned to any survey of this site. */
	actorAssigned: boolean;
}

/**
 * Sites: staff manage them; an auditor sees a site (its header list, its traps) while assigned
 * to one of its surveys; a client user sees their own company's sites.
 */
export function siteAccess(actor: Actor, site: SiteFacts): Access {
	if (actor.firmId !== site.firmId) return 'none';
	switch (actor.role) {
		case 'admin':
		case 'consultant':
			return 'write';
		case 'auditor':
			return site.actorAssigned ? 'read' : 'none';
		case 'client':
			return clientOwns(actor, site.clientCompanyId) ? 'read' : 'none';
	}
}

export interface PersonFacts {
	id: string;
	firmId: string;
	role: Role;
}

/**
 * Another person's account: admins manage their firm's people, consultants see them; nobody
 * manages their own role or disables themselves here (that would lock a firm out).
 */
export function personAccess(actor: Actor, person: PersonFacts): Access {
	if (actor.firmId !== person.firmId) return 'none';
	if (actor.role === 'admin') return actor.id === person.id ? 'read' : 'write';
	if (actor.role === 'consultant') return 'read';
	return 'none';
}

function clientOwns(actor: Actor, clientCompanyId: string): boolean {
	return actor.clientCompanyId !== null && actor.clientCompanyId === clientCompanyId;
}
