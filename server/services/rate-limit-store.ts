import { eq, sql } from 'drizzle-orm';
import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import type { Database } from '../db/database';
import { rateLimitHits } from '../db/schema/rate-limits';

/**
 * express-rate-limit counters in the database (one upsert per hit), so every server instance
 * behind a load balancer counts the same requests. Keys are prefixed per limiter.
 */
export class DatabaseRateLimitStore implements Store {
  private windowMs = 60_000;
  readonly localKeys = false;

  constructor(
    private readonly db: Database,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const fullKey = this.prefix + key;
    const resetAt = new Date(Date.now() + this.windowMs);
    // A window that has run out starts again at one hit.
    const [row] = await this.db
      .insert(rateLimitHits)
      .values({ key: fullKey, hits: 1, resetAt })
      .onConflictDoUpdate({
        target: rateLimitHits.key,
        set: {
          hits: sql`case when ${rateLimitHits.resetAt} <= now() then 1 else ${rateLimitHits.hits} + 1 end`,
          resetAt: sql`case when ${rateLimitHits.resetAt} <= now() then excluded.reset_at else ${rateLimitHits.resetAt} end`,
        },
      })
      .returning({ hits: rateLimitHits.hits, resetAt: rateLimitHits.resetAt });
    return { totalHits: row!.hits, resetTime: row!.resetAt };
  }

  async decrement(key: string): Promise<void> {
    await this.db
      .update(rateLimitHits)
      .set({ hits: sql`greatest(${rateLimitHits.hits} - 1, 0)` })
      .where(eq(rateLimitHits.key, this.prefix + key));
  }

  async resetKey(key: string): Promise<void> {
    await this.db.delete(rateLimitHits).where(eq(rateLimitHits.key, this.prefix + key));
  }
}
