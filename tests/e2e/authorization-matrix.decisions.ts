/**
 * Authorization matrix entries for the client's decisions and comments (docs/decisions.md; see
 * authorization-matrix.table.ts). Every write here is refused before anything is written, so
 * it is harmless to repeat: a decision on another client company's finding or measure (the
 * brewhouse survey's: the demo client gets 404, as does everyone of the other firm), a comment
 * or an answer over the limit on the tenant's own published item (400). Staff never decide or
 * comment on the Ladder (403): they answer at the Desk. Decisions that are written, and every
 * refusal's "nothing written": tests/integration/decisions.spec.ts.
 */
import { COMMENT_MAX } from '../../src/lib/schemas/decisions';
import { type Case, deskAction, deskPage, mine } from './support/matrix-kit';

const oversized = 'x'.repeat(COMMENT_MAX + 1);
/** A client's write on the Ladder: the gate answers nobody (401) and auditors (403) first. */
const clientWrite = (client: Case['expect']['client']): Case['expect'] => ({
	anonymous: 401,
	admin: 403,
	consultant: 403,
	auditor: 403,
	client
});
const ladderPage: Case['expect'] = {
	anonymous: 'signin',
	admin: mine,
	consultant: mine,
	auditor: 403,
	client: mine
};

export const decisionsMatrix: Record<string, Record<string, Case>> = {
	'/(ladder)/ladder/findings/[findingId]': {
		GET: {
			request: (t) => ({ path: `/ladder/findings/${t.decisionFindingId}` }),
			expect: ladderPage
		},
		'POST ?/decide': {
			request: (t) => ({ path: `/ladder/findings/${t.findingId}`, form: { decision: 'approved' } }),
			expect: clientWrite(404)
		},
		'POST ?/comment': {
			request: (t) => ({
				path: `/ladder/findings/${t.decisionFindingId}`,
				form: { body: oversized }
			}),
			expect: clientWrite({ own: 400, other: 404 })
		}
	},
	'/(ladder)/ladder/measures/[measureId]': {
		GET: {
			request: (t) => ({ path: `/ladder/measures/${t.decisionMeasureId}` }),
			expect: ladderPage
		},
		'POST ?/decide': {
			request: (t) => ({ path: `/ladder/measures/${t.measureId}`, form: { decision: 'approved' } }),
			expect: clientWrite(404)
		},
		'POST ?/comment': {
			request: (t) => ({
				path: `/ladder/measures/${t.decisionMeasureId}`,
				form: { body: oversized }
			}),
			expect: clientWrite({ own: 400, other: 404 })
		}
	},
	'/(desk)/desk/surveys/[surveyId]/decisions': {
		GET: {
			request: (t) => ({ path: `/desk/surveys/${t.decisionSurveyId}/decisions` }),
			expect: { ...deskPage, admin: mine, consultant: mine }
		},
		'POST ?/answer': {
			request: (t) => ({
				path: `/desk/surveys/${t.decisionSurveyId}/decisions`,
				form: { kind: 'finding', itemId: t.decisionFindingId, body: oversized }
			}),
			expect: deskAction({ own: 400, other: 404 }, { own: 400, other: 404 })
		}
	}
};
