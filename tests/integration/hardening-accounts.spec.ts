/**
 * Issue 14's account findings, each against the real database: sign-in counts failures only,
 * keeps a known browser in whatever others try, keys IPv6 by /64 and tells the account's owner
 * once; invitations answer and list alike for any address, are limited, and die with their
 * sender; reset links die with a password change and "sign out everywhere"; the sessions table
 * holds no token; the health answer says up or down to anyone and more only to admins.
 */
import { randomBytes, randomUUID } from 'node:crypto';
import type { Cookies } from '@sveltejs/kit';
import { and, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signIn } from '../../src/lib/server/auth/sign-in';
import { limitRules } from '../../src/lib/server/auth/limits';
import { hashPassword } from '../../src/lib/server/auth/password';
import {
	acceptInvitation,
	describeInvitation,
	invite,
	inviteLimitMessage,
	inviteLimits,
	openInvitations
} from '../../src/lib/server/auth/invitations';
import { changeRole, disablePerson } from '../../src/lib/server/auth/people';
import { changePassword } from '../../src/lib/server/auth/password-change';
import { requestReset } from '../../src/lib/server/auth/reset';
import {
	readSession,
	sessionIdFor,
	signOutEverywhere,
	startSession
} from '../../src/lib/server/auth/sessions';
import { lookUpToken, newToken } from '../../src/lib/server/auth/tokens';
import { db, pool } from '../../src/lib/server/db';
import {
	attemptCounters,
	auditLog,
	firms,
	sessions,
	tokens,
	users
} from '../../src/lib/server/db/schema';
import { firmMailbox, firmMessage } from '../../src/lib/server/mail/dev-mailbox';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { checkDatabase, healthAnswer } from '../../src/lib/server/health';
import { GET as healthRoute } from '../../src/routes/api/health/+server';
import { actions as acceptRoute } from '../../src/routes/invitation/[token]/+page.server';
import { adminA, adminB } from './demo-people';
import { captureMail, linkIn, type MailCapture } from './mail-capture';

let mail: MailCapture;
beforeAll(async () => {
	mail = await captureMail();
});
afterAll(async () => {
	await mail.close();
	await pool.end();
});

const [firmA, firmB] = demoFirms;
const password = 'a long and right password';
const origin = 'http://127.0.0.1:4180';
const run = randomBytes(2).toString('hex');
let n = 0;
/** An IPv6 address in a /64 of its own (documentation prefix, RFC 3849). */
const fresh64 = () => `2001:db8:${run}:${(++n).toString(16)}::1`;
const freshEmail = (what: string) => `${what}.${randomUUID()}@example.test`;

/** A person with a known password, made for one test. */
async function person(
	firmId: string,
	role: SessionUser['role'] = 'auditor',
	email = freshEmail(role)
): Promise<SessionUser> {
	const id = randomUUID();
	const name = `Test ${role} ${id.slice(0, 4)}`;
	await db
		.insert(users)
		.values({ id, firmId, email, name, role, passwordHash: await hashPassword(password) });
	return { id, firmId, email, name, role, clientCompanyId: null };
}

/** The cookies of one browser, as SvelteKit's Cookies (what the code under test reads and sets). */
function browser(): Cookies & { jar: Map<string, string> } {
	const jar = new Map<string, string>();
	return {
		jar,
		get: (name: string) => jar.get(name),
		getAll: () => [...jar].map(([name, value]) => ({ name, value })),
		set: (name: string, value: string, opts?: { maxAge?: number }) => {
			if (value === '' || opts?.maxAge === 0) jar.delete(name);
			else jar.set(name, value);
		},
		delete: (name: string) => void jar.delete(name),
		serialize: () => ''
	} as unknown as Cookies & { jar: Map<string, string> };
}

const attempt = (email: string, pw: string, address: string, device?: string, now?: Date) =>
	signIn({ email, password: pw, address, device, origin }, now);

