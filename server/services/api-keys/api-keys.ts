import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import { authProblemTypes } from '../../../shared/api/auth';
import { validationProblem } from '../../../shared/api/problem';
import { createApiKeyRequestSchema, type ApiKeyInfo, type ApiScope, type CreatedApiKey } from '../../../shared/api/v1';
import type { Database } from '../../db/database';
import { apiKeys, type ApiKeyKind } from '../../db/schema/api-access';
import { organisations } from '../../db/schema/organisations';
import { HttpProblem } from '../../middleware/http-problem';
import { recordAudit } from '../audit';
import { hashMatches, newKey, prefixOf } from './key-format';

type KeyRow = typeof apiKeys.$inferSelect;

export interface VerifiedKey {
  id: string;
  organisationId: string | null;
  prefix: string;
  kind: ApiKeyKind;
  scopes: readonly ApiScope[];
  allowedOrigins: readonly string[];
  ratePerMinute: number | null;
}

export type KeyCheck = { ok: true; key: VerifiedKey } | { ok: false; reason: 'invalid' | 'revoked' | 'expired' };

/** Who asks: an organisation's keys only, or (admin) every key. */
export type KeyScope = { organisationId: string } | { all: true };

/** Who changes a key, for the audit log: the signed-in person and the address they called from. */
export interface KeyActor {
  userId: string;
  ip?: string | null;
}

export interface ApiKeyServiceOptions {
  /** How long a looked-up key row is trusted before it is read again (revocation elsewhere shows within this). */
  cacheMs?: number;
}

const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function keyInfo(row: KeyRow): ApiKeyInfo {
  const iso = (d: Date | null) => (d ? d.toISOString() : null);
  return {
    id: row.id,
    organisationId: row.organisationId,
    name: row.name,
    prefix: row.prefix,
    kind: row.kind,
    scopes: row.scopes as ApiScope[],
    allowedOrigins: row.allowedOrigins,
    createdAt: row.createdAt.toISOString(),
    expiresAt: iso(row.expiresAt),
    revokedAt: iso(row.revokedAt),
    lastUsedAt: iso(row.lastUsedAt),
    ratePerMinute: row.ratePerMinute,
    rotatedFromId: row.rotatedFromId,
  };
}

const keyNotFound = (id: string) =>
  new HttpProblem({ type: '/problems/not-found', title: 'Unknown API key', status: 404, detail: `There is no API key ${id} here.` });

/**
 * API keys: creation (the key is returned once), rotation with a grace period, revocation, and
 * verification. Verification reads a key's row at most once per `cacheMs` per instance, so the
 * hot path does not touch the database; this instance forgets a key the moment it changes it.
 */
export class ApiKeyService {
  private readonly cacheMs: number;
  private readonly rows = new Map<string, { at: number; row: Promise<KeyRow | null> }>();
  private readonly origins = new Map<string, { at: number; allowed: Promise<boolean> }>();

  constructor(
    private readonly db: Database,
    options: ApiKeyServiceOptions = {},
  ) {
    this.cacheMs = options.cacheMs ?? 1000;
  }

  async verify(raw: string, now = new Date()): Promise<KeyCheck> {
    const prefix = prefixOf(raw);
    if (!prefix) return { ok: false, reason: 'invalid' };
    const row = await this.rowFor(prefix);
    if (!row || !hashMatches(raw, row.hash)) return { ok: false, reason: 'invalid' };
    if (row.revokedAt && row.revokedAt <= now) return { ok: false, reason: 'revoked' };
    if (row.expiresAt && row.expiresAt <= now) return { ok: false, reason: 'expired' };
    return {
      ok: true,
      key: {
        id: row.id,
        organisationId: row.organisationId,
        prefix: row.prefix,
        kind: row.kind,
        scopes: row.scopes as ApiScope[],
        allowedOrigins: row.allowedOrigins,
        ratePerMinute: row.ratePerMinute,
      },
    };
  }

  private rowFor(prefix: string): Promise<KeyRow | null> {
    const hit = this.rows.get(prefix);
    if (hit && Date.now() - hit.at < this.cacheMs) return hit.row;
    // Unknown prefixes are cached too, so guessing keys costs the database nothing extra.
    const row = this.db
      .select()
      .from(apiKeys)
      .where(eq(apiKeys.prefix, prefix))
      .then((r) => r[0] ?? null);
    this.rows.set(prefix, { at: Date.now(), row });
    row.catch(() => this.rows.delete(prefix));
    if (this.rows.size > 10_000) this.rows.delete(this.rows.keys().next().value!);
    return row;
  }

  /** Whether any live publishable key lists this origin (answers CORS preflights, which carry no key). */
  originAllowed(origin: string): Promise<boolean> {
    const hit = this.origins.get(origin);
    if (hit && Date.now() - hit.at < this.cacheMs) return hit.allowed;
    const allowed = this.db
      .select({ id: apiKeys.id })
      .from(apiKeys)
      .where(
        and(
          eq(apiKeys.kind, 'publishable'),
          isNull(apiKeys.revokedAt),
          sql`(${apiKeys.expiresAt} is null or ${apiKeys.expiresAt} > now())`,
          sql`${origin} = any(${apiKeys.allowedOrigins})`,
        ),
      )
      .limit(1)
      .then((r) => r.length > 0);
    this.origins.set(origin, { at: Date.now(), allowed });
    allowed.catch(() => this.origins.delete(origin));
    if (this.origins.size > 10_000) this.origins.delete(this.origins.keys().next().value!);
    return allowed;
  }

