import { PGlite } from '@electric-sql/pglite';
import { migratePgliteClient } from './open-pglite';

/**
 * A gzip dump of a freshly created and migrated PGlite. Creating PGlite from nothing takes many
 * seconds; loading this dump takes well under one, so the build and the test setup pay once.
 */
export async function createMigratedSnapshot(): Promise<Blob> {
  const client = new PGlite();
  try {
    await client.waitReady;
    await migratePgliteClient(client);
    // A checkpoint first, so the dump holds the migrated pages rather than a WAL to replay.
    await client.query('checkpoint');
    return await client.dumpDataDir('gzip');
  } finally {
    await client.close();
  }
}
