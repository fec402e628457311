import type { Database } from '../../db/database';
import { mailQueue } from '../../db/schema/mail';

export interface OutgoingMail {
  to: string;
  subject: string;
  html: string;
  text: string;
  purpose: string;
}

/**
 * The one way the app sends mail: a row in mail_queue. The request that causes a message only
 * waits for this insert; the worker sends it (and retries) in the background.
 */
export class MailQueue {
  private listener: (() => void) | null = null;

  constructor(private readonly db: Database) {}

  async enqueue(mail: OutgoingMail): Promise<number> {
    const [row] = await this.db.insert(mailQueue).values(mail).returning({ id: mailQueue.id });
    this.listener?.();
    return row!.id;
  }

  /** The worker asks to be woken when something is queued, so mail goes out at once. */
  onEnqueued(listener: (() => void) | null): void {
    this.listener = listener;
  }
}
