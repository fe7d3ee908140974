/**
 * The pieces every authorization-matrix table file shares: who asks, what they get, and the
 * usual expectations. The table is split by area (authorization-matrix.*.ts) so each part of
 * the app keeps its own entries; authorization-matrix.table.ts gathers them.
 */
import type { Role } from '../../../src/lib/schemas/roles';
import type { Tenant } from './tenants';

export type Who = 'anonymous' | Role;
export type Outcome = 200 | 303 | 400 | 401 | 403 | 404 | 405 | 409 | 410 | 'signin';
export type Expectation = Outcome | { own: Outcome; other: Outcome };

export interface Case {
	request?: (t: Tenant) => { path?: string; form?: Record<string, string> };
	expect: Record<Who, Expectation>;
	/** The request ends the session it is made with (sign-out): the runner uses a spare one. */
	endsSessions?: boolean;
}

export const every = (o: Expectation): Record<Who, Expectation> => ({
	anonymous: o,
	admin: o,
	consultant: o,
	auditor: o,
	client: o
});
export const signedIn = (o: Expectation, anonymous: Outcome): Record<Who, Expectation> => ({
	...every(o),
	anonymous
});
export const deskPage: Record<Who, Expectation> = {
	anonymous: 'signin',
	admin: 200,
	consultant: 200,
	auditor: 403,
	client: 403
};
/** A Desk action on one of the firm's people or invitations: 404 across tenants. */
export const deskAction = (
	admin: Expectation,
	consultant: Expectation
): Record<Who, Expectation> => ({
	anonymous: 401,
	admin,
	consultant,
	auditor: 403,
	client: 403
});
export const mine = { own: 200, other: 404 } as const;
/** A page of the Walk beyond its prerendered start page: the hooks' gate for the Walk. */
export const walkShell: Record<Who, Expectation> = {
	anonymous: 'signin',
	admin: 200,
	consultant: 200,
	auditor: 200,
	client: 403
};
