import { and, eq, gt, inArray, sql } from 'drizzle-orm';
import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import type { Logger } from 'pino';
import type { Database } from '../db/database';
import { rateLimitHits } from '../db/schema/rate-limits';

export interface BatchedRateLimitOptions {
  /** How often this instance adds its local hits to the shared rows and reads the totals back. */
  syncMs?: number;
  /** The last hits before a key's limit (this share of it, at least `nearMin`) each wait for a sync. */
  nearFraction?: number;
  nearMin?: number;
  logger?: Logger;
}

interface Waiter {
  /** The hit's place among the hits this instance sends in the next sync for its key. */
  place: number;
  resolve: (total: number) => void;
}

interface Counter {
  limit: number;
  /** End of the window, from the shared row once synced (a local guess before). */
  resetAt: number;
  /** The shared total as the last sync read it back (this instance's synced hits included). */
  shared: number;
  /** Hits sent in the sync now running and not yet answered. */
  inflight: number;
  /** Hits counted here and not yet sent (negative after decrements). */
  pending: number;
  /** When the sync that last read `shared` was sent; 0 before the first. */
  viewAt: number;
  waiters: Waiter[];
}

/**
 * express-rate-limit counters shared by every instance through the database, without a write
 * per request: each instance counts hits in memory and, every `syncMs` while a key is in use,
 * adds its local hits to the key's shared row and reads the shared total back (one upsert for
 * all keys). A hit is answered from the local figure (the shared total last read plus this
 * instance's hits since), so within one instance the count is exact. A hit waits for a sync
 * of its own (batched with any others waiting) when it lands in the last `nearFraction` of the
 * key's limit, or when this instance's view of the key is older than two sync intervals (a key
 * seen for the first time, or after a quiet spell); so a key near its limit is counted exactly
 * across instances. What is not seen is only what other instances counted since their last
 * sync: a key can pass its limit by at most what all instances together add to it in one
 * sync interval (two when an event loop runs late), and only if that is more than the near band.
 *
 * express-rate-limit asks for the limit after counting, so callers with a per-key limit tell
 * the store first (`noteLimit`, from the key generator); otherwise the limit is the option's
 * number, and with neither, no band (staleness still syncs).
 */
export class BatchedRateLimitStore implements Store {
  readonly localKeys = false;
  private windowMs = 60_000;
  private defaultLimit = Number.POSITIVE_INFINITY;
  private readonly counters = new Map<string, Counter>();
  private readonly syncMs: number;
  private readonly nearFraction: number;
  private readonly nearMin: number;
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;
  private queued: Promise<void> | null = null;
  private stopped = false;
  private readAllNext = false;
  private readonly logger: Logger | undefined;

  constructor(
    private readonly db: Database,
    readonly prefix: string,
    options: BatchedRateLimitOptions = {},
  ) {
    this.syncMs = options.syncMs ?? 100;
    this.nearFraction = options.nearFraction ?? 0.1;
    this.nearMin = options.nearMin ?? 10;
    this.logger = options.logger;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
    if (typeof options.limit === 'number') this.defaultLimit = options.limit;
  }

  /** The limit that will apply to `key`'s next hit (call before express-rate-limit counts it). */
  noteLimit(key: string, limit: number): void {
    this.counter(key, Date.now()).limit = limit;
  }

  increment(key: string): Promise<IncrementResponse> | IncrementResponse {
    const now = Date.now();
    const c = this.counter(key, now);
    const place = c.pending;
    c.pending += 1;
    const estimate = c.shared + c.inflight + c.pending;
    const band = Math.max(this.nearMin, Math.ceil(c.limit * this.nearFraction));
    // Past the limit needs no sync: other instances can only add to the count, so it is refused.
    const underLimit = estimate <= c.limit;
    const near = underLimit && estimate > c.limit - band;
    const stale = underLimit && now - c.viewAt > 2 * this.syncMs;
    if (!near && !stale) {
      this.schedule();
      return { totalHits: estimate, resetTime: new Date(c.resetAt) };
    }
    return new Promise<number>((resolve) => {
      c.waiters.push({ place, resolve });
      void this.sync();
    }).then((totalHits) => ({ totalHits, resetTime: new Date(c.resetAt) }));
  }

  decrement(key: string): void {
    const c = this.counters.get(this.prefix + key);
    if (!c) return;
    c.pending -= 1;
    this.schedule();
  }

  async resetKey(key: string): Promise<void> {
    this.counters.delete(this.prefix + key);
    await this.db.delete(rateLimitHits).where(eq(rateLimitHits.key, this.prefix + key));
  }

  /** Adds every local hit to the shared rows now and reads every known key's total back. */
  flush(): Promise<void> {
    this.readAllNext = true;
    return this.sync();
  }

  /** Stops the sync timer after writing what is counted here. */
  async shutdown(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearTimeout(this.timer);
    this.timer = null;
    await this.sync();
  }

