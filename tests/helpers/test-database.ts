import { readFileSync } from 'node:fs';
import pg from 'pg';
import { inject } from 'vitest';
import { openDatabase } from '../../server/db/client';
import type { DatabaseHandle } from '../../server/db/database';
import { databaseUrlFor } from './database-url';

let copies = 0;
let snapshot: Blob | undefined;

/** The driver the DB tests run on in this run: PostgreSQL when DATABASE_URL is set. */
export function expectedDriver(): 'pglite' | 'postgres' {
  return inject('postgres') ? 'postgres' : 'pglite';
}

export function pgliteSnapshotFile(): string {
  const file = inject('pgliteSnapshotFile');
  if (!file) {
    throw new Error('no test database snapshot: register tests/helpers/global-setup.ts in vite.config.ts test.globalSetup');
  }
  return file;
}

/**
 * A migrated database of its own for one test file: an in-memory PGlite loaded from the run's
 * snapshot, or, with DATABASE_URL, a fresh copy of the run's template database (dropped on close).
 */
export async function openTestDatabase(): Promise<DatabaseHandle> {
  const postgres = await createPostgresCopy();
  if (!postgres) {
    snapshot ??= new Blob([readFileSync(pgliteSnapshotFile())]);
    return openDatabase({ dataDir: 'memory', snapshot });
  }
  const handle = await openDatabase({ databaseUrl: postgres.url, dataDir: 'memory' });
  return {
    ...handle,
    async close() {
      await handle.close();
      await postgres.drop();
    },
  };
}

/**
 * With DATABASE_URL: a new database copied from the run's migrated template (or an empty one),
 * for a test that hands it to a server process; null on a PGlite-only run.
 */
export async function createPostgresCopy(
  options: { empty?: boolean } = {},
): Promise<{ url: string; drop(): Promise<void> } | null> {
  const postgres = inject('postgres');
  if (!postgres) return null;
  copies += 1;
  const name = `${postgres.prefix}${process.pid}_${copies}`;
  const template = options.empty ? 'template0' : postgres.templateDatabase;
  await adminQuery(postgres.adminUrl, `create database "${name}" template "${template}"`);
  return {
    url: databaseUrlFor(postgres.adminUrl, name),
    drop: () => adminQuery(postgres.adminUrl, `drop database if exists "${name}" with (force)`),
  };
}

async function adminQuery(url: string, statement: string): Promise<void> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    await client.query(statement);
  } finally {
    await client.end();
  }
}
