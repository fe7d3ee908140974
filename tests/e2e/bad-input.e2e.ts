/**
 * Bad input gets a clear 4xx and writes nothing: wrong content types, malformed and oversized
 * bodies, tampered forms, cross-site posts; expired, withdrawn, unknown and reused links.
 */
import { expect, test, type APIRequestContext } from '@playwright/test';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { openTestDb, rows, writeCounts, type Db } from './support/db';
import { appOrigin } from './support/servers';
import { anonymous, formHeaders, signedIn } from './support/sessions';
import { insertToken, insertUser } from './support/tokens';

const firm = demoFirms[0].id;
const stamp = Date.now();
const goodPassword = {
	password: 'a perfectly long password',
	confirm: 'a perfectly long password'
};

let db: Db;
let nobody: APIRequestContext;
let admin: APIRequestContext;
let invitation: { id: string; token: string };

test.beforeAll(async () => {
	db = openTestDb();
	nobody = await anonymous();
	admin = await signedIn('admin@cinderbrook.example');
	invitation = await insertToken(db, {
		purpose: 'invite',
		firmId: firm,
		email: `bad.input.invitee.${stamp}@example.test`,
		role: 'auditor'
	});
});

test.afterAll(async () => {
	await nobody?.dispose();
	await admin?.dispose();
	await db?.end();
});

interface FormPost {
	name: string;
	who: APIRequestContext;
	path: string;
	fields: Record<string, string>;
}

/** The form posts people make, with a valid sample body each. */
const forms = (): FormPost[] => [
	{
		name: 'sign-in',
		who: nobody,
		path: '/signin',
		fields: { email: 'x@example.test', password: 'p' }
	},
	{ name: 'forgot', who: nobody, path: '/password/forgot', fields: { email: 'x@example.test' } },
	{
		name: 'invitation',
		who: nobody,
		path: `/invitation/${invitation.token}`,
		fields: { name: 'Someone', ...goodPassword }
	},
	{
		name: 'change password',
		who: admin,
		path: '/account?/changePassword',
		fields: { current: 'wrong', ...goodPassword }
	},
	{
		name: 'invite',
		who: admin,
		path: '/desk/people?/invite',
		fields: { email: `bad.input.${stamp}@example.test`, role: 'auditor' }
	}
];

async function unchanged(run: () => Promise<void>) {
	const before = await writeCounts(db);
	await run();
	expect(await writeCounts(db)).toEqual(before);
}

test('wrong content types are refused with 415', async () => {
	await unchanged(async () => {
		for (const f of forms()) {
			const res = await f.who.post(f.path, {
				data: JSON.stringify(f.fields),
				headers: { ...formHeaders(), 'content-type': 'application/json' },
				maxRedirects: 0
			});
			expect(res.status(), f.name).toBe(415);
			expect(await res.text(), f.name).toContain('Not a form this page accepts');
		}
	});
});

test('oversized bodies are refused with 413', async () => {
	await unchanged(async () => {
		for (const f of forms()) {
			const res = await f.who.post(f.path, {
				form: { ...f.fields, padding: 'x'.repeat(600 * 1024) },
				headers: formHeaders(),
				maxRedirects: 0
			});
			expect(res.status(), f.name).toBe(413);
			expect(await res.text(), f.name).toContain('too large');
		}
	});
});

test('malformed and tampered forms are refused with 400 and say why', async () => {
	await unchanged(async () => {
		for (const f of forms()) {
			const broken = await f.who.post(f.path, {
				data: '--nope\r\nContent-Disposition: form-data; name="email"\r\n\r\nhalf a part',
				headers: { ...formHeaders(), 'content-type': 'multipart/form-data; boundary=elsewhere' },
				maxRedirects: 0
			});
			expect(broken.status(), `${f.name}: broken multipart`).toBe(400);
			expect(await broken.text()).toContain('That form could not be read');

			const repeated = new URLSearchParams({ ...f.fields });
			for (const [k, v] of Object.entries(f.fields)) repeated.append(k, v);
			const twice = await f.who.post(f.path, {
				data: repeated.toString(),
				headers: { ...formHeaders(), 'content-type': 'application/x-www-form-urlencoded' },
				maxRedirects: 0
			});
			expect(twice.status(), `${f.name}: repeated fields`).toBe(400);
			expect(await twice.text()).toContain('was sent twice');

			const file = await f.who.post(f.path, {
				multipart: {
					...f.fields,
					[Object.keys(f.fields)[0]]: {
						name: 'payload.bin',
						mimeType: 'application/octet-stream',
						buffer: Buffer.from('not text')
					}
				},
				headers: formHeaders(),
				maxRedirects: 0
			});
			expect(file.status(), `${f.name}: file in a text field`).toBe(400);
			expect(await file.text()).toContain('must be text');

			const long = await f.who.post(f.path, {
				form: Object.fromEntries(Object.keys(f.fields).map((k) => [k, 'y'.repeat(20_000)])),
				headers: formHeaders(),
				maxRedirects: 0
			});
			expect(long.status(), `${f.name}: overlong values`).toBe(400);
		}
	});
	// The invitation link survived all of that unspent.
	const [row] = await rows<{ used_at: Date | null }>(
		db,
		'SELECT used_at FROM tokens WHERE id = ?',
		[invitation.id]
	);
	expect(row.used_at).toBeNull();
});

