import path from 'node:path';
import type { Logger } from 'pino';
import type { DatabaseHandle } from './database';
import { openPglite } from './open-pglite';

export interface OpenDatabaseOptions {
  /** A PostgreSQL connection string; when set, the data folder is not used. */
  databaseUrl?: string | undefined;
  /** Pinwork's data folder (PGlite lives in its `pglite/` subfolder), or 'memory'. */
  dataDir: string;
  snapshotFile?: string | undefined;
  snapshot?: Blob | undefined;
  logger?: Logger | undefined;
}

export const MEMORY_DATA_DIR = 'memory';

/** Opens the database and brings its schema up to date; seeding is the caller's step. */
export async function openDatabase(options: OpenDatabaseOptions): Promise<DatabaseHandle> {
  if (options.databaseUrl) {
    // Loaded only when used: an embedded install never pays for pg's import.
    const { openPostgres } = await import('./open-postgres');
    return openPostgres({ connectionString: options.databaseUrl, logger: options.logger });
  }
  return openPglite({
    folder: options.dataDir === MEMORY_DATA_DIR ? null : pgliteFolder(options.dataDir),
    snapshotFile: options.snapshotFile,
    snapshot: options.snapshot,
    logger: options.logger,
  });
}

export function pgliteFolder(dataDir: string): string {
  return path.join(dataDir, 'pglite');
}
