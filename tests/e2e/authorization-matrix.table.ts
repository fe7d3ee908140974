/**
 * The expected answers of every route, for every role and for nobody, against the person's own
 * firm ("own") and the other firm ("other"). authorization-matrix.e2e.ts reads the route tree
 * and fails for any route or form action missing here, so a new route is decided on, not
 * forgotten.
 *
 * Adding a route: add its route id (groups included, as in src/routes) with one entry per
 * operation ("GET", "POST" for a default action or endpoint, "POST ?/name" for a named action,
 * "PUT"… for endpoints). `request` builds the concrete request for a tenant's fixtures
 * (support/tenants.ts); `expect` gives the status per role, either one value or { own, other }.
 * 'signin' means a redirect to the sign-in page. Requests that change data must be harmless to
 * repeat (they run once per role and tenant).
 */
import { costsMatrix } from './authorization-matrix.costs';
import { decisionsMatrix } from './authorization-matrix.decisions';
import { deskAreaMatrix } from './authorization-matrix.desk-areas';
import { deskReviewMatrix } from './authorization-matrix.desk-review';
import { deskSurveysMatrix } from './authorization-matrix.desk-surveys';
import { publishMatrix } from './authorization-matrix.publish';
import { reportsMatrix } from './authorization-matrix.reports';
import { savingsMatrix } from './authorization-matrix.savings';
import {
	type Case,
	deskAction,
	deskPage,
	every,
	mine,
	signedIn,
	walkShell
} from './support/matrix-kit';

export type { Case, Expectation, Outcome, Who } from './support/matrix-kit';

const unknownFinding = '00000000-0000-4000-8000-000000000000';

/** 43 characters of the token alphabet that no link ever carried. */
const unknownToken = 'Zz0_'.repeat(10) + 'Zz0';
const newPassword = { password: 'a perfectly long password', confirm: 'a perfectly long password' };
let inviteCounter = 0;

