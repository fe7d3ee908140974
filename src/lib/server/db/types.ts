/**
 * Types for code that runs on any Drizzle client of our schema: the app's pool, a script's
 * single connection (seed) or a caller's transaction. Type-only, so scripts run under tsx can
 * import modules that use them without SvelteKit's $env.
 */
import type { MySql2Database } from 'drizzle-orm/mysql2';
import type { Pool } from 'mysql2/promise';
import type * as schema from './schema';

export type Db = MySql2Database<typeof schema>;
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
/** A client or a transaction: what data-access functions take. */
export type Executor = Db | Tx;
/** A client on a pool, with the pool itself (for a statement run on the driver directly). */
export type PooledDb = Db & { $client: Pool };
