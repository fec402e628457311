import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/client';
import type { DatabaseHandle } from '../../server/db/database';
import { apiKeys, usageCounters } from '../../server/db/schema/api-access';
import { seedDemoData } from '../../server/db/seed';
import { ApiKeyService } from '../../server/services/api-keys/api-keys';
import { serverProcesses } from '../helpers/server-process';

const processes = serverProcesses('usage-stop');
const newDataHome = processes.newDataHome;

const open = (home: Record<string, string>): Promise<DatabaseHandle> =>
  openDatabase({ dataDir: home.DATA_DIR ?? 'memory', databaseUrl: home.DATABASE_URL, snapshotFile: home.DB_SNAPSHOT });

// A real process: usage is counted in memory and written once a second, so only the stop writes
// a call made just before it.
describe('stopping the server', { timeout: 90_000 }, () => {
  it('writes the API calls counted since the last batch before the database closes', async () => {
    const home = await newDataHome();
    let key: string;
    let keyId: string;
    const before = await open(home);
    try {
      await seedDemoData(before.db);
      const created = await new ApiKeyService(before.db).create(
        { organisationId: null, userId: 'demo-admin' },
        { name: 'Stop check', kind: 'secret', scopes: ['read'] },
      );
      key = created.key;
      keyId = created.info.id;
    } finally {
      await before.close();
    }

    const server = processes.start(home);
    const url = await server.ready;
    const res = await fetch(`${url}/api/v1/templates`, { headers: { Authorization: `Bearer ${key}` } });
    expect(res.status).toBe(200);
    server.child.kill('SIGTERM');
    expect(await server.exited).toBe(0);

    const after = await open(home);
    try {
      const rows = await after.db.select().from(usageCounters).where(eq(usageCounters.apiKeyId, keyId));
      expect(rows.map((r) => ({ endpoint: r.endpoint, count: r.count }))).toEqual([{ endpoint: 'listTemplates', count: 1 }]);
      const [row] = await after.db.select({ lastUsedAt: apiKeys.lastUsedAt }).from(apiKeys).where(eq(apiKeys.id, keyId));
      expect(row!.lastUsedAt).not.toBeNull();
    } finally {
      await after.close();
    }
  });
});