async function counter(scope: string, subject: string) {
	const [row] = await db
		.select({ attempts: attemptCounters.attempts, at: attemptCounters.lastAttemptAt })
		.from(attemptCounters)
		.where(
			and(
				eq(attemptCounters.scope, scope),
				eq(attemptCounters.subjectHash, sql`SHA2(${subject}, 256)`)
			)
		);
	return row ?? null;
}

describe('sign-in lockout', () => {
	it("keeps a browser that signed in before in, whatever others' failures", async () => {
		const p = await person(firmA.id);
		const first = await attempt(p.email, password, fresh64());
		expect(first.kind).toBe('signed-in');
		const device = first.kind === 'signed-in' ? first.device : '';
		// Someone else guesses from address after address until new browsers must wait.
		for (let i = 0; i < 8; i++) await attempt(p.email, `guess ${i}`, fresh64());
		expect(await attempt(p.email, password, fresh64())).toMatchObject({ kind: 'throttled' });
		// The known browser still gets in, from anywhere.
		expect((await attempt(p.email, password, fresh64(), device)).kind).toBe('signed-in');
		// Its own typos count on its own: the attacker's count is untouched by them.
		const known = await attempt(p.email, 'my typo', fresh64(), device);
		expect(known.kind).toBe('mismatch');
		expect((await counter('sign-in:account', p.email))!.attempts).toBe(5);
	});

	it('trusts a device cookie only for the account it was issued for, and only if signed', async () => {
		const p = await person(firmA.id);
		const q = await person(firmA.id);
		const signed = await attempt(p.email, password, fresh64());
		const device = signed.kind === 'signed-in' ? signed.device : '';
		for (let i = 0; i < 5; i++) await attempt(q.email, 'guess', fresh64());
		// p's cookie does not vouch for q, nor does a cookie someone made up.
		expect((await attempt(q.email, password, fresh64(), device)).kind).toBe('throttled');
		const forged = `${randomBytes(16).toString('base64url')}.${randomBytes(32).toString('base64url')}`;
		expect((await attempt(q.email, password, fresh64(), forged)).kind).toBe('throttled');
	});

	it('never counts a correct sign-in, nor lets one prolong a wait', async () => {
		const address = fresh64();
		const key = `${address.split('::')[0]}::/64`;
		// The address has used its whole allowance, and its wait is over.
		const failures = limitRules['sign-in:address'].allowance;
		for (let i = 0; i < failures; i++) await attempt(freshEmail('spray'), 'guess', address);
		const locked = await counter('sign-in:address', key);
		expect(locked!.attempts).toBe(failures);
		await db
			.update(attemptCounters)
			.set({ lastAttemptAt: sql`${attemptCounters.lastAttemptAt} - INTERVAL 61 SECOND` })
			.where(eq(attemptCounters.subjectHash, sql`SHA2(${key}, 256)`));
		const before = await counter('sign-in:address', key);
		// Three people of that office sign in one after another from new browsers.
		for (let i = 0; i < 3; i++) {
			const p = await person(firmB.id);
			expect((await attempt(p.email, password, address)).kind, `person ${i + 1}`).toBe('signed-in');
		}
		expect(await counter('sign-in:address', key)).toEqual(before);
	});

	it('counts IPv6 addresses by their /64', async () => {
		const prefix = `2001:db8:${run}:f${(++n).toString(16)}`;
		const allowance = limitRules['sign-in:address'].allowance;
		for (let i = 1; i <= allowance; i++) {
			const r = await attempt(freshEmail('v6'), 'guess', `${prefix}::${i.toString(16)}`);
			expect(r.kind).toBe('mismatch');
		}
		// Any other address of that /64, however written, waits; the next /64 does not.
		for (const other of [`${prefix}:0:0:0:ffff`, `${prefix}:abcd:1234:5678:9abc`]) {
			expect((await attempt(freshEmail('v6'), 'guess', other)).kind).toBe('throttled');
		}
		expect((await attempt(freshEmail('v6'), 'guess', `${prefix}1::1`)).kind).toBe('mismatch');
	});

	it("tells the account's owner once per episode, not per failure", async () => {
		const p = await person(firmA.id);
		const t0 = new Date(Date.now() + 3600_000);
		for (let i = 0; i < 5; i++) await attempt(p.email, 'guess', fresh64(), undefined, t0);
		const warning = await mail.waitFor(p.email, /trying to sign in/);
		expect(warning.message.text).toContain('a wrong password for your Steamwisp account 5 times');
		expect(warning.message.text).toContain(`${origin}/password/forgot`);
		expect(warning.meta.firmId).toBe(firmA.id);
		// The attack goes on once the wait is over: no second message for the same episode.
		const later = new Date(t0.getTime() + 61_000);
		expect((await attempt(p.email, 'guess', fresh64(), undefined, later)).kind).toBe('mismatch');
		const alerts = await db
			.select()
			.from(auditLog)
			.where(and(eq(auditLog.entityId, p.id), eq(auditLog.action, 'sign-in-alert')));
		expect(alerts).toHaveLength(1);
		// Give a late second message the chance to arrive before counting.
		await new Promise((r) => setTimeout(r, 300));
		expect(await mail.to(p.email)).toHaveLength(1);
	});
});

