import type { Logger } from 'pino';
import type { ServerConfig } from '../../config';
import type { Database } from '../../db/database';
import { startLocalSmtpServer, type LocalSmtpServer } from './local-smtp-server';
import { MailQueue } from './mail-queue';
import { MailWorker } from './mail-worker';
import { smtpTransport } from './transport';

export interface MailDelivery {
  queue: MailQueue;
  /** Where nodemailer sends: SMTP_URL, or the local development server. */
  smtpUrl: string;
  local: boolean;
  stop(): Promise<void>;
}

/** The queue, its worker and the SMTP transport; without SMTP_URL (never in production) a local server. */
export async function startMailDelivery(db: Database, logger: Logger, config: Pick<ServerConfig, 'smtpUrl' | 'mailFrom' | 'mode'>): Promise<MailDelivery> {
  let local: LocalSmtpServer | null = null;
  let smtpUrl = config.smtpUrl;
  if (!smtpUrl) {
    if (config.mode === 'production') throw new Error('SMTP_URL is required in production');
    local = await startLocalSmtpServer({ db, logger });
    smtpUrl = local.url;
    logger.info({ smtpUrl }, 'development mail server listening; messages appear in the dev outbox');
  }
  const transport = smtpTransport(smtpUrl);
  const queue = new MailQueue(db);
  const worker = new MailWorker({ db, queue, transport, from: config.mailFrom, logger });
  worker.start();
  return {
    queue,
    smtpUrl,
    local: local !== null,
    async stop() {
      await worker.stop();
      transport.close();
      await local?.close();
    },
  };
}
