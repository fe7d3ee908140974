/**
 * The authorization matrix: every route the app has (read from src/routes), every operation,
 * every role and nobody, against the person's own firm and the other firm. Each answer must be
 * the expected one in authorization-matrix.table.ts, never a 500, and carry no text of a firm
 * (or, for client users and auditors, of parts of their own firm) they may not see.
 */
import { expect, test, type APIRequestContext } from '@playwright/test';
import {
	matrix,
	plainPath,
	type Case,
	type Expectation,
	type Who
} from './authorization-matrix.table';
import { openTestDb, rows, type Db } from './support/db';
import { actionNames, appRoutes, serverMethods } from './support/routes';
import { anonymous, formHeaders, signedIn } from './support/sessions';
import { prepareTenants, type Tenant } from './support/tenants';

interface Actor {
	who: Who;
	email: string | null;
	tenant: Tenant;
	other: Tenant;
	context: APIRequestContext;
}

let db: Db;
let tenants: [Tenant, Tenant];
const actors: Actor[] = [];

test.beforeAll(async () => {
	db = openTestDb();
	tenants = await prepareTenants(db);
	for (const [tenant, other] of [tenants, [tenants[1], tenants[0]]] as const) {
		for (const user of tenant.users) {
			actors.push({
				who: user.role,
				email: user.email,
				tenant,
				other,
				context: await signedIn(user.email)
			});
		}
	}
	actors.push({
		who: 'anonymous',
		email: null,
		tenant: tenants[0],
		other: tenants[1],
		context: await anonymous()
	});
});

test.afterAll(async () => {
	for (const a of actors) await a.context.dispose();
	await db?.end();
});

test('every route and operation of the app has an entry, and every entry a route', () => {
	const discovered = appRoutes().flatMap((r) => r.operations.map((op) => `${r.id} ${op}`));
	const listed = Object.entries(matrix).flatMap(([id, ops]) =>
		Object.keys(ops).map((op) => `${id} ${op}`)
	);
	expect(discovered.length).toBeGreaterThan(15);
	expect(
		discovered.filter((d) => !listed.includes(d)),
		'routes missing from the matrix'
	).toEqual([]);
	expect(
		listed.filter((l) => !discovered.includes(l)),
		'matrix entries with no route'
	).toEqual([]);
});

test('the route reader finds form actions and endpoint methods', () => {
	const page = `
		import type { Actions } from './$types';
		export const actions: Actions = {
			// a comment { with: braces }
			invite: async (event) => { const o = { nested: 1 }; return o; },
			'quoted': async () => ({ s: 'a, b: c' }),
			async revoke(event) { return { ok: [1, 2] }; },
			default: async () => {}
		} satisfies Actions;`;
	expect(actionNames(page)).toEqual(['invite', 'quoted', 'revoke', 'default']);
	expect(actionNames('export const load = () => ({});')).toEqual([]);
	const server = `export const GET = () => x; export async function POST() {}; const PUT = 1; export { PUT as PATCH };`;
	expect(serverMethods(server).sort()).toEqual(['GET', 'PATCH', 'POST']);
});

for (const [routeId, operations] of Object.entries(matrix)) {
	for (const [operation, spec] of Object.entries(operations)) {
		test(`${operation} ${routeId}`, async () => {
			const problems: string[] = [];
			for (const actor of actors) {
				for (const side of ['own', 'other'] as const) {
					const tenant = side === 'own' ? actor.tenant : actor.other;
					problems.push(...(await check(actor, side, tenant, operation, routeId, spec)));
				}
			}
			expect(problems, `${operation} ${routeId}`).toEqual([]);
		});
	}
}

