import type { Health } from '../../shared/api/health';
import type { DatabaseHandle } from '../db/database';

const PING_TIMEOUT_MS = 2000;

export async function checkHealth(database: DatabaseHandle, version: string, mode: Health['mode']): Promise<Health> {
  let latencyMs: number | null = null;
  try {
    latencyMs = await withTimeout(database.ping(), PING_TIMEOUT_MS);
  } catch {
    latencyMs = null;
  }
  const ok = latencyMs !== null;
  return {
    status: ok ? 'ok' : 'degraded',
    version,
    mode,
    database: { ok, driver: database.driver, latencyMs: ok ? Math.round(latencyMs! * 100) / 100 : null },
  };
}

function withTimeout<T>(promise: Promise<T>, ms: number): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`no answer within ${ms} ms`)), ms);
  });
  return Promise.race([promise, timeout]).finally(() => clearTimeout(timer));
}
