import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { auditLog } from '../../server/db/schema/audit';
import { seedDemoData } from '../../server/db/seed';
import { seedBuiltInTemplates } from '../../server/db/seed-templates';
import { builtInTemplates } from '../../templates/registry';
import { wallJibTieRod } from '../../templates/wall-jib-tie-rod/spec';
import { openTestDatabase } from '../helpers/test-database';

let handle: DatabaseHandle;
beforeAll(async () => {
  handle = await openTestDatabase();
  await seedDemoData(handle.db);
}, 60_000);
afterAll(async () => {
  await handle?.close();
});

const published = () => handle.db.select().from(auditLog).where(eq(auditLog.action, 'template.published'));

describe('seeding the built-in templates, audited', () => {
  it('records template.published by the system once per version written, and nothing on a restart', async () => {
    await seedBuiltInTemplates(handle.db, builtInTemplates, 'tallow-ridge-engineering');
    const first = await published();
    expect(first).toHaveLength(builtInTemplates.length);
    expect(new Set(first.map((e) => e.target))).toEqual(new Set(builtInTemplates.map((s) => `template:${s.slug}`)));
    const jib = first.find((e) => e.target === 'template:wall-jib-tie-rod');
    expect(jib).toMatchObject({ actorKind: 'system', actorId: null });
    expect(jib!.details).toMatchObject({ slug: 'wall-jib-tie-rod', version: '1.0.0', source: 'built-in' });
    expect(String(jib!.details.contentHash)).toMatch(/^[0-9a-f]{64}$/);

    // A restart: every built-in already stored, so no new entry.
    await seedBuiltInTemplates(handle.db, builtInTemplates, 'tallow-ridge-engineering');
    expect(await published()).toHaveLength(builtInTemplates.length);

    // A changed built-in is a new version, and that one publication is recorded.
    const changed = { ...wallJibTieRod, summary: `${wallJibTieRod.summary} (revised)` };
    await seedBuiltInTemplates(handle.db, [changed], 'tallow-ridge-engineering');
    const updates = await handle.db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.action, 'template.published'), eq(auditLog.target, 'template:wall-jib-tie-rod')));
    expect(updates.map((e) => e.details.version).sort()).toEqual(['1.0.0', '1.1.0']);
  });
});
