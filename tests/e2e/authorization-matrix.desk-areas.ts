/**
 * Authorization matrix entries for the Desk's clients, sites, cost basis, headers and areas (see
 * authorization-matrix.table.ts). Reads are real page loads; every write is a form that fails
 * validation (400) so nothing accumulates however often it runs, and another firm's client or
 * site answers 404 before the form is even read.
 */
import { type Case, deskAction, deskPage, mine } from './support/matrix-kit';

/** Refused by validation in the person's own firm, unknown in the other. */
const ownBad = { own: 400, other: 404 } as const;
const siteWrite = deskAction(ownBad, ownBad);
const sitePage = { ...deskPage, admin: mine, consultant: mine };
const notAnId = { headerId: 'not-an-id', areaId: 'not-an-id' };

export const deskAreaMatrix: Record<string, Record<string, Case>> = {
	'/(desk)/desk/clients': {
		GET: { expect: deskPage },
		'POST ?/create': { request: () => ({ form: { name: '' } }), expect: deskAction(400, 400) }
	},
	'/(desk)/desk/clients/[clientId]': {
		GET: { request: (t) => ({ path: `/desk/clients/${t.clientId}` }), expect: sitePage },
		'POST ?/save': {
			request: (t) => ({ path: `/desk/clients/${t.clientId}`, form: { name: '' } }),
			expect: siteWrite
		},
		'POST ?/addSite': {
			request: (t) => ({
				path: `/desk/clients/${t.clientId}`,
				form: { name: '', currency: 'XYZ' }
			}),
			expect: siteWrite
		}
	},
	'/(desk)/desk/sites/[siteId]': {
		GET: { request: (t) => ({ path: `/desk/sites/${t.siteId}` }), expect: sitePage },
		'POST ?/save': {
			request: (t) => ({ path: `/desk/sites/${t.siteId}`, form: { name: '' } }),
			expect: siteWrite
		}
	},
	'/(desk)/desk/sites/[siteId]/cost-basis': {
		GET: { request: (t) => ({ path: `/desk/sites/${t.siteId}/cost-basis` }), expect: sitePage },
		'POST ?/save': {
			request: (t) => ({
				path: `/desk/sites/${t.siteId}/cost-basis`,
				form: { 'fuel.kind': 'natural-gas', boilerEfficiency: '150' }
			}),
			expect: siteWrite
		}
	},
	'/(desk)/desk/sites/[siteId]/headers': {
		GET: { request: (t) => ({ path: `/desk/sites/${t.siteId}/headers` }), expect: sitePage },
		'POST ?/add': {
			request: (t) => ({ path: `/desk/sites/${t.siteId}/headers`, form: { name: '' } }),
			expect: siteWrite
		},
		'POST ?/update': {
			request: (t) => ({ path: `/desk/sites/${t.siteId}/headers`, form: { ...notAnId, name: '' } }),
			expect: siteWrite
		},
		'POST ?/retire': {
			request: (t) => ({
				path: `/desk/sites/${t.siteId}/headers`,
				form: { headerId: 'not-an-id' }
			}),
			expect: siteWrite
		}
	},
	'/(desk)/desk/sites/[siteId]/areas': {
		GET: { request: (t) => ({ path: `/desk/sites/${t.siteId}/areas` }), expect: sitePage },
		'POST ?/add': {
			request: (t) => ({ path: `/desk/sites/${t.siteId}/areas`, form: { name: '' } }),
			expect: siteWrite
		},
		'POST ?/rename': {
			request: (t) => ({ path: `/desk/sites/${t.siteId}/areas`, form: { ...notAnId, name: '' } }),
			expect: siteWrite
		},
		'POST ?/retire': {
			request: (t) => ({ path: `/desk/sites/${t.siteId}/areas`, form: { areaId: 'not-an-id' } }),
			expect: siteWrite
		}
	}
};
