import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import pg from 'pg';
import type { Logger } from 'pino';
import { schema, type Database, type DatabaseHandle } from './database';
import { migrationsFolder } from './migrate';

export interface OpenPostgresOptions {
  connectionString: string;
  logger?: Logger | undefined;
  /** Pool size; several instances behind a load balancer share the server's connection limit. */
  max?: number;
}

export async function openPostgres(options: OpenPostgresOptions): Promise<DatabaseHandle> {
  const pool = new pg.Pool({ connectionString: options.connectionString, max: options.max ?? 10 });
  // An idle client that loses its connection emits here; without a listener it would crash us.
  pool.on('error', (error) => options.logger?.error({ err: error }, 'postgres pool client error'));
  try {
    await migrateUnderLock(pool);
  } catch (error) {
    await pool.end();
    throw error;
  }
  const db = drizzle({ client: pool, schema }) as unknown as Database;
  let closed = false;
  return {
    db,
    driver: 'postgres',
    async ping() {
      const started = performance.now();
      await pool.query('select 1');
      return performance.now() - started;
    },
    async close() {
      if (closed) return;
      closed = true;
      await pool.end();
    },
  };
}

// Any constant shared by every Pinwork instance; it names the lock, nothing more.
const MIGRATION_LOCK_KEY = 7_201_560_300;

/** Several instances may start at once against one server: one migrates, the others wait. */
async function migrateUnderLock(pool: pg.Pool): Promise<void> {
  const lockClient = await pool.connect();
  try {
    await lockClient.query('select pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
    try {
      await migrate(drizzle({ client: pool }), { migrationsFolder });
    } finally {
      await lockClient.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]);
    }
  } finally {
    lockClient.release();
  }
}
