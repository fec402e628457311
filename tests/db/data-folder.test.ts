import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { count } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openDatabase, pgliteFolder } from '../../server/db/client';
import { organisations } from '../../server/db/schema/organisations';
import { seedDemoData } from '../../server/db/seed';
import { demoOrganisations } from '../../server/db/demo-data';
import { makeTempDir } from '../helpers/server-process';
import { pgliteSnapshotFile } from '../helpers/test-database';

// About PGlite's folder only, so the run against PostgreSQL (DATABASE_URL) skips it.
describe.skipIf(Boolean(process.env.DATABASE_URL))('the embedded database folder', () => {
  let temp: ReturnType<typeof makeTempDir>;
  beforeAll(() => {
    temp = makeTempDir('folder');
  });
  afterAll(() => temp?.remove());

  it('starts a new folder from the snapshot, migrated, and keeps its rows across a reopen', async () => {
    const dataDir = path.join(temp.dir, 'fresh');
    const first = await openDatabase({ dataDir, snapshotFile: pgliteSnapshotFile() });
    await seedDemoData(first.db);
    await first.close();
    expect(existsSync(path.join(pgliteFolder(dataDir), 'pinwork-ready'))).toBe(true);

    const second = await openDatabase({ dataDir, snapshotFile: pgliteSnapshotFile() });
    const [row] = await second.db.select({ n: count() }).from(organisations);
    await second.close();
    expect(row!.n).toBe(demoOrganisations.length);
  });

  it('replaces a folder that an interrupted first start left half made', async () => {
    const dataDir = path.join(temp.dir, 'half-made');
    mkdirSync(pgliteFolder(dataDir), { recursive: true });
    writeFileSync(path.join(pgliteFolder(dataDir), 'PG_VERSION'), '17\n');
    const handle = await openDatabase({ dataDir, snapshotFile: pgliteSnapshotFile() });
    try {
      expect(await handle.ping()).toBeGreaterThanOrEqual(0);
      const [row] = await handle.db.select({ n: count() }).from(organisations);
      expect(row!.n).toBe(0);
    } finally {
      await handle.close();
    }
  });
});
