/**
 * Sign-in limits hold across app processes: two more `node server` processes on other loopback
 * ports share the test database with the main one; failures made on either count for both, and
 * a device cookie one of them issued is honoured by the other (they share the signing key).
 * Both extra processes trust X-Forwarded-For (ADDRESS_HEADER), as they would behind a load
 * balancer, so each test can speak from its own documentation-range address and leave
 * 127.0.0.1's budget alone.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes, randomUUID } from 'node:crypto';
import { createServer } from 'node:net';
import { expect, request, test, type APIRequestContext } from '@playwright/test';
import { addressKey } from '../../src/lib/server/auth/limits';
import { demoFirms } from '../../src/lib/server/seed/demo';
import { openTestDb, rows, type Db } from './support/db';
import { appEnv } from './support/servers';
import { formHeaders } from './support/sessions';
import { insertUser } from './support/tokens';

const ports: number[] = [];
const children: ChildProcess[] = [];
const servers: APIRequestContext[] = [];
let db: Db;

test.beforeAll(async () => {
	test.setTimeout(90_000);
	db = openTestDb();
	for (let i = 0; i < 2; i++) ports.push(await freeLoopbackPort());
	for (const port of ports) {
		const child = spawn('node', ['server'], {
			env: {
				...process.env,
				...appEnv(port, { ADDRESS_HEADER: 'x-forwarded-for', XFF_DEPTH: '1' })
			},
			stdio: ['ignore', 'ignore', 'inherit']
		});
		children.push(child);
		const api = await request.newContext({ baseURL: `http://127.0.0.1:${port}` });
		await expect
			.poll(async () => (await api.get('/api/health').catch(() => null))?.status(), {
				timeout: 30_000,
				message: `node server on port ${port}`
			})
			.toBe(200);
		servers.push(api);
	}
});

test.afterAll(async () => {
	for (const s of servers) await s.dispose();
	await Promise.all(children.map(stop));
	await db?.end();
});

/** A port nothing listens on right now (the OS picks it). */
function freeLoopbackPort(): Promise<number> {
	return new Promise((resolve, reject) => {
		const probe = createServer();
		probe.once('error', reject);
		probe.listen(0, '127.0.0.1', () => {
			const { port } = probe.address() as { port: number };
			probe.close(() => resolve(port));
		});
	});
}

/** Asks a server to shut down and waits for it; kills it if it will not go. */
function stop(child: ChildProcess): Promise<void> {
	return new Promise((resolve) => {
		if (child.exitCode !== null) return resolve();
		const force = setTimeout(() => child.kill('SIGKILL'), 10_000);
		child.once('exit', () => {
			clearTimeout(force);
			resolve();
		});
		child.kill('SIGTERM');
	});
}

// Addresses from the IPv6 documentation prefix (RFC 3849), new for every run, so counters left
// in the database by an earlier run never meet this one; each in a /64 of its own, since
// addresses are counted by their /64.
const run = randomBytes(2).toString('hex');
let counter = 0;
const freshAddress = () => `2001:db8:${run}:${(++counter).toString(16)}::1`;

/**
 * One sign-in from a new client (no cookie from an earlier success rides along), or from a
 * browser that signed in before when its device cookie is given. Returns the device cookie a
 * success sets.
 */
async function attempt(
	server: number,
	email: string,
	password: string,
	from: string,
	device?: string
) {
	const origin = `http://127.0.0.1:${ports[server]}`;
	const client = await request.newContext({ baseURL: origin });
	const res = await client.post('/signin', {
		form: { email, password },
		headers: {
			...formHeaders(origin),
			'x-forwarded-for': from,
			...(device ? { cookie: `steamwisp_device=${device}` } : {})
		},
		maxRedirects: 0
	});
	const text = await res.text();
	const set = res
		.headersArray()
		.filter((h) => h.name.toLowerCase() === 'set-cookie')
		.map((h) => /^steamwisp_device=([^;]*)/.exec(h.value)?.[1])
		.find((v) => v);
	await client.dispose();
	return {
		status: res.status(),
		device: set ?? null,
		tooMany: /Too many attempts, try again in (\d+) minutes?\./.exec(text)?.[0] ?? null
	};
}

