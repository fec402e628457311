import { sql } from 'drizzle-orm';
import { bigint, check, index, integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

export const mailQueueStatuses = ['pending', 'sending', 'sent', 'failed'] as const;
export type MailQueueStatus = (typeof mailQueueStatuses)[number];

// Outgoing mail is written here first and sent by a background worker, so a request that
// causes a message never waits for SMTP and never loses the message when SMTP is down.
export const mailQueue = pgTable(
  'mail_queue',
  {
    id: bigint('id', { mode: 'number' }).primaryKey().generatedAlwaysAsIdentity(),
    to: text('to').notNull(),
    subject: text('subject').notNull(),
    html: text('html').notNull(),
    text: text('text').notNull(),
    /** What the message is for (verify-email, reset-password, invitation…), for logs and tests. */
    purpose: text('purpose').notNull(),
    status: text('status').$type<MailQueueStatus>().notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }).notNull().defaultNow(),
    lastError: text('last_error'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
  },
  (t) => [
    check('mail_queue_status_known', sql`${t.status} in ('pending', 'sending', 'sent', 'failed')`),
    index('mail_queue_due_idx').on(t.status, t.nextAttemptAt),
  ],
);

// What the project's own development SMTP server received: the dev outbox.
export const mailMessages = pgTable(
  'mail_messages',
  {
    id: bigint('id', { mode: 'number' }).primaryKey().generatedAlwaysAsIdentity(),
    to: text('to').notNull(),
    from: text('from').notNull(),
    subject: text('subject').notNull(),
    html: text('html'),
    text: text('text'),
    raw: text('raw'),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('mail_messages_received_at_idx').on(t.receivedAt)],
);
