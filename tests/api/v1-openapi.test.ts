import { compileErrors, validate } from '@readme/openapi-parser';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { v1Operations } from '../../server/routes/v1-operations';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, seedV1, v1App, type V1Test } from './v1-fixture';

let database: DatabaseHandle;
let t: V1Test;
let key: string;
let doc: { openapi: string; paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: { properties?: Record<string, unknown> }; example?: unknown }> } }>> };
beforeAll(async () => {
  database = await openTestDatabase();
  const { supplierOrgId } = await seedV1(database);
  t = await v1App(database, supplierOrgId);
  key = (await createKey(t)).key;
  doc = (await request(t.app).get('/api/v1/openapi.json')).body;
}, 120_000);
afterAll(async () => {
  await database?.close();
});

describe('the OpenAPI document', () => {
  it('validates as OpenAPI 3.1', async () => {
    expect(doc.openapi).toBe('3.1.0');
    const result = await validate(structuredClone(doc) as never);
    expect(result.valid, result.valid ? '' : compileErrors(result)).toBe(true);
  });

  it('documents every operation with its request fields', () => {
    for (const op of v1Operations) expect(doc.paths[op.path]?.[op.method], `${op.method} ${op.path}`).toBeDefined();
    const solve = doc.paths['/templates/{slug}/solve']!.post!.requestBody!.content['application/json']!;
    expect(Object.keys(solve.schema.properties!)).toEqual(expect.arrayContaining(['version', 'inputs', 'units']));
  });

  it.each(v1Operations.map((op) => [op.id, op] as const))('runs the documented example of %s successfully', async (_id, op) => {
    const documented = doc.paths[op.path]![op.method]!.requestBody?.content['application/json']?.example;
    expect(documented).toEqual(op.example.body);
    const url = `/api/v1${op.example.path}`;
    const req = op.method === 'get' ? request(t.app).get(url) : request(t.app).post(url).send(op.example.body as object);
    const res = await req.set('Authorization', `Bearer ${key}`);
    expect(res.status, res.text.slice(0, 500)).toBe(200);
    if (op.response) op.response.parse(res.body);
    if (op.id === 'validateSpec') expect(res.body.valid).toBe(true);
  });
});
