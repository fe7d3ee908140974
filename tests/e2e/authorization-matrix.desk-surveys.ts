/** Authorization matrix entries for the Desk's surveys, auditors and sync state (see authorization-matrix.table.ts). */
import { type Case, deskAction, deskPage, mine } from './support/matrix-kit';

/**
 * Each action's request fails validation (400) once the survey is found, so repeating it
 * changes nothing; the survey is looked up first, so another firm's id answers 404.
 */
const refusedOnOwn = { own: 400, other: 404 } as const;

const surveyAction = (form: Record<string, string>): Case => ({
	request: (t) => ({ path: `/desk/surveys/${t.surveyId}`, form }),
	expect: deskAction(refusedOnOwn, refusedOnOwn)
});

export const deskSurveysMatrix: Record<string, Record<string, Case>> = {
	'/(desk)/desk/surveys/new': {
		// Another firm's site in ?site= is simply not preselected.
		GET: { request: (t) => ({ path: `/desk/surveys/new?site=${t.siteId}` }), expect: deskPage },
		// No name and no dates: refused before the site is looked at, for either firm's site.
		POST: {
			request: (t) => ({
				path: '/desk/surveys/new',
				form: { siteId: t.siteId, name: '', startsOn: '', endsOn: '' }
			}),
			expect: deskAction(400, 400)
		}
	},
	'/(desk)/desk/surveys/[surveyId]': {
		GET: {
			request: (t) => ({ path: `/desk/surveys/${t.surveyId}` }),
			expect: { ...deskPage, admin: mine, consultant: mine }
		},
		'POST ?/details': surveyAction({ name: '', startsOn: '2026-12-02', endsOn: '2026-12-01' }),
		'POST ?/stage': surveyAction({ stage: 'somewhere' }),
		'POST ?/assign': surveyAction({}),
		'POST ?/unassign': surveyAction({ userId: '' }),
		'POST ?/markReviewed': surveyAction({ mark: '' })
	}
};
