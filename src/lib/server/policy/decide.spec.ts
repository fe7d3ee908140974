import { describe, expect, it } from 'vitest';
import type { Role } from '../../schemas/roles';
import { ladderItemAccess, personAccess, siteAccess, surveyAccess, type Actor } from './decide';

const firmA = 'firm-a';
const firmB = 'firm-b';
const dairy = 'client-dairy';
const brewery = 'client-brewery';

const actor = (role: Role, firmId = firmA, clientCompanyId: string | null = null): Actor => ({
	id: `user-${role}`,
	firmId,
	role,
	clientCompanyId: role === 'client' ? (clientCompanyId ?? dairy) : null
});

const survey = (o: Partial<Parameters<typeof surveyAccess>[1]> = {}) => ({
	firmId: firmA,
	clientCompanyId: dairy,
	published: false,
	actorAssigned: false,
	...o
});

describe('surveys', () => {
	it('give consultants and admins their whole firm', () => {
		expect(surveyAccess(actor('admin'), survey())).toBe('write');
		expect(surveyAccess(actor('consultant'), survey())).toBe('write');
	});

	it('give auditors only the surveys they are assigned to', () => {
		expect(surveyAccess(actor('auditor'), survey({ actorAssigned: true }))).toBe('write');
		expect(surveyAccess(actor('auditor'), survey({ actorAssigned: false }))).toBe('none');
		expect(surveyAccess(actor('auditor'), survey({ published: true }))).toBe('none');
	});

	it("give clients only published surveys of their own company's sites, read-only", () => {
		expect(surveyAccess(actor('client'), survey({ published: true }))).toBe('read');
		expect(surveyAccess(actor('client'), survey({ published: false }))).toBe('none');
		expect(
			surveyAccess(actor('client'), survey({ published: true, clientCompanyId: brewery }))
		).toBe('none');
		// Being listed as an auditor by mistake gives a client nothing more.
		expect(surveyAccess(actor('client'), survey({ actorAssigned: true }))).toBe('none');
	});

	it('give a client user without a company nothing', () => {
		const stray: Actor = { id: 'u', firmId: firmA, role: 'client', clientCompanyId: null };
		expect(surveyAccess(stray, survey({ published: true }))).toBe('none');
	});

	it('hide every survey of another firm from every role', () => {
		for (const role of ['admin', 'consultant', 'auditor', 'client'] as const) {
			const other = survey({ firmId: firmB, published: true, actorAssigned: true });
			expect(surveyAccess(actor(role), other), role).toBe('none');
		}
	});
});

describe('a finding or measure on the Ladder', () => {
	const item = (o: Partial<Parameters<typeof ladderItemAccess>[1]> = {}) => ({
		...survey({ published: true }),
		shown: true,
		...o
	});

	it("lets the company's client users decide and comment on what they are shown", () => {
		expect(ladderItemAccess(actor('client'), item())).toBe('write');
	});

	it('hides what is not published, not in the revision shown, or another company’s', () => {
		expect(ladderItemAccess(actor('client'), item({ published: false }))).toBe('none');
		expect(ladderItemAccess(actor('client'), item({ shown: false }))).toBe('none');
		expect(ladderItemAccess(actor('client'), item({ clientCompanyId: brewery }))).toBe('none');
	});

	it('lets the firm’s staff look (they answer at the Desk), auditors and other firms nothing', () => {
		expect(ladderItemAccess(actor('admin'), item())).toBe('read');
		expect(ladderItemAccess(actor('consultant'), item())).toBe('read');
		expect(ladderItemAccess(actor('consultant'), item({ shown: false }))).toBe('none');
		expect(ladderItemAccess(actor('auditor'), item({ actorAssigned: true }))).toBe('none');
		for (const role of ['admin', 'consultant', 'client'] as const) {
			expect(ladderItemAccess(actor(role), item({ firmId: firmB })), role).toBe('none');
		}
	});
});

describe('sites', () => {
	const site = (o: Partial<Parameters<typeof siteAccess>[1]> = {}) => ({
		firmId: firmA,
		clientCompanyId: dairy,
		actorAssigned: false,
		...o
	});

	it('let staff manage, assigned auditors and the owning client look', () => {
		expect(siteAccess(actor('consultant'), site())).toBe('write');
		expect(siteAccess(actor('admin'), site())).toBe('write');
		expect(siteAccess(actor('auditor'), site({ actorAssigned: true }))).toBe('read');
		expect(siteAccess(actor('auditor'), site())).toBe('none');
		expect(siteAccess(actor('client'), site())).toBe('read');
		expect(siteAccess(actor('client', firmA, brewery), site())).toBe('none');
	});

	it('hide other firms’ sites', () => {
		for (const role of ['admin', 'consultant', 'auditor', 'client'] as const) {
			expect(siteAccess(actor(role), site({ firmId: firmB, actorAssigned: true })), role).toBe(
				'none'
			);
		}
	});
});

describe('people', () => {
	const person = (role: Role, firmId = firmA) => ({ id: `p-${role}`, firmId, role });

	it('let admins manage others in their firm but not themselves', () => {
		expect(personAccess(actor('admin'), person('consultant'))).toBe('write');
		expect(personAccess(actor('admin'), person('admin'))).toBe('write');
		const self = actor('admin');
		expect(personAccess(self, { id: self.id, firmId: firmA, role: 'admin' })).toBe('read');
	});

	it('let consultants see, and nobody else anything', () => {
		expect(personAccess(actor('consultant'), person('auditor'))).toBe('read');
		expect(personAccess(actor('auditor'), person('consultant'))).toBe('none');
		expect(personAccess(actor('client'), person('consultant'))).toBe('none');
	});

	it('hide other firms’ people even from admins', () => {
		expect(personAccess(actor('admin'), person('auditor', firmB))).toBe('none');
	});
});
