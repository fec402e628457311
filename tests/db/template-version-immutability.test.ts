import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { Database, DatabaseHandle } from '../../server/db/database';
import { templates, templateVersions } from '../../server/db/schema/templates';
import { openTestDatabase } from '../helpers/test-database';

let handle: DatabaseHandle;
let db: Database;
let templateId: string;
let seq = 0;

beforeAll(async () => {
  handle = await openTestDatabase();
  db = handle.db;
  const [row] = await db
    .insert(templates)
    .values({ slug: 'frozen-versions-test', title: 'Frozen versions test', category: 'frames' })
    .returning({ id: templates.id });
  templateId = row!.id;
});
afterAll(async () => {
  await handle?.close();
});

let versionId: string;
beforeEach(async () => {
  seq += 1;
  const [row] = await db
    .insert(templateVersions)
    .values({ templateId, semver: `1.${seq}.0`, spec: { specVersion: 1, span: 1200 }, contentHash: `hash-${seq}` })
    .returning({ id: templateVersions.id });
  versionId = row!.id;
});

const byId = () => eq(templateVersions.id, versionId);
const publish = () =>
  db.update(templateVersions).set({ status: 'published', publishedAt: new Date() }).where(byId());

// drizzle wraps driver errors; the database's own message is on the cause.
async function refusal(promise: Promise<unknown>): Promise<string> {
  try {
    await promise;
  } catch (error) {
    const e = error as Error & { cause?: Error };
    return `${e.message} ${e.cause?.message ?? ''}`;
  }
  throw new Error('the database accepted a change it should have refused');
}

async function current() {
  const [row] = await db.select().from(templateVersions).where(byId());
  return row!;
}

describe('published template versions are frozen', () => {
  it('lets a draft change freely and be deleted', async () => {
    await db.update(templateVersions).set({ spec: { specVersion: 1, span: 1500 }, contentHash: 'edited' }).where(byId());
    expect((await current()).spec).toEqual({ specVersion: 1, span: 1500 });
    await db.delete(templateVersions).where(byId());
    expect(await db.select().from(templateVersions).where(byId())).toHaveLength(0);
  });

  it.each([
    ['spec', { spec: { specVersion: 1, span: 9999 } }],
    ['content hash', { contentHash: 'tampered' }],
    ['semver', { semver: '9.9.9' }],
  ])('refuses to change the %s of a published version', async (_field, change) => {
    await publish();
    const before = await current();
    expect(await refusal(db.update(templateVersions).set(change).where(byId()))).toMatch(/cannot change/);
    expect(await current()).toEqual(before);
  });

  it('refuses to delete a published version', async () => {
    await publish();
    expect(await refusal(db.delete(templateVersions).where(byId()))).toMatch(/cannot be deleted/);
    expect(await db.select().from(templateVersions).where(byId())).toHaveLength(1);
  });

  it('refuses to send a published version back to draft', async () => {
    await publish();
    expect(await refusal(db.update(templateVersions).set({ status: 'draft' }).where(byId()))).toMatch(/draft/);
    expect((await current()).status).toBe('published');
  });

  it('allows deprecating and a changelog fix, and keeps a deprecated version frozen', async () => {
    await publish();
    await db.update(templateVersions).set({ status: 'deprecated', changelog: 'Superseded by 2.0.0.' }).where(byId());
    expect(await current()).toMatchObject({ status: 'deprecated', changelog: 'Superseded by 2.0.0.' });
    expect(await refusal(db.update(templateVersions).set({ contentHash: 'x' }).where(byId()))).toMatch(/cannot change/);
    expect(await refusal(db.delete(templateVersions).where(byId()))).toMatch(/cannot be deleted/);
  });

  it('refuses a published status without a publication time', async () => {
    expect(await refusal(db.update(templateVersions).set({ status: 'published' }).where(byId()))).toMatch(
      /template_versions_published_at_set/,
    );
  });
});
