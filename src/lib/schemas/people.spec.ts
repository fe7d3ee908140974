import { describe, expect, it } from 'vitest';
import { changeRoleSchema, inviteSchema } from './people';

const company = '5e7a0002-0000-4000-8000-000000000001';

describe('invitation form', () => {
	it('normalises the address and drops a company for staff roles', () => {
		const r = inviteSchema.parse({
			email: ' New.Person@Example.TEST ',
			role: 'consultant',
			clientCompanyId: company
		});
		expect(r).toEqual({
			email: 'new.person@example.test',
			role: 'consultant',
			clientCompanyId: null
		});
	});

	it('needs a client company for a client user', () => {
		const r = inviteSchema.safeParse({
			email: 'a@example.test',
			role: 'client',
			clientCompanyId: ''
		});
		expect(r.success).toBe(false);
		expect(r.error!.issues[0].message).toBe(
			'A client user belongs to one client company: choose it.'
		);
	});

	it('keeps the company of a client user', () => {
		const r = inviteSchema.parse({
			email: 'a@example.test',
			role: 'client',
			clientCompanyId: company
		});
		expect(r.clientCompanyId).toBe(company);
	});

	it('refuses an unknown role in words', () => {
		const r = inviteSchema.safeParse({ email: 'a@example.test', role: 'owner' });
		expect(r.error!.issues[0].message).toBe('Choose a role: admin, consultant, auditor or client.');
	});

	it('refuses a company id that is not an id', () => {
		const r = changeRoleSchema.safeParse({
			userId: company,
			role: 'client',
			clientCompanyId: "1' OR '1'='1"
		});
		expect(r.success).toBe(false);
	});
});