describe('invitations', () => {
	// A firm of this run's own, so its limits meet no invitation of an earlier run or file.
	let ownFirm: string;
	let ownAdmin: SessionUser;
	beforeAll(async () => {
		ownFirm = randomUUID();
		await db.insert(firms).values({ id: ownFirm, name: `Invitation test firm ${run}` });
		ownAdmin = await person(ownFirm, 'admin');
	});

	it('answer and list the same for a new address and for another firm’s person', async () => {
		const outsider = await person(firmB.id, 'consultant');
		const newcomer = freshEmail('newcomer');
		const asked = { role: 'auditor' as const, clientCompanyId: null };
		const ctx = { origin, address: '127.0.0.1' };
		const a = await invite(ownAdmin, { email: newcomer, ...asked }, ctx);
		const b = await invite(ownAdmin, { email: outsider.email, ...asked }, ctx);
		expect(b).toEqual(a);
		expect(a).toEqual({ kind: 'sent' });

		const open = await openInvitations(ownFirm);
		const rowA = open.find((r) => r.email === newcomer);
		const rowB = open.find((r) => r.email === outsider.email);
		const shape = (r: typeof rowA) => ({ ...r, id: 'x', email: 'x', createdAt: 0, expiresAt: 0 });
		expect(rowA && rowB).toBeTruthy();
		expect(shape(rowB)).toEqual(shape(rowA));
		const audits = await db
			.select({ action: auditLog.action, entity: auditLog.entity, after: auditLog.after })
			.from(auditLog)
			.where(sql`${auditLog.entityId} IN (${rowA!.id}, ${rowB!.id})`);
		expect(audits).toHaveLength(2);
		expect(audits[0]).toEqual(audits[1]);

		// Only the owner of the existing account hears of it, and only in their own firm's mail.
		const told = await mail.waitFor(outsider.email, /About your invitation/);
		expect(told.message.text).not.toContain('/invitation/');
		expect(told.meta.firmId).toBe(firmB.id);
		await mail.waitFor(newcomer, /invited you/);
		const shown = (await firmMailbox(ownFirm)).flatMap((m) => m.rcptTo);
		expect(shown).toContain(newcomer);
		expect(shown).not.toContain(outsider.email);
	});

	it('keep a message out of the mailbox once its address is another firm’s person', async () => {
		const address = freshEmail('moved');
		await invite(
			ownAdmin,
			{ email: address, role: 'auditor', clientCompanyId: null },
			{
				origin,
				address: null
			}
		);
		const sent = await mail.waitFor(address, /invited you/);
		expect(await firmMessage(ownFirm, sent.meta.id)).not.toBeNull();
		await person(firmB.id, 'auditor', address);
		expect(await firmMessage(ownFirm, sent.meta.id)).toBeNull();
		expect((await firmMailbox(ownFirm)).map((m) => m.id)).not.toContain(sent.meta.id);
	});

	it('are limited per person and per address, with nothing sent past a limit', async () => {
		const ctx = { origin, address: null };
		const inviter = await person(ownFirm, 'consultant');
		const { max } = inviteLimits.person;
		for (let i = 0; i < max; i++) {
			const r = await invite(
				inviter,
				{ email: freshEmail(`crew${i}`), role: 'auditor', clientCompanyId: null },
				ctx
			);
			expect(r.kind, `invitation ${i + 1}`).toBe('sent');
		}
		const over = freshEmail('one-too-many');
		const refused = await invite(
			inviter,
			{ email: over, role: 'auditor', clientCompanyId: null },
			ctx
		);
		expect(refused).toMatchObject({ kind: 'limited', limit: 'person' });
		if (refused.kind !== 'limited') throw new Error('limited');
		expect(refused.waitMs).toBeGreaterThan(0);
		expect(refused.waitMs).toBeLessThanOrEqual(3600_000);
		expect(inviteLimitMessage('person', refused.waitMs)).toMatch(
			/^You have sent 20 invitations in the past hour, the most one person may send\. Nothing was sent; try again in \d+ minutes?\.$/
		);
		const kept = await db.select().from(tokens).where(eq(tokens.email, over));
		expect(kept).toEqual([]);

		// One address, invited again and again.
		const target = freshEmail('target');
		const other = await person(ownFirm, 'admin');
		for (let i = 0; i < inviteLimits.address.max; i++) {
			expect(
				(await invite(other, { email: target, role: 'auditor', clientCompanyId: null }, ctx)).kind
			).toBe('sent');
		}
		expect(
			await invite(other, { email: target, role: 'auditor', clientCompanyId: null }, ctx)
		).toMatchObject({
			kind: 'limited',
			limit: 'address'
		});
		await new Promise((r) => setTimeout(r, 300));
		expect(await mail.to(target)).toHaveLength(inviteLimits.address.max);
		expect(await mail.to(over)).toHaveLength(0);
	});

	it('are limited per firm', async () => {
		const firmId = randomUUID();
		await db.insert(firms).values({ id: firmId, name: `Limit test firm ${run}` });
		const admin = await person(firmId, 'admin');
		const colleague = await person(firmId, 'admin');
		// The firm's other people have sent its day's worth already.
		const earlier = Array.from({ length: inviteLimits.firm.max }, (_, i) => ({
			id: randomUUID(),
			firmId,
			purpose: 'invite',
			tokenHash: newToken().hash,
			email: `earlier.${i}.${run}@example.test`,
			role: 'auditor',
			createdBy: colleague.id,
			expiresAt: sql`NOW(3) + INTERVAL 7 DAY`
		}));
		await db.insert(tokens).values(earlier);
		const email = freshEmail('firm-over');
		const r = await invite(
			admin,
			{ email, role: 'auditor', clientCompanyId: null },
			{ origin, address: null }
		);
		expect(r).toMatchObject({ kind: 'limited', limit: 'firm' });
		expect(await db.select().from(tokens).where(eq(tokens.email, email))).toEqual([]);
	});

	it('die with their sender: revoked when the sender is disabled', async () => {
		const consultant = await person(ownFirm, 'consultant');
		const invitee = freshEmail('orphan');
		await invite(
			consultant,
			{ email: invitee, role: 'auditor', clientCompanyId: null },
			{ origin, address: null }
		);
		const link = linkIn((await mail.waitFor(invitee, /invited you/)).message.text, '/invitation/');
		const token = link.split('/invitation/')[1];
		expect((await describeInvitation(token)).state).toBe('valid');

		await disablePerson(ownAdmin, { ...consultant, disabledAt: null }, null);
		expect((await openInvitations(ownFirm)).map((r) => r.email)).not.toContain(invitee);
		expect(await acceptInvitation(token, { name: 'Orphan', password }, null)).toEqual({
			kind: 'dead',
			state: 'revoked'
		});
		expect(await db.select().from(users).where(eq(users.email, invitee))).toEqual([]);
	});

	it('are refused once the sender is no longer active, however that came about', async () => {
		const ctx = { origin, address: null };
		const disabled = await person(ownFirm, 'consultant');
		const demoted = await person(ownFirm, 'consultant');
		const [x, y] = [freshEmail('x'), freshEmail('y')];
		await invite(disabled, { email: x, role: 'auditor', clientCompanyId: null }, ctx);
		await invite(demoted, { email: y, role: 'auditor', clientCompanyId: null }, ctx);
		const tokenOf = async (to: string) =>
			linkIn((await mail.waitFor(to, /invited you/)).message.text, '/invitation/').split(
				'/invitation/'
			)[1];
		const [tx, ty] = [await tokenOf(x), await tokenOf(y)];
		// Disabled behind the app's back (a database edit), and moved to a role that may not invite.
		await db
			.update(users)
			.set({ disabledAt: sql`NOW(3)` })
			.where(eq(users.id, disabled.id));
		await changeRole(
			ownAdmin,
			{ ...demoted, disabledAt: null },
			{ role: 'auditor', clientCompanyId: null },
			null
		);

		for (const t of [tx, ty]) {
			expect((await describeInvitation(t)).state).toBe('revoked');
			expect(await acceptInvitation(t, { name: 'Nobody', password }, null)).toEqual({
				kind: 'dead',
				state: 'revoked'
			});
		}
		expect(
			await db
				.select()
				.from(users)
				.where(sql`${users.email} IN (${x}, ${y})`)
		).toEqual([]);
	});
});

