import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiProblemTypes } from '../../shared/api/v1';
import type { DatabaseHandle } from '../../server/db/database';
import { apiQuotas } from '../../server/db/schema/api-access';
import { organisations } from '../../server/db/schema/organisations';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, expectProblem, seedV1, v1App, type V1Test } from './v1-fixture';

let database: DatabaseHandle;
let t: V1Test;
let supplierOrgId: string;
const windowMs = 1500;
beforeAll(async () => {
  database = await openTestDatabase();
  ({ supplierOrgId } = await seedV1(database));
  t = await v1App(database, supplierOrgId, { limits: { windowMs } });
}, 120_000);
afterAll(async () => {
  await database?.close();
});

const list = '/api/v1/templates';
const bearer = (key: string) => ({ Authorization: `Bearer ${key}` });

describe('API v1 limits', () => {
  it('answer 429 with Retry-After and RateLimit headers at the key’s limit, and clear after the window', async () => {
    const { key } = await createKey(t, { ratePerMinute: 3 });
    for (let i = 1; i <= 3; i++) {
      const res = await request(t.app).get(list).set(bearer(key));
      expect(res.status).toBe(200);
      expect(res.headers.ratelimit).toMatch(new RegExp(`r=${3 - i}\\b`));
      expect(res.headers['ratelimit-policy']).toMatch(/q=3/);
    }
    const limited = await request(t.app).get(list).set(bearer(key));
    const p = expectProblem(limited, 429, apiProblemTypes.rateLimited);
    expect(p.detail).toMatch(/more than 3 requests/);
    expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
    expect(limited.headers.ratelimit).toMatch(/r=0\b/);
    await new Promise((r) => setTimeout(r, windowMs + 100));
    expect((await request(t.app).get(list).set(bearer(key))).status).toBe(200);
  });

  it('share one counter between two app instances on one database', async () => {
    const second = await v1App(database, supplierOrgId, { limits: { windowMs: 60_000 } });
    const first = await v1App(database, supplierOrgId, { limits: { windowMs: 60_000 } });
    const { key } = await createKey(first, { ratePerMinute: 4 });
    const statuses: number[] = [];
    for (const app of [first.app, second.app, first.app, second.app, first.app, second.app]) statuses.push((await request(app).get(list).set(bearer(key))).status);
    expect(statuses).toEqual([200, 200, 200, 200, 429, 429]);
  });

  it('refuse calls past the organisation’s monthly quota', async () => {
    // An organisation of its own, so no other test's calls count against its month.
    const [org] = await database.db.insert(organisations).values({ slug: 'quayside-hoist-hire', name: 'Quayside Hoist Hire', kind: 'supplier' }).returning();
    await database.db.insert(apiQuotas).values({ organisationId: org!.id, monthlyRequests: 0 });
    const quotaApp = await v1App(database, org!.id);
    const { key } = await createKey(quotaApp);
    const res = await request(quotaApp.app).get(list).set(bearer(key));
    const p = expectProblem(res, 429, apiProblemTypes.quotaExceeded);
    expect(p.detail).toMatch(/of its 0 calls/);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    // Admins' own keys belong to no organisation and have no quota.
    const admin = await quotaApp.admin.post('/api/admin/api-keys').set('Origin', 'http://pinwork.test').send({ name: 'a', kind: 'secret', scopes: ['read'] });
    expect((await request(quotaApp.app).get(list).set(bearer(admin.body.key))).status).toBe(200);
    await database.db.update(apiQuotas).set({ monthlyRequests: 2 });
    await new Promise((r) => setTimeout(r, 1050));
    const statuses = [];
    for (let i = 0; i < 3; i++) statuses.push((await request(quotaApp.app).get(list).set(bearer(key))).status);
    expect(statuses).toEqual([200, 200, 429]);
    await database.db.delete(apiQuotas);
  });
});
