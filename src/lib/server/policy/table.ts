/**
 * Who may do what: the one table every guard in the app reads. Pure data and pure functions
 * (no database, no framework), so it is unit-tested on its own and read by a security reviewer
 * in one sitting. Tenancy (which firm, which client company, which survey) is decided in
 * ./decide.ts; this file only says which roles may attempt a kind of action at all.
 */
import { roles, type Role } from '../../schemas/roles';

const staff = ['admin', 'consultant'] as const satisfies readonly Role[];

export const capabilities = {
	/** Desk: the consultant workspace (and firm settings for admins). */
	'desk.open': staff,
	/** Ladder: the client's ranked savings; consultants and admins preview it. */
	'ladder.open': ['admin', 'consultant', 'client'],
	/** Walk and its sync API: recording in the field. */
	'walk.open': ['admin', 'consultant', 'auditor'],
	/** Your own account: password, sessions. */
	'account.own': roles,
	/** See the firm's people and pending invitations. */
	'people.view': staff,
	/** Invite a person (which roles: see invitableRoles). */
	'people.invite': staff,
	/** Change a person's role, disable or re-enable them, revoke invitations of any role. */
	'people.manage': ['admin'],
	/** The development mailbox (messages the local SMTP fake received for this firm). */
	'mailbox.read': ['admin'],
	/** Read surveys (which ones: decide.ts). */
	'survey.read': roles,
	/** Record findings on a survey (auditors only on surveys they are assigned to). */
	'survey.record': ['admin', 'consultant', 'auditor'],
	/** Create, assign, review, price and publish surveys; edit sites and their cost basis. */
	'survey.manage': staff,
	/**
	 * Decide on published findings and measures (approve, schedule, mark repaired, decline) and
	 * comment on them in Ladder: a client's only writes (docs/decisions.md).
	 */
	'survey.decide': ['client']
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof capabilities;

export function roleCan(role: Role, capability: Capability): boolean {
	return (capabilities[capability] as readonly Role[]).includes(role);
}

/**
 * Which roles each role may hand out by invitation. A consultant brings in auditors and
 * client users for their work; only an admin creates consultants and other admins.
 */
export const invitableRoles: Record<Role, readonly Role[]> = {
	admin: roles,
	consultant: ['auditor', 'client'],
	auditor: [],
	client: []
};

/** How a route is guarded in hooks.server.ts, before any load or action runs. */
export type RouteRule =
	{ access: 'public' } | { access: 'signed-in'; capability: Capability; machine: boolean };

/**
 * Routes anyone may open. Everything else needs a signed-in person (deny by default), so a
 * new route is closed until someone decides otherwise here.
 */
export const publicRoutes: ReadonlySet<string> = new Set([
	'/',
	'/signin',
	'/signout',
	'/password/forgot',
	'/password/reset/[token]',
	'/invitation/[token]',
	'/offline',
	'/api/health',
	// The Walk is a prerendered shell without data; its data comes from guarded API routes.
	'/(walk)/walk'
]);

/** Route-id prefixes (SvelteKit route ids keep the (group) segments) and what they need. */
const areas: readonly { prefix: string; capability: Capability; machine: boolean }[] = [
	{ prefix: '/(desk)/', capability: 'desk.open', machine: false },
	{ prefix: '/(ladder)/', capability: 'ladder.open', machine: false },
	{ prefix: '/(walk)/', capability: 'walk.open', machine: false },
	{ prefix: '/api/', capability: 'account.own', machine: true }
];

/** The rule for a SvelteKit route id (null: no route matched, SvelteKit answers 404). */
export function ruleFor(routeId: string | null): RouteRule {
	if (routeId === null || publicRoutes.has(routeId)) return { access: 'public' };
	const area = areas.find((a) => routeId.startsWith(a.prefix));
	if (area) return { access: 'signed-in', capability: area.capability, machine: area.machine };
	return { access: 'signed-in', capability: 'account.own', machine: false };
}

export type Gate =
	| { ok: true }
	| { ok: false; status: 401; machine: boolean }
	| { ok: false; status: 403; message: string };

/** Whether a person (or nobody) may enter a route at all. */
export function gate(user: { role: Role } | null, routeId: string | null): Gate {
	const rule = ruleFor(routeId);
	if (rule.access === 'public') return { ok: true };
	if (!user) return { ok: false, status: 401, machine: rule.machine };
	if (!roleCan(user.role, rule.capability)) {
		return { ok: false, status: 403, message: refusal[rule.capability] ?? defaultRefusal };
	}
	return { ok: true };
}

const defaultRefusal = 'Your role does not give access to this page.';
const refusal: Partial<Record<Capability, string>> = {
	'desk.open': 'Desk is for consultants and firm admins.',
	'ladder.open': 'Ladder is for client users and their consultants.',
	'walk.open': 'The Walk is for auditors and consultants.'
};
