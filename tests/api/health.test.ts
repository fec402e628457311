import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { healthSchema } from '../../shared/api/health';
import { problemSchema } from '../../shared/api/problem';
import type { DatabaseHandle } from '../../server/db/database';
import { expectedDriver, openTestDatabase } from '../helpers/test-database';
import { appFor } from './app-fixture';

const packageVersion = (JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8')) as { version: string }).version;

let database: DatabaseHandle;
beforeAll(async () => {
  database = await openTestDatabase();
});
afterAll(async () => {
  await database?.close();
});

describe('GET /api/health', () => {
  it('answers 200 with the version from package.json and a reachable database', async () => {
    const res = await request(appFor(database)).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    const health = healthSchema.parse(res.body);
    expect(health.status).toBe('ok');
    expect(health.version).toBe(packageVersion);
    expect(health.database.ok).toBe(true);
    expect(health.database.driver).toBe(expectedDriver());
    expect(health.database.latencyMs).toBeGreaterThanOrEqual(0);
    expect(health.mode).toBe('test');
  });

  it('names the mode the server runs in, which decides whether demo extras exist', async () => {
    for (const mode of ['development', 'production'] as const) {
      const res = await request(appFor(database, { accounts: { mode, secret: 'health-test-secret-0123456789abcdef' } })).get('/api/health');
      expect(healthSchema.parse(res.body).mode).toBe(mode);
    }
  });

  it('answers 503 degraded when the database does not answer', async () => {
    const unreachable: DatabaseHandle = {
      ...database,
      ping: () => Promise.reject(new Error('connection refused')),
    };
    const res = await request(appFor(unreachable)).get('/api/health');
    expect(res.status).toBe(503);
    const health = healthSchema.parse(res.body);
    expect(health.status).toBe('degraded');
    expect(health.database).toEqual({ ok: false, driver: expectedDriver(), latencyMs: null });
  });

  it('refuses other methods with a 405 problem that lists the allowed ones', async () => {
    const res = await request(appFor(database)).post('/api/health').send({});
    expect(res.status).toBe(405);
    expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(res.headers.allow).toBe('GET, HEAD');
    expect(problemSchema.parse(res.body)).toMatchObject({ status: 405, instance: '/api/health' });
  });
});
