import { ConfigError, readConfig } from './config';
import { DataFolderInUseError } from './db/data-folder-lock';
import { createLogger } from './logger';
import { startServer, type RunningServer } from './start-server';

async function main(): Promise<void> {
  let config;
  try {
    config = readConfig();
  } catch (error) {
    if (error instanceof ConfigError) {
      process.stderr.write(`${error.message}\n`);
      process.exit(1);
    }
    throw error;
  }
  const logger = createLogger(config.logLevel);

  let running: RunningServer | null = null;
  let stopRequested: string | null = null;

  const shutdown = (reason: string) => {
    if (stopRequested) {
      // A second Ctrl-C means "now": leave without waiting for requests in flight.
      logger.warn({ reason }, 'second stop signal: exiting at once');
      process.exit(1);
    }
    stopRequested = reason;
    if (running) stop(running, reason); // else still starting: main() stops once the start ends
  };
  const stop = (server: RunningServer, reason: string) => {
    server.stop(reason).then(
      () => process.exit(0),
      (error: unknown) => {
        logger.error({ err: error }, 'error while stopping');
        process.exit(1);
      },
    );
  };
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  process.on('SIGINT', () => shutdown('SIGINT'));

  try {
    running = await startServer(config, logger, (error) => {
      logger.fatal({ err: error }, 'lost the lock on the data folder; stopping so two servers never share it');
      shutdown('lock compromised');
    });
  } catch (error) {
    if (error instanceof DataFolderInUseError) {
      process.stderr.write(`${error.message}\n`);
      process.exit(1);
    }
    if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      process.stderr.write(`Pinwork cannot listen on port ${config.port}: it is in use; stop what uses it or set PORT to another port\n`);
      process.exit(1);
    }
    logger.fatal({ err: error }, 'Pinwork could not start');
    process.exit(1);
  }

  const startupMs = Math.round(performance.now());
  logger.info({ url: running.url, startupMs }, 'listening');
  process.stdout.write(`Pinwork is running at ${running.url} (ready in ${startupMs} ms)\n`);
  if (running.demoAccounts.length) {
    const lines = running.demoAccounts.map((a) => `  ${a.role.padEnd(9)} ${a.email.padEnd(36)} ${a.password}   (${a.name})`);
    process.stdout.write(`Demo accounts (development only):\n${lines.join('\n')}\n`);
  }
  if (running.demoApiKey) {
    const k = running.demoApiKey;
    process.stdout.write(`Demo API key (development only, ${k.organisation}; scopes ${k.scopes.join(', ')}):\n  ${k.key}\n  API reference with this key filled in: ${running.url}/developers/api\n`);
  }
  if (stopRequested) stop(running, stopRequested);
}

void main();
