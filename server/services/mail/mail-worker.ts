import { and, eq, inArray, sql } from 'drizzle-orm';
import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { Database } from '../../db/database';
import { mailQueue } from '../../db/schema/mail';
import type { MailQueue } from './mail-queue';

export interface MailWorkerOptions {
  db: Database;
  queue: MailQueue;
  transport: Pick<Transporter, 'sendMail'>;
  from: string;
  logger: Logger;
  /** How often due messages are looked for when nothing wakes the worker. */
  pollMs?: number;
  maxAttempts?: number;
  /** Wait before the first retry; each later one waits four times longer. */
  retryBaseMs?: number;
  /** A claimed message not finished in this time is taken up again (a crashed instance). */
  claimMs?: number;
}

/**
 * Sends what MailQueue stored. Claims due rows with one UPDATE … FOR UPDATE SKIP LOCKED, so
 * several server instances never send the same message twice, and retries a failed send with
 * growing waits before marking it failed (the user can ask for the mail again).
 */
export class MailWorker {
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;
  private again = false;
  private stopped = false;
  private readonly pollMs: number;
  private readonly maxAttempts: number;
  private readonly retryBaseMs: number;
  private readonly claimMs: number;

  constructor(private readonly options: MailWorkerOptions) {
    this.pollMs = options.pollMs ?? 2_000;
    this.maxAttempts = options.maxAttempts ?? 5;
    this.retryBaseMs = options.retryBaseMs ?? 2_000;
    this.claimMs = options.claimMs ?? 60_000;
  }

  start(): void {
    this.stopped = false;
    this.options.queue.onEnqueued(() => this.kick());
    this.timer = setInterval(() => this.kick(), this.pollMs);
    this.timer.unref();
    this.kick();
  }

  async stop(): Promise<void> {
    this.stopped = true;
    this.options.queue.onEnqueued(null);
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.running;
  }

  /** Runs a pass now (or right after the one in progress). */
  kick(): void {
    if (this.stopped) return;
    if (this.running) {
      this.again = true;
      return;
    }
    this.running = (async () => {
      try {
        do {
          this.again = false;
          await this.runOnce();
        } while (this.again && !this.stopped);
      } catch (error) {
        this.options.logger.error({ err: error }, 'mail worker pass failed');
      } finally {
        this.running = null;
      }
    })();
  }

  /** One pass: claims and sends every message that is due; resolves to how many were sent. */
  async runOnce(): Promise<number> {
    const { db, transport, from, logger } = this.options;
    const claimed = await db.execute(sql`
      update ${mailQueue}
      set status = 'sending', attempts = attempts + 1,
          next_attempt_at = now() + make_interval(secs => ${this.claimMs / 1000})
      where id in (
        select id from ${mailQueue}
        where status in ('pending', 'sending') and next_attempt_at <= now()
        order by id limit 20
        for update skip locked)
      returning id`);
    const ids = rowsOf<{ id: number | string }>(claimed).map((row) => Number(row.id));
    if (!ids.length) return 0;
    const rows = await db.select().from(mailQueue).where(inArray(mailQueue.id, ids));
    let sent = 0;
    for (const row of rows) {
      try {
        await transport.sendMail({ from, to: row.to, subject: row.subject, html: row.html, text: row.text });
        await db
          .update(mailQueue)
          .set({ status: 'sent', sentAt: new Date(), lastError: null })
          .where(and(eq(mailQueue.id, row.id), eq(mailQueue.status, 'sending')));
        sent += 1;
        logger.info({ mailId: row.id, purpose: row.purpose, attempts: row.attempts }, 'mail sent');
      } catch (error) {
        const message = error instanceof Error ? error.message : String(error);
        const giveUp = row.attempts >= this.maxAttempts;
        const waitMs = this.retryBaseMs * 4 ** (row.attempts - 1);
        await db
          .update(mailQueue)
          .set({
            status: giveUp ? 'failed' : 'pending',
            lastError: message.slice(0, 1000),
            nextAttemptAt: new Date(Date.now() + waitMs),
          })
          .where(eq(mailQueue.id, row.id));
        if (giveUp) logger.error({ mailId: row.id, purpose: row.purpose, attempts: row.attempts, err: error }, 'mail not sent; giving up');
        else logger.warn({ mailId: row.id, purpose: row.purpose, attempts: row.attempts, retryInMs: waitMs, err: error }, 'mail not sent; will retry');
      }
    }
    return sent;
  }

  /** For tests and shutdown: passes until nothing is due now. */
  async drain(): Promise<void> {
    await this.running;
    while ((await this.runOnce()) > 0) {
      // keep going: more may have become due while sending
    }
  }
}

// PGlite answers `{ rows }`, node-postgres a QueryResult with `rows` too.
function rowsOf<T>(result: unknown): T[] {
  return ((result as { rows?: T[] }).rows ?? []) as T[];
}
