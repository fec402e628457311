import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { ServerConfig } from '../../config';

/**
 * The configured AUTH_SECRET; else (development only) one kept in the data folder so sessions
 * survive a restart, or a fresh one per process for an in-memory database.
 */
export function authSecretFor(config: Pick<ServerConfig, 'authSecret' | 'dataDir' | 'mode'>): string {
  if (config.authSecret) return config.authSecret;
  if (config.mode === 'production') throw new Error('AUTH_SECRET is required in production');
  if (config.dataDir === 'memory') return randomBytes(32).toString('base64url');
  const file = path.join(config.dataDir, 'auth-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(config.dataDir, { recursive: true });
  const secret = randomBytes(32).toString('base64url');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}
