import {
	boolean,
	char,
	index,
	json,
	mysqlTable,
	text,
	uniqueIndex,
	varchar
} from 'drizzle-orm/mysql-core';
import { at, createdAt, id, updatedAt, uuid, word } from './columns';

/** A consulting firm: the tenant. Everything else hangs off one firm. */
export const firms = mysqlTable('firms', {
	id: id(),
	name: varchar('name', { length: 160 }).notNull(),
	/** Firm defaults: unit system, currency, cost library (validated by $lib/schemas). */
	defaultUnitSystem: char('default_unit_system', { length: 2 }).notNull().default('SI'),
	defaultCurrency: char('default_currency', { length: 3 }).notNull().default('EUR'),
	settings: json('settings').$type<Record<string, unknown>>(),
	createdAt: createdAt(),
	updatedAt: updatedAt()
});

/** A client company of a firm (the plant owner). Client users belong to exactly one. */
export const clientCompanies = mysqlTable(
	'client_companies',
	{
		id: id(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		name: varchar('name', { length: 160 }).notNull(),
		contactEmail: varchar('contact_email', { length: 254 }),
		notes: text('notes'),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [index('client_companies_firm_idx').on(t.firmId)]
);

export const users = mysqlTable(
	'users',
	{
		id: id(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		email: varchar('email', { length: 254 }).notNull(),
		name: varchar('name', { length: 160 }).notNull(),
		/** admin | consultant | auditor | client ($lib/schemas/roles). */
		role: word('role').notNull(),
		/** Set for client users only: the one client company they may see. */
		clientCompanyId: uuid('client_company_id').references(() => clientCompanies.id),
		/** argon2id PHC string; null until an invited person sets a password. */
		passwordHash: varchar('password_hash', { length: 255 }),
		unitSystem: char('unit_system', { length: 2 }),
		theme: word('theme'),
		disabledAt: at('disabled_at'),
		lastSignInAt: at('last_sign_in_at'),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [uniqueIndex('users_email_uq').on(t.email), index('users_firm_idx').on(t.firmId)]
);

/**
 * lucia v3 sessions (DrizzleMySQLAdapter expects id, user_id, expires_at). The id is the SHA-256
 * (hex) of the token in the person's cookie, never the token itself (auth/sessions.ts).
 */
export const sessions = mysqlTable(
	'sessions',
	{
		id: char('id', { length: 64 }).primaryKey(),
		userId: uuid('user_id')
			.notNull()
			.references(() => users.id, { onDelete: 'cascade' }),
		expiresAt: at('expires_at').notNull(),
		createdAt: createdAt(),
		userAgent: varchar('user_agent', { length: 255 })
	},
	(t) => [index('sessions_user_idx').on(t.userId)]
);

/**
 * Single-use e-mailed links: invitations and password resets. Only the SHA-256 of the
 * token is stored, so a leaked table cannot be replayed.
 */
export const tokens = mysqlTable(
	'tokens',
	{
		id: id(),
		firmId: uuid('firm_id')
			.notNull()
			.references(() => firms.id),
		/** invite | password-reset */
		purpose: word('purpose').notNull(),
		tokenHash: char('token_hash', { length: 64 }).notNull(),
		email: varchar('email', { length: 254 }).notNull(),
		/** The existing user (password reset) or the user created by accepting (invite). */
		userId: uuid('user_id').references(() => users.id, { onDelete: 'cascade' }),
		role: word('role'),
		clientCompanyId: uuid('client_company_id').references(() => clientCompanies.id),
		createdBy: uuid('created_by').references(() => users.id),
		expiresAt: at('expires_at').notNull(),
		usedAt: at('used_at'),
		revoked: boolean('revoked').notNull().default(false),
		createdAt: createdAt()
	},
	(t) => [uniqueIndex('tokens_hash_uq').on(t.tokenHash), index('tokens_email_idx').on(t.email)]
);
