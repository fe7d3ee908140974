/**
 * Steamwisp's data model (Drizzle, MySQL dialect, run on MariaDB). One file per aggregate
 * under ./schema/; this module is what drizzle-kit and the app import.
 */
export * from './schema/tenancy';
export * from './schema/sites';
export * from './schema/costs';
export * from './schema/surveys';
export * from './schema/client';
export * from './schema/audit';
export * from './schema/auth';
export * from './schema/sync';
export * from './schema/publish';
