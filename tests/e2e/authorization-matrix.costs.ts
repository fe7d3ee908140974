/**
 * Authorization matrix entries for the cost library, pricing repairs, a finding's repair cost
 * and measures (see authorization-matrix.table.ts, docs/costs.md). Every post fails validation
 * (400) once its survey or measure is found — or is refused because the brewhouse survey is
 * published (409) — so repeating it changes nothing; another firm's survey, finding and measure
 * ids answer 404. What the writes do: tests/integration/costs.spec.ts and measures.spec.ts.
 */
import { type Case, deskAction, deskPage, mine } from './support/matrix-kit';
import type { Tenant } from './support/tenants';

const post = (
	path: (t: Tenant) => string,
	form: Record<string, string>,
	own: 400 | 409 = 400
): Case => ({
	request: (t) => ({ path: path(t), form }),
	expect: deskAction({ own, other: 404 }, { own, other: 404 })
});

const measures = (t: Tenant) => `/desk/surveys/${t.surveyId}/measures`;
const measure = (t: Tenant) => `/desk/surveys/${t.findingSurveyId}/measures/${t.measureId}`;
const finding = (t: Tenant) => `/desk/surveys/${t.findingSurveyId}/findings/${t.findingId}`;

export const costsMatrix: Record<string, Record<string, Case>> = {
	// The library is the firm's own: nobody names another firm's; a bad entry is a 400 for staff.
	'/(desk)/desk/costs': {
		GET: { expect: deskPage },
		'POST ?/save': {
			request: () => ({
				path: '/desk/costs',
				form: { kind: 'leak-repair', sizeClass: 'medium', currency: 'EUR', unitCost: 'twelve' }
			}),
			expect: deskAction(400, 400)
		},
		'POST ?/retire': {
			request: () => ({ path: '/desk/costs', form: { entryId: 'not-an-id', version: '1' } }),
			expect: deskAction(400, 400)
		}
	},
	'/(desk)/desk/surveys/[surveyId]/measures': {
		GET: {
			request: (t) => ({ path: measures(t) }),
			expect: { ...deskPage, admin: mine, consultant: mine }
		},
		'POST ?/price': post(measures, { overwrite: 'everything' }),
		'POST ?/create': post(measures, { name: '' })
	},
	'/(desk)/desk/surveys/[surveyId]/measures/[measureId]': {
		GET: {
			request: (t) => ({ path: measure(t) }),
			expect: { ...deskPage, admin: mine, consultant: mine }
		},
		'POST ?/update': post(measure, { name: '' }),
		'POST ?/remove': post(measure, {}),
		// The brewhouse survey is published: deleting its measure is refused, nothing changes.
		'POST ?/delete': post(measure, {}, 409)
	}
};

/**
 * A finding's repair cost (the finding detail's route, whose other operations are in
 * authorization-matrix.desk-review.ts): a quote without its reference is refused field by field.
 */
export const findingCostOperations: Record<string, Case> = {
	'POST ?/cost': post(finding, { source: 'quote', amount: '12', note: '' })
};
