import pino from 'pino';
import { createApp, type AppOptions } from '../../server/app';
import type { DatabaseHandle } from '../../server/db/database';

export const silentLogger = pino({ level: 'silent' });

export function appFor(database: DatabaseHandle, options: Partial<AppOptions> = {}) {
  return createApp({ database, logger: silentLogger, ...options });
}
