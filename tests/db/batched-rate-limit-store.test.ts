import { eq } from 'drizzle-orm';
import type { Options } from 'express-rate-limit';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { rateLimitHits } from '../../server/db/schema/rate-limits';
import { BatchedRateLimitStore } from '../../server/services/batched-rate-limit-store';
import { openTestDatabase } from '../helpers/test-database';

let database: DatabaseHandle;
beforeAll(async () => {
  database = await openTestDatabase();
}, 120_000);
afterAll(async () => {
  await database?.close();
});

let keys = 0;
const freshKey = () => `key-${++keys}`;

/** A store as express-rate-limit sets it up; a long sync interval unless a test wants the timer. */
function store(options: { limit?: number; windowMs?: number; syncMs?: number } = {}): BatchedRateLimitStore {
  const s = new BatchedRateLimitStore(database.db, 'test:', { syncMs: options.syncMs ?? 60_000 });
  s.init({ windowMs: options.windowMs ?? 60_000, limit: options.limit ?? 1000 } as Options);
  return s;
}

async function sharedHits(key: string): Promise<number | undefined> {
  const [row] = await database.db.select().from(rateLimitHits).where(eq(rateLimitHits.key, `test:${key}`));
  return row?.hits;
}

async function hits(s: BatchedRateLimitStore, key: string, n: number): Promise<number[]> {
  const totals: number[] = [];
  for (let i = 0; i < n; i++) totals.push((await s.increment(key)).totalHits);
  return totals;
}

const range = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => from + i);

describe('BatchedRateLimitStore', () => {
  it('counts exactly within one instance and writes in batches, not per hit', async () => {
    const s = store();
    const key = freshKey();
    expect(await hits(s, key, 50)).toEqual(range(1, 50));
    // The first hit had no view of the key and synced; the other 49 wait for the next sync.
    expect(await sharedHits(key)).toBe(1);
    await s.flush();
    expect(await sharedHits(key)).toBe(50);
    expect((await s.increment(key)).totalHits).toBe(51);
  });

  it('writes on its own every sync interval', async () => {
    const s = store({ syncMs: 40 });
    const key = freshKey();
    await hits(s, key, 5);
    await new Promise((r) => setTimeout(r, 150));
    expect(await sharedHits(key)).toBe(5);
    await s.shutdown();
  });

  it('reads the shared total when an instance first sees a key', async () => {
    const a = store();
    const b = store();
    const key = freshKey();
    await hits(a, key, 30);
    await a.flush();
    expect(await hits(b, key, 2)).toEqual([31, 32]);
  });

  it('syncs every hit near the limit, so two instances count the last hits exactly', async () => {
    const a = store({ limit: 20 });
    const b = store({ limit: 20 });
    const key = freshKey();
    await hits(a, key, 5);
    await hits(b, key, 5);
    await a.flush();
    await b.flush();
    await a.flush(); // now both have read the shared 10
    const totals: number[] = [];
    for (let i = 0; i < 10; i++) totals.push((await (i % 2 === 0 ? a : b).increment(key)).totalHits);
    expect(totals).toEqual(range(11, 20));
    // Past the limit each refuses from what it knows, without a sync.
    expect((await a.increment(key)).totalHits).toBeGreaterThan(20);
    expect((await b.increment(key)).totalHits).toBeGreaterThan(20);
  });

  it('gives concurrent hits near the limit one sync and a place each', async () => {
    const s = store({ limit: 10 });
    const key = freshKey();
    const totals = await Promise.all(range(1, 10).map(() => s.increment(key)));
    expect(totals.map((t) => t.totalHits).sort((x, y) => x - y)).toEqual(range(1, 10));
    expect(await sharedHits(key)).toBe(10);
  });

  it('takes a per-key limit from noteLimit for the near band', async () => {
    const a = store({ limit: 1_000_000 });
    const b = store({ limit: 1_000_000 });
    const key = freshKey();
    a.noteLimit(key, 11);
    b.noteLimit(key, 11);
    await hits(a, key, 1);
    await hits(b, key, 1);
    // Every hit is within 10 of 11, so each one syncs and sees the other instance's.
    const totals: number[] = [];
    for (let i = 0; i < 6; i++) totals.push((await (i % 2 === 0 ? a : b).increment(key)).totalHits);
    expect(totals).toEqual(range(3, 8));
  });

  it('does not see the other instance’s hits between syncs (the documented overshoot), and does after one', async () => {
    const a = store({ limit: 100 });
    const b = store({ limit: 100 });
    const key = freshKey();
    await hits(a, key, 1);
    await hits(b, key, 1);
    // 60 each, far from the band by each instance's own view: 122 hits where 100 are allowed.
    const seenByA = await hits(a, key, 60);
    const seenByB = await hits(b, key, 60);
    expect(seenByA.at(-1)).toBe(61);
    expect(seenByB.at(-1)).toBe(62);
    await a.flush();
    await b.flush();
    expect(await sharedHits(key)).toBe(122);
    // b synced after a and sees both; a sees b's hits at its own next sync (one interval later).
    expect((await b.increment(key)).totalHits).toBe(123);
    expect((await a.increment(key)).totalHits).toBe(63);
    await a.flush();
    expect((await a.increment(key)).totalHits).toBe(124);
  });

  it('starts again at one after the window', async () => {
    const s = store({ limit: 5, windowMs: 300 });
    const key = freshKey();
    expect(await hits(s, key, 6)).toEqual(range(1, 6));
    await new Promise((r) => setTimeout(r, 350));
    const next = await s.increment(key);
    expect(next.totalHits).toBe(1);
    expect(next.resetTime!.getTime()).toBeGreaterThan(Date.now());
    expect(await sharedHits(key)).toBe(1);
  });

  it('takes a decrement off the shared count, never below zero, and resetKey clears it', async () => {
    const s = store();
    const key = freshKey();
    await hits(s, key, 3);
    s.decrement(key);
    await s.flush();
    expect(await sharedHits(key)).toBe(2);
    await s.resetKey(key);
    expect(await sharedHits(key)).toBeUndefined();
    expect((await s.increment(key)).totalHits).toBe(1);
  });
});