export const matrix: Record<string, Record<string, Case>> = {
	'/': { GET: { expect: every(200) } },
	'/offline': { GET: { expect: every(200) } },
	'/(walk)/walk': { GET: { expect: every(200) } },
	'/api/health': { GET: { expect: every(200) } },
	// The Walk's survey pages are client-rendered shells with no data in them (the device
	// database fills them), so another firm's survey id reads the same empty shell.
	'/(walk)/walk/surveys/[surveyId]': {
		GET: { request: (t) => ({ path: `/walk/surveys/${t.surveyId}` }), expect: walkShell }
	},
	'/(walk)/walk/surveys/[surveyId]/findings/[findingId]': {
		GET: {
			request: (t) => ({ path: `/walk/surveys/${t.surveyId}/findings/${unknownFinding}` }),
			expect: walkShell
		}
	},
	'/(walk)/walk/surveys/[surveyId]/record/[kind]': {
		GET: {
			request: (t) => ({ path: `/walk/surveys/${t.surveyId}/record/trap` }),
			expect: walkShell
		}
	},

	'/signin': {
		GET: { expect: signedIn(303, 200) },
		// An empty form: refused before any password check, so it costs no attempt. A person
		// already signed in is sent home by the page's load, which runs after the action.
		POST: { request: () => ({ form: { email: '', password: '' } }), expect: signedIn(303, 400) }
	},
	'/signout': { POST: { expect: every(303), endsSessions: true } },
	'/password/forgot': {
		GET: { expect: every(200) },
		POST: { request: () => ({ form: { email: 'not an address' } }), expect: every(400) }
	},
	'/password/reset/[token]': {
		GET: { request: () => ({ path: `/password/reset/${unknownToken}` }), expect: every(404) },
		POST: {
			request: () => ({ path: `/password/reset/${unknownToken}`, form: newPassword }),
			expect: every(404)
		}
	},
	'/invitation/[token]': {
		GET: { request: () => ({ path: `/invitation/${unknownToken}` }), expect: every(404) },
		POST: {
			request: () => ({
				path: `/invitation/${unknownToken}`,
				form: { name: 'Someone', ...newPassword }
			}),
			expect: every(404)
		}
	},
	'/account': {
		GET: { expect: signedIn(200, 'signin') },
		// Fails validation (new password too short) before the current password is checked.
		'POST ?/changePassword': {
			request: () => ({ form: { current: 'x', password: 'short', confirm: 'short' } }),
			expect: signedIn(400, 401)
		},
		'POST ?/signOutEverywhere': { expect: signedIn(303, 401), endsSessions: true }
	},

	'/(desk)/desk': { GET: { expect: deskPage } },
	'/(desk)/desk/people': {
		GET: { expect: deskPage },
		// A client user for one of the tenant's client companies: unknown in the other firm.
		'POST ?/invite': {
			request: (t) => ({
				form: {
					email: `matrix.invite.${Date.now()}.${inviteCounter++}@example.test`,
					role: 'client',
					clientCompanyId: t.clientId
				}
			}),
			expect: deskAction({ own: 200, other: 400 }, { own: 200, other: 400 })
		},
		'POST ?/revoke': {
			request: (t) => ({ form: { invitationId: t.invitationId } }),
			expect: deskAction(mine, mine)
		},
		'POST ?/changeRole': {
			request: (t) => ({ form: { userId: t.targetUserId, role: 'auditor' } }),
			expect: deskAction(mine, 403)
		},
		'POST ?/disable': {
			request: (t) => ({ form: { userId: t.targetUserId } }),
			expect: deskAction(mine, 403)
		},
		'POST ?/enable': {
			request: (t) => ({ form: { userId: t.targetUserId } }),
			expect: deskAction(mine, 403)
		}
	},
	'/(desk)/desk/mailbox': {
		GET: { expect: { ...deskPage, consultant: 403 } }
	},
	'/(desk)/desk/mailbox/[id]': {
		GET: {
			request: (t) => ({ path: `/desk/mailbox/${t.messageId}` }),
			expect: { ...deskPage, admin: mine, consultant: 403 }
		}
	},

	// The Walk's data: any signed-in person may ask who they are; recording needs the role,
	// and a survey of another firm (or not assigned to this auditor) does not exist for them.
	'/api/me': { GET: { expect: signedIn(200, 401) } },
	'/api/surveys': {
		GET: { expect: { anonymous: 401, admin: 200, consultant: 200, auditor: 200, client: 403 } }
	},
	'/api/surveys/[id]/snapshot': {
		GET: {
			request: (t) => ({ path: `/api/surveys/${t.surveyId}/snapshot` }),
			expect: { anonymous: 401, admin: mine, consultant: mine, auditor: mine, client: 403 }
		}
	},

	// Sync (docs/sync.md): the matrix posts a form, which is no JSON batch: a 400 for those
	// who may push at all. Tenancy of pushed ids is covered by tests/integration/sync-push.spec.ts.
	'/api/sync/push': {
		POST: { expect: { anonymous: 401, admin: 400, consultant: 400, auditor: 400, client: 403 } }
	},
	'/api/sync/pull': {
		GET: {
			request: () => ({ path: '/api/sync/pull?since=0' }),
			expect: { anonymous: 401, admin: 200, consultant: 200, auditor: 200, client: 403 }
		}
	},

	// Photos: a PUT without the photo headers is a 400 for those who may record; reading an id
	// that is no photo of theirs is a 404. Tenancy of real photos: tests/integration/photos.spec.ts.
	'/api/photos/[id]': {
		PUT: {
			request: () => ({ path: '/api/photos/5e7a0099-0000-4000-8000-000000000001' }),
			expect: { anonymous: 401, admin: 400, consultant: 400, auditor: 400, client: 403 }
		},
		GET: {
			request: () => ({ path: '/api/photos/5e7a0099-0000-4000-8000-000000000001' }),
			expect: signedIn(404, 401)
		}
	},

	...deskAreaMatrix,
	...deskSurveysMatrix,
	...deskReviewMatrix,
	...savingsMatrix,
	...publishMatrix,
	...reportsMatrix,
	...costsMatrix,
	...decisionsMatrix,

	'/(ladder)/ladder': {
		GET: { expect: { anonymous: 'signin', admin: 200, consultant: 200, auditor: 403, client: 200 } }
	}
};

/** The URL path of a route id with no parameters: groups dropped. */
export function plainPath(routeId: string): string {
	return routeId.replace(/\/\([^)]+\)/g, '') || '/';
}
