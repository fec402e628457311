import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { apiKeys } from '../../server/db/schema/api-access';
import { auditLog } from '../../server/db/schema/audit';
import { demoApiKey, demoApiKeyAtStart, demoApiKeyPrefix, liveDemoApiKey } from '../../server/db/seed-demo-key';
import { prefixOf } from '../../server/services/api-keys/key-format';
import { v1Operations } from '../../server/routes/v1-operations';
import { demoApiKeySchema } from '../../shared/api/demo-key';
import { apiProblemTypes } from '../../shared/api/v1';
import { ORIGIN, authApp } from '../helpers/auth-fixture';
import { type ServerProcess, serverProcesses, stopProcess } from '../helpers/server-process';
import { openTestDatabase } from '../helpers/test-database';
import { seedV1 } from './v1-fixture';

// The development demo key of Brightwater Rigging Supply: seeded at a development start only,
// handed out by GET /api/dev/demo-key (development and test apps only), accepted for every
// documented example, and revoked by a production start that finds it.

let database: DatabaseHandle;
beforeAll(async () => {
  database = await openTestDatabase();
  await seedV1(database);
}, 120_000);
afterAll(async () => {
  await database?.close();
});

const demoRows = () => database.db.select().from(apiKeys).where(eq(apiKeys.prefix, demoApiKeyPrefix));
const bearer = { Authorization: `Bearer ${demoApiKey.key}` };

describe('the demo key in the database', () => {
  it('is a well-formed secret key, and a test or production start seeds nothing', async () => {
    expect(prefixOf(demoApiKey.key)).toBe(demoApiKeyPrefix);
    expect(demoApiKeyPrefix.startsWith('pw_sk_')).toBe(true);
    expect(await demoApiKeyAtStart(database.db, 'test')).toEqual({ key: null, retired: false });
    expect(await demoApiKeyAtStart(database.db, 'production')).toEqual({ key: null, retired: false });
    expect(await demoRows()).toEqual([]);
  });

  it('is answered 404 by the dev endpoint before it is seeded', async () => {
    const res = await request(authApp(database).app).get('/api/dev/demo-key');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/problem\+json/);
    expect(JSON.stringify(res.body)).not.toContain(demoApiKey.key);
  });

  it('is seeded once by a development start, for the supplier organisation, stored only as a hash', async () => {
    const first = await demoApiKeyAtStart(database.db, 'development');
    expect(first.key).toEqual({ key: demoApiKey.key, prefix: demoApiKeyPrefix, name: demoApiKey.name, organisation: 'Brightwater Rigging Supply', scopes: [...demoApiKey.scopes] });
    const second = await demoApiKeyAtStart(database.db, 'development');
    expect(second.key?.key).toBe(demoApiKey.key);
    const rows = await demoRows();
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ kind: 'secret', revokedAt: null, createdBy: 'demo-supplier' });
    expect(rows[0]!.hash).toMatch(/^[0-9a-f]{64}$/);
    expect(JSON.stringify(rows[0])).not.toContain(demoApiKey.key.slice(prefixOf(demoApiKey.key)!.length + 1));
  });

  it('is handed out by GET /api/dev/demo-key in a development or test app, and never in a production one', async () => {
    const dev = await request(authApp(database, { mode: 'development' }).app).get('/api/dev/demo-key');
    expect(dev.status).toBe(200);
    expect(dev.headers['cache-control']).toBe('no-store');
    expect(demoApiKeySchema.parse(dev.body).key).toBe(demoApiKey.key);
    const test = await request(authApp(database).app).get('/api/dev/demo-key');
    expect(test.status).toBe(200);

    const prod = await request(authApp(database, { mode: 'production' }).app).get('/api/dev/demo-key');
    expect(prod.status).toBe(404);
    expect(prod.headers['content-type']).toMatch(/problem\+json/);
    expect(JSON.stringify(prod.body)).not.toContain(demoApiKey.key);
  });

  it.each(v1Operations.map((op) => [op.id, op] as const))('runs the documented example of %s with the demo key', async (_id, op) => {
    const app = authApp(database).app;
    const url = `/api/v1${op.example.path}`;
    const res = await (op.method === 'get' ? request(app).get(url) : request(app).post(url).send(op.example.body as object)).set(bearer);
    expect(res.status, res.text.slice(0, 300)).toBe(200);
  });

  it('is accepted from a browser on our own origin (the reference page), which sends an Origin header with a POST', async () => {
    const app = authApp(database).app;
    const solve = v1Operations.find((op) => op.id === 'solveTemplate')!;
    const res = await request(app).post(`/api/v1${solve.example.path}`).set(bearer).set('Origin', ORIGIN).send(solve.example.body as object);
    expect(res.status, res.text.slice(0, 300)).toBe(200);
    // Same origin needs no CORS: a secret key never gets an Access-Control-Allow-Origin answer.
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('is revoked (and audited) by a production start on a database that has it, and not brought back by a later development start', async () => {
    expect(await demoApiKeyAtStart(database.db, 'production')).toEqual({ key: null, retired: true });
    const [row] = await demoRows();
    expect(row!.revokedAt).toBeInstanceOf(Date);
    const audits = await database.db.select().from(auditLog).where(and(eq(auditLog.action, 'api-key.revoked'), eq(auditLog.target, row!.id)));
    expect(audits).toHaveLength(1);
    expect(audits[0]).toMatchObject({ actorKind: 'system' });

    // A fresh app (no cached key rows) refuses it as revoked.
    const res = await request(authApp(database).app).get('/api/v1/templates').set(bearer);
    expect(res.status).toBe(401);
    expect(res.body.type).toBe(apiProblemTypes.keyRevoked);
    expect((await request(authApp(database).app).get('/api/dev/demo-key')).status).toBe(404);

    expect(await demoApiKeyAtStart(database.db, 'development')).toEqual({ key: null, retired: false });
    expect(await liveDemoApiKey(database.db)).toBeNull();
    expect(await demoApiKeyAtStart(database.db, 'production')).toEqual({ key: null, retired: false });
  });
});

