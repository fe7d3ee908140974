/** E-mailed link tokens made directly in the test database (raw token known to the test). */
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { hash } from '@node-rs/argon2';
import type { Db } from './db';

export async function insertToken(
	db: Db,
	t: {
		purpose: 'invite' | 'password-reset';
		firmId: string;
		email: string;
		role?: string;
		userId?: string;
		/** Negative for a link that has already expired. */
		expiresInSeconds?: number;
		revoked?: boolean;
	}
): Promise<{ id: string; token: string }> {
	const token = randomBytes(32).toString('base64url');
	const id = randomUUID();
	await db.query(
		`INSERT INTO tokens (id, firm_id, purpose, token_hash, email, user_id, role, expires_at, revoked)
		 VALUES (?, ?, ?, ?, ?, ?, ?, NOW(3) + INTERVAL ? SECOND, ?)`,
		[
			id,
			t.firmId,
			t.purpose,
			createHash('sha256').update(token).digest('hex'),
			t.email,
			t.userId ?? null,
			t.role ?? null,
			t.expiresInSeconds ?? 3600,
			t.revoked ?? false
		]
	);
	return { id, token };
}

/** A person with a known password, made for one test. */
export async function insertUser(
	db: Db,
	u: { firmId: string; email: string; password: string; role?: string }
): Promise<string> {
	const id = randomUUID();
	const passwordHash = await hash(u.password, { memoryCost: 19456, timeCost: 2, parallelism: 1 });
	await db.query(
		`INSERT INTO users (id, firm_id, email, name, role, password_hash) VALUES (?, ?, ?, ?, ?, ?)`,
		[id, u.firmId, u.email, 'Test Person', u.role ?? 'auditor', passwordHash]
	);
	return id;
}