  private counter(key: string, now: number): Counter {
    const full = this.prefix + key;
    let c = this.counters.get(full);
    if (!c) {
      c = { limit: this.defaultLimit, resetAt: now + this.windowMs, shared: 0, inflight: 0, pending: 0, viewAt: 0, waiters: [] };
      this.counters.set(full, c);
    } else if (now >= c.resetAt) {
      // The window is over: hits not yet sent belonged to it and no longer count, unless a hit
      // is waiting on them for its place (then they count, a little early, in the new window).
      c.resetAt = now + this.windowMs;
      c.shared = 0;
      if (c.waiters.length === 0) c.pending = 0;
    }
    return c;
  }

  private schedule(): void {
    if (this.timer || this.stopped) return;
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.sync();
    }, this.syncMs);
    this.timer.unref();
  }

  /** Runs a sync that starts after this call (one at a time; callers during one share the next). */
  private sync(): Promise<void> {
    if (!this.running) {
      this.running = this.write().finally(() => {
        this.running = null;
      });
      return this.running;
    }
    this.queued ??= this.running.then(() => {
      this.queued = null;
      return this.sync();
    });
    return this.queued;
  }

  private async write(): Promise<void> {
    const sentAt = Date.now();
    const readAll = this.readAllNext;
    this.readAllNext = false;
    const batch: { key: string; c: Counter; n: number; waiters: Waiter[] }[] = [];
    for (const [key, c] of this.counters) {
      if (c.pending === 0 && c.waiters.length === 0 && !(readAll && sentAt < c.resetAt)) {
        // Forget keys whose window is over and that owe the database nothing.
        if (sentAt >= c.resetAt && c.inflight === 0) this.counters.delete(key);
        continue;
      }
      batch.push({ key, c, n: c.pending, waiters: c.waiters });
      c.inflight += c.pending;
      c.pending = 0;
      c.waiters = [];
    }
    if (batch.length === 0) return;
    let rows: { key: string; hits: number; resetAt: Date }[];
    try {
      rows = await this.send(batch, sentAt);
    } catch (error) {
      // Keep counting here and try again next interval; a waiting hit gets the local figure.
      this.logger?.warn({ err: error, keys: batch.length }, 'could not sync rate-limit counters');
      for (const { c, n, waiters } of batch) {
        c.inflight -= n;
        c.pending += n;
        for (const w of waiters) w.resolve(c.shared + c.inflight + w.place + 1);
      }
      this.schedule();
      return;
    }
    const byKey = new Map(rows.map((r) => [r.key, r]));
    const now = Date.now();
    for (const { key, c, n, waiters } of batch) {
      c.inflight -= n;
      const row = byKey.get(key);
      const resetAt = row?.resetAt.getTime() ?? 0;
      // A row whose window ended meanwhile says nothing about the window counted now.
      if (row && resetAt > now) {
        c.shared = row.hits;
        c.resetAt = resetAt;
        c.viewAt = sentAt;
        for (const w of waiters) w.resolve(row.hits - n + w.place + 1);
      } else {
        // Counted in a window that has ended (or a row reset meanwhile): they do not count now.
        for (const w of waiters) w.resolve(c.shared + c.inflight + w.place + 1);
      }
    }
    if (batch.some(({ c }) => c.pending !== 0)) this.schedule();
  }

  private async send(batch: { key: string; n: number }[], sentAt: number): Promise<{ key: string; hits: number; resetAt: Date }[]> {
    const adds = batch.filter((b) => b.n > 0);
    const subtracts = batch.filter((b) => b.n < 0);
    const resetAt = new Date(sentAt + this.windowMs);
    const rows: { key: string; hits: number; resetAt: Date }[] = [];
    // One statement adds every key's hits and returns the shared totals; a window that has run
    // out starts again at this batch's hits.
    if (adds.length > 0) {
      rows.push(
        ...(await this.db
          .insert(rateLimitHits)
          .values(adds.map((b) => ({ key: b.key, hits: b.n, resetAt })))
          .onConflictDoUpdate({
            target: rateLimitHits.key,
            set: {
              hits: sql`case when ${rateLimitHits.resetAt} <= now() then excluded.hits else ${rateLimitHits.hits} + excluded.hits end`,
              resetAt: sql`case when ${rateLimitHits.resetAt} <= now() then excluded.reset_at else ${rateLimitHits.resetAt} end`,
            },
          })
          .returning({ key: rateLimitHits.key, hits: rateLimitHits.hits, resetAt: rateLimitHits.resetAt })),
      );
    }
    // Decrements (skipped requests) are rare: one update each, never below zero.
    for (const b of subtracts) {
      rows.push(
        ...(await this.db
          .update(rateLimitHits)
          .set({ hits: sql`greatest(${rateLimitHits.hits} + ${b.n}, 0)` })
          .where(and(eq(rateLimitHits.key, b.key), gt(rateLimitHits.resetAt, sql`now()`)))
          .returning({ key: rateLimitHits.key, hits: rateLimitHits.hits, resetAt: rateLimitHits.resetAt })),
      );
    }
    // Keys with only waiting hits and nothing to add (after decrements) read their total.
    const readOnly = batch.filter((b) => b.n === 0).map((b) => b.key);
    if (readOnly.length > 0) {
      rows.push(
        ...(await this.db
          .select({ key: rateLimitHits.key, hits: rateLimitHits.hits, resetAt: rateLimitHits.resetAt })
          .from(rateLimitHits)
          .where(inArray(rateLimitHits.key, readOnly))),
      );
    }
    return rows;
  }
}