describe('reset links', () => {
	async function resetLinkFor(p: SessionUser) {
		const r = await requestReset(p.email, { origin, address: fresh64() });
		expect(r.kind).toBe('done');
		await r.settled;
		const m = await mail.waitFor(p.email, /Choose a new Steamwisp password/);
		return linkIn(m.message.text, '/password/reset/').split('/password/reset/')[1];
	}

	it('are withdrawn when the password is changed', async () => {
		const p = await person(firmA.id);
		const token = await resetLinkFor(p);
		expect((await lookUpToken(token, 'password-reset')).state).toBe('valid');
		const changed = await changePassword(p, password, 'another long password', {
			origin,
			address: '127.0.0.1'
		});
		expect(changed).toEqual({ kind: 'changed' });
		expect((await lookUpToken(token, 'password-reset')).state).toBe('revoked');
	});

	it('are withdrawn, with every session, when signing out everywhere', async () => {
		const p = await person(firmA.id);
		const token = await resetLinkFor(p);
		const jar = browser();
		await startSession(jar, p.id, 'test');
		await signOutEverywhere(p, '127.0.0.1');
		expect((await lookUpToken(token, 'password-reset')).state).toBe('revoked');
		expect(await readSession(jar)).toBeNull();
	});

	it('are asked for with an answer that waits for no account work', async () => {
		const known = await person(firmA.id);
		for (const email of [known.email, freshEmail('nobody')]) {
			const r = await requestReset(email, { origin, address: fresh64() });
			expect(r.kind).toBe('done');
			// The answer is given while the account is still to be looked up.
			const first = await Promise.race([
				r.settled.then(() => 'settled'),
				Promise.resolve('answered')
			]);
			expect(first).toBe('answered');
			await r.settled;
		}
		await mail.waitFor(known.email, /Choose a new Steamwisp password/);
		const issued = await db
			.select()
			.from(tokens)
			.where(and(eq(tokens.email, known.email), eq(tokens.purpose, 'password-reset')));
		expect(issued).toHaveLength(1);
	});
});