  private forget(row: KeyRow): void {
    this.rows.delete(row.prefix);
    this.origins.clear();
  }

  async list(scope: KeyScope): Promise<ApiKeyInfo[]> {
    const rows = await this.db
      .select()
      .from(apiKeys)
      .where('organisationId' in scope ? eq(apiKeys.organisationId, scope.organisationId) : undefined)
      .orderBy(desc(apiKeys.createdAt));
    return rows.map(keyInfo);
  }

  /** A new key for an organisation (it must be a supplier) or, with organisationId null, an admin's own. */
  async create(owner: { organisationId: string | null } & KeyActor, body: unknown): Promise<CreatedApiKey> {
    const parsed = createApiKeyRequestSchema.safeParse(body);
    if (!parsed.success) throw new HttpProblem(validationProblem(parsed.error.issues));
    const req = parsed.data;
    if (owner.organisationId) {
      const [org] = await this.db.select({ kind: organisations.kind, name: organisations.name }).from(organisations).where(eq(organisations.id, owner.organisationId));
      if (!org) throw new HttpProblem({ type: '/problems/not-found', title: 'Unknown organisation', status: 404, detail: 'There is no such organisation.' });
      if (org.kind !== 'supplier') {
        throw new HttpProblem({
          type: authProblemTypes.forbidden,
          title: 'Not allowed',
          status: 403,
          detail: `API keys belong to supplier organisations; ${org.name} is an ${org.kind} organisation.`,
        });
      }
    }
    const made = newKey(req.kind);
    const [row] = await this.db
      .insert(apiKeys)
      .values({
        organisationId: owner.organisationId,
        name: req.name,
        prefix: made.prefix,
        hash: made.hash,
        kind: req.kind,
        scopes: [...new Set(req.scopes)],
        allowedOrigins: [...new Set(req.allowedOrigins.map((o) => o.toLowerCase()))],
        createdBy: owner.userId,
        expiresAt: req.expiresAt ? new Date(req.expiresAt) : null,
        ratePerMinute: req.ratePerMinute ?? null,
      })
      .returning();
    this.origins.clear();
    await recordAudit(this.db, {
      actorKind: 'user',
      actorId: owner.userId,
      action: 'api-key.created',
      target: row!.id,
      ip: owner.ip ?? null,
      details: { prefix: row!.prefix, organisationId: row!.organisationId, kind: row!.kind, scopes: row!.scopes },
    });
    return { key: made.key, info: keyInfo(row!) };
  }

  private async find(id: string, scope: KeyScope): Promise<KeyRow> {
    if (!uuidPattern.test(id)) throw keyNotFound(id);
    const [row] = await this.db.select().from(apiKeys).where(eq(apiKeys.id, id));
    if (!row || ('organisationId' in scope && row.organisationId !== scope.organisationId)) throw keyNotFound(id);
    return row;
  }

  /**
   * A new key with the same owner, kind, scopes and origins; the old one keeps working for
   * `graceSeconds` (or until its own earlier expiry) and then is refused as expired.
   */
  async rotate(id: string, scope: KeyScope, graceSeconds: number, actor: KeyActor, now = new Date()): Promise<CreatedApiKey> {
    const old = await this.find(id, scope);
    if (old.revokedAt) {
      throw new HttpProblem({ type: '/problems/conflict', title: 'Key revoked', status: 409, detail: `Key ${old.prefix} is revoked; create a new key instead.` });
    }
    const graceEnd = new Date(now.getTime() + graceSeconds * 1000);
    const made = newKey(old.kind);
    const row = await this.db.transaction(async (tx) => {
      const [created] = await tx
        .insert(apiKeys)
        .values({
          organisationId: old.organisationId,
          name: old.name,
          prefix: made.prefix,
          hash: made.hash,
          kind: old.kind,
          scopes: old.scopes,
          allowedOrigins: old.allowedOrigins,
          createdBy: actor.userId,
          expiresAt: old.expiresAt,
          ratePerMinute: old.ratePerMinute,
          rotatedFromId: old.id,
        })
        .returning();
      await tx
        .update(apiKeys)
        .set({ expiresAt: old.expiresAt && old.expiresAt < graceEnd ? old.expiresAt : graceEnd })
        .where(eq(apiKeys.id, old.id));
      return created!;
    });
    this.forget(old);
    await recordAudit(this.db, {
      actorKind: 'user',
      actorId: actor.userId,
      action: 'api-key.rotated',
      target: old.id,
      ip: actor.ip ?? null,
      details: { prefix: old.prefix, organisationId: old.organisationId, newKeyId: row.id, newPrefix: row.prefix, graceSeconds },
    });
    return { key: made.key, info: keyInfo(row) };
  }

  async revoke(id: string, scope: KeyScope, actor: KeyActor): Promise<ApiKeyInfo> {
    const old = await this.find(id, scope);
    const [row] = await this.db
      .update(apiKeys)
      .set({ revokedAt: old.revokedAt ?? new Date() })
      .where(eq(apiKeys.id, old.id))
      .returning();
    this.forget(old);
    await recordAudit(this.db, {
      actorKind: 'user',
      actorId: actor.userId,
      action: 'api-key.revoked',
      target: old.id,
      ip: actor.ip ?? null,
      details: { prefix: old.prefix, organisationId: old.organisationId },
    });
    return keyInfo(row!);
  }
}