// The real server: what `npm start` prints and serves in each mode, on one data folder.
const processes = serverProcesses('demo-key');
const newDataHome = processes.newDataHome;

/** The start message is written in pieces after the ready line; wait for the piece asked for. */
async function printed(server: ServerProcess, text: string): Promise<string> {
  const deadline = Date.now() + 10_000;
  while (!server.output().includes(text) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
  return server.output();
}

const production = { NODE_ENV: 'production', AUTH_SECRET: 'demo-key-test-secret-0123456789abcdef', PUBLIC_URL: 'http://localhost', SMTP_URL: 'smtp://127.0.0.1:9' };

describe('the demo key at a real start', { timeout: 120_000 }, () => {
  it('is printed and served in development; production prints nothing, answers 404 and refuses the key', async () => {
    const home = await newDataHome();
    const dev = processes.start({ ...home, NODE_ENV: 'development', SMTP_URL: 'smtp://127.0.0.1:9' });
    const devUrl = await dev.ready;
    expect(await printed(dev, '/developers/api')).toContain(`Demo API key (development only, Brightwater Rigging Supply; scopes read, solve, sweep, sensitivity, author):\n  ${demoApiKey.key}\n`);
    expect((await fetch(`${devUrl}/api/dev/demo-key`)).status).toBe(200);
    expect((await fetch(`${devUrl}/api/v1/templates`, { headers: bearer })).status).toBe(200);
    await stopProcess(dev);

    const prod = processes.start({ ...home, ...production });
    const prodUrl = await prod.ready;
    expect(prod.output()).not.toContain('Demo API key');
    expect(prod.output()).not.toContain(demoApiKey.key);
    const endpoint = await fetch(`${prodUrl}/api/dev/demo-key`);
    expect(endpoint.status).toBe(404);
    expect(await endpoint.text()).not.toContain(demoApiKey.key);
    const call = await fetch(`${prodUrl}/api/v1/templates`, { headers: bearer });
    expect(call.status).toBe(401);
    expect(((await call.json()) as { type: string }).type).toBe(apiProblemTypes.keyRevoked);
  });

  it('is never seeded by a production start on a new database', async () => {
    const prod = processes.start({ ...(await newDataHome()), ...production });
    const url = await prod.ready;
    expect(prod.output()).not.toContain('Demo API key');
    const call = await fetch(`${url}/api/v1/templates`, { headers: bearer });
    expect(call.status).toBe(401);
    expect(((await call.json()) as { type: string }).type).toBe(apiProblemTypes.keyInvalid);
  });
});