test('cross-site form posts are refused with 403', async () => {
	await unchanged(async () => {
		for (const f of forms()) {
			const res = await f.who.post(f.path, {
				form: f.fields,
				headers: { origin: 'https://elsewhere.example', accept: 'text/html' },
				maxRedirects: 0
			});
			expect(res.status(), f.name).toBe(403);
		}
	});
});

test('expired, withdrawn, unknown and malformed links get a clear 4xx and change nothing', async () => {
	const email = `expired.${stamp}@example.test`;
	const expired = await insertToken(db, {
		purpose: 'invite',
		firmId: firm,
		email,
		role: 'auditor',
		expiresInSeconds: -60
	});
	const withdrawn = await insertToken(db, {
		purpose: 'invite',
		firmId: firm,
		email,
		role: 'auditor',
		revoked: true
	});
	const cases = [
		{ path: `/invitation/${expired.token}`, status: 410, says: 'This link has expired.' },
		{ path: `/invitation/${withdrawn.token}`, status: 410, says: 'This link was withdrawn.' },
		{ path: `/invitation/${'Q'.repeat(43)}`, status: 404, says: 'This link is not valid.' },
		{ path: `/invitation/${'Q'.repeat(600)}`, status: 404, says: 'This link is not valid.' },
		{ path: '/invitation/%2e%2e%2f%2e%2e%2fetc', status: 404, says: 'not valid' },
		// An invitation token is no password-reset token.
		{ path: `/password/reset/${invitation.token}`, status: 404, says: 'This link is not valid.' }
	];
	await unchanged(async () => {
		for (const c of cases) {
			const page = await nobody.get(c.path);
			expect(page.status(), c.path).toBe(c.status);
			expect(await page.text(), c.path).toContain(c.says);
			const post = await nobody.post(c.path, {
				form: { name: 'Someone', ...goodPassword },
				headers: formHeaders(),
				maxRedirects: 0
			});
			expect(post.status(), `POST ${c.path}`).toBe(c.status);
		}
	});
	expect(await rows(db, 'SELECT id FROM users WHERE email = ?', [email])).toEqual([]);
});

test('a reset link works once; the second use is refused and writes nothing', async () => {
	const email = `reset.once.${stamp}@example.test`;
	const userId = await insertUser(db, { firmId: firm, email, password: 'the first long password' });
	const link = await insertToken(db, { purpose: 'password-reset', firmId: firm, email, userId });
	const first = await nobody.post(`/password/reset/${link.token}`, {
		form: goodPassword,
		headers: formHeaders(),
		maxRedirects: 0
	});
	expect(first.status()).toBe(303);
	expect(first.headers()['location']).toBe('/signin?done=reset');

	await unchanged(async () => {
		const again = await nobody.post(`/password/reset/${link.token}`, {
			form: { password: 'yet another long password', confirm: 'yet another long password' },
			headers: formHeaders(),
			maxRedirects: 0
		});
		expect(again.status()).toBe(410);
		expect(await again.text()).toContain('This link has already been used.');
	});
	// The password is the one set by the first use.
	const signIn = await signedIn(email, goodPassword.password, appOrigin);
	await signIn.dispose();
});

test('an invitation whose address got an account meanwhile is refused with 409', async () => {
	const email = `taken.${stamp}@example.test`;
	const link = await insertToken(db, { purpose: 'invite', firmId: firm, email, role: 'auditor' });
	await insertUser(db, { firmId: demoFirms[1].id, email, password: 'someone else entirely' });
	await unchanged(async () => {
		const res = await nobody.post(`/invitation/${link.token}`, {
			form: { name: 'Late Comer', ...goodPassword },
			headers: formHeaders(),
			maxRedirects: 0
		});
		expect(res.status()).toBe(409);
		expect(await res.text()).toContain('already has a Steamwisp account');
	});
});

test('a password the form refuses leaves the invitation unspent', async () => {
	await unchanged(async () => {
		const res = await nobody.post(`/invitation/${invitation.token}`, {
			form: { name: 'Someone', password: 'short', confirm: 'short' },
			headers: formHeaders(),
			maxRedirects: 0
		});
		expect(res.status()).toBe(400);
		expect(await res.text()).toContain('Use at least 12 characters');
		const mismatch = await nobody.post(`/invitation/${invitation.token}`, {
			form: { name: 'Someone', password: goodPassword.password, confirm: 'something else' },
			headers: formHeaders(),
			maxRedirects: 0
		});
		expect(mismatch.status()).toBe(400);
		expect(await mismatch.text()).toContain('The two passwords differ');
	});
	expect((await nobody.get(`/invitation/${invitation.token}`)).status()).toBe(200);
});