test('an account makes new browsers wait after five failures, whichever process saw them', async () => {
	const email = `limit.${randomUUID()}@example.test`;
	const password = 'the right long password';
	await insertUser(db, { firmId: demoFirms[0].id, email, password });
	for (let i = 0; i < 5; i++) {
		// Alternate processes and addresses: only the account ties the attempts together.
		const r = await attempt(i % 2, email, 'wrong guess', freshAddress());
		expect(r.status, `attempt ${i + 1}`).toBe(400);
	}
	for (const server of [0, 1]) {
		const r = await attempt(server, email, 'wrong guess', freshAddress());
		expect(r.status).toBe(429);
		expect(r.tooMany).toBe('Too many attempts, try again in 1 minute.');
	}
	// While it waits even the right password is refused from a new browser, with the same words.
	const right = await attempt(1, email, password, freshAddress());
	expect(right.status).toBe(429);
	expect(right.tooMany).toBe('Too many attempts, try again in 1 minute.');
});

test("a browser that signed in before is not kept out by others' failures, on either process", async () => {
	const email = `known.${randomUUID()}@example.test`;
	const password = 'the right long password';
	await insertUser(db, { firmId: demoFirms[0].id, email, password });
	const first = await attempt(0, email, password, freshAddress());
	expect(first.status).toBe(303);
	expect(first.device).toMatch(/^[A-Za-z0-9_-]{22}\.[A-Za-z0-9_-]{43}$/);
	// Someone else fails from many addresses until new browsers must wait.
	for (let i = 0; i < 7; i++) await attempt(i % 2, email, 'wrong guess', freshAddress());
	expect((await attempt(0, email, password, freshAddress())).status).toBe(429);
	// The owner's browser gets in on the other process too, even from an address that is waiting.
	const from = freshAddress();
	for (let i = 0; i < 30; i++)
		await attempt(i % 2, `spray.${i}.${randomUUID()}@example.test`, 'x', from);
	expect((await attempt(1, `spray.${randomUUID()}@example.test`, 'x', from)).status).toBe(429);
	const known = await attempt(1, email, password, from, first.device!);
	expect(known.status).toBe(303);
	// A made-up device cookie vouches for nothing.
	const forged = `${randomBytes(16).toString('base64url')}.${randomBytes(32).toString('base64url')}`;
	expect((await attempt(0, email, password, freshAddress(), forged)).status).toBe(429);
});

test('an unknown address is limited exactly like a real one (no account enumeration)', async () => {
	const email = `nobody.${randomUUID()}@example.test`;
	const statuses: number[] = [];
	for (let i = 0; i < 6; i++)
		statuses.push((await attempt(i % 2, email, 'guess', freshAddress())).status);
	expect(statuses).toEqual([400, 400, 400, 400, 400, 429]);
});

test('the wait doubles with each attempt after a lock ends', async () => {
	const email = `backoff.${randomUUID()}@example.test`;
	for (let i = 0; i < 5; i++) await attempt(i % 2, email, 'guess', freshAddress());
	expect((await attempt(0, email, 'guess', freshAddress())).tooMany).toContain('in 1 minute.');
	// Let the minute pass (move the last attempt back rather than wait).
	await db.query(
		`UPDATE attempt_counters SET last_attempt_at = last_attempt_at - INTERVAL 61 SECOND
		 WHERE scope = 'sign-in:account' AND subject_hash = SHA2(?, 256)`,
		[email]
	);
	expect((await attempt(1, email, 'guess', freshAddress())).status).toBe(400);
	expect((await attempt(0, email, 'guess', freshAddress())).tooMany).toBe(
		'Too many attempts, try again in 2 minutes.'
	);
});

