import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import type { Logger } from 'pino';
import { SMTPServer } from 'smtp-server';
import type { Database } from '../../db/database';
import { mailMessages } from '../../db/schema/mail';

export interface LocalSmtpServer {
  /** smtp://127.0.0.1:<port>, for nodemailer. */
  url: string;
  port: number;
  close(): Promise<void>;
}

const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;

/**
 * The development and test mail server: listens on loopback only, takes every message without
 * authentication and stores it in mail_messages, where the dev outbox shows it. Never started
 * in production.
 */
export async function startLocalSmtpServer(options: { db: Database; logger: Logger; port?: number }): Promise<LocalSmtpServer> {
  const { db, logger } = options;
  const server = new SMTPServer({
    // Plain loopback SMTP: no TLS offered, so nodemailer does not try to upgrade.
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    size: MAX_MESSAGE_BYTES,
    banner: 'Pinwork development mail server',
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', callback);
      stream.on('end', () => {
        if ((stream as unknown as { sizeExceeded?: boolean }).sizeExceeded) {
          callback(Object.assign(new Error('message too large'), { responseCode: 552 }));
          return;
        }
        const raw = Buffer.concat(chunks);
        void store(raw, session.envelope.rcptTo.map((r) => r.address), session.envelope.mailFrom ? session.envelope.mailFrom.address : '')
          .then(() => callback())
          .catch((error: unknown) => {
            logger.error({ err: error }, 'local SMTP server could not store a message');
            callback(Object.assign(new Error('could not store the message'), { responseCode: 451 }));
          });
      });
    },
  });

  async function store(raw: Buffer, envelopeTo: string[], envelopeFrom: string): Promise<void> {
    const parsed = await simpleParser(raw);
    await db.insert(mailMessages).values({
      to: addressText(parsed.to) || envelopeTo.join(', '),
      from: addressText(parsed.from) || envelopeFrom,
      subject: parsed.subject ?? '',
      html: typeof parsed.html === 'string' ? parsed.html : null,
      text: parsed.text ?? null,
      raw: raw.toString('utf8'),
    });
  }

  server.on('error', (error) => logger.error({ err: error }, 'local SMTP server error'));
  server.listen(options.port ?? 0, '127.0.0.1');
  await once(server.server, 'listening');
  const port = (server.server.address() as AddressInfo).port;
  return {
    url: `smtp://127.0.0.1:${port}`,
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

function addressText(value: AddressObject | AddressObject[] | undefined): string {
  if (!value) return '';
  const list = Array.isArray(value) ? value : [value];
  return list
    .flatMap((entry) => entry.value)
    .map((address) => address.address ?? '')
    .filter(Boolean)
    .join(', ');
}
