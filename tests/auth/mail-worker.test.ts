import { eq } from 'drizzle-orm';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { users } from '../../server/db/schema/auth';
import { mailQueue } from '../../server/db/schema/mail';
import { MailQueue } from '../../server/services/mail/mail-queue';
import { MailWorker } from '../../server/services/mail/mail-worker';
import { GOOD_PASSWORD, authApp, uniqueEmail } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';

let database: DatabaseHandle;
beforeAll(async () => {
  database = await openTestDatabase();
});
afterAll(async () => {
  await database?.close();
});

/** An SMTP transport that refuses the first `failures` sends, as a server that is down would. */
function flakyTransport(failures: number) {
  const sent: string[] = [];
  let calls = 0;
  return {
    sent,
    transport: {
      async sendMail(message: { to?: unknown }) {
        calls += 1;
        if (calls <= failures) throw new Error('connect ECONNREFUSED 127.0.0.1:2525');
        sent.push(String(message.to));
        return {};
      },
    },
  };
}

async function queued(to: string) {
  const [row] = await database.db.select().from(mailQueue).where(eq(mailQueue.to, to));
  return row!;
}

describe('mail worker', () => {
  it('keeps the sign-up when SMTP is down, retries with growing waits and sends once SMTP answers', async () => {
    const queue = new MailQueue(database.db);
    const t = authApp(database, { mailQueue: queue });
    const email = uniqueEmail('retry');
    const up = await request(t.app).post('/api/auth/sign-up/email').send({ name: 'Rita Retry', email, password: GOOD_PASSWORD });
    expect(up.status).toBe(200);
    expect(await database.db.select().from(users).where(eq(users.email, email))).toHaveLength(1);

    const flaky = flakyTransport(2);
    const worker = new MailWorker({ db: database.db, queue, transport: flaky.transport as never, from: 'x@pinwork.example', logger: pino({ level: 'silent' }), retryBaseMs: 50 });
    await worker.runOnce();
    const first = await queued(email);
    expect(first).toMatchObject({ status: 'pending', attempts: 1, lastError: 'connect ECONNREFUSED 127.0.0.1:2525' });
    // Not due yet: a pass right away sends nothing.
    expect(await worker.runOnce()).toBe(0);
    await new Promise((resolve) => setTimeout(resolve, 80));
    await worker.runOnce();
    const second = await queued(email);
    expect(second.attempts).toBe(2);
    expect(second.nextAttemptAt.getTime() - first.nextAttemptAt.getTime()).toBeGreaterThan(100); // 50 ms, then 200 ms
    await new Promise((resolve) => setTimeout(resolve, 250));
    expect(await worker.runOnce()).toBe(1);
    expect(await queued(email)).toMatchObject({ status: 'sent', attempts: 3, lastError: null });
    expect(flaky.sent).toEqual([email]);
  });

  it('gives up after the last attempt, marks the message failed, and a new request queues a fresh one', async () => {
    const queue = new MailQueue(database.db);
    const t = authApp(database, { mailQueue: queue });
    const email = uniqueEmail('giveup');
    await request(t.app).post('/api/auth/sign-up/email').send({ name: 'Gus Giveup', email, password: GOOD_PASSWORD });
    const worker = new MailWorker({ db: database.db, queue, transport: flakyTransport(99).transport as never, from: 'x@pinwork.example', logger: pino({ level: 'silent' }), retryBaseMs: 1, maxAttempts: 2 });
    await worker.runOnce();
    await new Promise((resolve) => setTimeout(resolve, 20));
    await worker.runOnce();
    expect(await queued(email)).toMatchObject({ status: 'failed', attempts: 2 });

    const again = await request(t.app).post('/api/auth/send-verification-email').send({ email });
    expect(again.status).toBe(200);
    const rows = await database.db.select().from(mailQueue).where(eq(mailQueue.to, email));
    expect(rows.map((r) => r.status).sort()).toEqual(['failed', 'pending']);
  });
});
