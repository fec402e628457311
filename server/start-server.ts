import { once } from 'node:events';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Logger } from 'pino';
import { createApp, stopAppWork } from './app';
import type { ServerConfig } from './config';
import { MEMORY_DATA_DIR, openDatabase } from './db/client';
import { lockDataFolder, type DataFolderLock } from './db/data-folder-lock';
import type { DatabaseHandle } from './db/database';
import { seedDemoData } from './db/seed';
import { seedDemoAccounts, type DemoAccount } from './db/seed-demo-accounts';
import { demoApiKeyAtStart } from './db/seed-demo-key';
import { seedBuiltInTemplates } from './db/seed-templates';
import { builtInTemplates } from '../templates/registry';
import type { DemoApiKey } from '../shared/api/demo-key';
import { recordAudit } from './services/audit';
import { authSecretFor } from './services/auth/secret';
import { startMailDelivery, type MailDelivery } from './services/mail/mail-delivery';
import { appVersion } from './version';

// Long enough for any real request; a client that holds a connection open longer is cut off.
const DRAIN_TIMEOUT_MS = 10_000;

export interface RunningServer {
  url: string;
  port: number;
  /** Development only: the seeded demo sign-ins, for the start message. */
  demoAccounts: DemoAccount[];
  /** Development only: the seeded demo API key, for the start message. */
  demoApiKey: DemoApiKey | null;
  /** Stops accepting, lets in-flight requests finish, then closes the database and the lock. */
  stop(reason: string): Promise<void>;
}

export async function startServer(
  config: ServerConfig,
  logger: Logger,
  onLockCompromised: (error: Error) => void,
): Promise<RunningServer> {
  const embeddedFolder = !config.databaseUrl && config.dataDir !== MEMORY_DATA_DIR;
  // The lock comes before the database is touched, so a second start changes nothing on disk.
  const lock: DataFolderLock | null = embeddedFolder
    ? await lockDataFolder(config.dataDir, { onCompromised: onLockCompromised })
    : null;

  let database: DatabaseHandle | null = null;
  let mail: MailDelivery | null = null;
  try {
    database = await openDatabase({
      databaseUrl: config.databaseUrl,
      dataDir: config.dataDir,
      snapshotFile: config.snapshotFile,
      logger,
    });
    const seeded = await seedDemoData(database.db, { people: config.mode !== 'production' });
    logger.info({ seeded }, 'demo data checked');
    const seededTemplates = await seedBuiltInTemplates(database.db, builtInTemplates, 'tallow-ridge-engineering');
    logger.info({ seededTemplates }, 'built-in templates checked');
    await recordAudit(database.db, {
      actorKind: 'system',
      action: 'server.start',
      details: { version: appVersion, driver: database.driver, pid: process.pid },
    });

    const demoAccounts = config.mode === 'development' ? (await seedDemoAccounts(database.db)).accounts : [];
    const demoKey = await demoApiKeyAtStart(database.db, config.mode);
    if (demoKey.retired) logger.warn('revoked the development demo API key found in this database: production never accepts it');
    mail = await startMailDelivery(database.db, logger, config);

    let listeningUrl = '';
    const app = createApp({
      database,
      logger,
      clientDir: config.clientDir,
      trustProxy: config.trustProxy,
      accounts: {
        mode: config.mode,
        secret: authSecretFor(config),
        publicUrl: () => config.publicUrl ?? (listeningUrl || (config.port ? `http://localhost:${config.port}` : '')),
        // The Vite dev and preview servers proxy /api here from their own origins.
        trustedOrigins: [
          ...config.trustedOrigins,
          ...(config.mode === 'production' ? [] : ['http://localhost:5173', 'http://127.0.0.1:5173', 'http://localhost:4173']),
        ],
        mailQueue: mail.queue,
      },
    });
    const server = http.createServer(app);
    server.listen(config.port, config.host);
    await once(server, 'listening');
    const port = (server.address() as AddressInfo).port;
    const shownHost = !config.host || config.host === '0.0.0.0' || config.host === '::' ? 'localhost' : config.host;
    const url = `http://${shownHost}:${port}`;
    listeningUrl = url;
    const openMail = mail;

    const openDb = database;
    let stopping: Promise<void> | null = null;
    const stop = (reason: string) => {
      stopping ??= (async () => {
        logger.info({ reason }, 'stopping: no new connections, finishing requests in flight');
        const closed = new Promise<void>((resolve) => server.close(() => resolve()));
        const timer = setTimeout(() => {
          logger.warn({ ms: DRAIN_TIMEOUT_MS }, 'requests still open after the drain timeout; closing them');
          server.closeAllConnections();
        }, DRAIN_TIMEOUT_MS);
        await closed;
        clearTimeout(timer);
        // Calls counted since the last batch are written while the database is still open.
        await stopAppWork(app).catch((error: unknown) => logger.error({ err: error }, 'could not write the last API usage counts'));
        await recordAudit(openDb.db, {
          actorKind: 'system',
          action: 'server.stop',
          details: { version: appVersion, reason, pid: process.pid },
        }).catch((error: unknown) => logger.error({ err: error }, 'could not record the stop'));
        await openMail.stop().catch((error: unknown) => logger.error({ err: error }, 'could not stop the mail worker'));
        await openDb.close();
        await lock?.release();
        logger.info('stopped cleanly');
      })();
      return stopping;
    };
    return { url, port, demoAccounts, demoApiKey: demoKey.key, stop };
  } catch (error) {
    await mail?.stop().catch(() => undefined);
    await database?.close().catch(() => undefined);
    await lock?.release().catch(() => undefined);
    throw error;
  }
}
