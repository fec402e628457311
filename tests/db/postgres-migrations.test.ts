import { readFileSync } from 'node:fs';
import path from 'node:path';
import { sql } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { openDatabase } from '../../server/db/client';
import { migrationsFolder } from '../../server/db/migrate';
import { createPostgresCopy } from '../helpers/test-database';

const journal = JSON.parse(readFileSync(path.join(migrationsFolder, 'meta/_journal.json'), 'utf8')) as {
  entries: unknown[];
};
const drops: (() => Promise<void>)[] = [];
afterAll(async () => {
  for (const drop of drops) await drop();
});

// Only meaningful on a PostgreSQL server, where several instances may start at once.
describe.skipIf(!process.env.DATABASE_URL)('migrations on a PostgreSQL server', () => {
  it('applies every migration once when three instances start together on an empty database', async () => {
    const empty = await createPostgresCopy({ empty: true });
    drops.push(empty!.drop);
    const handles = await Promise.all(
      [1, 2, 3].map(() => openDatabase({ databaseUrl: empty!.url, dataDir: 'memory' })),
    );
    try {
      const rows = (await handles[0]!.db.execute(sql`select count(*)::int as n from drizzle.__drizzle_migrations`)) as unknown as { rows: unknown[] };
      expect((rows.rows[0] as { n: number }).n).toBe(journal.entries.length);
      const trigger = (await handles[0]!.db.execute(
        sql`select count(*)::int as n from pg_trigger where tgname like 'template_versions_frozen_%'`,
      )) as unknown as { rows: unknown[] };
      expect((trigger.rows[0] as { n: number }).n).toBe(2);
    } finally {
      await Promise.all(handles.map((h) => h.close()));
    }
  });
});
