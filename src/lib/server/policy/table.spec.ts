import { describe, expect, it } from 'vitest';
import { roles, type Role } from '../../schemas/roles';
import { capabilities, gate, invitableRoles, publicRoutes, roleCan, ruleFor } from './table';

describe('capabilities', () => {
	it.each([
		['desk.open', ['admin', 'consultant']],
		['ladder.open', ['admin', 'consultant', 'client']],
		['walk.open', ['admin', 'consultant', 'auditor']],
		['people.view', ['admin', 'consultant']],
		['people.invite', ['admin', 'consultant']],
		['people.manage', ['admin']],
		['mailbox.read', ['admin']],
		['survey.record', ['admin', 'consultant', 'auditor']],
		['survey.manage', ['admin', 'consultant']],
		['survey.decide', ['client']]
	] as const)('%s is for %j only', (capability, allowed) => {
		for (const role of roles) {
			expect(roleCan(role, capability), `${role} → ${capability}`).toBe(
				(allowed as readonly Role[]).includes(role)
			);
		}
	});

	it('lets every role manage its own account and read (its own) surveys', () => {
		for (const role of roles) {
			expect(roleCan(role, 'account.own')).toBe(true);
			expect(roleCan(role, 'survey.read')).toBe(true);
		}
	});

	it('names only real roles', () => {
		for (const list of Object.values(capabilities)) {
			for (const role of list) expect(roles).toContain(role);
		}
	});
});

describe('invitations', () => {
	it('let admins hand out every role and consultants only auditor and client', () => {
		expect([...invitableRoles.admin].sort()).toEqual([...roles].sort());
		expect([...invitableRoles.consultant].sort()).toEqual(['auditor', 'client']);
		expect(invitableRoles.auditor).toEqual([]);
		expect(invitableRoles.client).toEqual([]);
	});
});

describe('route rules', () => {
	it('keeps sign-in, links, the landing page and health public', () => {
		for (const id of ['/', '/signin', '/password/forgot', '/invitation/[token]', '/api/health']) {
			expect(ruleFor(id)).toEqual({ access: 'public' });
			expect(publicRoutes.has(id)).toBe(true);
		}
	});

	it('closes routes nobody listed (deny by default)', () => {
		expect(ruleFor('/some/new/page')).toEqual({
			access: 'signed-in',
			capability: 'account.own',
			machine: false
		});
		expect(ruleFor('/api/sync')).toEqual({
			access: 'signed-in',
			capability: 'account.own',
			machine: true
		});
	});

	it('guards each surface group by its capability', () => {
		expect(ruleFor('/(desk)/desk/people')).toMatchObject({ capability: 'desk.open' });
		expect(ruleFor('/(ladder)/ladder')).toMatchObject({ capability: 'ladder.open' });
		expect(ruleFor('/(walk)/walk/survey/[id]')).toMatchObject({ capability: 'walk.open' });
	});

	it('lets no group prefix match a look-alike route', () => {
		expect(ruleFor('/(desk)x/desk')).toMatchObject({ capability: 'account.own' });
	});
});

describe('the gate', () => {
	const as = (role: Role) => ({ role });

	it('asks nobody for anything on public routes', () => {
		expect(gate(null, '/signin')).toEqual({ ok: true });
		expect(gate(null, null)).toEqual({ ok: true });
	});

	it('answers 401 to nobody, saying whether the route is for machines', () => {
		expect(gate(null, '/(desk)/desk')).toEqual({ ok: false, status: 401, machine: false });
		expect(gate(null, '/api/anything')).toEqual({ ok: false, status: 401, machine: true });
		expect(gate(null, '/account')).toEqual({ ok: false, status: 401, machine: false });
	});

	it('answers 403 to a role outside the area, in words', () => {
		expect(gate(as('auditor'), '/(desk)/desk')).toEqual({
			ok: false,
			status: 403,
			message: 'Desk is for consultants and firm admins.'
		});
		expect(gate(as('client'), '/(desk)/desk/people')).toMatchObject({ status: 403 });
		expect(gate(as('auditor'), '/(ladder)/ladder')).toMatchObject({ status: 403 });
		expect(gate(as('client'), '/(walk)/walk/x')).toMatchObject({ status: 403 });
	});

	it('lets each role into its own surfaces', () => {
		expect(gate(as('consultant'), '/(desk)/desk')).toEqual({ ok: true });
		expect(gate(as('client'), '/(ladder)/ladder')).toEqual({ ok: true });
		expect(gate(as('auditor'), '/(walk)/walk/x')).toEqual({ ok: true });
		expect(gate(as('client'), '/account')).toEqual({ ok: true });
	});
});
