import { and, eq, isNull } from 'drizzle-orm';
import type { DemoApiKey } from '../../shared/api/demo-key';
import type { ApiScope } from '../../shared/api/v1';
import type { ServerMode } from '../config';
import { recordAudit } from '../services/audit';
import { hashKey, prefixOf } from '../services/api-keys/key-format';
import type { Database } from './database';
import { apiKeys } from './schema/api-access';
import { organisations } from './schema/organisations';

// Development only, like the demo passwords: printed at start, listed in README.md and
// docs/api.md, and handed to the API reference page so "Try it out" runs at once. It is public
// knowledge, so a production start never seeds it and revokes it if a development database is
// ever carried over.
export const demoApiKey = {
  key: 'pw_sk_bwdemo0001_Brightwater-demo-key-dev-only-01',
  name: 'Demo key (development only)',
  organisationSlug: 'brightwater-rigging-supply',
  createdBy: 'demo-supplier',
  // Every scope, author included, so every operation on the reference page runs with the one
  // key the page fills in; narrower keys are what a real integration should create.
  scopes: ['read', 'solve', 'sweep', 'sensitivity', 'author'] as const satisfies readonly ApiScope[],
} as const;

export const demoApiKeyPrefix = prefixOf(demoApiKey.key)!;

/**
 * Stores the demo key for Brightwater Rigging Supply once (by its prefix); a row that exists is
 * left alone, so a developer who revoked the demo key keeps it revoked. Null without the
 * organisation (seedDemoData runs first).
 */
export async function seedDemoApiKey(db: Database): Promise<DemoApiKey | null> {
  const [org] = await db.select({ id: organisations.id, name: organisations.name }).from(organisations).where(eq(organisations.slug, demoApiKey.organisationSlug));
  if (!org) return null;
  await db
    .insert(apiKeys)
    .values({
      organisationId: org.id,
      name: demoApiKey.name,
      prefix: demoApiKeyPrefix,
      hash: hashKey(demoApiKey.key),
      kind: 'secret',
      scopes: [...demoApiKey.scopes],
      createdBy: demoApiKey.createdBy,
    })
    .onConflictDoNothing({ target: apiKeys.prefix });
  return liveDemoApiKey(db);
}

/** The demo key if its row is there, live and still holds this key; otherwise null. */
export async function liveDemoApiKey(db: Database, now = new Date()): Promise<DemoApiKey | null> {
  const [row] = await db
    .select({ hash: apiKeys.hash, name: apiKeys.name, scopes: apiKeys.scopes, revokedAt: apiKeys.revokedAt, expiresAt: apiKeys.expiresAt, organisation: organisations.name })
    .from(apiKeys)
    .innerJoin(organisations, eq(organisations.id, apiKeys.organisationId))
    .where(eq(apiKeys.prefix, demoApiKeyPrefix));
  if (!row || row.hash !== hashKey(demoApiKey.key)) return null;
  if ((row.revokedAt && row.revokedAt <= now) || (row.expiresAt && row.expiresAt <= now)) return null;
  return { key: demoApiKey.key, prefix: demoApiKeyPrefix, name: row.name, organisation: row.organisation, scopes: row.scopes as ApiScope[] };
}

/** Revokes a live demo key (a development database started in production); true if it did. */
export async function retireDemoApiKey(db: Database): Promise<boolean> {
  const revoked = await db
    .update(apiKeys)
    .set({ revokedAt: new Date() })
    .where(and(eq(apiKeys.prefix, demoApiKeyPrefix), isNull(apiKeys.revokedAt)))
    .returning({ id: apiKeys.id });
  if (!revoked.length) return false;
  await recordAudit(db, { actorKind: 'system', action: 'api-key.revoked', target: revoked[0]!.id, details: { prefix: demoApiKeyPrefix, reason: 'demo key found at a production start' } });
  return true;
}

/** What a start does about the demo key in each mode: seed it (development), retire it (production). */
export async function demoApiKeyAtStart(db: Database, mode: ServerMode): Promise<{ key: DemoApiKey | null; retired: boolean }> {
  if (mode === 'development') return { key: await seedDemoApiKey(db), retired: false };
  if (mode === 'production') return { key: null, retired: await retireDemoApiKey(db) };
  return { key: null, retired: false };
}
