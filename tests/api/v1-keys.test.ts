import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { apiKeyListSchema, apiProblemTypes, createdApiKeySchema, usageReportSchema } from '../../shared/api/v1';
import type { DatabaseHandle } from '../../server/db/database';
import { apiKeys } from '../../server/db/schema/api-access';
import { hashKey } from '../../server/services/api-keys/key-format';
import { ORIGIN } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, expectProblem, seedV1, v1App, type V1Test } from './v1-fixture';

let database: DatabaseHandle;
let t: V1Test;
const shared = { supplierOrgId: '' };
beforeAll(async () => {
  database = await openTestDatabase();
  const { supplierOrgId } = await seedV1(database);
  shared.supplierOrgId = supplierOrgId;
  t = await v1App(database, supplierOrgId);
}, 120_000);
afterAll(async () => {
  await database?.close();
});

const list = '/api/v1/templates';
const solve = '/api/v1/templates/wall-jib-tie-rod/solve';
const bearer = (key: string) => ({ Authorization: `Bearer ${key}` });

describe('API keys', () => {
  it('are shown once, stored as a hash with a visible prefix', async () => {
    const created = await createKey(t, { name: 'Configurator' });
    expect(created.key).toMatch(/^pw_sk_[0-9a-z]{10}_[A-Za-z0-9_-]{32}$/);
    expect(created.key.startsWith(created.info.prefix)).toBe(true);
    const [row] = await database.db.select().from(apiKeys).where(eq(apiKeys.id, created.info.id));
    expect(row!.hash).toBe(hashKey(created.key));
    expect(JSON.stringify(row)).not.toContain(created.key);
    const listed = apiKeyListSchema.parse((await t.supplier.get(`/api/organisations/${t.supplierOrgId}/api-keys`)).body);
    expect(JSON.stringify(listed)).not.toContain(created.key.slice(created.info.prefix.length));
    expect(listed.items.map((k) => k.prefix)).toContain(created.info.prefix);
  });

  it('refuse a missing, malformed and unknown key with their own problem types', async () => {
    const missing = expectProblem(await request(t.app).get(list), 401, apiProblemTypes.keyMissing);
    expect(missing.detail).toMatch(/Authorization: Bearer/);
    expectProblem(await request(t.app).get(list).set('Authorization', 'Basic abc'), 401, apiProblemTypes.keyInvalid);
    expectProblem(await request(t.app).get(list).set(bearer('pw_sk_0000000000_' + 'a'.repeat(32))), 401, apiProblemTypes.keyInvalid);
    const real = await createKey(t);
    const tampered = real.key.slice(0, -1) + (real.key.endsWith('a') ? 'b' : 'a');
    const res = await request(t.app).get(list).set(bearer(tampered));
    expectProblem(res, 401, apiProblemTypes.keyInvalid);
    expect(res.headers['www-authenticate']).toMatch(/^Bearer/);
  });

  it('refuse a revoked key on the very next request', async () => {
    const { key, info } = await createKey(t);
    expect((await request(t.app).get(list).set(bearer(key))).status).toBe(200);
    const revoked = await t.supplier.post(`/api/organisations/${t.supplierOrgId}/api-keys/${info.id}/revoke`).set('Origin', ORIGIN).send({});
    expect(revoked.status).toBe(200);
    expect(revoked.body.revokedAt).not.toBeNull();
    expectProblem(await request(t.app).get(list).set(bearer(key)), 401, apiProblemTypes.keyRevoked);
  });

  it('refuse a key revoked on another instance within a second', async () => {
    const other = await v1App(database, t.supplierOrgId);
    const { key, info } = await createKey(t);
    expect((await request(other.app).get(list).set(bearer(key))).status).toBe(200);
    await t.admin.post(`/api/admin/api-keys/${info.id}/revoke`).set('Origin', ORIGIN).send({}).expect(200);
    await new Promise((r) => setTimeout(r, 1050));
    expectProblem(await request(other.app).get(list).set(bearer(key)), 401, apiProblemTypes.keyRevoked);
  });

  it('keep a rotated key valid for the grace period, then refuse it; the new key works', async () => {
    const { key: oldKey, info } = await createKey(t);
    const res = await t.supplier.post(`/api/organisations/${t.supplierOrgId}/api-keys/${info.id}/rotate`).set('Origin', ORIGIN).send({ graceSeconds: 1 });
    expect(res.status, res.text).toBe(201);
    const rotated = createdApiKeySchema.parse(res.body);
    expect(rotated.key).not.toBe(oldKey);
    expect(rotated.info.rotatedFromId).toBe(info.id);
    expect(rotated.info.scopes).toEqual(info.scopes);
    expect((await request(t.app).get(list).set(bearer(oldKey))).status).toBe(200);
    expect((await request(t.app).get(list).set(bearer(rotated.key))).status).toBe(200);
    await new Promise((r) => setTimeout(r, 1100));
    expectProblem(await request(t.app).get(list).set(bearer(oldKey)), 401, apiProblemTypes.keyExpired);
    expect((await request(t.app).get(list).set(bearer(rotated.key))).status).toBe(200);
  });

  it('refuse an expired key', async () => {
    const { key } = await createKey(t, { expiresAt: new Date(Date.now() + 800).toISOString() });
    expect((await request(t.app).get(list).set(bearer(key))).status).toBe(200);
    await new Promise((r) => setTimeout(r, 1000));
    expectProblem(await request(t.app).get(list).set(bearer(key)), 401, apiProblemTypes.keyExpired);
  });

  it('enforce scopes per endpoint', async () => {
    const { key } = await createKey(t, { scopes: ['read'] });
    expect((await request(t.app).get(list).set(bearer(key))).status).toBe(200);
    const p = expectProblem(await request(t.app).post(solve).set(bearer(key)).send({}), 403, apiProblemTypes.outOfScope);
    expect(p.detail).toMatch(/'solve'/);
    expectProblem(await request(t.app).post('/api/v1/specs/validate').set(bearer(key)).send({ spec: {} }), 403, apiProblemTypes.outOfScope);
    const solver = (await createKey(t, { scopes: ['solve'] })).key;
    expect((await request(t.app).post(solve).set(bearer(solver)).send({})).status).toBe(200);
    expectProblem(await request(t.app).get(list).set(bearer(solver)), 403, apiProblemTypes.outOfScope);
  });

  it('accept a publishable key only from its origins, with CORS for those alone', async () => {
    const shop = 'https://shop.brightwater.example';
    const { key } = await createKey(t, { kind: 'publishable', scopes: ['read', 'solve'], allowedOrigins: [shop] });
    expect(key.startsWith('pw_pk_')).toBe(true);
    const ok = await request(t.app).post(solve).set(bearer(key)).set('Origin', shop).send({});
    expect(ok.status).toBe(200);
    expect(ok.headers['access-control-allow-origin']).toBe(shop);
    const wrong = await request(t.app).post(solve).set(bearer(key)).set('Origin', 'https://elsewhere.example').send({});
    const p = expectProblem(wrong, 403, apiProblemTypes.wrongOrigin);
    expect(p.detail).toMatch(/elsewhere/);
    expect(wrong.headers['access-control-allow-origin']).toBeUndefined();
    expectProblem(await request(t.app).post(solve).set(bearer(key)).send({}), 403, apiProblemTypes.wrongOrigin);
    const preflight = await request(t.app).options(solve).set('Origin', shop).set('Access-Control-Request-Method', 'POST');
    expect(preflight.status).toBe(204);
    expect(preflight.headers['access-control-allow-headers']).toMatch(/Authorization/);
    const foreign = await request(t.app).options(solve).set('Origin', 'https://elsewhere.example').set('Access-Control-Request-Method', 'POST');
    expect(foreign.headers['access-control-allow-origin']).toBeUndefined();
    expectProblem(foreign, 403, apiProblemTypes.wrongOrigin);
    const secret = (await createKey(t)).key;
    const fromBrowser = await request(t.app).post(solve).set(bearer(secret)).set('Origin', shop).send({});
    expect(fromBrowser.status).toBe(200);
    expect(fromBrowser.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('refuse bad key requests field by field', async () => {
    const res = await t.supplier
      .post(`/api/organisations/${t.supplierOrgId}/api-keys`)
      .set('Origin', ORIGIN)
      .send({ name: '', kind: 'publishable', scopes: ['author', 'fly'], allowedOrigins: ['not an origin'], expiresAt: '2001-01-01T00:00:00Z' });
    const p = expectProblem(res, 422);
    const paths = p.errors!.map((e) => e.path);
    expect(paths).toEqual(expect.arrayContaining(['/name', '/scopes/1', '/allowedOrigins/0']));
    const pub = await t.supplier.post(`/api/organisations/${t.supplierOrgId}/api-keys`).set('Origin', ORIGIN).send({ name: 'x', kind: 'publishable', scopes: ['author'] });
    expect(expectProblem(pub, 422).errors!.map((e) => e.path)).toEqual(expect.arrayContaining(['/allowedOrigins', '/scopes']));
    const past = await t.supplier.post(`/api/organisations/${t.supplierOrgId}/api-keys`).set('Origin', ORIGIN).send({ name: 'x', kind: 'secret', scopes: ['read'], expiresAt: '2001-01-01T00:00:00Z' });
    expect(expectProblem(past, 422).errors!.map((e) => e.path)).toEqual(['/expiresAt']);
  });

  it('let admins see every key and make their own; suppliers see only their organisation', async () => {
    const mine = await t.admin.post('/api/admin/api-keys').set('Origin', ORIGIN).send({ name: 'Admin checks', kind: 'secret', scopes: ['read'] });
    expect(mine.status).toBe(201);
    expect(mine.body.info.organisationId).toBeNull();
    expect((await request(t.app).get(list).set(bearer(mine.body.key))).status).toBe(200);
    const all = apiKeyListSchema.parse((await t.admin.get('/api/admin/api-keys')).body);
    expect(all.items.map((k) => k.id)).toContain(mine.body.info.id);
    const org = apiKeyListSchema.parse((await t.supplier.get(`/api/organisations/${t.supplierOrgId}/api-keys`)).body);
    expect(org.items.every((k) => k.organisationId === t.supplierOrgId)).toBe(true);
    const foreign = await t.supplier.post(`/api/organisations/${t.supplierOrgId}/api-keys/${mine.body.info.id}/revoke`).set('Origin', ORIGIN).send({});
    expectProblem(foreign, 404);
    expect((await request(t.app).get(list).set(bearer(mine.body.key))).status).toBe(200);
  });

  it('count usage per key, endpoint and day in batches, with the last use', async () => {
    // A flush interval no test run reaches, so only the explicit flush below can write (a busy
    // machine must not turn the one-second default into a write before the first check).
    const t = await v1App(database, shared.supplierOrgId, { flushMs: 600_000 });
    const { key, info } = await createKey(t, { name: 'Counted' });
    for (let i = 0; i < 3; i++) await request(t.app).post(solve).set(bearer(key)).send({ inputs: { L: 3000 + i } }).expect(200);
    await request(t.app).get(list).set(bearer(key)).expect(200);
    const [before] = await database.db.select().from(apiKeys).where(eq(apiKeys.id, info.id));
    expect(before!.lastUsedAt).toBeNull(); // nothing written in the response path
    await t.usage.flush();
    const report = usageReportSchema.parse((await t.supplier.get(`/api/organisations/${t.supplierOrgId}/api-usage`)).body);
    const rows = report.rows.filter((r) => r.apiKeyId === info.id);
    const today = new Date().toISOString().slice(0, 10);
    expect(rows).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ endpoint: 'solveTemplate', day: today, count: 3 }),
        expect.objectContaining({ endpoint: 'listTemplates', day: today, count: 1 }),
      ]),
    );
    expect(report.monthly!.used).toBeGreaterThanOrEqual(4);
    const [after] = await database.db.select().from(apiKeys).where(eq(apiKeys.id, info.id));
    expect(after!.lastUsedAt).not.toBeNull();
    const admin = usageReportSchema.parse((await t.admin.get('/api/admin/api-usage')).body);
    expect(admin.rows.some((r) => r.apiKeyId === info.id)).toBe(true);
    expectProblem(await t.supplier.get(`/api/organisations/${t.supplierOrgId}/api-usage`).query({ from: '2026-02-10', to: '2026-02-01' }), 422);
  });
});
