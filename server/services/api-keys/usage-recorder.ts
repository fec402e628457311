import { and, eq, gte, inArray, sql } from 'drizzle-orm';
import type { Logger } from 'pino';
import type { Database } from '../../db/database';
import { apiKeys, apiQuotas, usageCounters } from '../../db/schema/api-access';

export interface UsageRecorderOptions {
  /** How often counted calls are written; also how stale a quota figure may be. */
  flushMs?: number;
  /** Requests a month per organisation when it has no api_quotas row; null: no quota. */
  defaultMonthlyQuota?: number | null;
}

const dayOf = (d: Date) => d.toISOString().slice(0, 10);
const monthStart = (d: Date) => new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth(), 1));
export const nextMonthStart = (d: Date) => new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth() + 1, 1));

/**
 * Counts API calls in memory and writes them in one batch every `flushMs` (one upsert per key,
 * endpoint and day, and each key's last use), so no request waits for a usage write. The
 * monthly quota check reads the organisation's total at most once per `flushMs` and adds what
 * this instance has counted since.
 */
export class UsageRecorder {
  private pending = new Map<string, { apiKeyId: string; endpoint: string; day: string; count: number }>();
  private lastUsed = new Map<string, Date>();
  /** Calls counted here per organisation and not yet written. */
  private unwritten = new Map<string, number>();
  private monthly = new Map<string, { at: number; figure: Promise<{ used: number; quota: number | null }> }>();
  private timer: NodeJS.Timeout | null = null;
  private flushing: Promise<void> = Promise.resolve();
  private readonly flushMs: number;
  private readonly defaultQuota: number | null;

  constructor(
    private readonly db: Database,
    private readonly logger: Logger,
    options: UsageRecorderOptions = {},
  ) {
    this.flushMs = options.flushMs ?? 1000;
    this.defaultQuota = options.defaultMonthlyQuota === undefined ? 100_000 : options.defaultMonthlyQuota;
  }

  /** The UTC day of the last call, so each call does not format a date. */
  private today = { from: 0, to: 0, day: '' };

  private dayOfCall(now: Date): string {
    const t = now.getTime();
    if (t < this.today.from || t >= this.today.to) {
      const from = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
      this.today = { from, to: from + 86_400_000, day: dayOf(now) };
    }
    return this.today.day;
  }

  record(apiKeyId: string, organisationId: string | null, endpoint: string, now = new Date()): void {
    const day = this.dayOfCall(now);
    const id = `${apiKeyId}|${endpoint}|${day}`;
    const entry = this.pending.get(id);
    if (entry) entry.count += 1;
    else this.pending.set(id, { apiKeyId, endpoint, day, count: 1 });
    this.lastUsed.set(apiKeyId, now);
    if (organisationId) this.unwritten.set(organisationId, (this.unwritten.get(organisationId) ?? 0) + 1);
    this.timer ??= setTimeout(() => {
      this.timer = null;
      void this.flush();
    }, this.flushMs).unref();
  }

  /** Writes what has been counted; resolves when it is in the database (tests and shutdown call it). */
  flush(): Promise<void> {
    this.flushing = this.flushing.then(() => this.write());
    return this.flushing;
  }

  private async write(): Promise<void> {
    if (this.pending.size === 0 && this.lastUsed.size === 0) return;
    const rows = [...this.pending.values()];
    const used = [...this.lastUsed.entries()];
    this.pending = new Map();
    this.lastUsed = new Map();
    const unwritten = this.unwritten;
    this.unwritten = new Map();
    try {
      if (rows.length) {
        await this.db
          .insert(usageCounters)
          .values(rows)
          .onConflictDoUpdate({
            target: [usageCounters.apiKeyId, usageCounters.endpoint, usageCounters.day],
            set: { count: sql`${usageCounters.count} + excluded.count` },
          });
      }
      for (const [id, at] of used) {
        await this.db.update(apiKeys).set({ lastUsedAt: sql`greatest(coalesce(${apiKeys.lastUsedAt}, ${at}), ${at})` }).where(eq(apiKeys.id, id));
      }
    } catch (error) {
      // A key deleted meanwhile (cascade) fails the batch; drop it rather than retry forever.
      this.logger.warn({ err: error, rows: rows.length }, 'could not write API usage counters');
    }
    // The next quota check reads the written total afresh.
    for (const org of unwritten.keys()) this.monthly.delete(org);
  }

  /**
   * This month's calls of an organisation and its quota: the flushed total (read at most once
   * per flushMs) plus what this instance has counted and not yet written. Other instances'
   * unwritten calls show after their next flush, so the quota may be passed by about one
   * second's traffic.
   */
  async monthlyFigure(organisationId: string, now = new Date()): Promise<{ used: number; quota: number | null }> {
    let hit = this.monthly.get(organisationId);
    if (!hit || Date.now() - hit.at >= this.flushMs) {
      hit = { at: Date.now(), figure: this.read(organisationId, now) };
      this.monthly.set(organisationId, hit);
      hit.figure.catch(() => this.monthly.delete(organisationId));
    }
    const f = await hit.figure;
    return { used: f.used + (this.unwritten.get(organisationId) ?? 0), quota: f.quota };
  }

  private async read(organisationId: string, now: Date): Promise<{ used: number; quota: number | null }> {
    const keyIds = this.db.select({ id: apiKeys.id }).from(apiKeys).where(eq(apiKeys.organisationId, organisationId));
    const [sum] = await this.db
      .select({ used: sql<string>`coalesce(sum(${usageCounters.count}), 0)` })
      .from(usageCounters)
      .where(and(inArray(usageCounters.apiKeyId, keyIds), gte(usageCounters.day, dayOf(monthStart(now)))));
    const [quota] = await this.db.select({ monthly: apiQuotas.monthlyRequests }).from(apiQuotas).where(eq(apiQuotas.organisationId, organisationId));
    return { used: Number(sum?.used ?? 0), quota: quota ? quota.monthly : this.defaultQuota };
  }

  stop(): Promise<void> {
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    return this.flush();
  }
}
