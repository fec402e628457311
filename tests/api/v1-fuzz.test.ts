import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { problemSchema } from '../../shared/api/problem';
import type { DatabaseHandle } from '../../server/db/database';
import { v1Operations } from '../../server/routes/v1-operations';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, seedV1, v1App, type V1Test } from './v1-fixture';

let database: DatabaseHandle;
let t: V1Test;
let key: string;
beforeAll(async () => {
  database = await openTestDatabase();
  const { supplierOrgId } = await seedV1(database);
  t = await v1App(database, supplierOrgId);
  key = (await createKey(t, { ratePerMinute: 100_000 })).key;
}, 120_000);
afterAll(async () => {
  await database?.close();
});

/** Bodies near the real shapes (so validation goes deep) and far from them. */
const number = fc.oneof(fc.double(), fc.integer(), fc.constantFrom(0, -1, 1e308, -1e308, 4000));
const inputs = fc.dictionary(fc.constantFrom('L', 'h', 'tieAt', 'trolley', 'mb', 'm', 'a', 'b', 'c', 'd', 'theta2', 'x', '__proto__', 'constructor'), fc.oneof(number, fc.string(), fc.constant(null)));
const nearBody = fc.record(
  {
    version: fc.oneof(fc.constantFrom('1.0.0', '^1', '~1.0.0', '>=2', '*', 'x.y', ''), fc.string()),
    inputs,
    units: fc.constantFrom('SI', 'US', 'metric', 3),
    sweep: fc.record({ input: fc.constantFrom('L', 'h', 'nope'), from: number, to: number, steps: fc.oneof(fc.integer({ min: -5, max: 400 }), fc.double()) }, { requiredKeys: [] }),
    tornado: fc.record({ result: fc.constantFrom('T', 'R', 'nope'), percent: number, inputs: fc.array(fc.string(), { maxLength: 50 }) }, { requiredKeys: [] }),
    spec: fc.oneof(fc.anything(), fc.record({ specVersion: fc.constant(1), slug: fc.string(), inputs: fc.array(fc.anything(), { maxLength: 3 }), points: fc.dictionary(fc.string(), fc.anything()) }, { requiredKeys: [] })),
  },
  { requiredKeys: [] },
);
const body = fc.oneof(nearBody, fc.anything(), fc.string({ maxLength: 200 }).map((s) => ({ raw: s })));
const slug = fc.oneof(fc.constantFrom('wall-jib-tie-rod', 'four-bar-linkage', 'toggle-clamp', 'nope'), fc.string({ maxLength: 80 }));
const query = fc.oneof(fc.constant(''), fc.string({ maxLength: 40 }).map((s) => `?version=${encodeURIComponent(s)}`), fc.constant('?version=%5E1&extra=1'));

async function expectClientAnswer(res: request.Response, what: string) {
  expect(res.status, `${what}: ${res.text.slice(0, 300)}`).toBeLessThan(500);
  if (res.status >= 400) {
    expect(res.headers['content-type'], what).toMatch(/^application\/problem\+json/);
    problemSchema.parse(JSON.parse(res.text));
  }
}

describe('fuzzing every v1 endpoint', () => {
  it.each(v1Operations.map((op) => [op.id, op] as const))('%s never answers 5xx, and every 4xx is problem details', async (_id, op) => {
    await fc.assert(
      fc.asyncProperty(slug, query, body, fc.boolean(), async (s, q, b, raw) => {
        const path = `/api/v1${op.path.replace('{slug}', encodeURIComponent(s))}${op.method === 'get' ? q : ''}`;
        let req = op.method === 'get' ? request(t.app).get(path) : request(t.app).post(path);
        req = req.set('Authorization', `Bearer ${key}`);
        if (op.method === 'post') {
          // Any JSON value as the body, or (raw) a truncated one that is no longer JSON.
          const text = JSON.stringify(b) ?? 'null';
          req = req.set('Content-Type', 'application/json').send(raw ? text.slice(0, -1) || '{' : text);
        }
        await expectClientAnswer(await req, `${op.method} ${path}`);
      }),
      { numRuns: 60 },
    );
  });

  it('refuses oversized bodies and odd headers as problems', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...v1Operations.filter((o) => o.method === 'post')), fc.integer({ min: 65 * 1024, max: 200 * 1024 }), async (op, size) => {
        const res = await request(t.app)
          .post(`/api/v1${op.example.path}`)
          .set('Authorization', `Bearer ${key}`)
          .send({ ...(op.example.body as object), pad: 'x'.repeat(size) });
        expect(res.status).toBe(413);
        await expectClientAnswer(res, op.id);
      }),
      { numRuns: 8 },
    );
    await fc.assert(
      fc.asyncProperty(fc.string({ maxLength: 120 }).filter((s) => !/[\r\n\0]/.test(s) && /^[\x20-\x7e]*$/.test(s)), async (header) => {
        const res = await request(t.app).get('/api/v1/templates').set('Authorization', header);
        expect([401]).toContain(res.status);
        await expectClientAnswer(res, header);
      }),
      { numRuns: 60 },
    );
  });
});
