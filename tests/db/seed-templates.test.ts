import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Database, DatabaseHandle } from '../../server/db/database';
import { templates, templateVersions } from '../../server/db/schema/templates';
import { seedDemoData } from '../../server/db/seed';
import { seedBuiltInTemplates } from '../../server/db/seed-templates';
import { contentHash } from '../../server/services/templates/content-hash';
import { templateSpecSchema } from '../../shared/spec/template-spec';
import { builtInTemplates } from '../../templates/registry';
import { wallJibTieRod } from '../../templates/wall-jib-tie-rod/spec';
import { openTestDatabase } from '../helpers/test-database';

let handle: DatabaseHandle;
let db: Database;
beforeAll(async () => {
  handle = await openTestDatabase();
  db = handle.db;
  await seedDemoData(db);
}, 60_000);
afterAll(async () => {
  await handle?.close();
});

const versionsOf = (slug: string) =>
  db
    .select({ semver: templateVersions.semver, status: templateVersions.status, hash: templateVersions.contentHash, spec: templateVersions.spec, validator: templateVersions.validatorScript })
    .from(templateVersions)
    .innerJoin(templates, eq(templates.id, templateVersions.templateId))
    .where(eq(templates.slug, slug));

describe('seeding the built-in templates', () => {
  it('inserts every built-in once as published 1.0.0, with its content hash and validator', async () => {
    const first = await seedBuiltInTemplates(db, builtInTemplates, 'tallow-ridge-engineering');
    expect(first).toEqual({ templates: builtInTemplates.length, versions: builtInTemplates.length });
    expect(builtInTemplates.length).toBeGreaterThanOrEqual(10);
    const [jib] = await versionsOf('wall-jib-tie-rod');
    expect(jib).toMatchObject({ semver: '1.0.0', status: 'published', hash: contentHash(templateSpecSchema.parse(wallJibTieRod)) });
    expect(jib!.validator).toMatch(/pinworkInputValidators/);
    const [owner] = await db.select({ org: templates.ownerOrganisationId }).from(templates).where(eq(templates.slug, 'wall-jib-tie-rod'));
    expect(owner!.org).not.toBeNull();
  });

  it('inserts nothing on a second start', async () => {
    expect(await seedBuiltInTemplates(db, builtInTemplates, 'tallow-ridge-engineering')).toEqual({ templates: 0, versions: 0 });
    expect(await versionsOf('wall-jib-tie-rod')).toHaveLength(1);
  });

  it('turns a changed built-in into a new version and leaves the published one untouched', async () => {
    const changed = { ...wallJibTieRod, summary: `${wallJibTieRod.summary} Now with a longer summary.` };
    expect(await seedBuiltInTemplates(db, [changed], 'tallow-ridge-engineering')).toEqual({ templates: 0, versions: 1 });
    const versions = (await versionsOf('wall-jib-tie-rod')).sort((a, b) => a.semver.localeCompare(b.semver));
    expect(versions.map((v) => v.semver)).toEqual(['1.0.0', '1.1.0']);
    expect((versions[0]!.spec as { summary: string }).summary).toBe(wallJibTieRod.summary);
    expect((versions[1]!.spec as { summary: string }).summary).toMatch(/longer summary/);
    expect(versions[0]!.hash).not.toBe(versions[1]!.hash);
  });

  it('refuses a built-in that is not a valid spec, naming the problem', async () => {
    const broken = { ...wallJibTieRod, slug: 'broken-jib', joints: [{ id: 'x', kind: 'pin' as const, at: 'Nowhere', between: ['boom', 'ground'] as [string, string] }] };
    await expect(seedBuiltInTemplates(db, [broken], 'tallow-ridge-engineering')).rejects.toThrow(/broken-jib is not valid: joints\.0\.at: refers to the point 'Nowhere'/);
  });
});