describe('names', () => {
	it('with direction or line-break characters are refused, and the invitation keeps', async () => {
		const invitee = freshEmail('bidi');
		const { token, hash } = newToken();
		await db.insert(tokens).values({
			id: randomUUID(),
			firmId: firmA.id,
			purpose: 'invite',
			tokenHash: hash,
			email: invitee,
			role: 'auditor',
			createdBy: adminA.id,
			expiresAt: sql`NOW(3) + INTERVAL 1 HOUR`
		});
		for (const [name, code] of [
			['Ines \u202Erofako', 'U+202E'],
			['\u2067Ines\u2069 Okafor', 'U+2067'],
			['Ines\u2028Bcc: x@example.test', 'U+2028']
		]) {
			const request = new Request(`${origin}/invitation/${token}`, {
				method: 'POST',
				body: new URLSearchParams({ name, password, confirm: password })
			});
			const answer = (await acceptRoute.default({
				request,
				params: { token },
				getClientAddress: () => '127.0.0.1'
			} as unknown as Parameters<typeof acceptRoute.default>[0])) as {
				status: number;
				data: { errors: Record<string, string> };
			};
			expect(answer.status).toBe(400);
			expect(answer.data.errors.name).toContain(`(${code})`);
		}
		expect(await db.select().from(users).where(eq(users.email, invitee))).toEqual([]);
		expect((await lookUpToken(token, 'invite')).state).toBe('valid');
	});
});

