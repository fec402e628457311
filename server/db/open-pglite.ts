import { existsSync, mkdirSync } from 'node:fs';
import { readFile, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { PGlite } from '@electric-sql/pglite';
import { drizzle } from 'drizzle-orm/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import type { Logger } from 'pino';
import { schema, type Database, type DatabaseHandle } from './database';
import { migrationsFolder } from './migrate';

export interface OpenPgliteOptions {
  /** Folder for PGlite's files, or null for an in-memory database. */
  folder: string | null;
  /** A gzip dump of an already migrated database (see scripts/db-snapshot.ts), if one exists. */
  snapshotFile?: string | undefined;
  /** An already loaded snapshot (tests share one across files); wins over snapshotFile. */
  snapshot?: Blob | undefined;
  logger?: Logger | undefined;
}

// Written only after the folder has been created and migrated, so a folder without it is one a
// previous start abandoned half-way (it holds nothing a user could have written).
const READY_MARKER = 'pinwork-ready';

export async function openPglite(options: OpenPgliteOptions): Promise<DatabaseHandle> {
  const { folder, logger } = options;
  if (folder !== null && existsSync(folder) && !existsSync(markerPath(folder))) {
    logger?.warn({ folder }, 'removing a database folder that an earlier start left incomplete');
    await rm(folder, { recursive: true, force: true });
  }

  let client: PGlite;
  if (folder === null || !existsSync(folder)) {
    const snapshot = options.snapshot ?? (await readSnapshot(options.snapshotFile, logger));
    const started = Date.now();
    if (folder !== null) mkdirSync(path.dirname(folder), { recursive: true });
    client = snapshot
      ? new PGlite(folder ?? undefined, { loadDataDir: snapshot })
      : new PGlite(folder ?? undefined);
    await client.waitReady;
    logger?.info(
      { folder: folder ?? 'memory', fromSnapshot: Boolean(snapshot), ms: Date.now() - started },
      'created the embedded database',
    );
  } else {
    client = new PGlite(folder);
    await client.waitReady;
  }

  await migratePgliteClient(client);
  if (folder !== null && !existsSync(markerPath(folder))) {
    await writeFile(markerPath(folder), `${new Date().toISOString()}\n`);
  }

  const db = drizzle({ client, schema }) as unknown as Database;
  return {
    db,
    driver: 'pglite',
    async ping() {
      const started = performance.now();
      await client.query('select 1');
      return performance.now() - started;
    },
    async close() {
      if (!client.closed) await client.close();
    },
  };
}

function markerPath(folder: string): string {
  return path.join(folder, READY_MARKER);
}

async function readSnapshot(file: string | undefined, logger: Logger | undefined): Promise<Blob | undefined> {
  if (file && existsSync(file)) return new Blob([await readFile(file)]);
  logger?.info(
    { snapshotFile: file ?? null },
    'no migrated database snapshot found (npm run build:db-snapshot makes one); creating the database from scratch, which takes several seconds',
  );
  return undefined;
}

export async function migratePgliteClient(client: PGlite): Promise<void> {
  await migrate(drizzle({ client }), { migrationsFolder });
}
