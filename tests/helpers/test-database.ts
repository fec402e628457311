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
  return inject('pgliteSnapshotFile');
}

/**
 * A migrated database of its own for one test file: an in-memory PGlite loaded from the run's
 * snapshot, or, with DATABASE_URL, a fresh copy of the run's template database (dropped on close).
 */
export async function openTestDatabase(): Promise<DatabaseHandle> {
  const postgres = inject('postgres');
  if (!postgres) {
    snapshot ??= new Blob([readFileSync(inject('pgliteSnapshotFile'))]);
    return openDatabase({ dataDir: 'memory', snapshot });
  }

  copies += 1;
  const name = `${postgres.prefix}${process.pid}_${copies}`;
  await adminQuery(postgres.adminUrl, `create database "${name}" template "${postgres.templateDatabase}"`);
  const handle = await openDatabase({ databaseUrl: databaseUrlFor(postgres.adminUrl, name), dataDir: 'memory' });
  return {
    ...handle,
    async close() {
      await handle.close();
      await adminQuery(postgres.adminUrl, `drop database if exists "${name}" with (force)`);
    },
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