test('one network address is limited across accounts and processes', async () => {
	const from = freshAddress();
	for (let i = 0; i < 30; i++) {
		const r = await attempt(i % 2, `spray.${i}.${randomUUID()}@example.test`, 'guess', from);
		expect(r.status, `attempt ${i + 1}`).toBe(400);
	}
	const blocked = await attempt(0, `spray.last.${randomUUID()}@example.test`, 'guess', from);
	expect(blocked.status).toBe(429);
	// Another address of the same /64 waits too; an address of another /64 is unaffected.
	const neighbour = from.replace(/::1$/, ':dead:beef:1:2');
	expect(
		(await attempt(1, `spray.near.${randomUUID()}@example.test`, 'guess', neighbour)).status
	).toBe(429);
	expect(
		(await attempt(1, `spray.other.${randomUUID()}@example.test`, 'guess', freshAddress())).status
	).toBe(400);
});

test('parallel guesses against both processes cannot outrun the allowance', async () => {
	const email = `burst.${randomUUID()}@example.test`;
	const results = await Promise.all(
		Array.from({ length: 12 }, (_, i) => attempt(i % 2, email, 'guess', freshAddress()))
	);
	const statuses = results.map((r) => r.status).sort();
	expect(statuses.filter((s) => s === 400)).toHaveLength(5);
	expect(statuses.filter((s) => s === 429)).toHaveLength(7);
	const [row] = await rows<{ attempts: number }>(
		db,
		`SELECT attempts FROM attempt_counters WHERE scope = 'sign-in:account' AND subject_hash = SHA2(?, 256)`,
		[email]
	);
	expect(row.attempts).toBe(5);
});

test('a successful sign-in clears the account count and is not held against the address', async () => {
	const email = `success.${randomUUID()}@example.test`;
	const password = 'the right long password';
	await insertUser(db, { firmId: demoFirms[1].id, email, password });
	const from = freshAddress();
	for (let i = 0; i < 4; i++) await attempt(i % 2, email, 'wrong', from);
	expect((await attempt(0, email, password, from)).status).toBe(303);
	const counters = await rows<{ scope: string; attempts: number }>(
		db,
		`SELECT scope, attempts FROM attempt_counters WHERE subject_hash IN (SHA2(?, 256), SHA2(?, 256))`,
		[email, addressKey(from)]
	);
	expect(counters).toEqual([{ scope: 'sign-in:address', attempts: 4 }]);
	// The account starts afresh: five more failures are allowed before the lock.
	for (let i = 0; i < 5; i++) expect((await attempt(1, email, 'wrong', from)).status).toBe(400);
	expect((await attempt(0, email, 'wrong', from)).status).toBe(429);
});

test('correct sign-ins never count, so they never keep an address waiting', async () => {
	const from = freshAddress();
	for (let i = 0; i < 30; i++)
		await attempt(i % 2, `fail.${i}.${randomUUID()}@example.test`, 'x', from);
	// Let the address's wait pass (move its last failure back rather than wait).
	await db.query(
		`UPDATE attempt_counters SET last_attempt_at = last_attempt_at - INTERVAL 61 SECOND
		 WHERE scope = 'sign-in:address' AND subject_hash = SHA2(?, 256)`,
		[addressKey(from)]
	);
	// Three people behind that address sign in from new browsers, one after another.
	for (let i = 0; i < 3; i++) {
		const email = `office.${i}.${randomUUID()}@example.test`;
		await insertUser(db, { firmId: demoFirms[0].id, email, password: 'the right long password' });
		expect((await attempt(i % 2, email, 'the right long password', from)).status).toBe(303);
	}
	const [row] = await rows<{ attempts: number }>(
		db,
		`SELECT attempts FROM attempt_counters WHERE scope = 'sign-in:address' AND subject_hash = SHA2(?, 256)`,
		[addressKey(from)]
	);
	expect(row.attempts).toBe(30);
});