describe('sessions', () => {
	it('keep only a hash of the token in the table, and open only with the token', async () => {
		const p = await person(firmB.id);
		const jar = browser();
		const token = await startSession(jar, p.id, 'test');
		expect(jar.get('steamwisp_session')).toBe(token);
		const rows = await db.select().from(sessions).where(eq(sessions.userId, p.id));
		expect(rows).toHaveLength(1);
		expect(rows[0].id).toBe(sessionIdFor(token));
		expect(rows[0].id).toMatch(/^[0-9a-f]{64}$/);
		const [raw] = await db.execute(
			sql`SELECT COUNT(*) AS n FROM sessions WHERE id = ${token} OR user_agent LIKE ${`%${token}%`}`
		);
		expect(Number((raw as unknown as { n: number }[])[0].n)).toBe(0);

		expect((await readSession(jar))?.user.id).toBe(p.id);
		// The stored id is worth nothing as a cookie.
		const thief = browser();
		thief.set('steamwisp_session', rows[0].id, { path: '/' });
		expect(await readSession(thief)).toBeNull();
	});
});

describe('the health answer', () => {
	it('says up or down to anyone, and the details to a signed-in admin only', async () => {
		const database = await checkDatabase(db);
		expect(healthAnswer(database, '1.2.3', null)).toEqual({ status: 'ok' });
		expect(healthAnswer(database, '1.2.3', { role: 'consultant' })).toEqual({ status: 'ok' });
		expect(healthAnswer({ up: false, latencyMs: 3, error: 'x' }, '1.2.3', null)).toEqual({
			status: 'degraded'
		});
		const admin = healthAnswer(database, '1.2.3', { role: 'admin' });
		expect(admin).toMatchObject({ status: 'ok', version: '1.2.3', database: { up: true } });

		const call = (user: SessionUser | null) =>
			healthRoute({ locals: { user, session: null } } as Parameters<typeof healthRoute>[0]);
		const anonymous = await call(null);
		expect(anonymous.status).toBe(200);
		expect(await anonymous.json()).toEqual({ status: 'ok' });
		const details = await (await call(adminB)).json();
		expect(details.database.migrations).toBeGreaterThan(0);
		expect(details.version).toMatch(/^\d+\.\d+\.\d+/);
	});
});
