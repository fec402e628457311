import { eq } from 'drizzle-orm';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { users } from '../../server/db/schema/auth';
import { mailMessages, mailQueue } from '../../server/db/schema/mail';
import { startLocalSmtpServer, type LocalSmtpServer } from '../../server/services/mail/local-smtp-server';
import { MailQueue } from '../../server/services/mail/mail-queue';
import { MailWorker } from '../../server/services/mail/mail-worker';
import { smtpTransport } from '../../server/services/mail/transport';
import { GOOD_PASSWORD, PUBLIC_URL, authApp, setRole, signedInAgent, uniqueEmail } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';

const logger = pino({ level: 'silent' });
let database: DatabaseHandle;
let smtp: LocalSmtpServer;
let worker: MailWorker;
let queue: MailQueue;

beforeAll(async () => {
  database = await openTestDatabase();
  smtp = await startLocalSmtpServer({ db: database.db, logger });
  queue = new MailQueue(database.db);
  worker = new MailWorker({ db: database.db, queue, transport: smtpTransport(smtp.url), from: 'Pinwork <no-reply@pinwork.example>', logger, pollMs: 200 });
  worker.start();
});
afterAll(async () => {
  await worker?.stop();
  await smtp?.close();
  await database?.close();
});

async function waitForMessage(to: string) {
  for (let i = 0; i < 100; i += 1) {
    const [row] = await database.db.select().from(mailMessages).where(eq(mailMessages.to, to));
    if (row) return row;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`no message to ${to} reached the SMTP server`);
}

describe('mail through SMTP', () => {
  it('signs up, receives the verification message over SMTP, follows its link and is verified', async () => {
    const t = authApp(database, { mailQueue: queue });
    const email = uniqueEmail('smtp');
    const up = await request(t.app).post('/api/auth/sign-up/email').send({ name: 'Sid Mailer', email, password: GOOD_PASSWORD });
    expect(up.status).toBe(200);

    const message = await waitForMessage(email);
    expect(message.subject).toBe('Confirm your e-mail address for Pinwork');
    expect(message.from).toBe('no-reply@pinwork.example');
    expect(message.raw).toMatch(/multipart\/alternative/i);
    expect(message.html).toContain('Confirm my address');
    const link = /(http:\/\/pinwork\.test\/verify-email\?token=\S+)/.exec(message.text ?? '')?.[1];
    expect(link, message.text ?? '').toBeDefined();
    const token = new URL(link!).searchParams.get('token')!;
    expect(link!.startsWith(PUBLIC_URL)).toBe(true);

    const verified = await request(t.app).get('/api/auth/verify-email').query({ token });
    expect(verified.status).toBe(200);
    const [user] = await database.db.select().from(users).where(eq(users.email, email));
    expect(user!.emailVerified).toBe(true);
    const [queued] = await database.db.select().from(mailQueue).where(eq(mailQueue.to, email));
    expect(queued).toMatchObject({ status: 'sent', attempts: 1 });

    // The admin's dev outbox shows the same message, HTML and text.
    await setRole(database, user!.id, 'admin');
    const admin = await signedInAgent(t, email);
    const list = await admin.get('/api/dev/mail').query({ to: email });
    expect(list.body.total).toBe(1);
    const one = await admin.get(`/api/dev/mail/${list.body.items[0].id}`);
    expect(one.body).toMatchObject({ to: email, subject: message.subject, html: message.html, text: message.text });
    const html = await admin.get(`/api/dev/mail/${list.body.items[0].id}/html`);
    expect(html.headers['content-type']).toMatch(/^text\/html/);
    expect(html.headers['content-security-policy']).toMatch(/sandbox/);
    expect(html.text).toContain('Confirm my address');
  });
});
