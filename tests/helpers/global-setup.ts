import { createHash, randomBytes } from 'node:crypto';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { mkdir, rename, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import type { TestProject } from 'vitest/node';
import { openDatabase } from '../../server/db/client';
import { migrationsFolder } from '../../server/db/migrate';
import { createMigratedSnapshot } from '../../server/db/snapshot';
import { databaseUrlFor } from './database-url';

declare module 'vitest' {
  export interface ProvidedContext {
    /** A gzip dump of a migrated PGlite; every PGlite test database starts from it. */
    pgliteSnapshotFile: string;
    /** Set when DATABASE_URL is: the migrated template database each test file copies. */
    postgres: { adminUrl: string; templateDatabase: string; prefix: string } | null;
  }
}

const root = fileURLToPath(new URL('../..', import.meta.url));

// Migrating once per run (not per file) keeps the suite fast: a fresh PGlite costs many seconds.
// The dump is cached by the migrations' content and PGlite's version, so a rerun with
// unchanged migrations skips even that; any change to drizzle/ makes a new one.
export default async function setup(project: TestProject) {
  project.provide('pgliteSnapshotFile', await pgliteSnapshot());

  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) {
    project.provide('postgres', null);
    return;
  }
  const prefix = `pinwork_test_${randomBytes(4).toString('hex')}_`;
  const templateDatabase = `${prefix}template`;
  const admin = new pg.Client({ connectionString: databaseUrl });
  await admin.connect();
  try {
    await admin.query(`create database "${templateDatabase}"`);
  } finally {
    await admin.end();
  }
  const template = await openDatabase({ databaseUrl: databaseUrlFor(databaseUrl, templateDatabase), dataDir: 'memory' });
  await template.close();
  project.provide('postgres', { adminUrl: databaseUrl, templateDatabase, prefix });

  return async () => {
    const cleanup = new pg.Client({ connectionString: databaseUrl });
    await cleanup.connect();
    try {
      const { rows } = await cleanup.query<{ datname: string }>(
        'select datname from pg_database where starts_with(datname, $1)',
        [prefix],
      );
      for (const { datname } of rows) await cleanup.query(`drop database if exists "${datname}" with (force)`);
    } finally {
      await cleanup.end();
    }
  };
}

async function pgliteSnapshot(): Promise<string> {
  const hash = createHash('sha256');
  for (const file of listFiles(migrationsFolder)) {
    hash.update(path.relative(migrationsFolder, file));
    hash.update(readFileSync(file));
  }
  hash.update(readFileSync(path.join(root, 'node_modules/@electric-sql/pglite/package.json')));
  const cacheDir = path.join(root, 'node_modules/.cache/pinwork-tests');
  const file = path.join(cacheDir, `pglite-${hash.digest('hex').slice(0, 16)}.tar.gz`);
  if (existsSync(file)) return file;

  const snapshot = await createMigratedSnapshot();
  await mkdir(cacheDir, { recursive: true });
  const partial = `${file}.partial-${process.pid}`;
  await writeFile(partial, Buffer.from(await snapshot.arrayBuffer()));
  await rename(partial, file);
  return file;
}

function listFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true, recursive: true })
    .filter((entry) => entry.isFile())
    .map((entry) => path.join(entry.parentPath, entry.name))
    .sort();
}
