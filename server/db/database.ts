import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import * as apiAccess from './schema/api-access';
import * as audit from './schema/audit';
import * as auth from './schema/auth';
import * as embeds from './schema/embeds';
import * as invitations from './schema/invitations';
import * as mail from './schema/mail';
import * as organisations from './schema/organisations';
import * as rateLimits from './schema/rate-limits';
import * as templates from './schema/templates';

export const schema = { ...auth, ...organisations, ...templates, ...apiAccess, ...embeds, ...audit, ...invitations, ...mail, ...rateLimits };
export type Schema = typeof schema;

// Both drivers (PGlite, node-postgres) give this same query-builder surface; code above the db
// layer never needs to know which one is underneath.
export type Database = PgDatabase<PgQueryResultHKT, Schema>;

export type DatabaseDriver = 'pglite' | 'postgres';

export interface DatabaseHandle {
  db: Database;
  driver: DatabaseDriver;
  /** Round-trips `select 1`; resolves to the latency in milliseconds, rejects if unreachable. */
  ping(): Promise<number>;
  /** Waits for in-flight queries, then closes the connection(s) or the embedded database. */
  close(): Promise<void>;
}