test('no request crossed a tenant in the audit log', async () => {
	const crossed = await rows<{ action: string }>(
		db,
		`SELECT a.action FROM audit_log a
		 JOIN users actor ON actor.id = a.actor_id
		 LEFT JOIN users person ON a.entity = 'user' AND person.id = a.entity_id
		 LEFT JOIN tokens invitation ON a.entity = 'invitation' AND invitation.id = a.entity_id
		 WHERE (person.id IS NOT NULL AND person.firm_id <> actor.firm_id)
		    OR (invitation.id IS NOT NULL AND invitation.firm_id <> actor.firm_id)`
	);
	expect(crossed).toEqual([]);
	// Both admins did act on their own firm's people during the matrix: the query can see rows.
	const [{ n }] = await rows<{ n: number }>(
		db,
		`SELECT COUNT(*) AS n FROM audit_log WHERE action = 'disable' AND entity_id IN (?, ?)`,
		[tenants[0].targetUserId, tenants[1].targetUserId]
	);
	expect(Number(n)).toBeGreaterThanOrEqual(2);
});

test('methods a route does not declare are refused with a 4xx, never a 500', async () => {
	const problems: string[] = [];
	// Prerendered pages are static files: the file server answers every method with the file,
	// and no code of ours runs, so there is nothing to refuse.
	for (const route of appRoutes().filter((r) => !r.prerendered)) {
		const spec = matrix[route.id]?.GET ?? Object.values(matrix[route.id] ?? {})[0];
		const path = spec?.request?.(tenants[0]).path ?? plainPath(route.id);
		for (const method of ['PUT', 'PATCH', 'DELETE']) {
			if (route.operations.includes(method)) continue;
			for (const actor of actors) {
				const res = await actor.context.fetch(path, {
					method,
					headers: formHeaders(),
					form: { x: '1' },
					maxRedirects: 0
				});
				if (res.status() < 400 || res.status() >= 500) {
					problems.push(`${method} ${path} as ${actor.email ?? 'nobody'} → ${res.status()}`);
				}
			}
		}
	}
	expect(problems).toEqual([]);
});

async function check(
	actor: Actor,
	side: 'own' | 'other',
	tenant: Tenant,
	operation: string,
	routeId: string,
	spec: Case
): Promise<string[]> {
	const [method, action] = operation.split(' ');
	const built = spec.request?.(tenant) ?? {};
	const path = (built.path ?? plainPath(routeId)) + (action ?? '');
	let context = actor.context;
	// Sign-out ends the session it is sent with: use a spare session and keep the actor's own.
	const spare = spec.endsSessions && actor.email ? await signedIn(actor.email) : null;
	if (spare) context = spare;
	const res = await context.fetch(path, {
		method,
		headers: method === 'GET' ? {} : formHeaders(),
		form: method === 'GET' ? undefined : (built.form ?? {}),
		maxRedirects: 0
	});
	const body = await res.text();
	await spare?.dispose();
	if (spec.endsSessions && actor.email) {
		// "Sign out everywhere" ended the actor's own session as well.
		await actor.context.dispose();
		actor.context = await signedIn(actor.email);
	}

	const who = `${actor.who} of ${actor.tenant.firmName} on ${side} tenant`;
	const problems: string[] = [];
	const wanted = expected(spec.expect[actor.who], side);
	const status = res.status();
	if (status >= 500) problems.push(`${who}: server error ${status}`);
	if (wanted === 'signin') {
		const location = res.headers()['location'] ?? '';
		if (status !== 303 || !location.startsWith('/signin?next=')) {
			problems.push(`${who}: wanted a redirect to sign-in, got ${status} ${location}`);
		}
	} else if (status !== wanted) {
		problems.push(`${who}: wanted ${wanted}, got ${status}`);
	}
	const sent = `${path} ${JSON.stringify(built.form ?? {})}`;
	for (const marker of forbidden(actor)) {
		if (!sent.includes(marker) && body.includes(marker)) {
			problems.push(`${who}: answer shows "${marker}", which is not theirs to see`);
		}
	}
	return problems;
}

function expected(e: Expectation, side: 'own' | 'other') {
	return typeof e === 'object' ? e[side] : e;
}

/** What must never appear in an answer to this actor. */
function forbidden(actor: Actor): string[] {
	if (actor.who === 'anonymous') return [...tenants[0].markers, ...tenants[1].markers];
	const list = [...actor.other.markers];
	if (actor.who === 'client') list.push(...actor.tenant.hiddenFromClient);
	if (actor.who === 'auditor') list.push(...actor.tenant.hiddenFromAuditor);
	return list;
}
